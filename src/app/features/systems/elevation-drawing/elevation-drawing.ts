import {
  ChangeDetectionStrategy,
  Component,
  type ElementRef,
  computed,
  effect,
  input,
  viewChild,
} from '@angular/core';
import type { Scenario, UnitSystem } from '../../../../../shared/scenario';
import { displayScale } from '../../../ui/time-series-chart/display-scale';
import { ELEVATION_WIDTH, drawElevation, elevationFrame } from './draw-elevation';
import { layoutElevation } from './elevation-layout';

/**
 * The system in side elevation, to scale (one scale for heights and widths): every vessel at its
 * floor elevation with its water, media, standpipe, bell and intake level, the drain pipes and
 * the pump lines, and an elevation axis in the reader's units. Redraws whenever `scenario` changes.
 *
 * @example <tw-elevation-drawing [scenario]="drawable()" [system]="units()" />
 */
@Component({
  selector: 'tw-elevation-drawing',
  template: `<svg
    #drawing
    class="drawing"
    [attr.viewBox]="viewBox()"
    role="img"
    [attr.aria-label]="description()"
  ></svg>`,
  styles: `
    :host {
      display: block;
    }
    .drawing {
      display: block;
      width: 100%;
      height: auto;
      color: var(--mat-sys-on-surface);
      font-family: Roboto, sans-serif;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ElevationDrawing {
  /** The system to draw (normalised, SI), or null to draw nothing. */
  readonly scenario = input.required<Scenario | null>();
  /** The reader's unit system for the elevation axis. */
  readonly system = input<UnitSystem>('metric');

  private readonly svgRef = viewChild.required<ElementRef<SVGSVGElement>>('drawing');
  private readonly layout = computed(() => {
    const scenario = this.scenario();
    return scenario ? layoutElevation(scenario) : null;
  });
  private readonly frame = computed(() => {
    const layout = this.layout();
    return layout ? elevationFrame(layout) : null;
  });

  /** Drawing units per metre, the same horizontally and vertically (0 when nothing is drawn). */
  readonly pxPerM = computed(() => this.frame()?.pxPerM ?? 0);
  protected readonly viewBox = computed(
    () => `0 0 ${ELEVATION_WIDTH} ${Math.round(this.frame()?.height ?? 200)}`,
  );
  protected readonly description = computed(() => {
    const scenario = this.scenario();
    if (!scenario) return 'No drawing: the system has errors to fix first.';
    const beds = scenario.vessels.filter((v) => v.kind === 'bed').length;
    return `Side elevation of ${scenario.name}: ${scenario.vessels.length} vessels, ${beds} beds, ${scenario.pumps.length} pumps.`;
  });

  constructor() {
    effect(() => {
      const svg = this.svgRef().nativeElement;
      const layout = this.layout();
      const frame = this.frame();
      if (!layout || !frame) {
        svg.replaceChildren();
        return;
      }
      drawElevation(svg, layout, frame, displayScale('length', this.system()));
    });
  }
}
