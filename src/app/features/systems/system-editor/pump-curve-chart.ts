import {
  ChangeDetectionStrategy,
  Component,
  type ElementRef,
  effect,
  input,
  viewChild,
} from '@angular/core';
import * as d3 from 'd3';
import type { UnitSystem } from '../../../../../shared/scenario';
import { displayScale, toDisplayValue } from '../../../ui/time-series-chart/display-scale';

/** One point of a pump curve in SI: flow m³/s, head m. */
export interface CurvePoint {
  readonly flow: number;
  readonly head: number;
}

const WIDTH = 360;
const HEIGHT = 200;
const MARGIN = { top: 10, right: 12, bottom: 36, left: 48 } as const;

/**
 * The pump curve (head against flow) in the reader's units: the datasheet points and a line
 * through them; with `dutyFlowM3PerS` a marker at the mean flow of the latest live run.
 */
@Component({
  selector: 'tw-pump-curve-chart',
  template: `<svg
    #chart
    class="chart"
    [attr.viewBox]="viewBox"
    role="img"
    aria-label="Pump curve: head against flow"
  ></svg>`,
  styles: `
    .chart {
      display: block;
      width: 100%;
      max-width: 28rem;
      height: auto;
      color: var(--mat-sys-on-surface);
      font-family: 'JetBrains Mono', monospace;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PumpCurveChart {
  /** The curve's points, SI, any order. */
  readonly points = input.required<readonly CurvePoint[]>();
  /** The reader's unit system. */
  readonly system = input<UnitSystem>('metric');
  /** The flow the pump delivered on average in the latest live run, m³/s, or null. */
  readonly dutyFlowM3PerS = input<number | null>(null);

  protected readonly viewBox = `0 0 ${WIDTH} ${HEIGHT}`;
  private readonly svgRef = viewChild.required<ElementRef<SVGSVGElement>>('chart');

  constructor() {
    effect(() => this.draw(this.svgRef().nativeElement));
  }

  private draw(svg: SVGSVGElement): void {
    const flowScale = displayScale('flow', this.system());
    const headScale = displayScale('length', this.system());
    const points = [...this.points()]
      .filter((p) => Number.isFinite(p.flow) && Number.isFinite(p.head))
      .sort((a, b) => a.flow - b.flow)
      .map((p) => ({ q: toDisplayValue(flowScale, p.flow), h: toDisplayValue(headScale, p.head) }));
    const root = d3.select(svg);
    root.selectAll('*').remove();
    const x = d3
      .scaleLinear()
      .domain([0, d3.max(points, (p) => p.q) || 1])
      .nice()
      .range([MARGIN.left, WIDTH - MARGIN.right]);
    const y = d3
      .scaleLinear()
      .domain([0, d3.max(points, (p) => p.h) || 1])
      .nice()
      .range([HEIGHT - MARGIN.bottom, MARGIN.top]);
    root
      .append('g')
      .attr('transform', `translate(0,${HEIGHT - MARGIN.bottom})`)
      .call(d3.axisBottom(x).ticks(5));
    root.append('g').attr('transform', `translate(${MARGIN.left},0)`).call(d3.axisLeft(y).ticks(5));
    root
      .append('text')
      .attr('x', (MARGIN.left + WIDTH) / 2)
      .attr('y', HEIGHT - 4)
      .attr('text-anchor', 'middle')
      .attr('font-size', 10)
      .attr('fill', 'currentColor')
      .text(`flow (${flowScale.label})`);
    root
      .append('text')
      .attr('transform', `translate(11,${HEIGHT / 2}) rotate(-90)`)
      .attr('text-anchor', 'middle')
      .attr('font-size', 10)
      .attr('fill', 'currentColor')
      .text(`head (${headScale.label})`);
    const line = d3
      .line<{ q: number; h: number }>()
      .x((p) => x(p.q))
      .y((p) => y(p.h))
      .curve(d3.curveMonotoneX);
    root
      .append('path')
      .attr('class', 'curve')
      .attr('fill', 'none')
      .attr('stroke', '#1f6f8b')
      .attr('stroke-width', 2)
      .attr('d', line(points) ?? '');
    root
      .selectAll('circle.point')
      .data(points)
      .join('circle')
      .attr('class', 'point')
      .attr('r', 3.5)
      .attr('fill', '#1f6f8b')
      .attr('cx', (p) => x(p.q))
      .attr('cy', (p) => y(p.h));
    const duty = this.dutyFlowM3PerS();
    if (duty !== null) {
      const dx = x(toDisplayValue(flowScale, duty));
      root
        .append('line')
        .attr('class', 'duty')
        .attr('x1', dx)
        .attr('x2', dx)
        .attr('y1', MARGIN.top)
        .attr('y2', HEIGHT - MARGIN.bottom)
        .attr('stroke', '#c2410c')
        .attr('stroke-dasharray', '4 3');
    }
  }
}
