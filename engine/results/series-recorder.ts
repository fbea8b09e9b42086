import { hermiteStateAt } from '../integrator/hermite-interpolant';
import type { TrajectoryObserver } from '../integrator/hybrid-system';
import type { StepSegment } from '../integrator/step-segment';
import type { SeriesChannel } from './run-result';
import type { SeriesProbe } from './series-probe';

/** Phase codes of the series. */
const SPILLING = 1;
const PRIMING = 2;
const SIPHONING = 3;
const BREAK = 4;

/**
 * Records the series on a fixed output grid from each step's cubic Hermite interpolant (never
 * from the step points), plus the exact state just before and just after every transition. The
 * sample before a priming or a break carries the instant phase code (2 or 4).
 */
export class SeriesRecorder implements TrajectoryObserver {
  readonly timesS: number[] = [];
  private readonly values: number[][];
  private readonly scratchState: Float64Array;
  private readonly row: Float64Array;
  private readonly pendingRow: Float64Array;
  private nextGridIndex = 0;
  private started = false;

  constructor(
    private readonly probe: SeriesProbe,
    stateSize: number,
    private readonly startS: number,
    private readonly intervalS: number,
    private readonly includeTransitions: boolean,
  ) {
    this.values = probe.specs.map(() => []);
    this.scratchState = new Float64Array(stateSize);
    this.row = new Float64Array(probe.specs.length);
    this.pendingRow = new Float64Array(probe.specs.length);
  }

  onSegment(segment: StepSegment): void {
    for (;;) {
      const t = this.startS + this.nextGridIndex * this.intervalS;
      if (t > segment.t1S) return;
      if (t >= segment.t0S) {
        hermiteStateAt(segment, t, this.scratchState);
        this.probe.sample(this.scratchState, t, this.row);
        this.push(t, this.row);
      }
      this.nextGridIndex += 1;
    }
  }

  beforeTransition(timeS: number, state: Float64Array): void {
    if (this.started && this.includeTransitions) this.probe.sample(state, timeS, this.pendingRow);
  }

  afterTransition(timeS: number, state: Float64Array): void {
    if (!this.started) {
      this.started = true;
      return;
    }
    if (!this.includeTransitions) return;
    this.probe.sample(state, timeS, this.row);
    for (const k of this.probe.phaseChannels) {
      const before = this.pendingRow[k] as number;
      const after = this.row[k] as number;
      if (before === SPILLING && after === SIPHONING) this.pendingRow[k] = PRIMING;
      else if (before === SIPHONING && after !== SIPHONING) this.pendingRow[k] = BREAK;
    }
    this.push(timeS, this.pendingRow);
    this.push(timeS, this.row);
  }

  /** The recorded channels (the arrays are shared, not copied). */
  channels(): SeriesChannel[] {
    return this.probe.specs.map((spec, k) => ({ ...spec, values: this.values[k] ?? [] }));
  }

  private push(timeS: number, row: Float64Array): void {
    this.timesS.push(timeS);
    for (let k = 0; k < row.length; k += 1) this.values[k]?.push(row[k] as number);
  }
}
