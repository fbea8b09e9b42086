import * as d3 from 'd3';
import { REGIME_STYLES } from './regime-style';
import { type CycleMetric, type MapModel, METRIC_NAMES, filledField } from './sweep-map-model';

/** Size of the drawing in viewBox units. */
export const MAP_SIZE = { width: 720, height: 480 } as const;
const MARGIN = { top: 16, right: 20, bottom: 48, left: 70 } as const;

type Selection = d3.Selection<SVGSVGElement, unknown, null, undefined>;

/** Scales from grid position (cell edges at integers) to the drawing, and display value to position. */
function scales(model: MapModel) {
  const nx = model.x.values.length;
  const ny = model.y?.values.length ?? 1;
  const gx = d3
    .scaleLinear()
    .domain([0, nx])
    .range([MARGIN.left, MAP_SIZE.width - MARGIN.right]);
  const gy = d3
    .scaleLinear()
    .domain([0, ny])
    .range([MAP_SIZE.height - MARGIN.bottom, MARGIN.top]);
  // A value v of an axis sits at the centre of its cell: position = (v − first)/(step) + 0.5.
  const toGrid = (values: readonly number[], v: number): number => {
    const first = values[0] ?? 0;
    const last = values[values.length - 1] ?? 1;
    return values.length < 2 || last === first
      ? 0.5
      : ((v - first) / (last - first)) * (values.length - 1) + 0.5;
  };
  return { nx, ny, gx, gy, toGrid };
}

/** A value scale whose pixels line up with the cells: value k sits at the centre of cell k. */
function valueScale(values: readonly number[], range: number[]): d3.ScaleLinear<number, number> {
  const n = values.length;
  const first = values[0] ?? 0;
  const step = n > 1 ? ((values[n - 1] ?? 1) - first) / (n - 1) : 1;
  return d3
    .scaleLinear()
    .domain([first - 0.5 * step, first + (n - 0.5) * step])
    .range(range);
}

function axisTitle(root: Selection, text: string, transform: string): void {
  root
    .append('text')
    .attr('transform', transform)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', 'currentColor')
    .text(text);
}

function drawAxes(root: Selection, model: MapModel, s: ReturnType<typeof scales>): void {
  const xAxis = valueScale(model.x.values, s.gx.range());
  root
    .append('g')
    .attr('transform', `translate(0,${MAP_SIZE.height - MARGIN.bottom})`)
    .call(d3.axisBottom(xAxis).ticks(8));
  axisTitle(
    root,
    model.x.title,
    `translate(${(MARGIN.left + MAP_SIZE.width) / 2},${MAP_SIZE.height - 8})`,
  );
  if (!model.y) return;
  const yAxis = valueScale(model.y.values, s.gy.range());
  root
    .append('g')
    .attr('transform', `translate(${MARGIN.left},0)`)
    .call(d3.axisLeft(yAxis).ticks(8));
  axisTitle(
    root,
    model.y.title,
    `translate(14,${(MARGIN.top + MAP_SIZE.height - MARGIN.bottom) / 2}) rotate(-90)`,
  );
}

function drawCells(
  root: Selection,
  model: MapModel,
  s: ReturnType<typeof scales>,
  onPick: (index: number) => void,
): void {
  const w = s.gx(1) - s.gx(0);
  const h = s.gy(0) - s.gy(1);
  root
    .append('g')
    .attr('class', 'cells')
    .selectAll('rect')
    .data(model.cells)
    .join('rect')
    .attr('class', (c) => `cell regime-${c.cell?.regime ?? 'pending'}`)
    .attr('data-index', (c) => c.index)
    .attr('x', (c) => s.gx(c.i))
    .attr('y', (c) => s.gy(c.j + 1))
    .attr('width', w + 0.5)
    .attr('height', h + 0.5)
    .attr('fill', (c) => (c.cell ? REGIME_STYLES[c.cell.regime].color : 'transparent'))
    .style('cursor', (c) => (c.cell && c.cell.regime !== 'invalid' ? 'pointer' : 'default'))
    .on('click', (_event, c) => {
      if (c.cell && c.cell.regime !== 'invalid') onPick(c.index);
    })
    .append('title')
    .text((c) => c.caption);
}

/** Contour lines of a cycle figure over the cycling cells, labelled in minutes. */
function drawContours(
  root: Selection,
  model: MapModel,
  metric: CycleMetric,
  s: ReturnType<typeof scales>,
): void {
  const field = filledField(model, metric);
  const finite = field.filter(Number.isFinite);
  if (finite.length < 4 || s.ny < 2 || s.nx < 2) return;
  const thresholds = d3.ticks(d3.min(finite) ?? 0, d3.max(finite) ?? 1, 6);
  const contours = d3.contours().size([s.nx, s.ny]).thresholds(thresholds)(field);
  const clipId = `cycling-${Math.random().toString(36).slice(2, 8)}`;
  const clip = root.append('clipPath').attr('id', clipId);
  const w = s.gx(1) - s.gx(0);
  const h = s.gy(0) - s.gy(1);
  for (const c of model.cells.filter((c) => c.cell?.regime === 'cycling')) {
    clip
      .append('rect')
      .attr('x', s.gx(c.i))
      .attr('y', s.gy(c.j + 1))
      .attr('width', w + 0.5)
      .attr('height', h + 0.5);
  }
  // Contour coordinates are in grid units with cell centres at k + 0.5.
  const path = d3.geoPath(
    d3.geoTransform({
      point(x, y) {
        this.stream.point(s.gx(x), s.gy(y));
      },
    }),
  );
  const layer = root
    .append('g')
    .attr('class', 'contours')
    .attr('clip-path', `url(#${clipId})`)
    .attr('pointer-events', 'none');
  layer
    .selectAll('path')
    .data(contours)
    .join('path')
    .attr('d', path)
    .attr('fill', 'none')
    .attr('stroke', '#0f3d4c')
    .attr('stroke-width', 1)
    .attr('stroke-opacity', 0.7);
  layer
    .selectAll('text')
    .data(contours.filter((c) => c.coordinates.length > 0))
    .join('text')
    .attr('font-size', 10)
    .attr('fill', '#0f3d4c')
    .attr('transform', (c) => {
      const ring = c.coordinates[0]?.[0] ?? [];
      const point = ring[Math.floor(ring.length / 2)];
      return `translate(${s.gx(point?.[0] ?? 0)},${s.gy(point?.[1] ?? 0)})`;
    })
    .text((c) => `${c.value} min`);
  root
    .append('text')
    .attr('class', 'metric-note')
    .attr('x', MAP_SIZE.width - MARGIN.right)
    .attr('y', MARGIN.top - 4)
    .attr('text-anchor', 'end')
    .attr('font-size', 11)
    .attr('fill', 'currentColor')
    .text(`Contours: ${METRIC_NAMES[metric].toLowerCase()}, min`);
}

function drawCurrentDesign(root: Selection, model: MapModel, s: ReturnType<typeof scales>): void {
  const { x, y } = model;
  if (x.current === null || !y || y.current === null) return;
  const cx = s.gx(s.toGrid(x.values, x.current));
  const cy = s.gy(s.toGrid(y.values, y.current));
  const mark = root.append('g').attr('class', 'current-design').attr('pointer-events', 'none');
  mark
    .append('circle')
    .attr('cx', cx)
    .attr('cy', cy)
    .attr('r', 9)
    .attr('fill', 'none')
    .attr('stroke', '#111')
    .attr('stroke-width', 2.5);
  mark
    .append('circle')
    .attr('cx', cx)
    .attr('cy', cy)
    .attr('r', 9)
    .attr('fill', 'none')
    .attr('stroke', '#fff')
    .attr('stroke-width', 1);
  mark
    .append('text')
    .attr('x', cx + 12)
    .attr('y', cy - 10)
    .attr('font-size', 11)
    .attr('font-weight', 600)
    .attr('fill', '#111')
    .attr('stroke', '#fff')
    .attr('stroke-width', 3)
    .attr('paint-order', 'stroke')
    .text('your design');
}

/**
 * Draws a two-parameter map: each cell filled by the mapped bed's regime, contours of a cycle
 * figure over the cycling cells, the current design ringed; clicking a cell calls `onPick`.
 */
export function drawRegimeMap(
  svg: SVGSVGElement,
  model: MapModel,
  metric: CycleMetric,
  onPick: (index: number) => void,
): void {
  const root = d3.select(svg);
  root.selectAll('*').remove();
  const s = scales(model);
  drawCells(root, model, s, onPick);
  drawContours(root, model, metric, s);
  drawAxes(root, model, s);
  drawCurrentDesign(root, model, s);
}
