/**
 * The cycling inflow window solved from the flow balance, checked against brute force: sweeps and
 * bisections of full engine runs (2 h each) over the pump's flow, on beds of different geometry.
 */
import { describe, expect, it } from 'vitest';
import {
  bedRegime,
  cyclingInflowWindow,
  pumpDutyPoint,
  regimeAtInflow,
  simulate,
  type InflowWindow,
} from '../../engine/index';
import type { Scenario } from '../../shared/scenario';
import { oneBedSystem, withPumpFlowScale } from './one-bed-system';

const BED = 'bed';

/** The bed's steady inflow with the pump's flow scaled by `scale`, m³/s. */
function inflowAt(base: Scenario, scale: number): number {
  const scenario = withPumpFlowScale(base, scale);
  return pumpDutyPoint(scenario, scenario.pumps[0] as Scenario['pumps'][number]).flowM3PerS;
}

/** What the engine says the bed does over 2 h with the pump's flow scaled by `scale`. */
function engineRegime(base: Scenario, scale: number): string {
  const outcome = simulate(withPumpFlowScale(base, scale), { maxSamples: 2 });
  expect(outcome.status).toBe('completed');
  return bedRegime(outcome.result, BED) ?? 'no bed';
}

/** The pump flow scale at which the bed's inflow is `inflowM3PerS` (inflow is increasing in the scale). */
function scaleForInflow(base: Scenario, inflowM3PerS: number): number {
  let lo = 0.01;
  let hi = 20;
  for (let k = 0; k < 60; k += 1) {
    const mid = 0.5 * (lo + hi);
    if (inflowAt(base, mid) < inflowM3PerS) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

/**
 * Bisects the engine on the pump flow scale between `belowScale` (regime `below`) and `aboveScale`
 * (any other regime) until the inflows differ by less than 0.25 %; returns the boundary inflow.
 */
function bisectEngine(
  base: Scenario,
  belowScale: number,
  aboveScale: number,
  below: string,
): number {
  let lo = belowScale;
  let hi = aboveScale;
  expect(engineRegime(base, lo)).toBe(below);
  expect(engineRegime(base, hi)).not.toBe(below);
  while (inflowAt(base, hi) / inflowAt(base, lo) > 1.0025) {
    const mid = 0.5 * (lo + hi);
    if (engineRegime(base, mid) === below) lo = mid;
    else hi = mid;
  }
  return 0.5 * (inflowAt(base, lo) + inflowAt(base, hi));
}

/** Engine regimes on a geometric grid of inflows, skipping points within `margin` of a boundary. */
function sweepAgainstWindow(
  base: Scenario,
  window: InflowWindow,
  fromM3PerS: number,
  toM3PerS: number,
  points: number,
) {
  const margin = 0.03;
  const bounds = [
    window.primingInflowM3PerS,
    window.breakingInflowM3PerS,
    window.spillAtRimM3PerS,
    window.siphonAtRimM3PerS,
  ];
  const rows: { inflow: number; engine: string; predicted: string }[] = [];
  for (let k = 0; k < points; k += 1) {
    const inflow = fromM3PerS * (toM3PerS / fromM3PerS) ** (k / (points - 1));
    if (bounds.some((b) => Math.abs(inflow / b - 1) < margin)) continue;
    const scale = scaleForInflow(base, inflow);
    rows.push({
      inflow,
      engine: engineRegime(base, scale),
      predicted: regimeAtInflow(window, inflowAt(base, scale)),
    });
  }
  return rows;
}

const GEOMETRIES: { name: string; changes: Record<string, unknown> }[] = [
  { name: 'a 1-inch bell siphon on a short drain', changes: {} },
  {
    name: 'a 1-inch bell siphon with a 60 mm intake and a long drain with three elbows',
    changes: {
      'vessels[1].drain.bell.intakeHeight': '60 mm',
      'vessels[1].drain.pipe.length': '2.5 m',
      'vessels[1].drain.pipe.fittings.elbow90': 3,
    },
  },
  {
    name: 'a ¾-inch bell siphon in a 2-inch bell',
    changes: {
      'vessels[1].drain.standpipe': {
        innerDiameter: '20.9 mm',
        outerDiameter: '26.7 mm',
        height: '0.2 m',
      },
      'vessels[1].drain.bell': { innerDiameter: '52.5 mm', capGap: '20 mm', intakeHeight: '20 mm' },
      'vessels[1].drain.pipe.innerDiameter': '20.9 mm',
    },
  },
];

describe('the cycling inflow window against brute-force engine sweeps', () => {
  for (const geometry of GEOMETRIES) {
    describe(geometry.name, () => {
      const base = oneBedSystem(geometry.changes);
      const window = cyclingInflowWindow(base, BED) as InflowWindow;

      it('has a cycling range between the priming flow and the siphon flow at the break level', () => {
        expect(window.cyclingRange).not.toBeNull();
        expect(window.cyclingRange?.lowM3PerS).toBe(window.primingInflowM3PerS);
        expect(window.cyclingRange?.highM3PerS).toBe(window.breakingInflowM3PerS);
        expect(window.breakingInflowM3PerS).toBeGreaterThan(window.primingInflowM3PerS);
      });

      it('predicts the regime of every engine run on a sweep of inflows from half the lowest to 1.4× the highest', () => {
        const range = window.cyclingRange as { lowM3PerS: number; highM3PerS: number };
        const rows = sweepAgainstWindow(
          base,
          window,
          0.5 * range.lowM3PerS,
          1.4 * range.highM3PerS,
          14,
        );
        expect(rows.map((r) => r.engine)).toEqual(rows.map((r) => r.predicted));
        expect(new Set(rows.map((r) => r.engine))).toEqual(
          new Set(['spill-stall', 'cycling', 'siphon-lock']),
        );
      }, 120_000);

      it('places both boundaries within 0.5 % of where bisecting the engine finds them', () => {
        const range = window.cyclingRange as { lowM3PerS: number; highM3PerS: number };
        const low = bisectEngine(
          base,
          scaleForInflow(base, 0.9 * range.lowM3PerS),
          scaleForInflow(base, 1.1 * range.lowM3PerS),
          'spill-stall',
        );
        const mid = Math.sqrt(range.lowM3PerS * range.highM3PerS);
        const high = bisectEngine(
          base,
          scaleForInflow(base, mid),
          scaleForInflow(base, 1.1 * range.highM3PerS),
          'cycling',
        );
        expect(Math.abs(low / range.lowM3PerS - 1)).toBeLessThan(0.005);
        expect(Math.abs(high / range.highM3PerS - 1)).toBeLessThan(0.005);
      }, 120_000);
    });
  }

  it('finds no cycling range when the rim stands too close above the standpipe, and the engine agrees', () => {
    const base = oneBedSystem({
      'vessels[1].height': '0.226 m',
      'vessels[1].media.depth': '0.2 m',
    });
    const window = cyclingInflowWindow(base, BED) as InflowWindow;
    expect(window.spillAtRimM3PerS).toBeLessThan(window.primingInflowM3PerS);
    expect(window.cyclingRange).toBeNull();
    expect(window.rimOverflowInflowM3PerS).toBe(window.spillAtRimM3PerS);
    const rows = sweepAgainstWindow(
      base,
      window,
      0.5 * window.spillAtRimM3PerS,
      2 * window.primingInflowM3PerS,
      8,
    );
    expect(rows.map((r) => r.engine)).toEqual(rows.map((r) => r.predicted));
    expect(new Set(rows.map((r) => r.engine))).toEqual(new Set(['spill-stall', 'rim-overflow']));
  }, 120_000);

  it('reports the pump delivery the engine measures as the bed inflow (within 0.5 %)', () => {
    const base = oneBedSystem();
    const window = cyclingInflowWindow(base, BED) as InflowWindow;
    const outcome = simulate(base, { maxSamples: 2 });
    const measured = outcome.result.summary.pumps[0]?.meanFlow_m3s ?? 0;
    expect(Math.abs(measured / window.inflowM3PerS - 1)).toBeLessThan(0.005);
    expect(window.regime).toBe(bedRegime(outcome.result, BED));
  });
});
