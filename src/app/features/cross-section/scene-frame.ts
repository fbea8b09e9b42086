import { type ElevationFrame, elevationFrame } from '../systems/elevation-drawing/draw-elevation';
import type { CrossSectionScene } from './cross-section-scene';

/** The tallest the cross-section may be, SVG user units (taller than the editor's sketch). */
export const SCENE_MAX_HEIGHT = 560;

/** A frame with the elevations it spans, m above the datum. */
export interface SceneFrame extends ElevationFrame {
  readonly zMinM: number;
  readonly zMaxM: number;
}

/**
 * The drawing frame of a scene: the elevation drawing's own fit (one scale across, the same or
 * `verticalExaggeration` times it upward), over the layout widened to every pipe of the scene.
 */
export function sceneFrame(scene: CrossSectionScene, verticalExaggeration: number): SceneFrame {
  const xs = scene.pipes.flatMap((p) => p.points.map((point) => point[0]));
  const zs = scene.pipes.flatMap((p) => p.points.map((point) => point[1]));
  const layout = {
    ...scene.layout,
    xMin: Math.min(scene.layout.xMin, ...xs),
    xMax: Math.max(scene.layout.xMax, ...xs),
    zMin: Math.min(scene.layout.zMin, ...zs),
    zMax: Math.max(scene.layout.zMax, ...zs),
  };
  const frame = elevationFrame(layout, { verticalExaggeration, maxHeight: SCENE_MAX_HEIGHT });
  return { ...frame, zMinM: layout.zMin, zMaxM: layout.zMax };
}
