import { signal } from '@angular/core';

/**
 * Presentation mode for a projector: the element fills the screen (the browser's full screen when
 * it allows it, else a fixed overlay) and the `presenting` signal lets styles switch to large type
 * and high contrast. Leaving the browser's full screen (Esc) leaves presentation mode too.
 */
export class PresentationScreen {
  /** Whether presentation mode is on. */
  readonly presenting = signal(false);
  private readonly onChange = () => {
    if (this.presenting() && document.fullscreenElement !== this.element && this.wasFull) {
      this.presenting.set(false);
    }
    this.wasFull = document.fullscreenElement === this.element;
  };
  private wasFull = false;

  constructor(private readonly element: HTMLElement) {
    document.addEventListener('fullscreenchange', this.onChange);
  }

  /** Turns presentation mode on or off. */
  async toggle(): Promise<void> {
    if (this.presenting()) await this.leave();
    else await this.enter();
  }

  /** Turns presentation mode on, full screen when the browser allows it. */
  async enter(): Promise<void> {
    this.presenting.set(true);
    this.element.focus();
    try {
      await this.element.requestFullscreen?.();
    } catch {
      // Without full screen (refused, or a headless browser) the fixed overlay still covers the page.
    }
  }

  /** Turns presentation mode off. */
  async leave(): Promise<void> {
    this.presenting.set(false);
    if (document.fullscreenElement === this.element) await document.exitFullscreen();
  }

  /** Stops listening (the component is going away). */
  dispose(): void {
    document.removeEventListener('fullscreenchange', this.onChange);
  }
}
