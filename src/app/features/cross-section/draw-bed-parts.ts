import type * as d3 from 'd3';
import type { SceneBed } from './cross-section-scene';
import type { SceneFrame } from './scene-frame';
import type { BedHandles } from './scene-handles';
import { PAINT, textSize } from './scene-palette';

/** Distance of the phase tag below the bed floor, user units. */
const TAG_OFFSET_PX = 16;

/**
 * Draws one bed's drain parts, still: media guard, the bell (its air space, walls and slots), the
 * standpipe and its bore, the break level, and the phase tag under the bed; returns the parts that
 * move (bell water, bore water, tag text).
 */
export function drawBedParts(
  root: d3.Selection<SVGGElement, unknown, null, undefined>,
  bed: SceneBed,
  frame: SceneFrame,
  airPattern: string,
  vesselIndex: number,
): BedHandles {
  const g = root.append('g').attr('class', 'bed-parts').attr('data-id', bed.id);
  const { standpipe } = bed.drain;
  const x = (offsetM: number) => frame.px(bed.centreXM + offsetM);
  const z = (heightM: number) => frame.py(bed.floorM + heightM);
  if (bed.drain.guard) {
    const d = bed.drain.guard.diameter;
    g.append('rect')
      .attr('class', 'guard')
      .attr('x', x(-d / 2))
      .attr('y', z(bed.heightM))
      .attr('width', d * frame.pxPerM)
      .attr('height', bed.heightM * frame.pzPerM)
      .style('fill', 'none')
      .style('stroke', PAINT.pipe)
      .style('stroke-dasharray', '4 3');
  }
  let bellWater: SVGRectElement | null = null;
  if (bed.drain.type === 'bell-siphon' && bed.bellTopM !== null) {
    const bell = bed.drain.bell;
    const inner = bell.innerDiameter;
    g.append('rect')
      .attr('class', 'bell-air')
      .attr('x', x(-inner / 2))
      .attr('y', z(bed.bellTopM))
      .attr('width', inner * frame.pxPerM)
      .attr('height', bed.bellTopM * frame.pzPerM)
      .style('fill', `url(#${airPattern})`);
    bellWater = g
      .append('rect')
      .attr('class', 'bell-water')
      .attr('x', x(-inner / 2))
      .attr('width', inner * frame.pxPerM)
      .attr('y', z(0))
      .attr('height', 0)
      .style('fill', PAINT.water)
      .node() as SVGRectElement;
  }
  g.append('rect')
    .attr('class', 'standpipe')
    .attr('data-id', bed.id)
    .attr('x', x(-standpipe.outerDiameter / 2))
    .attr('y', z(standpipe.height))
    .attr('width', standpipe.outerDiameter * frame.pxPerM)
    .attr('height', standpipe.height * frame.pzPerM)
    .style('fill', PAINT.pipe);
  g.append('rect')
    .attr('class', 'bore')
    .attr('x', x(-standpipe.innerDiameter / 2))
    .attr('y', z(standpipe.height))
    .attr('width', standpipe.innerDiameter * frame.pxPerM)
    .attr('height', standpipe.height * frame.pzPerM)
    .style('fill', PAINT.air);
  const boreWater = g
    .append('rect')
    .attr('class', 'bore-water')
    .attr('x', x(-standpipe.innerDiameter / 2))
    .attr('width', standpipe.innerDiameter * frame.pxPerM)
    .attr('y', z(0))
    .attr('height', 0)
    .style('fill', PAINT.waterFull)
    .node() as SVGRectElement;
  if (bed.drain.type === 'bell-siphon' && bed.bellTopM !== null) drawBellWalls(g, bed, frame);
  const tag = g
    .append('text')
    .attr('class', 'phase-tag')
    .attr('x', x(0))
    .attr('y', z(0) + TAG_OFFSET_PX)
    .attr('text-anchor', 'middle')
    .style('fill', PAINT.wall)
    .style('font-size', textSize(13))
    .style('paint-order', 'stroke')
    .style('stroke', PAINT.halo)
    .style('stroke-width', 4)
    .style('stroke-linejoin', 'round');
  const phaseText = tag
    .append('tspan')
    .attr('class', 'phase')
    .style('font-weight', 600)
    .node() as SVGTSpanElement;
  const spillText = tag
    .append('tspan')
    .attr('class', 'spill num')
    .attr('x', x(0))
    .attr('dy', '1.25em')
    .style('font-size', textSize(11))
    .node() as SVGTSpanElement;
  return { bed, vesselIndex, bellWater, boreWater, phaseText, spillText };
}

/** The bell's wall and cap above the slots, and the slotted band below (dashed: open and shut). */
function drawBellWalls(
  g: d3.Selection<SVGGElement, unknown, null, undefined>,
  bed: SceneBed,
  frame: SceneFrame,
): void {
  if (bed.drain.type !== 'bell-siphon' || bed.bellTopM === null) return;
  const bell = bed.drain.bell;
  const half = bell.outerDiameter / 2;
  const xl = frame.px(bed.centreXM - half);
  const xr = frame.px(bed.centreXM + half);
  const zFloor = frame.py(bed.floorM);
  const zSlots = frame.py(bed.floorM + bell.intakeHeight);
  const zTop = frame.py(bed.floorM + bed.bellTopM);
  const wall = Math.max(1.5, ((bell.outerDiameter - bell.innerDiameter) / 2) * frame.pxPerM);
  g.append('path')
    .attr('class', 'bell-wall')
    .attr('d', `M${xl},${zSlots}V${zTop}H${xr}V${zSlots}`)
    .style('fill', 'none')
    .style('stroke', PAINT.wall)
    .style('stroke-width', wall);
  g.append('path')
    .attr('class', 'bell-slots')
    .attr('d', `M${xl},${zFloor}V${zSlots}M${xr},${zFloor}V${zSlots}`)
    .style('fill', 'none')
    .style('stroke', PAINT.wall)
    .style('stroke-width', wall)
    .style('stroke-dasharray', '2 2');
  const breakZ = frame.py(bed.floorM + (bed.breakLevelM ?? bell.intakeHeight));
  g.append('line')
    .attr('class', 'break-level')
    .attr('x1', xl - 6)
    .attr('x2', xr + 6)
    .attr('y1', breakZ)
    .attr('y2', breakZ)
    .style('stroke', PAINT.marker)
    .style('stroke-dasharray', '2 2')
    .style('stroke-width', 1.2);
}
