import type { Scenario } from '../shared/scenario';
import type { TrajectoryObserver } from './integrator/hybrid-system';
import { integrateHybrid } from './integrator/integrate-hybrid';
import type { IntegrateSettings } from './integrator/integrate-settings';
import type { StepSegment } from './integrator/step-segment';
import { BedCycleRecorder } from './results/bed-cycle-recorder';
import { LevelExtremesTracker } from './results/level-extremes';
import type { SimulateOptions, SimulationOutcome } from './results/run-result';
import { makeSeriesProbe } from './results/series-probe';
import { SeriesRecorder } from './results/series-recorder';
import { summariseRun } from './results/summarise-run';
import { StallMonitor } from './system/stall-monitor';
import { SystemModel } from './system/system-model';

/** A scenario that passed the schema but cannot be modelled (e.g. a shape with no storage area). */
export class ScenarioModelError extends Error {
  readonly code = 'invalid-scenario';
}

/** Longest integration step, s: bounds how long a level can go unobserved between event checks. */
const MAX_STEP_S = 120;

/**
 * Simulates a normalised scenario: builds the system model, integrates it with located events,
 * and returns the summary, events, verdicts, mass-balance error, statistics and series. A
 * numerical failure (a NaN, a stall of the integrator) is returned as `failed` with the partial
 * result up to the time reached; invalid options or an unmodellable scenario throw.
 */
export function simulate(scenario: Scenario, options: SimulateOptions = {}): SimulationOutcome {
  const durationS = options.durationS ?? scenario.run.duration;
  if (!(durationS > 0) || !Number.isFinite(durationS))
    throw new ScenarioModelError(
      `The duration must be a positive number of seconds (got ${durationS}).`,
    );
  const model = buildModel(scenario, options.hydraulics === 'exact');
  const initialState = model.initialState();
  const recorder = makeRecorder(model, durationS, options);
  const extremes = new LevelExtremesTracker(model.parts.vessels);
  const cycles = new BedCycleRecorder(bedsOf(scenario), extremes.extremes);
  const omitted = limitEvents(model, cycles, options.maxSamples);
  const stalls = new StallMonitor(model);
  const observer = composeObservers([extremes, recorder], stalls);
  const outcome = integrateHybrid(
    model,
    initialState,
    integrationSettings(model, scenario, durationS, options),
    observer,
  );
  const summary = summariseRun({
    model,
    initialState,
    finalState: outcome.state,
    startS: 0,
    endS: outcome.endS,
    extremes: extremes.extremes,
    tallies: cycles.tallies,
  });
  const events = [...model.events].sort((a, b) => a.t_s - b.t_s);
  const result = {
    ...summary,
    events,
    stats: {
      ...outcome.stats,
      wall_ms: 0,
      simulated_s: outcome.endS,
      eventsOmitted: omitted.count,
    },
    series: { t_s: recorder.timesS, channels: recorder.channels() },
  };
  if (outcome.status === 'failed') return { status: 'failed', reason: outcome.reason, result };
  return { status: outcome.status, result };
}

/** The beds of a scenario as the cycle recorder needs them. */
function bedsOf(scenario: Scenario) {
  return scenario.vessels.flatMap((vessel, index) =>
    vessel.kind === 'bed'
      ? [
          {
            id: vessel.id,
            index,
            drain: vessel.drain.type,
            standpipeHeightM: vessel.drain.standpipe.height,
          },
        ]
      : [],
  );
}

/**
 * Routes every reported event to the cycle recorder and, when the series is capped at
 * `maxSamples`, keeps at most that many events, always including the first of each kind at each
 * place, so memory stays flat with run length. Returns the running count of events left out.
 */
function limitEvents(
  model: SystemModel,
  cycles: BedCycleRecorder,
  maxSamples: number | undefined,
): { count: number } {
  const omitted = { count: 0 };
  const seen = new Set<string>();
  model.onEvent = (event) => cycles.onEvent(event);
  if (maxSamples === undefined) return omitted;
  model.keepEvent = (event) => {
    const key = `${event.kind}@${event.where}`;
    const keep = !seen.has(key) || model.events.length < maxSamples;
    seen.add(key);
    if (!keep) omitted.count += 1;
    return keep;
  };
  return omitted;
}

function buildModel(scenario: Scenario, exactHydraulics: boolean): SystemModel {
  try {
    return new SystemModel(scenario, exactHydraulics);
  } catch (error) {
    throw new ScenarioModelError(error instanceof Error ? error.message : String(error));
  }
}

function makeRecorder(
  model: SystemModel,
  durationS: number,
  options: SimulateOptions,
): SeriesRecorder {
  const requested = options.outputIntervalS ?? model.parts.scenario.run.outputInterval;
  if (!(requested > 0))
    throw new ScenarioModelError(`The output interval must be positive (got ${requested}).`);
  const { maxSamples } = options;
  const intervalS =
    maxSamples === undefined
      ? requested
      : Math.max(requested, durationS / Math.max(1, maxSamples - 1));
  return new SeriesRecorder(
    makeSeriesProbe(model),
    model.stateSize,
    0,
    intervalS,
    maxSamples === undefined,
  );
}

function integrationSettings(
  model: SystemModel,
  scenario: Scenario,
  durationS: number,
  options: SimulateOptions,
): IntegrateSettings {
  const { layout, vessels } = model.parts;
  const capacityM3 = vessels.reduce((sum, v) => sum + v.geometry.rimVolumeM3, 0);
  const errorFloor = new Float64Array(model.stateSize).fill(1e-3 * capacityM3);
  for (const vessel of vessels) errorFloor[vessel.index] = 1e-3 * vessel.geometry.rimVolumeM3;
  for (const index of layout.energyIndex.values()) errorFloor[index] = 1;
  return {
    startS: 0,
    endS: durationS,
    relativeTolerance: scenario.run.tolerance,
    errorFloor,
    maxStepS: Math.min(MAX_STEP_S, durationS / 4),
    initialStepS: Math.min(0.01, durationS / 100),
    eventToleranceFraction: 1e-6,
    maxSteps: 20_000_000,
    maxTransitionsAtOneInstant: 100,
    ...(options.shouldStop && { shouldStop: options.shouldStop }),
    ...(options.onProgress && { onProgress: options.onProgress }),
  };
}

/** Runs the stall monitor and then each observer, in order, on every piece of the trajectory. */
function composeObservers(
  observers: readonly TrajectoryObserver[],
  stalls: StallMonitor,
): TrajectoryObserver {
  return {
    onSegment: (segment: StepSegment) => {
      stalls.onSegment(segment);
      for (const o of observers) o.onSegment(segment);
    },
    beforeTransition: (timeS, state) => {
      for (const o of observers) o.beforeTransition(timeS, state);
    },
    afterTransition: (timeS, state) => {
      for (const o of observers) o.afterTransition(timeS, state);
    },
  };
}
