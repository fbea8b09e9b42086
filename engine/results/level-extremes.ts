import type { VesselComponent } from '../components/vessel';
import type { TrajectoryObserver } from '../integrator/hybrid-system';
import { hermiteTurningPoint } from '../integrator/hermite-turning-point';
import type { StepSegment } from '../integrator/step-segment';

/** Lowest and highest level of one vessel and when they happened, over the run and since a reset. */
export interface LevelExtremes {
  minLevelM: number;
  minAtS: number;
  maxLevelM: number;
  maxAtS: number;
  /** Lowest level since the window's low end was last reset, m. */
  windowMinM: number;
  /** Highest level since the window's high end was last reset, m. */
  windowMaxM: number;
}

/**
 * Tracks each vessel's lowest and highest level over the trajectory: at every step end, at every
 * transition, and inside a step where dV/dt changes sign, at the extremum of the step's cubic
 * Hermite interpolant (the root of its quadratic derivative), so a turning point between step
 * ends is not missed. A resettable window serves per-cycle highs and lows.
 */
export class LevelExtremesTracker implements TrajectoryObserver {
  readonly extremes: LevelExtremes[];

  constructor(private readonly vessels: readonly VesselComponent[]) {
    this.extremes = vessels.map(() => ({
      minLevelM: Infinity,
      minAtS: 0,
      maxLevelM: -Infinity,
      maxAtS: 0,
      windowMinM: Infinity,
      windowMaxM: -Infinity,
    }));
  }

  onSegment(segment: StepSegment): void {
    for (const vessel of this.vessels) {
      const i = vessel.index;
      this.note(vessel, segment.y1[i] as number, segment.t1S);
      const f0 = segment.f0[i] as number;
      const f1 = segment.f1[i] as number;
      if (f0 * f1 < 0) this.noteTurningPoint(vessel, segment);
    }
  }

  beforeTransition(timeS: number, state: Float64Array): void {
    for (const vessel of this.vessels) this.note(vessel, state[vessel.index] as number, timeS);
  }

  afterTransition(timeS: number, state: Float64Array): void {
    this.beforeTransition(timeS, state);
  }

  private note(vessel: VesselComponent, volumeM3: number, timeS: number): void {
    const level = vessel.geometry.levelAtVolumeM(volumeM3);
    const e = this.extremes[vessel.index] as LevelExtremes;
    e.windowMinM = Math.min(e.windowMinM, level);
    e.windowMaxM = Math.max(e.windowMaxM, level);
    if (level < e.minLevelM) {
      e.minLevelM = level;
      e.minAtS = timeS;
    }
    if (level > e.maxLevelM) {
      e.maxLevelM = level;
      e.maxAtS = timeS;
    }
  }

  private noteTurningPoint(vessel: VesselComponent, segment: StepSegment): void {
    const i = vessel.index;
    const h = segment.t1S - segment.t0S;
    const y0 = segment.y0[i] as number;
    const y1 = segment.y1[i] as number;
    const d0 = h * (segment.f0[i] as number);
    const d1 = h * (segment.f1[i] as number);
    const s = hermiteTurningPoint(y0, y1, d0, d1);
    if (s === undefined) return;
    const s2 = s * s;
    const s3 = s2 * s;
    const value =
      (2 * s3 - 3 * s2 + 1) * y0 +
      (s3 - 2 * s2 + s) * d0 +
      (-2 * s3 + 3 * s2) * y1 +
      (s3 - s2) * d1;
    this.note(vessel, value, segment.t0S + s * h);
  }
}
