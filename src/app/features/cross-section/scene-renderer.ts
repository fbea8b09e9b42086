import type { DisplayScale } from '../../ui/time-series-chart/display-scale';
import { AttributeWriter } from './attribute-writer';
import type { CrossSectionScene } from './cross-section-scene';
import { type CloseUpHandles, drawCloseUp } from './draw-close-up';
import { drawScene } from './draw-scene';
import { FrameTimer } from './frame-timer';
import { paintCloseUp, paintScene } from './paint-scene';
import type { SceneFrame } from './scene-frame';
import type { SceneHandles } from './scene-handles';
import type { SceneSampler } from './scene-sampler';

/** What one frame paints from. */
export interface FrameInput {
  readonly sampler: SceneSampler;
  readonly timeS: number;
  /** Wall seconds since the last frame, 0 for a still frame (a seek, a step, a redraw). */
  readonly wallStepS: number;
  readonly frame: SceneFrame;
  readonly primingCoefficients: readonly number[];
  readonly speed: number;
}

/**
 * The drawing's DOM work, outside Angular: draws the still scene and the close-up (only when
 * their geometry changes) and paints each frame by writing the attributes that changed; times
 * its own work per frame.
 */
export class SceneRenderer {
  /** Timings of the paint work per frame. */
  readonly timer = new FrameTimer();
  private readonly writer = new AttributeWriter();
  private handles: SceneHandles | null = null;
  private closeUp: CloseUpHandles | null = null;
  private offsets = new Float64Array(0);

  /** @param idPrefix makes the drawing's pattern ids unique on the page. */
  constructor(private readonly idPrefix: string) {}

  /** Draws the still scene into `layer` (emptied first). */
  drawScene(
    layer: SVGGElement,
    scene: CrossSectionScene,
    frame: SceneFrame,
    units: DisplayScale,
  ): void {
    this.writer.clear();
    this.handles = drawScene(layer, {
      scene,
      frame,
      units,
      patterns: this.patterns(),
    });
    this.offsets = new Float64Array(scene.pipes.length);
  }

  /** Draws the close-up of bed `bedId` into `layer`, or empties it when there is no such bed. */
  drawCloseUp(layer: SVGGElement, scene: CrossSectionScene, bedId: string): void {
    const bedIndex = scene.beds.findIndex((b) => b.id === bedId);
    const bed = scene.beds[bedIndex];
    if (!bed) {
      layer.replaceChildren();
      this.closeUp = null;
      return;
    }
    const vesselIndex = scene.vessels.findIndex((v) => v.id === bed.id);
    const patterns = this.patterns();
    const media = bed.media.type === 'expanded-clay' ? patterns.clay : patterns.gravel;
    this.closeUp = drawCloseUp(layer, bed, bedIndex, vesselIndex, patterns.air, media);
  }

  /** Paints one frame; does nothing before the scene is drawn. */
  paint(input: FrameInput): void {
    const handles = this.handles;
    if (!handles) return;
    const started = this.timer.start();
    const state = input.sampler.sample(input.timeS);
    const context = {
      frame: input.frame,
      writer: this.writer,
      busiestM3PerS: input.sampler.busiestM3PerS,
      wallStepS: input.wallStepS,
      offsets: this.offsets,
      primingCoefficients: input.primingCoefficients,
      speed: input.speed,
    };
    paintScene(handles, state, context);
    if (this.closeUp) paintCloseUp(this.closeUp, state, context);
    this.timer.stop(started);
  }

  private patterns() {
    const id = this.idPrefix;
    return { gravel: `${id}-gravel`, clay: `${id}-clay`, air: `${id}-air` };
  }
}
