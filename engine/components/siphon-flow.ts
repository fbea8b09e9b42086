import type { BellSiphonDrain, Drain, LossCoefficients } from '../../shared/scenario/index';
import { SCENARIO_DEFAULTS } from '../../shared/scenario/scenario-defaults';
import { darcyWeisbachHeadLossM } from '../hydraulics/darcy-weisbach-loss';
import { flowForMonotoneHeadM3PerS } from '../hydraulics/flow-for-monotone-head';
import { hazenWilliamsHeadLossM } from '../hydraulics/hazen-williams-loss';
import { minorLossCoefficient } from '../hydraulics/minor-loss';
import type { FrictionModel } from '../hydraulics/pipe-run';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';

/**
 * One stretch of the flow path: its flow area, a constant loss coefficient at its own velocity,
 * and optionally a friction length on a (hydraulic) diameter.
 */
interface Section {
  areaM2: number;
  k: number;
  friction?: { lengthM: number; diameterM: number };
}

const disc = (diameterM: number): number => (Math.PI / 4) * diameterM * diameterM;

/** Borda–Carnot loss of a jet from area `small` into `large`, on the small area's velocity. */
const expansionK = (small: number, large: number): number =>
  small < large ? (1 - small / large) ** 2 : 0;

/** Where the flow enters: through the bell's slots (or spacer gap) and annulus, or the bare rim. */
function inletSections(drain: Drain, coefficients: LossCoefficients): Section[] {
  const boreM2 = disc(drain.standpipe.innerDiameter);
  if (drain.type !== 'bell-siphon') return [{ areaM2: boreM2, k: coefficients.entrance }];
  const { bell, standpipe } = drain;
  const intakeM2 =
    bell.slotCount !== undefined && bell.slotWidth !== undefined
      ? bell.slotCount * bell.slotWidth * bell.intakeHeight
      : Math.PI * bell.innerDiameter * bell.intakeHeight;
  const annulusM2 = disc(bell.innerDiameter) - disc(standpipe.outerDiameter);
  const gapM2 = Math.PI * standpipe.innerDiameter * bell.capGap;
  return [
    { areaM2: intakeM2, k: coefficients.entrance + expansionK(intakeM2, annulusM2) },
    {
      areaM2: annulusM2,
      k: 0,
      friction: {
        lengthM: standpipe.height,
        diameterM: bell.innerDiameter - standpipe.outerDiameter,
      },
    },
    {
      areaM2: boreM2,
      k: coefficients.bellReturn + (gapM2 < boreM2 ? (boreM2 / gapM2 - 1) ** 2 : 0),
    },
  ];
}

/**
 * The sections of a drain from the bed to its outlet: inlet (bell intake, annulus and the turn over
 * the rim, or a plain entrance), standpipe bore, the change to the drain pipe's bore (Borda–Carnot
 * expansion, or contraction K = 0.5·(1 − A₂/A₁)), and the drain pipe with its fittings.
 */
function drainSections(drain: Drain, coefficients: LossCoefficients): Section[] {
  const boreM2 = disc(drain.standpipe.innerDiameter);
  const pipeM2 = disc(drain.pipe.innerDiameter);
  const standpipe: Section = {
    areaM2: boreM2,
    k: expansionK(boreM2, pipeM2),
    friction: { lengthM: drain.standpipe.height, diameterM: drain.standpipe.innerDiameter },
  };
  const contraction = pipeM2 < boreM2 ? 0.5 * (1 - pipeM2 / boreM2) : 0;
  const pipe: Section = {
    areaM2: pipeM2,
    k: contraction + minorLossCoefficient(drain.pipe.fittings, coefficients),
    friction: { lengthM: drain.pipe.length, diameterM: drain.pipe.innerDiameter },
  };
  return [...inletSections(drain, coefficients), standpipe, pipe];
}

/** Head lost in one section at flow Q, m; friction on its hydraulic diameter at its own velocity. */
function sectionLossM(
  section: Section,
  drain: Drain,
  flow: number,
  model: FrictionModel,
  nu: number,
): number {
  const velocity = flow / section.areaM2;
  let loss = (section.k * velocity * velocity) / (2 * G);
  if (section.friction !== undefined && section.friction.lengthM > 0) {
    const { lengthM, diameterM } = section.friction;
    const equivalentFlow = velocity * disc(diameterM);
    loss +=
      model === 'hazen-williams'
        ? hazenWilliamsHeadLossM(lengthM, equivalentFlow, drain.pipe.hazenWilliamsC, diameterM)
        : darcyWeisbachHeadLossM(lengthM, diameterM, equivalentFlow, drain.pipe.roughness, nu);
  }
  return loss;
}

/**
 * Full-bore (primed) flow of a bed's drain, m³/s, from the energy balance between the bed surface
 * and the outlet (or the receiving surface when the outlet is submerged):
 * Δz = K_exit·v_p²/(2g) + m·Σ_sections (K_j + f_j·L_j/D_j)·v_j²/(2g),
 * with v_j = Q/A_j, m = `dischargeLossMultiplier`, the sections of `drainSections` (bell intake with
 * entrance K and its jet's expansion into the annulus, annulus friction on its hydraulic diameter,
 * the 180° turn over the rim and the jet through the cap gap, standpipe friction, bore change,
 * drain-pipe friction and fittings) and friction by the run's model (f and Q solved together, to
 * 1e-10). `headDropM` = Δz in m; 0 for Δz ≤ 0. `kinematicViscosityM2PerS` m²/s.
 * Valid for a primed siphon running full. Source: siphon-spillway blackwater flow
 * Q = C_d·A·√(2gH), C_d = (ΣK)^−½ (Novak, Moffat, Nalluri & Narayanan, Hydraulic Structures, 4th ed.,
 * 2007, §4.7.5); bell return as a 180° return bend (an analogy).
 */
export function siphonFullBoreFlowM3PerS(
  drain: Drain,
  headDropM: number,
  model: FrictionModel,
  kinematicViscosityM2PerS: number,
  coefficients: LossCoefficients = SCENARIO_DEFAULTS.lossCoefficients,
): number {
  if (!(headDropM > 0)) return 0;
  const sections = drainSections(drain, coefficients);
  const pipeM2 = disc(drain.pipe.innerDiameter);
  const multiplier = drain.dischargeLossMultiplier;
  const headAtFlow = (flow: number): number => {
    let losses = 0;
    for (const section of sections)
      losses += sectionLossM(section, drain, flow, model, kinematicViscosityM2PerS);
    const exitVelocity = flow / pipeM2;
    return (coefficients.exit * exitVelocity * exitVelocity) / (2 * G) + multiplier * losses;
  };
  let kOnPipe = coefficients.exit;
  for (const section of sections)
    kOnPipe += multiplier * section.k * (pipeM2 / section.areaM2) ** 2;
  const bound =
    kOnPipe > 0
      ? pipeM2 * Math.sqrt((2 * G * headDropM) / kOnPipe) * (1 + 1e-9)
      : Number.POSITIVE_INFINITY;
  return flowForMonotoneHeadM3PerS(headAtFlow, headDropM, bound);
}

/**
 * Spill flow over the standpipe rim at which the falling water seals the drain and the siphon
 * primes, m³/s: Q_prime = k_p·√(g·D_s⁵), D_s the standpipe bore (m), k_p the drain's priming
 * coefficient. No published value exists for bell siphons; the default k_p is an analogy with
 * vertical drain stacks, whose falling film closes into water plugs at 1/4–1/3 full (Wyly & Eaton,
 * NBS BMS 132, 1952; Dawson & Kalinske 1937), and calibration replaces it.
 */
export function primingFlowM3PerS(drain: BellSiphonDrain): number {
  return drain.primingCoefficient * Math.sqrt(G * drain.standpipe.innerDiameter ** 5);
}
