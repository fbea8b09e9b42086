import * as d3 from 'd3';

/** One student's prediction: a number in display units, or a choice. */
export interface PlotDot {
  readonly name: string;
  readonly value: number | string;
  /** Right or wrong once the answer is shown; null when ungraded. */
  readonly correct: boolean | null;
}

/** What the plot shows. Numbers are in display units (min, cm, in). */
export interface PredictionPlotData {
  readonly kind: 'number' | 'choice';
  readonly dots: readonly PlotDot[];
  /** The simulated answer, drawn only when `showAnswer`. */
  readonly simulated: number | string | null;
  readonly showAnswer: boolean;
  /** The range that counts as right around a simulated number. */
  readonly band: readonly [number, number] | null;
  readonly unitLabel: string;
  /** The choices of a choice question, in order, with their words. */
  readonly choices: readonly { readonly value: string; readonly label: string }[];
}

const WIDTH = 640;
const MARGIN = { top: 16, right: 24, bottom: 36, left: 24 };
const RADIUS = 6;
const STEP = RADIUS * 2 + 2;
const ROW_HEIGHT = 30;
const CHOICE_LABEL_WIDTH = 340;

/** Draws the dot plot into `svg` (replacing what was there) and sets its viewBox. */
export function drawPredictionPlot(svg: SVGSVGElement, data: PredictionPlotData): void {
  const root = d3.select(svg);
  root.selectAll('*').remove();
  if (data.kind === 'number') drawNumbers(root, data);
  else drawChoices(root, data);
}

function dotClass(dot: PlotDot, showAnswer: boolean): string {
  if (!showAnswer || dot.correct === null) return 'dot';
  return dot.correct ? 'dot right' : 'dot wrong';
}

function drawNumbers(
  root: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  data: PredictionPlotData,
): void {
  const numbers = data.dots.map((d) => Number(d.value));
  const simulated = typeof data.simulated === 'number' && data.showAnswer ? data.simulated : null;
  const extent = d3.extent([
    ...numbers,
    ...(simulated === null ? [] : [simulated]),
    ...(data.showAnswer && data.band ? data.band : []),
  ]);
  const low = Math.min(0, extent[0] ?? 0);
  const high = (extent[1] ?? 1) * 1.1 || 1;
  const x = d3
    .scaleLinear()
    .domain([low, high])
    .nice()
    .range([MARGIN.left, WIDTH - MARGIN.right]);
  const stacks = new Map<number, number>();
  const placed = data.dots.map((dot) => {
    const bin = Math.round(x(Number(dot.value)) / STEP);
    const level = stacks.get(bin) ?? 0;
    stacks.set(bin, level + 1);
    return { dot, cx: x(Number(dot.value)), level };
  });
  const tallest = Math.max(3, ...stacks.values());
  const baseline = MARGIN.top + tallest * STEP + 8;
  const height = baseline + MARGIN.bottom;
  root.attr('viewBox', `0 0 ${WIDTH} ${height}`);
  if (data.showAnswer && data.band && simulated !== null) {
    root
      .append('rect')
      .attr('class', 'band')
      .attr('x', x(data.band[0]))
      .attr('width', Math.max(1, x(data.band[1]) - x(data.band[0])))
      .attr('y', MARGIN.top)
      .attr('height', baseline - MARGIN.top);
  }
  root
    .append('g')
    .attr('class', 'axis')
    .attr('transform', `translate(0,${baseline})`)
    .call(
      d3
        .axisBottom(x)
        .ticks(8)
        .tickFormat((v) => `${d3.format('~g')(Number(v))}`),
    );
  root
    .append('text')
    .attr('class', 'axis-title')
    .attr('x', WIDTH - MARGIN.right)
    .attr('y', height - 4)
    .attr('text-anchor', 'end')
    .text(data.unitLabel);
  root
    .append('g')
    .selectAll('circle')
    .data(placed)
    .join('circle')
    .attr('class', (p) => dotClass(p.dot, data.showAnswer))
    .attr('r', RADIUS)
    .attr('cx', (p) => p.cx)
    .attr('cy', (p) => baseline - RADIUS - 2 - p.level * STEP)
    .append('title')
    .text((p) => `${p.dot.name}: ${d3.format('~g')(Number(p.dot.value))} ${data.unitLabel}`);
  if (simulated !== null) {
    root
      .append('line')
      .attr('class', 'simulated')
      .attr('x1', x(simulated))
      .attr('x2', x(simulated))
      .attr('y1', MARGIN.top - 4)
      .attr('y2', baseline);
    root
      .append('text')
      .attr('class', 'simulated-label')
      .attr('x', x(simulated) + 4)
      .attr('y', MARGIN.top + 6)
      .text(`simulated ${d3.format('~g')(Number(simulated.toPrecision(3)))} ${data.unitLabel}`);
  }
}

function drawChoices(
  root: d3.Selection<SVGSVGElement, unknown, null, undefined>,
  data: PredictionPlotData,
): void {
  const height = MARGIN.top + data.choices.length * ROW_HEIGHT + 8;
  root.attr('viewBox', `0 0 ${WIDTH} ${height}`);
  data.choices.forEach((choice, row) => {
    const y = MARGIN.top + row * ROW_HEIGHT;
    const isAnswer = data.showAnswer && data.simulated === choice.value;
    const group = root.append('g').attr('class', isAnswer ? 'choice answer' : 'choice');
    group
      .append('rect')
      .attr('class', 'row')
      .attr('x', 0)
      .attr('y', y)
      .attr('width', WIDTH)
      .attr('height', ROW_HEIGHT - 4)
      .attr('rx', 4);
    group
      .append('text')
      .attr('class', 'choice-label')
      .attr('x', 8)
      .attr('y', y + ROW_HEIGHT / 2 + 2)
      .text(choice.label);
    const dots = data.dots.filter((d) => d.value === choice.value);
    group
      .selectAll('circle')
      .data(dots)
      .join('circle')
      .attr('class', (dot) => dotClass(dot, data.showAnswer))
      .attr('r', RADIUS)
      .attr('cx', (_d, i) => CHOICE_LABEL_WIDTH + RADIUS + i * STEP)
      .attr('cy', y + (ROW_HEIGHT - 4) / 2)
      .append('title')
      .text((dot) => dot.name);
    group
      .append('text')
      .attr('class', 'count num')
      .attr('x', WIDTH - 8)
      .attr('y', y + ROW_HEIGHT / 2 + 2)
      .attr('text-anchor', 'end')
      .text(String(dots.length));
  });
}
