import { spillNumber } from '../../../../engine/index';
import { type BedPhaseReading, BedPhaseTrack } from './bed-phase';
import type { CrossSectionEvent, CrossSectionSeries } from './cross-section-data';
import type { CrossSectionScene } from './cross-section-scene';
import { type PumpState, PumpStateTrack } from './pump-state';
import { SeriesReader } from './series-reader';

/** Everything that moves, at one time; arrays follow the scene's vessels, beds, pipes and pumps. */
export interface SceneState {
  readonly timeS: number;
  /** Water level of each vessel, m above its floor (NaN when the series has none). */
  readonly levelsM: Float64Array;
  readonly phases: BedPhaseReading[];
  /** Each bed's spill number Q/√(g·D⁵) while spilling, else NaN. */
  readonly spillNumbers: Float64Array;
  /** Flow along each pipe, m³/s (NaN when the series has none). */
  readonly flowsM3PerS: Float64Array;
  readonly pumps: PumpState[];
}

/**
 * Reads the scene's state at any time from a run's series and events. The arrays of the returned
 * state are reused from call to call (one allocation per sampler, none per frame): copy what must
 * outlive the next call.
 */
export class SceneSampler {
  readonly reader: SeriesReader;
  /** The largest flow along any pipe over the run, m³/s (sets how busy the flow marks look). */
  readonly busiestM3PerS: number;
  private readonly bedTracks: BedPhaseTrack[];
  private readonly pumpTracks: PumpStateTrack[];
  private readonly state: {
    timeS: number;
    levelsM: Float64Array;
    phases: BedPhaseReading[];
    spillNumbers: Float64Array;
    flowsM3PerS: Float64Array;
    pumps: PumpState[];
  };

  constructor(
    private readonly scene: CrossSectionScene,
    series: CrossSectionSeries,
    events: readonly CrossSectionEvent[],
  ) {
    this.reader = new SeriesReader(series);
    this.bedTracks = scene.beds.map((bed) => new BedPhaseTrack(bed.id, this.reader, events));
    this.pumpTracks = scene.pumps.map((p) => new PumpStateTrack(p.id, p.initialState, events));
    this.busiestM3PerS = Math.max(0, ...scene.pipes.map((p) => this.reader.largest(p.channelId)));
    this.state = {
      timeS: 0,
      levelsM: new Float64Array(scene.vessels.length),
      phases: scene.beds.map(() => ({ phase: 'filling', sinceS: Infinity })),
      spillNumbers: new Float64Array(scene.beds.length),
      flowsM3PerS: new Float64Array(scene.pipes.length),
      pumps: scene.pumps.map((p) => p.initialState),
    };
  }

  /** The state at `timeS`. */
  sample(timeS: number): SceneState {
    const { state, reader, scene } = this;
    state.timeS = timeS;
    scene.vessels.forEach((v, i) => (state.levelsM[i] = reader.valueAt(`level:${v.id}`, timeS)));
    scene.pipes.forEach((p, i) => (state.flowsM3PerS[i] = reader.valueAt(p.channelId, timeS)));
    scene.beds.forEach((bed, i) => {
      const reading = this.bedTracks[i]?.phaseAt(timeS) ?? { phase: 'filling', sinceS: Infinity };
      state.phases[i] = reading;
      const spill = reader.valueAt(`flow:${bed.id}.drain`, timeS);
      state.spillNumbers[i] =
        reading.phase === 'spilling' && Number.isFinite(spill)
          ? spillNumber(spill, bed.drain.standpipe.innerDiameter)
          : Number.NaN;
    });
    this.pumpTracks.forEach((track, i) => (state.pumps[i] = track.stateAt(timeS)));
    return state;
  }
}
