import {
  STANDARD_GRAVITY_M_PER_S2 as G,
  primingFlowM3PerS,
  spillNumber,
  torricelliOutflowM3PerS,
  weirFlowM3PerS,
} from '../../../../engine/index';
import {
  type Dimension,
  type Scenario,
  type UnitSystem,
  formatQuantity,
} from '../../../../shared/scenario';
import type { BedPhase, BedPhaseReading } from './bed-phase';
import type { SceneBed } from './cross-section-scene';
import type { SeriesReader } from './series-reader';

/** One live number of an explanation. */
export interface ExplainedValue {
  readonly symbol: string;
  readonly meaning: string;
  readonly value: string;
}

/** The physics of a bed's current phase: the law, its equation, the numbers now, in words. */
export interface PhaseExplanation {
  readonly bedId: string;
  readonly phase: BedPhase;
  /** The law in use: storage, weir, Torricelli, priming or energy balance. */
  readonly law: string;
  readonly equation: string;
  /** The equation with today's numbers put in (SI) and its result in the reader's units. */
  readonly substituted: string;
  readonly values: readonly ExplainedValue[];
  readonly words: string;
}

/** What an explanation reads. */
export interface ExplainInput {
  readonly scenario: Scenario;
  readonly bed: SceneBed;
  readonly reader: SeriesReader;
  readonly reading: BedPhaseReading;
  readonly timeS: number;
  readonly system: UnitSystem;
}

/** Three significant digits, for numbers put into an equation. */
const sig = (value: number): string =>
  Number.isFinite(value) ? String(Number(value.toPrecision(3))) : '–';

/** Explains what governs the bed at this moment, with the live numbers substituted. */
export function explainPhase(input: ExplainInput): PhaseExplanation {
  switch (input.reading.phase) {
    case 'filling':
      return explainFilling(input);
    case 'spilling':
      return explainSpilling(input);
    case 'priming':
      return explainPriming(input);
    case 'siphoning':
      return explainSiphoning(input);
    case 'break':
      return explainBreak(input);
  }
}

function context(input: ExplainInput) {
  const { reader, bed, timeS, system } = input;
  const show = (value: number, dimension: Dimension): string =>
    Number.isFinite(value) ? formatQuantity(value, dimension, system) : '–';
  const levelM = reader.valueAt(`level:${bed.id}`, timeS);
  const drainM3PerS = reader.valueAt(`flow:${bed.id}.drain`, timeS);
  return { show, levelM, drainM3PerS, base: { bedId: bed.id, phase: input.reading.phase } };
}

/** Flow into the bed from every pump outlet that feeds it, m³/s. */
function inflowM3PerS({ scenario, bed, reader, timeS }: ExplainInput): number {
  let total = 0;
  for (const pump of scenario.pumps) {
    pump.outlets.forEach((outlet, i) => {
      if (outlet.to !== bed.id) return;
      const flow = reader.valueAt(`flow:${pump.id}.outlet[${i}]`, timeS);
      if (Number.isFinite(flow)) total += flow;
    });
  }
  return total;
}

function explainFilling(input: ExplainInput): PhaseExplanation {
  const { show, levelM, base } = context(input);
  const { bed } = input;
  const inflow = inflowM3PerS(input);
  const porosity = levelM < bed.media.depth ? bed.media.porosity : 1;
  const rise = inflow / (bed.planAreaM2 * porosity);
  const weep = bed.drain.type === 'standpipe' ? bed.drain.weepHole : undefined;
  const weepFlow = weep
    ? torricelliOutflowM3PerS(weep.dischargeCoefficient, (Math.PI / 4) * weep.diameter ** 2, levelM)
    : 0;
  const net = (inflow - weepFlow) / (bed.planAreaM2 * porosity);
  return {
    ...base,
    law: weep ? 'storage, with a Torricelli weep hole' : 'storage (water balance)',
    equation: weep ? 'dh/dt = (Q_in − C_d·a·√(2gh)) / (A·φ)' : 'dh/dt = Q_in / (A·φ)',
    substituted: weep
      ? `= (${sig(inflow)} − ${sig(weepFlow)}) / (${sig(bed.planAreaM2)} × ${sig(porosity)}) = ${sig(net * 60000)} mm/min`
      : `= ${sig(inflow)} / (${sig(bed.planAreaM2)} × ${sig(porosity)}) = ${sig(rise * 60000)} mm/min`,
    values: [
      { symbol: 'Q_in', meaning: 'inflow from the pump', value: show(inflow, 'flow') },
      { symbol: 'A', meaning: 'bed plan area', value: show(bed.planAreaM2, 'area') },
      {
        symbol: 'φ',
        meaning: 'share of the depth that is water (media pores)',
        value: sig(porosity),
      },
      { symbol: 'h', meaning: 'level above the bed floor', value: show(levelM, 'length') },
    ],
    words:
      'Nothing leaves yet: every litre pumped in raises the water, faster where the media takes up room.',
  };
}

function explainSpilling(input: ExplainInput): PhaseExplanation {
  const { show, levelM, drainM3PerS, base } = context(input);
  const { standpipe } = input.bed.drain;
  const headM = Math.max(0, levelM - standpipe.height);
  const weir = weirFlowM3PerS(standpipe.weirCoefficient, Math.PI * standpipe.outerDiameter, headM);
  const boreAreaM2 = (Math.PI / 4) * standpipe.innerDiameter ** 2;
  const bore = torricelliOutflowM3PerS(standpipe.dischargeCoefficient, boreAreaM2, headM);
  const number = spillNumber(drainM3PerS, standpipe.innerDiameter);
  const kp = input.bed.drain.type === 'bell-siphon' ? input.bed.drain.primingCoefficient : NaN;
  return {
    ...base,
    law: weir <= bore ? 'weir over the standpipe rim' : 'Torricelli: the bore runs as an orifice',
    equation: weir <= bore ? 'Q = C_w · π·D_o · H^1.5' : 'Q = C_d · (π·D_i²/4) · √(2·g·H)',
    substituted:
      weir <= bore
        ? `= ${sig(standpipe.weirCoefficient)} × π × ${sig(standpipe.outerDiameter)} × ${sig(headM)}^1.5 = ${show(weir, 'flow')}`
        : `= ${sig(standpipe.dischargeCoefficient)} × ${sig(boreAreaM2)} × √(2 × ${sig(G)} × ${sig(headM)}) = ${show(bore, 'flow')}`,
    values: [
      { symbol: 'H', meaning: 'water above the standpipe top', value: show(headM, 'length') },
      { symbol: 'Q', meaning: 'spill down the drain', value: show(drainM3PerS, 'flow') },
      { symbol: 'Q/√(gD_i⁵)', meaning: 'spill number now', value: sig(number) },
      { symbol: 'k_p', meaning: 'spill number that primes the siphon', value: sig(kp) },
    ],
    words:
      'Water tips over the rim and falls down the drain as a film. When the spill number reaches k_p the falling water seals the pipe.',
  };
}

function explainPriming(input: ExplainInput): PhaseExplanation {
  const { show, base } = context(input);
  const { drain } = input.bed;
  const kp = drain.type === 'bell-siphon' ? drain.primingCoefficient : NaN;
  const prime = drain.type === 'bell-siphon' ? primingFlowM3PerS(drain) : NaN;
  const d = drain.standpipe.innerDiameter;
  return {
    ...base,
    law: 'priming threshold',
    equation: 'Q_prime = k_p · √(g · D_i⁵)',
    substituted: `= ${sig(kp)} × √(${sig(G)} × ${sig(d)}⁵) = ${show(prime, 'flow')}`,
    values: [
      {
        symbol: 'k_p',
        meaning: 'priming coefficient (an analogy with drain stacks; calibrate it)',
        value: sig(kp),
      },
      { symbol: 'D_i', meaning: 'standpipe bore', value: show(d, 'diameter') },
      { symbol: 'Q_prime', meaning: 'spill that seals the drain', value: show(prime, 'flow') },
    ],
    words:
      'The spill reached the priming flow: plugs of water close the drain, carry the bell’s air away, and the pipe starts to run full.',
  };
}

function explainSiphoning(input: ExplainInput): PhaseExplanation {
  const { show, levelM, drainM3PerS, base } = context(input);
  const { bed, reader, timeS } = input;
  const receiver = input.scenario.vessels.find((v) => v.id === bed.drain.to);
  const tailLevel = reader.valueAt(`level:${bed.drain.to}`, timeS);
  const tailM = Math.max(
    bed.drain.outletElevation,
    receiver && Number.isFinite(tailLevel) ? receiver.floorElevation + tailLevel : -Infinity,
  );
  const dropM = bed.floorM + levelM - tailM;
  const pipeAreaM2 = (Math.PI / 4) * bed.drain.pipe.innerDiameter ** 2;
  const velocity = drainM3PerS / pipeAreaM2;
  const sumK = (2 * G * dropM) / (velocity * velocity);
  return {
    ...base,
    law: 'energy balance, bed surface to outlet',
    equation: 'Δz = ΣK · v²/2g   ⇒   Q = A·√(2g·Δz / ΣK)',
    substituted: `= ${sig(pipeAreaM2)} × √(2 × ${sig(G)} × ${sig(dropM)} / ${sig(sumK)}) = ${show(drainM3PerS, 'flow')}`,
    values: [
      {
        symbol: 'Δz',
        meaning: 'bed surface above the outlet (or the water it runs into)',
        value: show(dropM, 'length'),
      },
      { symbol: 'v', meaning: 'speed in the drain pipe', value: `${sig(velocity)} m/s` },
      {
        symbol: 'ΣK',
        meaning: 'every loss together (slots, bell, bends, friction, exit)',
        value: sig(sumK),
      },
      { symbol: 'Q', meaning: 'drain flow', value: show(drainM3PerS, 'flow') },
    ],
    words:
      'The drain runs full: the whole height from the bed surface down to the outlet drives the water, so the bed empties many times faster than it filled.',
  };
}

function explainBreak(input: ExplainInput): PhaseExplanation {
  const { show, levelM, base } = context(input);
  const { bed } = input;
  const breakM = bed.breakLevelM ?? 0;
  return {
    ...base,
    law: 'siphon break at the slots',
    equation: 'h ≤ H_i   ⇒   air enters, Q falls to 0',
    substituted: `${sig(levelM)} m ≤ ${sig(breakM)} m`,
    values: [
      { symbol: 'h', meaning: 'level above the bed floor', value: show(levelM, 'length') },
      {
        symbol: 'H_i',
        meaning: 'top of the bell’s slots (break level)',
        value: show(breakM, 'length'),
      },
    ],
    words:
      'The water uncovered the slots: air rushes up the bell, the column in the standpipe falls away, and the bed starts filling again.',
  };
}
