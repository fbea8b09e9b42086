import type { Scenario } from '../../shared/scenario';
import type { HybridSystem } from '../integrator/hybrid-system';
import type { RunEvent } from '../results/run-result';
import { buildSystemParts, type SystemParts } from './build-system-parts';
import type { ModelContext, SwitchInput } from './model-context';
import { applyVesselLimits } from './vessel-flow-balance';

/** Upper bound on settling passes at one instant; more means two switches undo each other. */
const MAX_SETTLING_PASSES = 50;

/**
 * The hydraulic system as a hybrid ODE: state = vessel volumes, water held in pipes, water lost
 * per sink, pumped volume and pump energy; modes = bed phases, pump states and vessel limits.
 * The derivative writes into the array it is given and allocates nothing.
 */
export class SystemModel implements HybridSystem {
  readonly parts: SystemParts;
  readonly stateSize: number;
  readonly eventCount: number;
  /** Events kept so far, in time order (see {@link SystemModel.keepEvent}). */
  readonly events: RunEvent[] = [];
  /** Called with every reported event, kept or not. */
  onEvent: (event: RunEvent) => void = () => {};
  /** Decides which reported events are kept in {@link SystemModel.events} (all by default). */
  keepEvent: (event: RunEvent) => boolean = () => true;
  /** Incremented whenever a mode changes (keys the flow cache). */
  modeVersion = 0;
  private readonly ctx: ModelContext;
  private readonly rates: Float64Array;
  private readonly scratchInflow: Float64Array;
  private readonly scratchNet: Float64Array;
  private readonly fired: Uint8Array;
  private readonly cachedState: Float64Array;
  private cachedTimeS = Number.NaN;
  private cachedVersion = -1;
  private readonly log = (event: RunEvent): void => this.report(event);

  /** Reports an event: passes it to {@link SystemModel.onEvent} and keeps it if wanted. */
  report(event: RunEvent): void {
    this.onEvent(event);
    if (this.keepEvent(event)) this.events.push(event);
  }

  /** Models `scenario`; `exactHydraulics` bypasses the hydraulic tables (slow; for verification). */
  constructor(scenario: Scenario, exactHydraulics = false) {
    this.parts = buildSystemParts(scenario, exactHydraulics);
    const n = this.parts.vessels.length;
    this.stateSize = this.parts.layout.size;
    this.eventCount = this.parts.components.reduce((sum, c) => sum + c.eventCount, 0);
    this.ctx = {
      timeS: 0,
      state: new Float64Array(this.stateSize),
      levelM: new Float64Array(n),
      surfaceM: new Float64Array(n),
      flowM3PerS: new Float64Array(this.parts.channels.length),
      inflowM3PerS: new Float64Array(n),
      netInflowM3PerS: new Float64Array(n),
    };
    this.rates = new Float64Array(this.stateSize);
    this.scratchInflow = new Float64Array(n);
    this.scratchNet = new Float64Array(n);
    this.fired = new Uint8Array(this.eventCount);
    this.cachedState = new Float64Array(this.stateSize);
  }

  /** The state at the start: vessel volumes at their initial levels, everything else zero. */
  initialState(): Float64Array {
    const y = new Float64Array(this.stateSize);
    for (const vessel of this.parts.vessels)
      y[vessel.index] = vessel.geometry.volumeAtLevelM3(vessel.vessel.initialLevel);
    return y;
  }

  derivative(out: Float64Array, y: Float64Array, timeS: number): void {
    const ctx = this.evaluate(y, timeS);
    out.fill(0);
    const { from, to } = this.parts.ends;
    const flows = ctx.flowM3PerS;
    for (let k = 0; k < flows.length; k += 1) {
      const q = flows[k] as number;
      const a = from[k] as number;
      const b = to[k] as number;
      out[a] = (out[a] as number) - q;
      out[b] = (out[b] as number) + q;
    }
    for (const index of this.parts.meterIndices) out[index] = this.rates[index] as number;
  }

  eventValues(out: Float64Array, y: Float64Array, timeS: number): void {
    let ctx: ModelContext;
    if (this.cachedAt(y, timeS)) {
      // The usual case after a step: its end was just evaluated for the derivative there.
      ctx = this.ctx;
    } else {
      let needsFlows = false;
      for (const vessel of this.parts.vessels)
        needsFlows = needsFlows || vessel.brimful || vessel.empty;
      ctx = needsFlows ? this.evaluate(y, timeS) : this.evaluateLevels(y, timeS);
    }
    for (const component of this.parts.components) component.eventValues(ctx, out);
  }

  nextTimedTransitionS(afterS: number): number {
    return this.parts.schedule.nextAfter(afterS);
  }

  transition(timeS: number, y: Float64Array, fired: readonly number[], timed: boolean): void {
    if (timed) this.parts.schedule.applyDue(timeS, this.log);
    this.fired.fill(0);
    for (const index of fired) this.fired[index] = 1;
    this.modeVersion += 1;
    for (let pass = 0; pass < MAX_SETTLING_PASSES; pass += 1) {
      if (!this.settlingPass(timeS, y)) return;
      this.fired.fill(0);
    }
    throw new Error(`the modes did not settle at t = ${timeS} s (two switches undo each other)`);
  }

  /** Flows, levels and surfaces at (y, t); cached for repeated calls at the same point and modes. */
  flowsAt(y: Float64Array, timeS: number): ModelContext {
    return this.cachedAt(y, timeS) ? this.ctx : this.evaluate(y, timeS);
  }

  /**
   * Whether the context holds the evaluation of (y, t) in the current modes; if so, points it at
   * `y` (the array it was computed from may have been reused since, with other values).
   */
  private cachedAt(y: Float64Array, timeS: number): boolean {
    if (
      timeS !== this.cachedTimeS ||
      this.cachedVersion !== this.modeVersion ||
      !sameValues(y, this.cachedState)
    )
      return false;
    this.ctx.state = y;
    return true;
  }

  private settlingPass(timeS: number, y: Float64Array): boolean {
    let dirty = true;
    let changed = false;
    const input: SwitchInput = { ctx: this.ctx, fired: this.fired, state: y, log: this.log };
    for (const component of this.parts.components) {
      if (dirty) this.flowsAt(y, timeS);
      dirty = component.switchModes(input);
      if (dirty) {
        changed = true;
        this.modeVersion += 1;
      }
    }
    return changed;
  }

  private evaluateLevels(y: Float64Array, timeS: number): ModelContext {
    const ctx = this.ctx;
    ctx.timeS = timeS;
    ctx.state = y;
    this.cachedTimeS = Number.NaN;
    for (const vessel of this.parts.vessels) {
      const level = vessel.geometry.levelAtVolumeM(y[vessel.index] as number);
      ctx.levelM[vessel.index] = level;
      ctx.surfaceM[vessel.index] = vessel.vessel.floorElevation + level;
    }
    return ctx;
  }

  private evaluate(y: Float64Array, timeS: number): ModelContext {
    const ctx = this.evaluateLevels(y, timeS);
    ctx.flowM3PerS.fill(0);
    for (const index of this.parts.meterIndices) this.rates[index] = 0;
    for (const component of this.parts.components) component.computeFlows(ctx, this.rates);
    applyVesselLimits(
      ctx,
      this.parts.ends,
      this.parts.vessels,
      this.scratchInflow,
      this.scratchNet,
    );
    this.cachedState.set(y);
    this.cachedTimeS = timeS;
    this.cachedVersion = this.modeVersion;
    return ctx;
  }
}

function sameValues(a: Float64Array, b: Float64Array): boolean {
  for (let i = 0; i < a.length; i += 1) if (a[i] !== b[i]) return false;
  return true;
}
