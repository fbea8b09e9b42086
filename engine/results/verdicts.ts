import type { Scenario } from '../../shared/scenario';
import { frictionPipes } from './friction-pipes';
import { hazenWilliamsRangeVerdicts } from './hazen-williams-range-verdicts';
import type { BedSummary, PumpSummary, Verdict, VesselSummary } from './run-result';

const PRACTICE = 'common practice';
const PRIMING_SOURCE =
  'model: priming at Q_prime = k_p·√(g·D_s⁵), k_p by analogy with drain stacks (Wyly & Eaton, NBS BMS 132, 1952); calibrate k_p from measured cycles';

/** Everything the design checks look at. */
export interface VerdictInputs {
  scenario: Scenario;
  beds: readonly BedSummary[];
  vessels: readonly VesselSummary[];
  pumps: readonly PumpSummary[];
  /** Water lost over rims and through overflows to "out", and through leaks, m³. */
  lostOverRimsM3: number;
  lostThroughOverflowsM3: number;
  lostThroughLeaksM3: number;
  durationS: number;
  massBalanceError: number;
  /** Water in the fish tanks at the start, m³. */
  tankVolumeM3: number;
}

/** The design checks of a run, each with its value, its limit and where the limit comes from. */
export function makeVerdicts(inputs: VerdictInputs): Verdict[] {
  return [
    ...bedVerdicts(inputs),
    ...vesselVerdicts(inputs),
    ...pumpVerdicts(inputs),
    ...lossVerdicts(inputs),
    ...modelVerdicts(inputs),
  ];
}

function bedVerdicts({ scenario, beds }: VerdictInputs): Verdict[] {
  return beds.flatMap((bed) => {
    const vessel = scenario.vessels.find((v) => v.id === bed.id);
    const bell = vessel?.kind === 'bed' && vessel.drain.type === 'bell-siphon';
    const regime: Verdict = {
      check: `${bed.id}: drains and refills`,
      status:
        bed.state === 'cycling' || (!bell && bed.state === 'flooded')
          ? 'ok'
          : bed.state === 'spill-stall' || bed.state === 'siphon-lock'
            ? 'fails'
            : 'warning',
      value: bed.state,
      limit: bell ? 'cycling' : 'cycling or flooded',
      source: bell ? PRIMING_SOURCE : PRACTICE,
    };
    if (!bell || bed.periodMean_s === null) return [regime];
    const minutes = bed.periodMean_s / 60;
    const period: Verdict = {
      check: `${bed.id}: cycle period (a few floods per hour)`,
      status: minutes >= 5 && minutes <= 60 ? 'ok' : 'warning',
      value: Number(minutes.toFixed(1)),
      limit: '5–60 min',
      source: PRACTICE,
    };
    return [regime, period];
  });
}

function vesselVerdicts({ scenario, vessels }: VerdictInputs): Verdict[] {
  return scenario.vessels.flatMap((vessel): Verdict[] => {
    const summary = vessels.find((v) => v.id === vessel.id);
    if (vessel.minLevel === undefined || summary === undefined) return [];
    return [
      {
        check: `${vessel.id}: stays above its fish-safe minimum level (m)`,
        status: summary.minLevel_m >= vessel.minLevel ? 'ok' : 'fails',
        value: round(summary.minLevel_m),
        limit: vessel.minLevel,
        source: `${PRACTICE} (minimum set by the designer)`,
      },
    ];
  });
}

function pumpVerdicts({ pumps, durationS, tankVolumeM3: tankVolume }: VerdictInputs): Verdict[] {
  const dry: Verdict[] = pumps.map((pump) => ({
    check: `${pump.id}: never runs dry (s dry)`,
    status: pump.dry_s > 0 ? 'fails' : 'ok',
    value: round(pump.dry_s),
    limit: 0,
    source: `${PRACTICE}: a pump running dry overheats, and the fish lose their circulation`,
  }));
  const pumpedPerHour = pumps.reduce((sum, p) => sum + p.meanFlow_m3s, 0) * 3600;
  if (tankVolume <= 0 || durationS <= 0) return dry;
  const turnover: Verdict = {
    check: 'fish-tank volume turned over per hour',
    status: pumpedPerHour / tankVolume >= 1 ? 'ok' : 'warning',
    value: round(pumpedPerHour / tankVolume),
    limit: 1,
    source:
      'FAO Fisheries and Aquaculture Technical Paper 589 (Somerville et al., 2014), ch. 8 (from memory)',
  };
  return [...dry, turnover];
}

function lossVerdicts(inputs: VerdictInputs): Verdict[] {
  const { scenario, lostOverRimsM3, lostThroughOverflowsM3, lostThroughLeaksM3 } = inputs;
  const verdicts: Verdict[] = [
    {
      check: 'no water spills over a rim (L)',
      status: lostOverRimsM3 > 0 ? 'fails' : 'ok',
      value: round(lostOverRimsM3 * 1000),
      limit: 0,
      source: PRACTICE,
    },
    {
      check: 'no water leaves through overflows to the outside (L)',
      status: lostThroughOverflowsM3 > 0 ? 'warning' : 'ok',
      value: round(lostThroughOverflowsM3 * 1000),
      limit: 0,
      source: PRACTICE,
    },
  ];
  if (scenario.leaks.length > 0) {
    verdicts.push({
      check: 'water lost through leaks (L)',
      status: lostThroughLeaksM3 > 0 ? 'warning' : 'ok',
      value: round(lostThroughLeaksM3 * 1000),
      limit: 0,
      source: PRACTICE,
    });
  }
  scenario.leaks.forEach((leak, k) => {
    const vessel = scenario.vessels.find((v) => v.id === leak.from);
    for (const pump of scenario.pumps.filter((p) => p.in === leak.from)) {
      const intakeM = (vessel?.floorElevation ?? 0) + pump.intakeHeight;
      verdicts.push({
        check: `leak[${k}] cannot drain ${leak.from} below the intake of ${pump.id} (elevation, m)`,
        status: leak.elevation >= intakeM ? 'ok' : 'warning',
        value: round(leak.elevation),
        limit: round(intakeM),
        source: `${PRACTICE}, no source: pipe penetrations above the pump intake`,
      });
    }
  });
  return verdicts;
}

function modelVerdicts({ scenario, massBalanceError }: VerdictInputs): Verdict[] {
  const verdicts: Verdict[] = [
    {
      check: 'water is conserved by the simulation (relative error)',
      status: massBalanceError < 1e-6 ? 'ok' : 'warning',
      value: massBalanceError,
      limit: 1e-6,
      source: 'conservation of mass (numerical check)',
    },
  ];
  const t = scenario.water.temperature;
  if (scenario.run.friction === 'hazen-williams') {
    verdicts.push({
      check: 'Hazen–Williams used within its range (water temperature, °C)',
      status: t >= 15 && t <= 25 ? 'ok' : 'warning',
      value: t,
      limit: '15–25',
      source:
        'Hazen–Williams is fitted to water near room temperature in larger pipes; Darcy–Weisbach is the default',
    });
    verdicts.push(...hazenWilliamsRangeVerdicts(frictionPipes(scenario)));
  }
  return verdicts;
}

function round(value: number): number {
  return Number(value.toPrecision(4));
}
