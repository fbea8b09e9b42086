import {
  ChangeDetectionStrategy,
  Component,
  type ElementRef,
  computed,
  effect,
  input,
  output,
  viewChild,
} from '@angular/core';
import type { Sweep } from '../../../../shared/contracts/sweeps';
import type { UnitSystem } from '../../../../shared/scenario';
import { MAP_SIZE, drawRegimeMap } from './draw-regime-map';
import { drawRegimeLine } from './draw-regime-line';
import { REGIME_ORDER, REGIME_STYLES } from './regime-style';
import { type CycleMetric, sweepMapModel } from './sweep-map-model';

/**
 * The operating-window map of a sweep: a regime map with contours for two parameters, a line
 * chart with regime bands for one; the current design marked; a click picks a cell.
 */
@Component({
  selector: 'tw-regime-map',
  template: `
    <svg
      #chart
      class="chart"
      [attr.viewBox]="viewBox"
      role="img"
      [attr.aria-label]="description()"
    ></svg>
    <ul class="legend" aria-label="Regimes">
      @for (entry of legend(); track entry.regime) {
        <li>
          <span class="swatch" [style.background]="entry.color"></span>{{ entry.label }}
          <span class="count">{{ entry.count }}</span>
        </li>
      }
    </ul>
  `,
  styleUrl: './regime-map.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RegimeMap {
  readonly sweep = input.required<Sweep>();
  readonly system = input<UnitSystem>('metric');
  /** The figure drawn as contours on a two-parameter map. */
  readonly metric = input<CycleMetric>('periodS');
  /** A cell was clicked: its index. */
  readonly pick = output<number>();

  protected readonly viewBox = `0 0 ${MAP_SIZE.width} ${MAP_SIZE.height}`;
  private readonly svgRef = viewChild.required<ElementRef<SVGSVGElement>>('chart');
  private readonly model = computed(() => sweepMapModel(this.sweep(), this.system()));
  protected readonly legend = computed(() => {
    const cells = this.sweep().cells ?? [];
    return REGIME_ORDER.map((regime) => ({
      regime,
      ...REGIME_STYLES[regime],
      count: cells.filter((c) => c.regime === regime).length,
    })).filter((e) => e.count > 0);
  });
  protected readonly description = computed(() => {
    const m = this.model();
    return m.y
      ? `Regime map over ${m.x.title} and ${m.y.title}`
      : `Regimes and cycle times over ${m.x.title}`;
  });

  constructor() {
    effect(() => {
      const svg = this.svgRef().nativeElement;
      const model = this.model();
      const onPick = (index: number) => this.pick.emit(index);
      if (model.y) drawRegimeMap(svg, model, this.metric(), onPick);
      else drawRegimeLine(svg, model, onPick);
    });
  }
}
