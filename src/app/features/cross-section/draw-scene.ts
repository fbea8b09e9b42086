import * as d3 from 'd3';
import { type DisplayScale, toDisplayValue } from '../../ui/time-series-chart/display-scale';
import { ELEVATION_MARGIN, ELEVATION_WIDTH } from '../systems/elevation-drawing/draw-elevation';
import type { CrossSectionScene, ScenePipe } from './cross-section-scene';
import { drawBedParts } from './draw-bed-parts';
import { PAINT, textSize } from './scene-palette';
import type { PipeHandles, PumpHandles, SceneHandles } from './scene-handles';
import type { SceneFrame } from './scene-frame';

type Root = d3.Selection<SVGGElement, unknown, null, undefined>;

/** Ids of the patterns one drawing defines (unique per drawing on the page). */
export interface ScenePatternIds {
  readonly gravel: string;
  readonly clay: string;
  readonly air: string;
}

/** Everything one static drawing of the scene needs. */
export interface SceneDrawing {
  readonly scene: CrossSectionScene;
  readonly frame: SceneFrame;
  /** The reader's length unit for the elevation axis. */
  readonly units: DisplayScale;
  readonly patterns: ScenePatternIds;
}

/**
 * Draws the still parts of the scene into `layer` (emptied first): patterns, elevation axis,
 * vessels with media, bells and standpipes, pipes and pumps; and returns the elements the
 * animation moves. Called only when the scene, the scale or the units change, never per frame.
 */
export function drawScene(layer: SVGGElement, drawing: SceneDrawing): SceneHandles {
  const root: Root = d3.select(layer);
  root.selectAll('*').remove();
  drawPatterns(root, drawing.patterns);
  drawAxis(root, drawing);
  const { frame, scene } = drawing;
  const water = scene.vessels.map((vessel) => {
    const g = root.append('g').attr('class', 'vessel').attr('data-id', vessel.id);
    const bed = scene.beds.find((b) => b.id === vessel.id);
    if (bed && bed.media.type !== 'none') {
      const pattern =
        bed.media.type === 'expanded-clay' ? drawing.patterns.clay : drawing.patterns.gravel;
      g.append('rect')
        .attr('class', 'media')
        .attr('x', frame.px(bed.xM))
        .attr('y', frame.py(bed.floorM + bed.media.depth))
        .attr('width', bed.widthM * frame.pxPerM)
        .attr('height', bed.media.depth * frame.pzPerM)
        .style('fill', `url(#${pattern})`);
    }
    const rect = g
      .append('rect')
      .attr('class', 'water')
      .attr('data-id', vessel.id)
      .attr('x', frame.px(vessel.xM))
      .attr('width', vessel.widthM * frame.pxPerM)
      .attr('y', frame.py(vessel.floorM))
      .attr('height', 0)
      .style('fill', PAINT.water)
      .style('fill-opacity', 0.6)
      .node() as SVGRectElement;
    const x0 = frame.px(vessel.xM);
    const x1 = frame.px(vessel.xM + vessel.widthM);
    g.append('path')
      .attr('class', 'wall')
      .attr('data-id', vessel.id)
      .attr(
        'd',
        `M${x0},${frame.py(vessel.floorM + vessel.heightM)}V${frame.py(vessel.floorM)}H${x1}V${frame.py(vessel.floorM + vessel.heightM)}`,
      )
      .style('fill', 'none')
      .style('stroke', PAINT.wall)
      .style('stroke-width', 2);
    return { vessel, rect };
  });
  const beds = scene.beds.map((bed) =>
    drawBedParts(
      root,
      bed,
      frame,
      drawing.patterns.air,
      scene.vessels.findIndex((v) => v.id === bed.id),
    ),
  );
  const pipes = scene.pipes.map((pipe) =>
    drawPipe(
      root,
      pipe,
      frame,
      scene.beds.findIndex((b) => b.id === pipe.bedId),
    ),
  );
  const pumps = scene.pumps.map((pump): PumpHandles => drawPump(root, pump, frame));
  drawNames(root, drawing);
  const clock = root
    .append('text')
    .attr('class', 'clock num')
    .attr('x', ELEVATION_WIDTH - ELEVATION_MARGIN.right)
    .attr('y', 18)
    .attr('text-anchor', 'end')
    .style('fill', PAINT.wall)
    .style('font-size', textSize(15))
    .node() as SVGTextElement;
  return { water, beds, pipes, pumps, clock };
}

function drawPatterns(root: Root, ids: ScenePatternIds): void {
  const defs = root.append('defs');
  const gravel = defs
    .append('pattern')
    .attr('id', ids.gravel)
    .attr('width', 9)
    .attr('height', 7)
    .attr('patternUnits', 'userSpaceOnUse');
  gravel
    .append('rect')
    .attr('width', 9)
    .attr('height', 7)
    .style('fill', PAINT.media)
    .style('fill-opacity', 0.35);
  for (const [cx, cy, r] of [
    [2, 2, 1.4],
    [6.5, 4.5, 1.7],
    [3, 6, 0.9],
  ] as const) {
    gravel.append('circle').attr('cx', cx).attr('cy', cy).attr('r', r).style('fill', PAINT.media);
  }
  const clay = defs
    .append('pattern')
    .attr('id', ids.clay)
    .attr('width', 8)
    .attr('height', 8)
    .attr('patternUnits', 'userSpaceOnUse');
  clay
    .append('rect')
    .attr('width', 8)
    .attr('height', 8)
    .style('fill', PAINT.media)
    .style('fill-opacity', 0.3);
  clay
    .append('circle')
    .attr('cx', 4)
    .attr('cy', 4)
    .attr('r', 3)
    .style('fill', 'none')
    .style('stroke', PAINT.media)
    .style('stroke-width', 1.4);
  const air = defs
    .append('pattern')
    .attr('id', ids.air)
    .attr('width', 5)
    .attr('height', 5)
    .attr('patternUnits', 'userSpaceOnUse');
  air.append('rect').attr('width', 5).attr('height', 5).style('fill', PAINT.air);
  air.append('path').attr('d', 'M0,5L5,0').style('stroke', PAINT.pipe).style('stroke-width', 0.6);
}

function drawAxis(root: Root, { frame, units }: SceneDrawing): void {
  const scale = d3
    .scaleLinear()
    .domain([toDisplayValue(units, frame.zMinM), toDisplayValue(units, frame.zMaxM)])
    .range([frame.py(frame.zMinM), frame.py(frame.zMaxM)]);
  root
    .append('g')
    .attr('class', 'axis')
    .attr('transform', `translate(${ELEVATION_MARGIN.left - 8},0)`)
    .call(d3.axisLeft(scale).ticks(6));
  root
    .append('text')
    .attr('x', 4)
    .attr('y', 14)
    .style('fill', PAINT.wall)
    .style('font-size', textSize(11))
    .text(`elevation (${units.label})`);
}

/** Length of a polyline in user units. */
function pathLengthPx(points: readonly (readonly [number, number])[], frame: SceneFrame): number {
  let length = 0;
  for (let i = 1; i < points.length; i++) {
    const [x0, z0] = points[i - 1] ?? [0, 0];
    const [x1, z1] = points[i] ?? [0, 0];
    length += Math.hypot((x1 - x0) * frame.pxPerM, (z1 - z0) * frame.pzPerM);
  }
  return length;
}

function drawPipe(root: Root, pipe: ScenePipe, frame: SceneFrame, bedIndex: number): PipeHandles {
  const line = d3
    .line<readonly [number, number]>()
    .x((p) => frame.px(p[0]))
    .y((p) => frame.py(p[1]));
  const width = Math.max(2.5, pipe.boreM * frame.pxPerM);
  const g = root.append('g').attr('class', `pipe ${pipe.kind}`).attr('data-id', pipe.id);
  // A drain's first leg is the standpipe's bore, drawn with the bed; the pipe starts at the floor.
  const piped = pipe.kind === 'drain' ? pipe.points.slice(1) : pipe.points;
  g.append('path')
    .attr('class', 'pipe-wall')
    .attr('d', line(piped) ?? '')
    .style('fill', 'none')
    .style('stroke', PAINT.pipe)
    .style('stroke-width', width)
    .style('stroke-linejoin', 'round');
  const water = g
    .append('path')
    .attr('class', 'pipe-water')
    .attr('d', line(piped) ?? '')
    .style('fill', 'none')
    .style('stroke', PAINT.waterFull)
    .style('stroke-width', width * 0.65)
    .style('stroke-linejoin', 'round')
    .style('opacity', 0)
    .node() as SVGPathElement;
  const marks = g
    .append('path')
    .attr('class', 'marks')
    .attr('d', line(pipe.points) ?? '')
    .style('fill', 'none')
    .style('stroke', PAINT.marks)
    .style('stroke-width', Math.max(1.4, width * 0.45))
    .style('stroke-linecap', 'round')
    .style('opacity', 0)
    .node() as SVGPathElement;
  return { pipe, bedIndex, water, marks, lengthPx: pathLengthPx(pipe.points, frame) };
}

function drawPump(root: Root, pump: PumpHandles['pump'], frame: SceneFrame): PumpHandles {
  const size = Math.max(10, pump.sizeM * frame.pxPerM);
  const x = frame.px(pump.xM + pump.sizeM / 2) - size / 2;
  const y = frame.py(pump.zM) - size;
  const g = root.append('g').attr('class', 'pump').attr('data-id', pump.id);
  const body = g
    .append('rect')
    .attr('class', 'pump-body')
    .attr('x', x)
    .attr('y', y)
    .attr('width', size)
    .attr('height', size)
    .attr('rx', 3)
    .style('stroke', PAINT.wall)
    .style('stroke-width', 1.5)
    .node() as SVGRectElement;
  const state = g
    .append('text')
    .attr('class', 'pump-state')
    .attr('x', x + size + 4)
    .attr('y', y + size / 2 + 4)
    .style('fill', PAINT.wall)
    .style('font-size', textSize(12))
    .style('font-weight', 600)
    .style('paint-order', 'stroke')
    .style('stroke', PAINT.halo)
    .style('stroke-width', 3)
    .node() as SVGTextElement;
  return { pump, body, state };
}

function drawNames(root: Root, { scene, frame }: SceneDrawing): void {
  root
    .selectAll('text.name')
    .data(scene.vessels)
    .join('text')
    .attr('class', 'name')
    .attr('x', (v) => frame.px(v.xM + v.widthM / 2))
    .attr('y', (v) => frame.py(v.floorM + v.heightM) - 6)
    .attr('text-anchor', 'middle')
    .style('fill', PAINT.wall)
    .style('font-size', textSize(12))
    .text((v) => v.id);
}
