import type { SceneBed, ScenePipe, ScenePump, SceneVessel } from './cross-section-scene';

/** The moving parts of one bed's drain: bell water, bore water and the phase tag. */
export interface BedHandles {
  readonly bed: SceneBed;
  /** Index of the bed among the scene's vessels (for its level). */
  readonly vesselIndex: number;
  /** Water inside the bell (null for a plain standpipe). */
  readonly bellWater: SVGRectElement | null;
  readonly boreWater: SVGRectElement;
  readonly phaseText: SVGTSpanElement;
  readonly spillText: SVGTSpanElement;
}

/** The moving parts of one pipe: the water filling it and the marks running along it. */
export interface PipeHandles {
  readonly pipe: ScenePipe;
  /** Index of a drain's bed among the scene's beds, else -1. */
  readonly bedIndex: number;
  readonly water: SVGPathElement;
  readonly marks: SVGPathElement;
  /** Drawn length of the path, user units (worked out from the points, never measured). */
  readonly lengthPx: number;
}

/** The moving parts of one pump: its body and its state word. */
export interface PumpHandles {
  readonly pump: ScenePump;
  readonly body: SVGRectElement;
  readonly state: SVGTextElement;
}

/** Every element the animation updates, found once when the scene is drawn. */
export interface SceneHandles {
  readonly water: readonly { readonly vessel: SceneVessel; readonly rect: SVGRectElement }[];
  readonly beds: readonly BedHandles[];
  readonly pipes: readonly PipeHandles[];
  readonly pumps: readonly PumpHandles[];
  readonly clock: SVGTextElement;
}
