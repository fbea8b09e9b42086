import * as d3 from 'd3';
import { type ChartSeriesSet, chartColour } from './chart-series';
import { type DisplayScale, toDisplayValue } from './display-scale';
import { timeAxisUnit } from './time-axis';

/** The chart's drawing box in SVG user units (one unit = one CSS pixel at the measured width). */
export interface ChartFrame {
  readonly width: number;
  readonly height: number;
  readonly top: number;
  readonly right: number;
  readonly bottom: number;
  readonly left: number;
}

/** The frame for a chart `width` pixels wide (at least 320), 300 high. */
export function chartFrame(width: number): ChartFrame {
  return {
    width: Math.max(320, Math.round(width)),
    height: 300,
    top: 14,
    right: 18,
    bottom: 40,
    left: 64,
  };
}

/** The frame used until the chart has measured its container. */
export const CHART_FRAME: ChartFrame = chartFrame(800);

/** Everything one drawing of the chart needs. */
export interface ChartDrawing {
  readonly data: ChartSeriesSet;
  readonly overlay: ChartSeriesSet | null;
  readonly frame: ChartFrame;
  readonly scale: DisplayScale;
  readonly yTitle: string;
  /** A document-unique id for the plot's clip path. */
  readonly clipId: string;
  /** The x-scale after zooming: seconds → user units. */
  readonly x: d3.ScaleLinear<number, number>;
}

type Point = readonly [number, number | null];

/** The time axis at zoom 1: the whole time span of both series sets across the plot width. */
export function baseTimeScale(
  data: ChartSeriesSet,
  overlay: ChartSeriesSet | null,
  frame: ChartFrame,
): d3.ScaleLinear<number, number> {
  const times = [...data.t_s, ...(overlay?.t_s ?? [])];
  const [first, last] = d3.extent(times);
  const start = first ?? 0;
  const end = last !== undefined && last > start ? last : start + 1;
  return d3
    .scaleLinear()
    .domain([start, end])
    .range([frame.left, frame.width - frame.right]);
}

/** The value axis: the extent of every displayed value, padded by 5 % and made nice. */
export function valueScale(
  drawing: Omit<ChartDrawing, 'x' | 'clipId'>,
): d3.ScaleLinear<number, number> {
  const values: number[] = [];
  for (const set of [drawing.data, drawing.overlay]) {
    for (const line of set?.lines ?? []) {
      for (const v of line.values)
        if (v !== null && Number.isFinite(v)) values.push(toDisplayValue(drawing.scale, v));
    }
  }
  const [low = 0, high = 1] = d3.extent(values);
  const pad = high > low ? (high - low) * 0.05 : Math.max(Math.abs(high) * 0.05, 1e-6);
  return d3
    .scaleLinear()
    .domain([low - pad, high + pad])
    .range([drawing.frame.height - drawing.frame.bottom, drawing.frame.top])
    .nice();
}

/** Redraws axes and lines into `svg`. Presentation attributes (not CSS) keep exported SVGs whole. */
export function drawTimeSeries(svg: SVGSVGElement, drawing: ChartDrawing): void {
  const root = d3.select(svg);
  const y = valueScale(drawing);
  const [start = 0, end = 1] = drawing.x.domain();
  const unit = timeAxisUnit(end - start);
  drawAxes(root, drawing, y, unit.seconds, unit.label);
  const clip = root
    .selectAll('g.lines')
    .data([0])
    .join('g')
    .attr('class', 'lines')
    .attr('clip-path', `url(#${drawing.clipId})`);
  const sets = [
    { key: 'data', set: drawing.data, dash: null },
    { key: 'overlay', set: drawing.overlay, dash: '6 4' },
  ];
  const line = d3
    .line<Point>()
    .defined((p) => p[1] !== null)
    .x((p) => drawing.x(p[0]))
    .y((p) => y(toDisplayValue(drawing.scale, p[1] ?? 0)));
  const paths = sets.flatMap(({ key, set, dash }) =>
    (set?.lines ?? []).map((entry, index) => ({
      key: `${key}:${entry.id}`,
      colour: chartColour(index),
      dash,
      d: line(entry.values.map((v, i): Point => [set?.t_s[i] ?? 0, v])) ?? '',
    })),
  );
  clip
    .selectAll('path')
    .data(paths, (p) => (p as { key: string }).key)
    .join('path')
    .attr('data-line', (p) => p.key)
    .attr('fill', 'none')
    .attr('stroke', (p) => p.colour)
    .attr('stroke-width', 1.6)
    .attr('stroke-dasharray', (p) => p.dash)
    .attr('d', (p) => p.d);
}

function drawAxes(
  root: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  drawing: ChartDrawing,
  y: d3.ScaleLinear<number, number>,
  timeUnitS: number,
  timeLabel: string,
): void {
  const { width, height, top, right, bottom, left } = drawing.frame;
  root
    .selectAll('clipPath')
    .data([0])
    .join('clipPath')
    .attr('id', drawing.clipId)
    .selectAll('rect')
    .data([0])
    .join('rect')
    .attr('x', left)
    .attr('y', top)
    .attr('width', width - left - right)
    .attr('height', height - top - bottom);
  // Ticks are chosen in the shown unit (minutes, hours) so they fall on round values.
  const inUnit = drawing.x.copy().domain(drawing.x.domain().map((t) => t / timeUnitS));
  const xAxis = d3.axisBottom(inUnit).ticks(Math.max(3, Math.floor(width / 100)));
  root
    .selectAll<SVGGElement, number>('g.x-axis')
    .data([0])
    .join('g')
    .attr('class', 'x-axis')
    .attr('transform', `translate(0,${height - bottom})`)
    .call(xAxis);
  root
    .selectAll<SVGGElement, number>('g.y-axis')
    .data([0])
    .join('g')
    .attr('class', 'y-axis')
    .attr('transform', `translate(${left},0)`)
    .call(
      d3
        .axisLeft(y)
        .ticks(6)
        .tickSize(-(width - left - right)),
    )
    .call((g) => g.selectAll('.tick line').attr('stroke-opacity', 0.15));
  root
    .selectAll('text.x-title')
    .data([`time (${timeLabel})`])
    .join('text')
    .attr('class', 'x-title')
    .attr('x', (left + width - right) / 2)
    .attr('y', height - 6)
    .attr('text-anchor', 'middle')
    .attr('fill', 'currentColor')
    .attr('font-size', 11)
    .attr('font-family', 'Roboto, sans-serif')
    .text((t) => t);
  root
    .selectAll('text.y-title')
    .data([drawing.yTitle])
    .join('text')
    .attr('class', 'y-title')
    .attr('transform', `translate(14,${(top + height - bottom) / 2}) rotate(-90)`)
    .attr('text-anchor', 'middle')
    .attr('fill', 'currentColor')
    .attr('font-size', 11)
    .attr('font-family', 'Roboto, sans-serif')
    .text((t) => t);
}
