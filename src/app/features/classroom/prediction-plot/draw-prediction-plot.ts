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
/** Numbers on the plot: as short as they are exact ("8", "7.9"). */
const FORMAT = d3.format('~g');

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

type Root = d3.Selection<SVGSVGElement, unknown, null, undefined>;

/** Where the number plot puts things: the value scale, each dot's stack level, the axis line. */
interface NumberLayout {
  x: d3.ScaleLinear<number, number>;
  placed: { dot: PlotDot; cx: number; level: number }[];
  baseline: number;
  height: number;
  simulated: number | null;
}

/** The value scale from 0 (or below) to past the largest value; dots at one place stack upwards. */
function layoutNumbers(data: PredictionPlotData): NumberLayout {
  const simulated = typeof data.simulated === 'number' && data.showAnswer ? data.simulated : null;
  const shown = [
    ...data.dots.map((d) => Number(d.value)),
    ...(simulated === null ? [] : [simulated]),
    ...(data.showAnswer && data.band ? data.band : []),
  ];
  const extent = d3.extent(shown);
  const domain = [Math.min(0, extent[0] ?? 0), (extent[1] ?? 1) * 1.1 || 1];
  const x = d3
    .scaleLinear()
    .domain(domain)
    .nice()
    .range([MARGIN.left, WIDTH - MARGIN.right]);
  const stacks = new Map<number, number>();
  const placed = data.dots.map((dot) => {
    const cx = x(Number(dot.value));
    const bin = Math.round(cx / STEP);
    const level = stacks.get(bin) ?? 0;
    stacks.set(bin, level + 1);
    return { dot, cx, level };
  });
  const baseline = MARGIN.top + Math.max(3, ...stacks.values()) * STEP + 8;
  return { x, placed, baseline, height: baseline + MARGIN.bottom, simulated };
}

function drawNumbers(root: Root, data: PredictionPlotData): void {
  const layout = layoutNumbers(data);
  root.attr('viewBox', `0 0 ${WIDTH} ${layout.height}`);
  drawBandAndAxis(root, data, layout);
  root
    .append('g')
    .selectAll('circle')
    .data(layout.placed)
    .join('circle')
    .attr('class', (p) => dotClass(p.dot, data.showAnswer))
    .attr('r', RADIUS)
    .attr('cx', (p) => p.cx)
    .attr('cy', (p) => layout.baseline - RADIUS - 2 - p.level * STEP)
    .append('title')
    .text((p) => `${p.dot.name}: ${FORMAT(Number(p.dot.value))} ${data.unitLabel}`);
  if (layout.simulated !== null) drawSimulated(root, data, layout, layout.simulated);
}

/** The band that counts as right (once the answer shows), the value axis and its unit. */
function drawBandAndAxis(root: Root, data: PredictionPlotData, layout: NumberLayout): void {
  const { x, baseline } = layout;
  if (data.band && layout.simulated !== null) {
    const [from, to] = data.band;
    root
      .append('rect')
      .attr('class', 'band')
      .attr('x', x(from))
      .attr('width', Math.max(1, x(to) - x(from)))
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
        .tickFormat((v) => FORMAT(Number(v))),
    );
  root
    .append('text')
    .attr('class', 'axis-title')
    .attr('x', WIDTH - MARGIN.right)
    .attr('y', layout.height - 4)
    .attr('text-anchor', 'end')
    .text(data.unitLabel);
}

/** The simulated value as a line across the dots, labelled. */
function drawSimulated(
  root: Root,
  data: PredictionPlotData,
  layout: NumberLayout,
  value: number,
): void {
  const at = layout.x(value);
  root
    .append('line')
    .attr('class', 'simulated')
    .attr('x1', at)
    .attr('x2', at)
    .attr('y1', MARGIN.top - 4)
    .attr('y2', layout.baseline);
  root
    .append('text')
    .attr('class', 'simulated-label')
    .attr('x', at + 4)
    .attr('y', MARGIN.top + 6)
    .text(`simulated ${FORMAT(Number(value.toPrecision(3)))} ${data.unitLabel}`);
}

function drawChoices(root: Root, data: PredictionPlotData): void {
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
