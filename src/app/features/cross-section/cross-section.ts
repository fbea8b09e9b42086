import {
  ChangeDetectionStrategy,
  Component,
  DestroyRef,
  ElementRef,
  InjectionToken,
  computed,
  effect,
  inject,
  input,
  model,
  signal,
  untracked,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import type { Scenario, UnitSystem } from '../../../../shared/scenario';
import { displayScale } from '../../ui/time-series-chart/display-scale';
import { ELEVATION_WIDTH } from '../systems/elevation-drawing/draw-elevation';
import { bedReadouts } from './bed-readouts';
import { CaptionHold } from './caption-hold';
import { CaptionPicker } from './caption-picker';
import type { CrossSectionEvent, CrossSectionSeries } from './cross-section-data';
import { buildCrossSectionScene } from './cross-section-scene';
import { CLOSE_UP_SIZE } from './draw-close-up';
import { ExplainPanel } from './explain-panel';
import { explainPhase } from './phase-explanation';
import { PlaybackBar } from './playback-bar';
import { BROWSER_FRAMES, type FrameScheduler, PlaybackController } from './playback-controller';
import { PresentationScreen } from './presentation-screen';
import { SHORTCUTS, type ShortcutAction, shortcutFor } from './playback-shortcuts';
import { sceneFrame } from './scene-frame';
import { SceneRenderer } from './scene-renderer';
import { SceneSampler } from './scene-sampler';

/** Where animation frames come from (specs hand in a fake they step by hand). */
export const CROSS_SECTION_FRAMES = new InjectionToken<FrameScheduler>('CROSS_SECTION_FRAMES', {
  providedIn: 'root',
  factory: () => BROWSER_FRAMES,
});

/** Vertical exaggerations offered. */
export const EXAGGERATIONS: readonly number[] = [1, 2, 4];

let nextId = 1;

/**
 * The animated cross-section of a run: the system in side elevation to scale (with a vertical
 * exaggeration toggle), water levels from the stored series, water and trapped air inside each
 * bell, moving marks along the pipes at the speed and density of their flow, the pump's state,
 * each bed's phase and spill number, captions for events, playback with a scrub bar and event
 * stepping, an explain panel, keyboard shortcuts and a presentation mode for a projector.
 *
 * @example <tw-cross-section [scenario]="scenario" [series]="series" [events]="events" [system]="units()" [(cursorS)]="cursor" />
 */
@Component({
  selector: 'tw-cross-section',
  imports: [MatButtonModule, MatButtonToggleModule, MatIconModule, ExplainPanel, PlaybackBar],
  templateUrl: './cross-section.html',
  styleUrl: './cross-section.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: {
    '[class.presenting]': 'presenting()',
    '(keydown)': 'onKey($event)',
  },
})
export class CrossSection {
  /** The system as run (normalised, SI). */
  readonly scenario = input.required<Scenario>();
  /** The run's series: levels, flows and phases. */
  readonly series = input.required<CrossSectionSeries>();
  /** The run's events. */
  readonly events = input<readonly CrossSectionEvent[]>([]);
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** The shared time cursor, s: follows playback and moves it when set from outside. */
  readonly cursorS = model<number | null>(null);

  protected readonly id = `tw-xs-${nextId++}`;
  protected readonly exaggerationOptions = EXAGGERATIONS.map((value) => ({
    value,
    label: value === 1 ? 'to scale' : `heights ×${value}`,
  }));
  protected readonly shortcuts = SHORTCUTS;
  protected readonly exaggeration = signal(1);
  protected readonly captionsOn = signal(true);
  protected readonly explainOn = signal(false);
  protected readonly explainBedId = signal<string | null>(null);
  private readonly captionHold = new CaptionHold();
  protected readonly caption = this.captionHold.caption;
  protected readonly screen = new PresentationScreen(
    inject<ElementRef<HTMLElement>>(ElementRef).nativeElement,
  );
  protected readonly presenting = this.screen.presenting;
  private readonly svgLayer = viewChild.required<ElementRef<SVGGElement>>('layer');
  private readonly closeUpLayer = viewChild.required<ElementRef<SVGGElement>>('closeUpLayer');
  protected readonly closeUpViewBox = `0 0 ${CLOSE_UP_SIZE.width} ${CLOSE_UP_SIZE.height}`;
  private readonly renderer = new SceneRenderer(this.id);
  private lastEmittedS: number | null = null;
  private readonly frames = inject(CROSS_SECTION_FRAMES);
  readonly playback = new PlaybackController(this.frames, (t, step) => this.drawFrame(t, step));

  protected readonly scene = computed(() => buildCrossSectionScene(this.scenario()));
  private readonly orderedEvents = computed(() => [...this.events()].sort((a, b) => a.t_s - b.t_s));
  private readonly sampler = computed(
    () => new SceneSampler(this.scene(), this.series(), this.orderedEvents()),
  );
  private readonly captions = computed(
    () => new CaptionPicker(this.orderedEvents(), this.system()),
  );
  private readonly primingCoefficients = computed(() =>
    this.scene().beds.map((b) =>
      b.drain.type === 'bell-siphon' ? b.drain.primingCoefficient : Number.NaN,
    ),
  );
  protected readonly frame = computed(() => sceneFrame(this.scene(), this.exaggeration()));
  protected readonly viewBox = computed(
    () => `0 0 ${ELEVATION_WIDTH} ${Math.round(this.frame().height)}`,
  );
  protected readonly endS = computed(() => this.sampler().reader.endS);
  protected readonly startS = computed(() => this.sampler().reader.startS);
  protected readonly tickEvents = computed(() => this.orderedEvents());
  protected readonly readouts = computed(() =>
    bedReadouts(this.scene(), this.sampler(), this.playback.coarseTimeS(), this.system()),
  );
  protected readonly showCaptions = computed(() => this.captionsOn() || this.presenting());
  protected readonly showExplain = computed(() => this.explainOn() || this.presenting());
  protected readonly presentIcon = computed(() =>
    this.presenting() ? 'fullscreen_exit' : 'co_present',
  );
  protected readonly presentLabel = computed(() =>
    this.presenting() ? 'Leave presentation' : 'Present',
  );
  /** The bed the reader picked, else the bed of the latest caption, else the first bed. */
  protected readonly explainedBedId = computed(() => {
    const beds = this.scene().beds;
    const captioned = beds.find((b) => b.id === this.caption()?.where)?.id;
    return this.explainBedId() ?? captioned ?? beds[0]?.id ?? '';
  });
  protected readonly bedIds = computed(() => this.scene().beds.map((b) => b.id));
  protected readonly explanation = computed(() => {
    const bed = this.scene().beds.find((b) => b.id === this.explainedBedId());
    const reading = this.readouts().beds.find((b) => b.id === bed?.id)?.reading;
    if (!bed || !reading) return null;
    const timeS = this.playback.coarseTimeS();
    const reader = this.sampler().reader;
    return explainPhase({
      scenario: this.scenario(),
      bed,
      reader,
      reading,
      timeS,
      system: this.system(),
    });
  });
  protected readonly closeUpLabel = computed(
    () =>
      `Close-up, to scale, of the bell of ${this.explainedBedId()}: the water and air inside the bell and the standpipe.`,
  );
  protected readonly title = computed(() => `Cross-section of ${this.scenario().name}`);
  protected readonly description = computed(() => {
    const scene = this.scene();
    const exaggeration = this.exaggeration();
    const scale =
      exaggeration === 1 ? 'to scale' : `heights drawn ${exaggeration} times their width scale`;
    return `Side elevation, ${scale}: ${scene.vessels.length} vessels, ${scene.beds.length} beds with their standpipes and bells, ${scene.pumps.length} pump. Water levels, water and air inside each bell, and flows along the pipes follow the run's time.`;
  });

  constructor() {
    effect(() => this.redraw());
    effect(() => this.redrawCloseUp());
    effect(() => {
      const reader = this.sampler().reader;
      untracked(() => this.playback.setRange(reader.startS, reader.endS));
    });
    effect(() => {
      const timeS = this.playback.coarseTimeS();
      untracked(() => {
        this.lastEmittedS = timeS;
        this.cursorS.set(timeS);
      });
    });
    effect(() => {
      const wanted = this.cursorS();
      untracked(() => {
        if (wanted !== null && wanted !== this.lastEmittedS) this.playback.seek(wanted);
      });
    });
    inject(DestroyRef).onDestroy(() => {
      this.playback.dispose();
      this.screen.dispose();
    });
  }

  protected togglePlay(): void {
    if (this.playback.playing()) {
      this.playback.pause();
      this.renderer.timer.report();
    } else {
      this.renderer.timer.reset();
      this.playback.play();
    }
  }

  protected stepEvent(by: 1 | -1): void {
    this.playback.stepTo(this.captions().times(), by);
  }

  protected seek(timeS: number): void {
    this.playback.seek(timeS);
  }

  protected setSpeed(speed: number): void {
    this.playback.setSpeed(speed);
  }

  protected toggleCaptions(): void {
    this.captionsOn.update((on) => !on);
  }

  protected toggleExplain(): void {
    this.explainOn.update((on) => !on);
  }

  protected setExaggeration(value: number): void {
    this.exaggeration.set(value);
  }

  protected togglePresentation(): void {
    void this.screen.toggle();
  }

  protected onKey(event: KeyboardEvent): void {
    const action = shortcutFor(event);
    if (!action) return;
    event.preventDefault();
    this.actions[action]();
  }

  /** What each shortcut does. */
  private readonly actions: Readonly<Record<ShortcutAction, () => void>> = {
    'toggle-play': () => this.togglePlay(),
    'next-event': () => this.stepEvent(1),
    'previous-event': () => this.stepEvent(-1),
    forward: () => this.playback.seek(this.playback.time + 60),
    back: () => this.playback.seek(this.playback.time - 60),
    faster: () => this.playback.stepSpeed(1),
    slower: () => this.playback.stepSpeed(-1),
    start: () => this.playback.seek(this.startS()),
    end: () => this.playback.seek(this.endS()),
    captions: () => this.toggleCaptions(),
    explain: () => this.toggleExplain(),
    exaggerate: () => this.cycleExaggeration(),
    present: () => this.togglePresentation(),
    leave: () => void this.screen.leave(),
  };

  private cycleExaggeration(): void {
    const index = EXAGGERATIONS.indexOf(this.exaggeration());
    this.exaggeration.set(EXAGGERATIONS[(index + 1) % EXAGGERATIONS.length] ?? 1);
  }

  /** Draws the still parts again (scene, scale or units changed), then the current frame. */
  private redraw(): void {
    const layer = this.svgLayer().nativeElement;
    const scene = this.scene();
    const frame = this.frame();
    const units = displayScale('length', this.system());
    this.sampler();
    untracked(() => {
      this.renderer.drawScene(layer, scene, frame, units);
      this.drawFrame(this.playback.time, 0);
    });
  }

  /** Draws the close-up of the explained bed's bell again (another bed, scene or scale). */
  private redrawCloseUp(): void {
    const layer = this.closeUpLayer().nativeElement;
    const scene = this.scene();
    const bedId = this.explainedBedId();
    this.frame();
    untracked(() => {
      this.renderer.drawCloseUp(layer, scene, bedId);
      this.drawFrame(this.playback.time, 0);
    });
  }

  /** One animation frame: paint the run at `timeS`, then the caption for it. */
  private drawFrame(timeS: number, wallStepS: number): void {
    untracked(() => {
      const speed = this.playback.speed();
      this.renderer.paint({
        sampler: this.sampler(),
        timeS,
        wallStepS,
        frame: this.frame(),
        primingCoefficients: this.primingCoefficients(),
        speed,
      });
      this.captionHold.update(this.captions(), timeS, speed, this.frames.now(), wallStepS === 0);
    });
  }
}
