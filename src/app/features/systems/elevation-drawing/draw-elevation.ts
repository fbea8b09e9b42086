import * as d3 from 'd3';
import type { ElevationBox, ElevationLayout, ElevationLine } from './elevation-layout';
import { type DisplayScale, toDisplayValue } from '../../../ui/time-series-chart/display-scale';

/** Drawing margins in SVG user units: room for the elevation axis and the vessel names. */
export const ELEVATION_MARGIN = { top: 30, right: 24, bottom: 16, left: 68 } as const;
/** Width of the drawing in SVG user units (the SVG scales to its container). */
export const ELEVATION_WIDTH = 960;
/** The tallest the drawing may be, SVG user units. */
export const ELEVATION_MAX_HEIGHT = 440;

/**
 * How metres map onto the drawing: `pxPerM` across, `pzPerM` up. They are equal (the drawing is
 * to scale) unless a vertical exaggeration was asked for.
 */
export interface ElevationFrame {
  readonly pxPerM: number;
  readonly pzPerM: number;
  readonly height: number;
  readonly px: (xM: number) => number;
  readonly py: (zM: number) => number;
}

/** Choices for {@link elevationFrame}. */
export interface ElevationFrameOptions {
  /** Vertical scale over horizontal scale (1: true to scale). */
  readonly verticalExaggeration?: number;
  /** The tallest the drawing may be, SVG user units. */
  readonly maxHeight?: number;
}

/** The largest scale that fits the layout into the width and the maximum height. */
export function elevationFrame(
  layout: ElevationLayout,
  options: ElevationFrameOptions = {},
): ElevationFrame {
  const { top, right, bottom, left } = ELEVATION_MARGIN;
  const exaggeration = options.verticalExaggeration ?? 1;
  const maxHeight = options.maxHeight ?? ELEVATION_MAX_HEIGHT;
  const spanX = Math.max(layout.xMax - layout.xMin, 0.1);
  const spanZ = Math.max(layout.zMax - layout.zMin, 0.1);
  const pxPerM = Math.min(
    (ELEVATION_WIDTH - left - right) / spanX,
    (maxHeight - top - bottom) / (spanZ * exaggeration),
  );
  const pzPerM = pxPerM * exaggeration;
  return {
    pxPerM,
    pzPerM,
    height: top + bottom + spanZ * pzPerM,
    px: (xM) => left + (xM - layout.xMin) * pxPerM,
    py: (zM) => top + (layout.zMax - zM) * pzPerM,
  };
}

const BOX_STYLE: Record<
  ElevationBox['kind'],
  { fill: string; fillOpacity: number; stroke: string; dash: string | null }
> = {
  vessel: { fill: 'none', fillOpacity: 0, stroke: 'currentColor', dash: null },
  media: { fill: '#a8a29e', fillOpacity: 0.45, stroke: 'none', dash: null },
  water: { fill: '#3b8fc4', fillOpacity: 0.45, stroke: 'none', dash: null },
  standpipe: { fill: '#e7e5e4', fillOpacity: 1, stroke: '#44403c', dash: null },
  bell: { fill: '#d6d3d1', fillOpacity: 0.35, stroke: '#44403c', dash: null },
  guard: { fill: 'none', fillOpacity: 0, stroke: '#78716c', dash: '4 3' },
  pump: { fill: '#1f6f8b', fillOpacity: 1, stroke: '#0c3f52', dash: null },
};

const LINE_STYLE: Record<
  ElevationLine['kind'],
  { stroke: string; dash: string | null; minWidth: number }
> = {
  drain: { stroke: '#78716c', dash: null, minWidth: 2 },
  'pump-line': { stroke: '#1f6f8b', dash: null, minWidth: 2 },
  overflow: { stroke: '#57534e', dash: null, minWidth: 2 },
  'min-level': { stroke: '#c2410c', dash: '6 4', minWidth: 1.5 },
  intake: { stroke: '#c2410c', dash: '2 2', minWidth: 1.5 },
};

/** Draws the layout into `svg` (cleared first) with an elevation axis in the reader's units. */
export function drawElevation(
  svg: SVGSVGElement,
  layout: ElevationLayout,
  frame: ElevationFrame,
  units: DisplayScale,
): void {
  const root = d3.select(svg);
  root.selectAll('*').remove();
  const axisScale = d3
    .scaleLinear()
    .domain([toDisplayValue(units, layout.zMin), toDisplayValue(units, layout.zMax)])
    .range([frame.py(layout.zMin), frame.py(layout.zMax)]);
  root
    .append('g')
    .attr('class', 'axis')
    .attr('transform', `translate(${ELEVATION_MARGIN.left - 8},0)`)
    .call(d3.axisLeft(axisScale).ticks(6));
  root
    .append('text')
    .attr('x', 4)
    .attr('y', 14)
    .attr('fill', 'currentColor')
    .attr('font-size', 11)
    .text(`elevation (${units.label})`);
  root
    .append('line')
    .attr('class', 'datum')
    .attr('x1', ELEVATION_MARGIN.left)
    .attr('x2', ELEVATION_WIDTH - ELEVATION_MARGIN.right)
    .attr('y1', frame.py(0))
    .attr('y2', frame.py(0))
    .attr('stroke', 'currentColor')
    .attr('stroke-opacity', 0.35)
    .attr('stroke-dasharray', '2 4');
  drawBoxes(root, layout.boxes, frame);
  drawLines(root, layout.lines, frame);
  root
    .selectAll('text.name')
    .data(layout.labels)
    .join('text')
    .attr('class', 'name')
    .attr('x', (l) => frame.px(l.x))
    .attr('y', (l) => frame.py(l.z) - 6)
    .attr('text-anchor', 'middle')
    .attr('fill', 'currentColor')
    .attr('font-size', 12)
    .text((l) => l.text);
}

function drawBoxes(
  root: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  boxes: readonly ElevationBox[],
  frame: ElevationFrame,
): void {
  const filled = boxes.filter((b) => b.kind !== 'vessel');
  root
    .selectAll('rect.part')
    .data(filled)
    .join('rect')
    .attr('class', (b) => `part ${b.kind}`)
    .attr('data-id', (b) => b.id)
    .attr('x', (b) => frame.px(b.x))
    .attr('y', (b) => frame.py(b.z + b.height))
    .attr('width', (b) => b.width * frame.pxPerM)
    .attr('height', (b) => b.height * frame.pzPerM)
    .attr('fill', (b) => BOX_STYLE[b.kind].fill)
    .attr('fill-opacity', (b) => BOX_STYLE[b.kind].fillOpacity)
    .attr('stroke', (b) => BOX_STYLE[b.kind].stroke)
    .attr('stroke-dasharray', (b) => BOX_STYLE[b.kind].dash);
  // A vessel is open at the top: its walls and floor as one path.
  root
    .selectAll('path.vessel')
    .data(boxes.filter((b) => b.kind === 'vessel'))
    .join('path')
    .attr('class', 'vessel')
    .attr('data-id', (b) => b.id)
    .attr('fill', 'none')
    .attr('stroke', 'currentColor')
    .attr('stroke-width', 2)
    .attr('d', (b) => {
      const x0 = frame.px(b.x);
      const x1 = frame.px(b.x + b.width);
      return `M${x0},${frame.py(b.z + b.height)}V${frame.py(b.z)}H${x1}V${frame.py(b.z + b.height)}`;
    });
}

function drawLines(
  root: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  lines: readonly ElevationLine[],
  frame: ElevationFrame,
): void {
  const path = d3
    .line<readonly [number, number]>()
    .x((p) => frame.px(p[0]))
    .y((p) => frame.py(p[1]));
  root
    .selectAll('path.line')
    .data(lines)
    .join('path')
    .attr('class', (l) => `line ${l.kind}`)
    .attr('data-id', (l) => l.id)
    .attr('fill', 'none')
    .attr('stroke', (l) => LINE_STYLE[l.kind].stroke)
    .attr('stroke-dasharray', (l) => LINE_STYLE[l.kind].dash)
    .attr('stroke-linejoin', 'round')
    .attr('stroke-width', (l) => Math.max(LINE_STYLE[l.kind].minWidth, l.widthM * frame.pxPerM))
    .attr('d', (l) => path(l.points) ?? '');
}
