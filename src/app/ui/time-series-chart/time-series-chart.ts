import {
  ChangeDetectionStrategy,
  inject,
  Component,
  DestroyRef,
  type ElementRef,
  afterNextRender,
  computed,
  effect,
  input,
  output,
  signal,
  viewChild,
} from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import * as d3 from 'd3';
import type { Dimension, UnitSystem } from '../../../../shared/scenario';
import { type ChartSeriesSet, chartColour, nearestSampleIndex } from './chart-series';
import { chartPngBlob, chartSvgMarkup } from './chart-export';
import { displayScale, formatDisplayValue, toDisplayValue } from './display-scale';
import { CHART_FRAME, baseTimeScale, chartFrame, drawTimeSeries } from './draw-time-series';
import { formatElapsed } from './time-axis';

let nextChartId = 1;

/** One row of the hover read-out. */
interface ReadoutRow {
  readonly key: string;
  readonly label: string;
  readonly colour: string;
  readonly dashed: boolean;
  readonly text: string;
}

/**
 * A d3 line chart of quantities over time: values arrive in SI and are shown in the reader's
 * units; wheel or pinch zooms the time axis (double-click or "Reset zoom" restores it); hovering
 * shows every line's value at that time and emits the time as `cursorChange`; `cursorS` draws a
 * cursor set from outside (an animation, another chart). An `overlay` set (e.g. a second run) is
 * drawn dashed in the same colours, and the legend names both.
 *
 * @example <tw-time-series-chart heading="Levels" dimension="length" [system]="units()" [data]="levels()" />
 */
@Component({
  selector: 'tw-time-series-chart',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './time-series-chart.html',
  styleUrl: './time-series-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TimeSeriesChart {
  /** The chart's title, also its accessible name. */
  readonly heading = input('');
  /** The lines, values in SI. */
  readonly data = input.required<ChartSeriesSet>();
  /** A second set drawn dashed over the first, or null. */
  readonly overlay = input<ChartSeriesSet | null>(null);
  /** Legend suffixes telling the two sets apart when there is an overlay. */
  readonly dataName = input('A');
  readonly overlayName = input('B');
  /** What the values are; sets the unit of the value axis. */
  readonly dimension = input.required<Dimension>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** A time (s) to mark with a cursor line, or null. */
  readonly cursorS = input<number | null>(null);
  /** The time (s) under the pointer while it moves over the plot. */
  readonly cursorChange = output<number>();

  protected readonly clipId = `tw-chart-clip-${nextChartId++}`;
  private readonly measuredWidth = signal(CHART_FRAME.width);
  private readonly frame = computed(() => chartFrame(this.measuredWidth()));
  protected readonly viewBox = computed(() => `0 0 ${this.frame().width} ${this.frame().height}`);
  private readonly svgRef = viewChild.required<ElementRef<SVGSVGElement>>('plot');
  private readonly transform = signal<d3.ZoomTransform>(d3.zoomIdentity);
  private readonly hoverS = signal<number | null>(null);
  private zoomBehaviour: d3.ZoomBehavior<SVGSVGElement, unknown> | null = null;

  private readonly scale = computed(() => displayScale(this.dimension(), this.system()));
  private readonly baseX = computed(() => baseTimeScale(this.data(), this.overlay(), this.frame()));
  private readonly x = computed(() => this.transform().rescaleX(this.baseX()));
  protected readonly zoomed = computed(() => this.transform().k !== 1);

  protected readonly legend = computed(() => {
    const overlay = this.overlay();
    const entries = this.data().lines.map((line, index) => ({
      key: `data:${line.id}`,
      label: overlay ? `${line.label} (${this.dataName()})` : line.label,
      colour: chartColour(index),
      dashed: false,
    }));
    const extra = (overlay?.lines ?? []).map((line, index) => ({
      key: `overlay:${line.id}`,
      label: `${line.label} (${this.overlayName()})`,
      colour: chartColour(index),
      dashed: true,
    }));
    return [...entries, ...extra];
  });

  /** The time under the pointer and each line's value there, in display units. */
  protected readonly readout = computed(() => {
    const timeS = this.hoverS();
    if (timeS === null) return null;
    const rows: ReadoutRow[] = [];
    for (const [key, set, dashed] of [
      ['data', this.data(), false],
      ['overlay', this.overlay(), true],
    ] as const) {
      if (!set) continue;
      const index = nearestSampleIndex(set.t_s, timeS);
      set.lines.forEach((line, lineIndex) => {
        const value = index >= 0 ? (line.values[index] ?? null) : null;
        rows.push({
          key: `${key}:${line.id}`,
          label: line.label,
          colour: chartColour(lineIndex),
          dashed,
          text:
            value === null
              ? '–'
              : formatDisplayValue(toDisplayValue(this.scale(), value), this.scale().label),
        });
      });
    }
    return { time: formatElapsed(timeS), rows };
  });

  protected readonly cursorX = computed(() => this.lineX(this.cursorS()));
  protected readonly hoverX = computed(() => this.lineX(this.hoverS()));
  protected readonly plotTop = computed(() => this.frame().top);
  protected readonly plotBottom = computed(() => this.frame().height - this.frame().bottom);

  constructor() {
    effect(() => {
      const label = this.scale().label;
      drawTimeSeries(this.svgRef().nativeElement, {
        data: this.data(),
        overlay: this.overlay(),
        frame: this.frame(),
        scale: this.scale(),
        yTitle: label ? `${this.heading() || 'value'} (${label})` : this.heading(),
        clipId: this.clipId,
        x: this.x(),
      });
    });
    effect(() => this.attachZoom(this.svgRef().nativeElement));
    this.followWidth();
  }

  /** The chart as an SVG document, for download. */
  svgMarkup(): string {
    return chartSvgMarkup(this.svgRef().nativeElement);
  }

  /** The chart as a PNG image, for download. */
  pngBlob(): Promise<Blob> {
    return chartPngBlob(this.svgRef().nativeElement);
  }

  protected resetZoom(): void {
    const svg = this.svgRef().nativeElement;
    if (this.zoomBehaviour) d3.select(svg).call(this.zoomBehaviour.transform, d3.zoomIdentity);
    this.transform.set(d3.zoomIdentity);
  }

  protected trackPointer(event: PointerEvent): void {
    const [px] = d3.pointer(event, this.svgRef().nativeElement);
    const x = this.x();
    const [start = 0, end = 0] = x.domain();
    const timeS = Math.min(end, Math.max(start, x.invert(px)));
    this.hoverS.set(timeS);
    this.cursorChange.emit(timeS);
  }

  protected leavePlot(): void {
    this.hoverS.set(null);
  }

  private lineX(timeS: number | null): number | null {
    if (timeS === null) return null;
    const px = this.x()(timeS);
    const frame = this.frame();
    return px >= frame.left && px <= frame.width - frame.right ? px : null;
  }

  private attachZoom(svg: SVGSVGElement): void {
    const { width, height, left, right, top, bottom } = this.frame();
    const extent: [[number, number], [number, number]] = [
      [left, top],
      [width - right, height - bottom],
    ];
    if (this.zoomBehaviour) {
      // A new width: the old zoom was in the old pixels, so start again unzoomed.
      this.zoomBehaviour.extent(extent).translateExtent(extent);
      d3.select(svg).call(this.zoomBehaviour.transform, d3.zoomIdentity);
      return;
    }
    this.zoomBehaviour = d3
      .zoom<SVGSVGElement, unknown>()
      .scaleExtent([1, 500])
      .extent(extent)
      .translateExtent(extent)
      .on('zoom', (event: d3.D3ZoomEvent<SVGSVGElement, unknown>) =>
        this.transform.set(event.transform),
      );
    d3.select(svg)
      .call(this.zoomBehaviour)
      .on('dblclick.zoom', () => this.resetZoom());
  }

  /** Draws at the container's real width, so text keeps its size on any screen. */
  private followWidth(): void {
    const destroyRef = inject(DestroyRef);
    afterNextRender(() => {
      if (typeof ResizeObserver === 'undefined') return;
      const observer = new ResizeObserver((entries) => {
        const width = entries[0]?.contentRect.width ?? 0;
        if (width > 0) this.measuredWidth.set(width);
      });
      observer.observe(this.svgRef().nativeElement.parentElement ?? this.svgRef().nativeElement);
      destroyRef.onDestroy(() => observer.disconnect());
    });
  }
}
