import * as d3 from 'd3';
import { REGIME_STYLES } from './regime-style';
import {
  type CycleMetric,
  type MapCell,
  type MapModel,
  METRIC_NAMES,
  metricMinutes,
} from './sweep-map-model';
import { MAP_SIZE } from './draw-regime-map';

const MARGIN = { top: 16, right: 20, bottom: 48, left: 62 } as const;
const LINES: readonly { metric: CycleMetric; dash: string }[] = [
  { metric: 'periodS', dash: '' },
  { metric: 'floodS', dash: '6 3' },
  { metric: 'drainS', dash: '2 3' },
];

type Selection = d3.Selection<SVGSVGElement, unknown, null, undefined>;

function xScale(model: MapModel): d3.ScaleLinear<number, number> {
  const values = model.x.values;
  const n = values.length;
  const first = values[0] ?? 0;
  const step = n > 1 ? ((values[n - 1] ?? 1) - first) / (n - 1) : 1;
  return d3
    .scaleLinear()
    .domain([first - 0.5 * step, first + (n - 0.5) * step])
    .range([MARGIN.left, MAP_SIZE.width - MARGIN.right]);
}

function drawBands(
  root: Selection,
  model: MapModel,
  x: d3.ScaleLinear<number, number>,
  onPick: (index: number) => void,
): void {
  const [d0, d1] = x.domain() as [number, number];
  const width = (x(d1) - x(d0)) / model.cells.length;
  root
    .append('g')
    .attr('class', 'cells')
    .selectAll('rect')
    .data(model.cells)
    .join('rect')
    .attr('class', (c) => `cell regime-${c.cell?.regime ?? 'pending'}`)
    .attr('data-index', (c) => c.index)
    .attr('x', (c) => x(c.x) - width / 2)
    .attr('y', MARGIN.top)
    .attr('width', width + 0.5)
    .attr('height', MAP_SIZE.height - MARGIN.top - MARGIN.bottom)
    .attr('fill', (c) => (c.cell ? REGIME_STYLES[c.cell.regime].color : 'transparent'))
    .attr('fill-opacity', 0.45)
    .style('cursor', (c) => (c.cell && c.cell.regime !== 'invalid' ? 'pointer' : 'default'))
    .on('click', (_event, c) => {
      if (c.cell && c.cell.regime !== 'invalid') onPick(c.index);
    })
    .append('title')
    .text((c) => c.caption);
}

function drawLines(root: Selection, model: MapModel, x: d3.ScaleLinear<number, number>): void {
  const all = model.cells
    .flatMap((c) => LINES.map((l) => metricMinutes(c.cell, l.metric)))
    .filter(Number.isFinite);
  const y = d3
    .scaleLinear()
    .domain([0, d3.max(all) ?? 1])
    .nice()
    .range([MAP_SIZE.height - MARGIN.bottom, MARGIN.top]);
  root.append('g').attr('transform', `translate(${MARGIN.left},0)`).call(d3.axisLeft(y).ticks(6));
  root
    .append('text')
    .attr('transform', `translate(16,${MAP_SIZE.height / 2}) rotate(-90)`)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', 'currentColor')
    .text('minutes');
  for (const { metric, dash } of LINES) {
    const line = d3
      .line<MapCell>()
      .defined((c) => Number.isFinite(metricMinutes(c.cell, metric)))
      .x((c) => x(c.x))
      .y((c) => y(metricMinutes(c.cell, metric)));
    root
      .append('path')
      .attr('class', `line ${metric}`)
      .attr('d', line([...model.cells]) ?? '')
      .attr('fill', 'none')
      .attr('stroke', '#0f3d4c')
      .attr('stroke-width', 2)
      .attr('stroke-dasharray', dash)
      .attr('pointer-events', 'none');
  }
  const legend = root
    .append('g')
    .attr('transform', `translate(${MAP_SIZE.width - MARGIN.right - 150},${MARGIN.top + 8})`)
    .attr('pointer-events', 'none');
  LINES.forEach(({ metric, dash }, k) => {
    legend
      .append('line')
      .attr('x1', 0)
      .attr('x2', 28)
      .attr('y1', k * 16)
      .attr('y2', k * 16)
      .attr('stroke', '#0f3d4c')
      .attr('stroke-width', 2)
      .attr('stroke-dasharray', dash);
    legend
      .append('text')
      .attr('x', 34)
      .attr('y', k * 16 + 4)
      .attr('font-size', 11)
      .attr('fill', 'currentColor')
      .text(METRIC_NAMES[metric]);
  });
}

/**
 * Draws a one-parameter sweep: the mapped bed's regime as bands behind lines of its period,
 * flood and drain times (cycling cells only); the current design marked; clicking a band picks it.
 */
export function drawRegimeLine(
  svg: SVGSVGElement,
  model: MapModel,
  onPick: (index: number) => void,
): void {
  const root = d3.select(svg);
  root.selectAll('*').remove();
  const x = xScale(model);
  drawBands(root, model, x, onPick);
  drawLines(root, model, x);
  root
    .append('g')
    .attr('transform', `translate(0,${MAP_SIZE.height - MARGIN.bottom})`)
    .call(d3.axisBottom(x).ticks(8));
  root
    .append('text')
    .attr('x', (MARGIN.left + MAP_SIZE.width) / 2)
    .attr('y', MAP_SIZE.height - 8)
    .attr('text-anchor', 'middle')
    .attr('font-size', 12)
    .attr('fill', 'currentColor')
    .text(model.x.title);
  const current = model.x.current;
  if (current === null) return;
  const mark = root.append('g').attr('class', 'current-design').attr('pointer-events', 'none');
  mark
    .append('line')
    .attr('x1', x(current))
    .attr('x2', x(current))
    .attr('y1', MARGIN.top)
    .attr('y2', MAP_SIZE.height - MARGIN.bottom)
    .attr('stroke', '#111')
    .attr('stroke-width', 2)
    .attr('stroke-dasharray', '4 3');
  mark
    .append('text')
    .attr('x', x(current) + 4)
    .attr('y', MARGIN.top + 12)
    .attr('font-size', 11)
    .attr('font-weight', 600)
    .attr('fill', '#111')
    .text('your design');
}
