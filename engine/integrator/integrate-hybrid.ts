import { makeCashKarpStepper, type CashKarpStepper } from './cash-karp-stepper';
import { hermiteStateAt } from './hermite-interpolant';
import type { IntegrateSettings } from './integrate-settings';
import { IntegrationFailure } from './integration-failure';
import type {
  HybridSystem,
  IntegrationOutcome,
  IntegrationStats,
  TrajectoryObserver,
} from './hybrid-system';
import { locateCrossing } from './locate-crossing';
import { RestartStepMemory } from './restart-step-memory';
import { startingStepS } from './starting-step';
import { makeStepSegment, type StepSegment } from './step-segment';

/**
 * Integrates a hybrid system from `initialState` (copied, not changed) with the adaptive
 * Cash–Karp stepper: between transitions the system is smooth; after each accepted step every
 * event function is evaluated, a sign change is located on the step's cubic Hermite
 * interpolant, the step is re-integrated from its start exactly to the event time, the model
 * switches modes, and the stepper restarts there. Timed transitions are hit exactly.
 * Never skips a non-finite value: the run fails with the reason and the time reached.
 */
export function integrateHybrid(
  system: HybridSystem,
  initialState: Float64Array,
  settings: IntegrateSettings,
  observer: TrajectoryObserver,
): IntegrationOutcome {
  const run = new HybridRun(system, initialState, settings, observer);
  return run.execute();
}

class HybridRun {
  private readonly stepper: CashKarpStepper;
  private readonly segment: StepSegment;
  /** The rest of a step that overshot an event: from the located time to the step's end. */
  private readonly remainder: StepSegment;
  private readonly scratchState: Float64Array;
  private readonly gValues: Float64Array;
  private readonly gScratch: Float64Array;
  private readonly armed: Uint8Array;
  private readonly stats: IntegrationStats = {
    steps: 0,
    rejected: 0,
    rhsEvaluations: 0,
    events: 0,
  };
  private timeS: number;
  private readonly y: Float64Array;
  private readonly f: Float64Array;
  private lastTransitionS = Number.NaN;
  private transitionsAtInstant = 0;
  private nextProgress = 0.01;
  private tinySteps = 0;
  private extraEvaluations = 0;
  private naturalStepS = 0;
  /** True after a cut that stopped just short of its event: the next step is a short follow-up. */
  private shortOfEvent = false;
  private readonly firedScratch: number[] = [];
  private readonly restartSteps: RestartStepMemory;

  constructor(
    private readonly system: HybridSystem,
    initialState: Float64Array,
    private readonly settings: IntegrateSettings,
    private readonly observer: TrajectoryObserver,
  ) {
    const n = system.stateSize;
    this.stepper = makeCashKarpStepper((out, y, t) => system.derivative(out, y, t), n, settings);
    this.segment = makeStepSegment(n);
    this.remainder = makeStepSegment(n);
    this.scratchState = new Float64Array(n);
    this.y = Float64Array.from(initialState);
    this.f = new Float64Array(n);
    this.gValues = new Float64Array(system.eventCount);
    this.gScratch = new Float64Array(system.eventCount);
    this.armed = new Uint8Array(system.eventCount);
    this.restartSteps = new RestartStepMemory(system.eventCount);
    this.timeS = settings.startS;
  }

  execute(): IntegrationOutcome {
    try {
      this.applyTransition([], true, undefined);
      this.stats.events = 0;
      while (this.timeS < this.settings.endS) {
        if (this.settings.shouldStop?.()) return this.finish('stopped');
        this.advance();
        this.reportProgress();
      }
      return this.finish('completed');
    } catch (error) {
      if (error instanceof IntegrationFailure) return this.finish('failed', error.message);
      const message = error instanceof Error ? error.message : String(error);
      return this.finish('failed', `integration stopped at t = ${this.timeS} s: ${message}`);
    }
  }

  private finish(status: 'completed' | 'stopped' | 'failed', reason?: string): IntegrationOutcome {
    this.stats.rhsEvaluations = this.stepper.counters.rhsEvaluations + this.extraEvaluations;
    this.stats.rejected = this.stepper.counters.rejected;
    const stats = { ...this.stats };
    const state = Float64Array.from(this.y);
    if (status === 'failed')
      return { status, endS: this.timeS, state, stats, reason: reason ?? 'unknown failure' };
    return { status, endS: this.timeS, state, stats };
  }

  private evaluate(out: Float64Array, y: Float64Array, timeS: number): void {
    this.extraEvaluations += 1;
    this.system.derivative(out, y, timeS);
    IntegrationFailure.assertFinite(out, timeS, 'derivative');
  }

  /** One accepted step, or a step cut at a located event followed by the transition. */
  private advance(): void {
    const limitS = Math.min(this.settings.endS, this.system.nextTimedTransitionS(this.timeS));
    const seg = this.takeStep(limitS);
    let fired = this.firedEvents(seg.y1, seg.t1S);
    // A short follow-up step after a cut says nothing about the time scale of the motion: keep
    // the step size from before the cut for the restart after the event.
    if (!this.shortOfEvent) this.naturalStepS = this.stepper.nextStepS;
    this.shortOfEvent = false;
    if (fired.length === 0) {
      this.restartSteps.noteAccepted(seg, limitS);
      this.accept(seg);
    } else {
      fired = this.cutAtEarliestEvent(seg, fired);
    }
    const timedDue = this.timeS === limitS && limitS < this.settings.endS;
    if (fired.length > 0 || timedDue)
      this.applyTransition(
        fired,
        timedDue,
        this.restartSteps.restartStepS(fired, this.naturalStepS),
      );
  }

  /** Takes one adaptive step from the current point; returns it as a segment. */
  private takeStep(limitS: number): StepSegment {
    const seg = this.segment;
    seg.t0S = this.timeS;
    seg.y0.set(this.y);
    seg.f0.set(this.f);
    this.stepper.step(limitS);
    seg.t1S = this.stepper.timeS;
    seg.y1.set(this.stepper.state);
    IntegrationFailure.assertFinite(seg.y1, seg.t1S, 'state');
    this.evaluate(seg.f1, seg.y1, seg.t1S);
    this.countStep(seg);
    return seg;
  }

  private countStep(seg: StepSegment): void {
    this.stats.steps += 1;
    if (this.stats.steps > this.settings.maxSteps) {
      throw new IntegrationFailure(
        `more than ${this.settings.maxSteps} steps; the system may be too stiff`,
      );
    }
    const length = seg.t1S - seg.t0S;
    this.tinySteps = length <= 1e-13 * Math.max(1, Math.abs(seg.t1S)) ? this.tinySteps + 1 : 0;
    if (this.tinySteps > 1000) {
      throw new IntegrationFailure(`step size underflow at t = ${seg.t1S} s`);
    }
  }

  /** Makes a segment the current point and re-arms events that have turned positive. */
  private accept(seg: StepSegment): void {
    this.observer.onSegment(seg);
    this.timeS = seg.t1S;
    this.y.set(seg.y1);
    this.f.set(seg.f1);
    this.stepper.cacheDerivative(this.f);
    for (let i = 0; i < this.gValues.length; i += 1) {
      if ((this.gValues[i] as number) > 0) this.armed[i] = 1;
    }
  }

  /** Evaluates the events at (t, y) into gValues and lists the armed ones that are ≤ 0 (a reused array). */
  private firedEvents(y: Float64Array, timeS: number): number[] {
    this.system.eventValues(this.gValues, y, timeS);
    const fired = this.firedScratch;
    fired.length = 0;
    for (let i = 0; i < this.gValues.length; i += 1) {
      const g = this.gValues[i] as number;
      if (Number.isNaN(g))
        throw new IntegrationFailure(`event function ${i} is NaN at t = ${timeS} s`);
      if (this.armed[i] === 1 && g <= 0) fired.push(i);
    }
    return fired;
  }

  /** Earliest crossing among the fired events, on the step's Hermite interpolant. */
  private locateEarliest(seg: StepSegment, fired: readonly number[]): number {
    const toleranceS = this.settings.eventToleranceFraction * (seg.t1S - seg.t0S);
    let earliestS = seg.t1S;
    for (const index of fired) {
      const g = (timeS: number): number => {
        hermiteStateAt(seg, timeS, this.scratchState);
        this.system.eventValues(this.gScratch, this.scratchState, timeS);
        return this.gScratch[index] as number;
      };
      this.system.eventValues(this.gScratch, seg.y0, seg.t0S);
      const g0 = this.gScratch[index] as number;
      const g1 = g(seg.t1S);
      if (!(g0 > 0) || !(g1 <= 0)) continue;
      earliestS = Math.min(earliestS, locateCrossing(g, seg.t0S, seg.t1S, g0, g1, toleranceS));
    }
    return earliestS;
  }

  /**
   * Integrates from the current point to the earliest crossing located in a step that fired
   * events, and returns the events fired there. The crossing was located on the step's cubic
   * interpolant, which differs from the integrated solution by the interpolation error, so the
   * integrated state may stop just short of it. Then the crossing is located again on the
   * remainder of the step (from the point reached to the step's end, an interval so short that
   * its interpolant is far more accurate) and one more short piece is integrated; only if that
   * misses too does the next ordinary step find the event.
   */
  private cutAtEarliestEvent(seg: StepSegment, fired: readonly number[]): number[] {
    const rest = this.remainder;
    rest.t1S = seg.t1S;
    rest.y1.set(seg.y1);
    rest.f1.set(seg.f1);
    this.reintegrateTo(this.locateEarliest(seg, fired));
    const firedHere = this.firedEvents(this.y, this.timeS);
    if (firedHere.length > 0 || this.timeS >= rest.t1S) return firedHere;
    rest.t0S = this.timeS;
    rest.y0.set(this.y);
    rest.f0.set(this.f);
    const firedAtEnd = this.firedEvents(rest.y1, rest.t1S);
    if (firedAtEnd.length === 0) {
      this.shortOfEvent = true;
      return this.firedEvents(this.y, this.timeS);
    }
    this.reintegrateTo(this.locateEarliest(rest, firedAtEnd.slice()));
    const firedAfter = this.firedEvents(this.y, this.timeS);
    this.shortOfEvent = firedAfter.length === 0;
    return firedAfter;
  }

  /** Integrates again from the current point exactly to `eventS`, reporting each piece. */
  private reintegrateTo(eventS: number): void {
    this.stepper.reset(this.timeS, this.y, this.f, eventS - this.timeS);
    while (this.timeS < eventS) {
      const piece = this.takeStep(eventS);
      this.gValues.fill(-1);
      this.accept(piece);
    }
  }

  /**
   * Switches modes at the current time, reports it, and restarts the stepper there with the step
   * size the integration had before the event (the error test cuts it at once if the new mode is
   * faster), or at the very start with a computed starting step.
   */
  private applyTransition(
    fired: readonly number[],
    timed: boolean,
    previousStepS: number | undefined,
  ): void {
    this.guardChatter();
    this.observer.beforeTransition(this.timeS, this.y);
    this.system.transition(this.timeS, this.y, fired, timed);
    IntegrationFailure.assertFinite(this.y, this.timeS, 'state after a transition');
    this.observer.afterTransition(this.timeS, this.y);
    this.stats.events += 1;
    this.evaluate(this.f, this.y, this.timeS);
    this.system.eventValues(this.gValues, this.y, this.timeS);
    for (let i = 0; i < this.gValues.length; i += 1)
      this.armed[i] = (this.gValues[i] as number) > 0 ? 1 : 0;
    this.stepper.reset(this.timeS, this.y, this.f, previousStepS ?? this.startingStep());
  }

  private startingStep(): number {
    this.extraEvaluations += 1;
    const { relativeTolerance, errorFloor, maxStepS } = this.settings;
    const rhs = (out: Float64Array, y: Float64Array, t: number): void =>
      this.system.derivative(out, y, t);
    return startingStepS(
      rhs,
      this.timeS,
      this.y,
      this.f,
      relativeTolerance,
      errorFloor,
      maxStepS,
      this.scratchState,
      this.segment.f1,
    );
  }

  /** Fails when the modes keep switching without time advancing. */
  private guardChatter(): void {
    this.transitionsAtInstant =
      this.timeS === this.lastTransitionS ? this.transitionsAtInstant + 1 : 0;
    this.lastTransitionS = this.timeS;
    if (this.transitionsAtInstant > this.settings.maxTransitionsAtOneInstant) {
      throw new IntegrationFailure(
        `modes keep switching at t = ${this.timeS} s without time advancing`,
      );
    }
  }

  private reportProgress(): void {
    const { startS, endS, onProgress } = this.settings;
    if (!onProgress) return;
    const fraction = (this.timeS - startS) / (endS - startS);
    if (fraction < this.nextProgress && fraction < 1) return;
    onProgress(Math.min(1, fraction));
    this.nextProgress = Math.floor(fraction * 100 + 1) / 100;
  }
}
