import type { Fittings, LossCoefficients } from '../../shared/scenario/index';

/**
 * Sum of the minor-loss coefficients of a pipe's fittings, dimensionless: ΣK = Σ count·K, with K per
 * fitting from the scenario's table (defaults: screwed fittings from the equivalent lengths of ICC
 * 2018 IRC App. A Table A.2.2; ball valve open from Crane TP-410; see SCENARIO_DEFAULTS).
 * The loss is ΣK·v²/(2g) at the pipe's velocity.
 */
export function minorLossCoefficient(fittings: Fittings, coefficients: LossCoefficients): number {
  return (
    fittings.elbow90 * coefficients.elbow90 +
    fittings.elbow45 * coefficients.elbow45 +
    fittings.teeRun * coefficients.teeRun +
    fittings.teeBranch * coefficients.teeBranch +
    fittings.ballValve * coefficients.ballValve
  );
}

/**
 * Loss coefficient of a valve opened to a fraction `opening` (0–1) of its flow area, based on the
 * pipe velocity: K = K_open + (1/(C_c·s) − 1)², the Borda–Carnot loss of the jet leaving the
 * restriction, with Weisbach's contraction coefficient C_c = 0.63 + 0.37·s³ (s = opening; C_c = 1
 * fully open, so K = K_open). Infinite when closed. Valid as an estimate for a throttled ball or gate
 * valve taken as a thin orifice; real valves differ with their trim (from memory: Weisbach's C_c
 * fit; the orifice-in-pipe Borda–Carnot form is in Idelchik, Handbook of Hydraulic Resistance).
 */
export function ballValveK(opening: number, openK: number): number {
  if (opening <= 0) return Number.POSITIVE_INFINITY;
  const s = Math.min(opening, 1);
  const contraction = 0.63 + 0.37 * s * s * s;
  const jet = 1 / (contraction * s) - 1;
  return openK + jet * jet;
}
