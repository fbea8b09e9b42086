import * as d3 from 'd3';
import type { SceneBed } from './cross-section-scene';
import { drawBedParts } from './draw-bed-parts';
import type { SceneFrame } from './scene-frame';
import type { BedHandles } from './scene-handles';
import { PAINT, textSize } from './scene-palette';

/** Size of the close-up drawing, user units. */
export const CLOSE_UP_SIZE = { width: 220, height: 300 } as const;
/** Room around the bed's parts in the close-up, user units. */
const MARGIN = { top: 22, side: 10, bottom: 40 };

/** The moving parts of the close-up: the bed's drain parts and the water around the bell. */
export interface CloseUpHandles {
  readonly frame: SceneFrame;
  readonly bed: BedHandles;
  readonly bedIndex: number;
  readonly water: SVGRectElement;
  /** Left and right of the water drawn around the bell, m. */
  readonly spanM: readonly [number, number];
}

/**
 * The frame of a close-up of one bed's bell and standpipe: one scale across and up (true to
 * scale), as large as fits a window three bell widths wide and the bed's depth high.
 */
export function closeUpFrame(bed: SceneBed): SceneFrame & { readonly spanM: [number, number] } {
  const bellM = bed.drain.type === 'bell-siphon' ? bed.drain.bell.outerDiameter : 0;
  const partsM = Math.max(bellM, bed.drain.guard?.diameter ?? 0, bed.drain.standpipe.outerDiameter);
  const halfM = Math.min(bed.widthM / 2, Math.max(partsM * 1.5, 0.05));
  const zTopM = bed.floorM + bed.heightM;
  const zMinM = bed.floorM;
  const k = Math.min(
    (CLOSE_UP_SIZE.width - 2 * MARGIN.side) / (2 * halfM),
    (CLOSE_UP_SIZE.height - MARGIN.top - MARGIN.bottom) / bed.heightM,
  );
  const left = CLOSE_UP_SIZE.width / 2 - halfM * k;
  return {
    pxPerM: k,
    pzPerM: k,
    height: CLOSE_UP_SIZE.height,
    px: (xM) => left + (xM - (bed.centreXM - halfM)) * k,
    py: (zM) => MARGIN.top + (zTopM - zM) * k,
    zMinM,
    zMaxM: zTopM,
    spanM: [bed.centreXM - halfM, bed.centreXM + halfM],
  };
}

/** Draws the close-up of `bed` into `layer` (emptied first) and returns its moving parts. */
export function drawCloseUp(
  layer: SVGGElement,
  bed: SceneBed,
  bedIndex: number,
  vesselIndex: number,
  airPattern: string,
  mediaPattern: string,
): CloseUpHandles {
  const root = d3.select(layer);
  root.selectAll('*').remove();
  const frame = closeUpFrame(bed);
  const [x0, x1] = frame.spanM;
  const width = (x1 - x0) * frame.pxPerM;
  if (bed.media.type !== 'none') {
    root
      .append('rect')
      .attr('class', 'media')
      .attr('x', frame.px(x0))
      .attr('width', width)
      .attr('y', frame.py(bed.floorM + bed.media.depth))
      .attr('height', bed.media.depth * frame.pzPerM)
      .style('fill', `url(#${mediaPattern})`);
  }
  const water = root
    .append('rect')
    .attr('class', 'water')
    .attr('x', frame.px(x0))
    .attr('width', width)
    .attr('y', frame.py(bed.floorM))
    .attr('height', 0)
    .style('fill', PAINT.water)
    .style('fill-opacity', 0.6)
    .node() as SVGRectElement;
  root
    .append('path')
    .attr('class', 'floor')
    .attr('d', `M${frame.px(x0)},${frame.py(bed.floorM)}H${frame.px(x1)}`)
    .style('stroke', PAINT.wall)
    .style('stroke-width', 2);
  const parts = drawBedParts(root, bed, frame, airPattern, vesselIndex);
  root
    .append('text')
    .attr('x', CLOSE_UP_SIZE.width / 2)
    .attr('y', 14)
    .attr('text-anchor', 'middle')
    .style('fill', PAINT.wall)
    .style('font-size', textSize(12))
    .text(`${bed.id}: bell close-up`);
  return { frame, bed: parts, bedIndex, water, spanM: frame.spanM };
}
