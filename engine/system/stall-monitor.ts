import type { BellSiphonComponent } from '../components/bell-siphon';
import type { StepSegment } from '../integrator/step-segment';
import { formatSignificant as fmt } from '../results/format-significant';
import type { SystemModel } from './system-model';

/**
 * How long a stall condition must hold before it is reported, s. Five minutes is many times the
 * settling time of the rim spill of beds of common size (A_eff/(dQ/dh) of tens of seconds); the
 * trajectory test scales itself, as it only holds once the level has settled.
 */
export const STALL_WINDOW_S = 300;

/** The level counts as settled when |dV/dt| is below this fraction of the inflow. */
export const SETTLED_FRACTION = 1e-3;

interface Watch {
  phaseStartS: number;
  balanceSinceS: number;
  settledSinceS: number;
}

/**
 * Watches every bell-siphon bed for the two stalls, both ways. Spill stall (never primes): the
 * inflow is below Q_prime (flow balance) or the level has settled while spilling (trajectory).
 * Siphon lock (never breaks): the inflow is at least the siphon's flow at the break level (flow
 * balance) or the level has settled while siphoning (trajectory). A stall is reported once per
 * phase, when either test has held for {@link STALL_WINDOW_S}, with the inflow change that cures it.
 */
export class StallMonitor {
  private readonly watches: Watch[];

  constructor(private readonly model: SystemModel) {
    this.watches = model.parts.bells.map(() => ({
      phaseStartS: Number.NaN,
      balanceSinceS: Number.NaN,
      settledSinceS: Number.NaN,
    }));
  }

  /** Checks the end of an accepted step. */
  onSegment(segment: StepSegment): void {
    const bells = this.model.parts.bells;
    for (let i = 0; i < bells.length; i += 1) {
      const bell = bells[i] as BellSiphonComponent;
      const watch = this.watches[i] as Watch;
      if (bell.phase === 'filling' || bell.stall !== null) continue;
      this.check(bell, watch, segment);
    }
  }

  private check(bell: BellSiphonComponent, watch: Watch, segment: StepSegment): void {
    const t = segment.t1S;
    if (watch.phaseStartS !== bell.phaseStartS) {
      watch.phaseStartS = bell.phaseStartS;
      watch.balanceSinceS = Number.NaN;
      watch.settledSinceS = Number.NaN;
    }
    const ctx = this.model.flowsAt(segment.y1, t);
    const index = bell.wiring.bed.index;
    const inflow = ctx.inflowM3PerS[index] as number;
    const level = ctx.levelM[index] as number;
    const spilling = bell.phase === 'spilling';
    const threshold = spilling
      ? bell.primingFlowM3PerS
      : bell.siphonFlowAtLevel(ctx, bell.breakLevelM);
    const balance = inflow > 0 && (spilling ? inflow < threshold : inflow >= threshold);
    const settled =
      inflow > 0 && Math.abs(segment.f1[index] as number) <= SETTLED_FRACTION * inflow;
    watch.balanceSinceS = balance
      ? Number.isNaN(watch.balanceSinceS)
        ? t
        : watch.balanceSinceS
      : Number.NaN;
    watch.settledSinceS = settled
      ? Number.isNaN(watch.settledSinceS)
        ? t
        : watch.settledSinceS
      : Number.NaN;
    const byBalance = t - watch.balanceSinceS >= STALL_WINDOW_S;
    const byTrajectory = t - watch.settledSinceS >= STALL_WINDOW_S;
    if (!byBalance && !byTrajectory) return;
    const detectedBy = [byBalance ? 'flow balance' : '', byTrajectory ? 'trajectory' : '']
      .filter(Boolean)
      .join(' and ');
    bell.stall = spilling ? 'spill-stall' : 'siphon-lock';
    this.model.report(
      spilling
        ? spillStallEvent(bell, t, inflow, level, detectedBy)
        : siphonLockEvent(bell, t, inflow, threshold, level, detectedBy),
    );
  }
}

const perMin = (flowM3PerS: number): string => `${fmt(flowM3PerS * 60000, 3)} L/min`;

function spillStallEvent(
  bell: BellSiphonComponent,
  t: number,
  inflow: number,
  level: number,
  detectedBy: string,
) {
  const cure = bell.primingFlowM3PerS - inflow;
  return {
    t_s: t,
    kind: 'spill-stall',
    where: bell.bedId,
    detail: `The siphon never primes: the inflow ${perMin(inflow)} stays below the priming flow ${perMin(bell.primingFlowM3PerS)}, so the bed trickles over the standpipe at ${fmt(level)} m (found by ${detectedBy}). Raise the inflow by at least ${perMin(Math.max(cure, 0))}, or use a narrower standpipe.`,
    values: {
      inflowM3PerS: inflow,
      primingFlowM3PerS: bell.primingFlowM3PerS,
      cureInflowIncreaseM3PerS: cure,
      levelM: level,
    },
  };
}

function siphonLockEvent(
  bell: BellSiphonComponent,
  t: number,
  inflow: number,
  siphonAtBreak: number,
  level: number,
  detectedBy: string,
) {
  const cure = inflow - siphonAtBreak;
  return {
    t_s: t,
    kind: 'siphon-lock',
    where: bell.bedId,
    detail: `The siphon never breaks: the inflow ${perMin(inflow)} is at least the siphon's flow at the break level, ${perMin(siphonAtBreak)}, so the level holds at ${fmt(level)} m (found by ${detectedBy}). Cut the inflow by at least ${perMin(Math.max(cure, 0))}, or raise the intake.`,
    values: {
      inflowM3PerS: inflow,
      siphonFlowAtBreakM3PerS: siphonAtBreak,
      cureInflowDecreaseM3PerS: cure,
      levelM: level,
    },
  };
}
