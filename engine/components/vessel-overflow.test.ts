import { describe, expect, it } from 'vitest';
import { parseScenario, type Overflow, type Scenario } from '../../shared/scenario';
import { STANDARD_GRAVITY_M_PER_S2 as G } from '../hydraulics/standard-gravity';
import { simulate } from '../index';
import { overflowControlHeadM, overflowFlowM3PerS } from './vessel-overflow';

const LENGTH_M = 1;
const WIDTH_M = 0.5;
const INVERT_M = 0.5;

/** A 1 × 0.5 m tank, 1 m tall, with a 50 mm overflow at 0.5 m spilling out of the system. */
function tank(initialLevelM: number): Scenario {
  const parsed = parseScenario({
    format: 'scenario/1',
    name: 'tank with an overflow',
    vessels: [
      {
        id: 'tank',
        kind: 'tank',
        shape: { type: 'box', length: LENGTH_M, width: WIDTH_M },
        height: 1,
        initialLevel: initialLevelM,
        overflow: { elevation: INVERT_M, diameter: 0.05, to: 'out' },
      },
    ],
    pumps: [],
    run: { outputInterval: 1 },
  });
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

const overflowOf = (scenario: Scenario): Overflow => {
  const overflow = scenario.vessels[0]?.overflow;
  if (!overflow) throw new Error('no overflow');
  return overflow;
};

describe('vessel overflow', () => {
  const overflow = overflowOf(tank(0.9));
  const controlM = overflowControlHeadM(overflow);

  it('changes from weir to orifice where both laws give the same flow', () => {
    const weir = overflowFlowM3PerS(overflow, controlM, false);
    const orifice = overflowFlowM3PerS(overflow, controlM, true);
    expect(Math.abs(weir - orifice) / orifice).toBeLessThan(1e-12);
    // Below it the weir is the smaller flow and controls; above it the orifice does.
    expect(overflowFlowM3PerS(overflow, 0.5 * controlM)).toBe(
      overflowFlowM3PerS(overflow, 0.5 * controlM, false),
    );
    expect(overflowFlowM3PerS(overflow, 2 * controlM)).toBe(
      overflowFlowM3PerS(overflow, 2 * controlM, true),
    );
    expect(overflowFlowM3PerS(overflow, 0)).toBe(0);
  });

  it('drains a tank through both regimes in the closed-form time', () => {
    // Box tank of area A falling under Q(H): orifice k_o·√H above the control head H*, weir
    // k_w·H^1.5 below it. Integrating A·dH/dt = −Q(H): from H₀ to H*, t₁ = 2A(√H₀ − √H*)/k_o;
    // from H* to H₁, t₂ = 2A(1/√H₁ − 1/√H*)/k_w (Torricelli's law and the weir law, e.g.
    // Streeter & Wylie, Fluid Mechanics, 8th ed., 1985, §§8.6–8.7).
    const areaM2 = LENGTH_M * WIDTH_M;
    const startHeadM = 0.4;
    const endHeadM = 0.2 * controlM;
    expect(startHeadM).toBeGreaterThan(controlM);
    const kOrifice =
      overflow.dischargeCoefficient * (Math.PI / 4) * overflow.diameter ** 2 * Math.sqrt(2 * G);
    const kWeir = overflow.weirCoefficient * overflow.diameter;
    const orificeS = (2 * areaM2 * (Math.sqrt(startHeadM) - Math.sqrt(controlM))) / kOrifice;
    const weirS = (2 * areaM2 * (1 / Math.sqrt(endHeadM) - 1 / Math.sqrt(controlM))) / kWeir;
    const outcome = simulate(tank(INVERT_M + startHeadM), {
      durationS: Math.ceil(orificeS + weirS),
    });
    expect(outcome.status).toBe('completed');
    // The change from orifice to weir is the one located event of the run (no kink in between).
    expect(outcome.result.stats.events).toBe(1);
    const levels =
      outcome.result.series.channels.find((channel) => channel.id === 'level:tank')?.values ?? [];
    const times = outcome.result.series.t_s;
    // The last sample on the output grid, and the head the closed form gives at its time.
    const lastS = times[times.length - 1] as number;
    expect(lastS).toBeGreaterThan(orificeS);
    const expectedHeadM =
      (1 / Math.sqrt(controlM) + (kWeir * (lastS - orificeS)) / (2 * areaM2)) ** -2;
    const finalHeadM = (levels[levels.length - 1] as number) - INVERT_M;
    expect(Math.abs(finalHeadM - expectedHeadM) / expectedHeadM).toBeLessThan(1e-6);
    // And at a sample in the orifice regime: H = (√H₀ − k_o·t/(2A))².
    const early = times.findIndex((t) => t > 0.5 * orificeS);
    const earlyHeadM =
      (Math.sqrt(startHeadM) - (kOrifice * (times[early] as number)) / (2 * areaM2)) ** 2;
    expect(Math.abs((levels[early] as number) - INVERT_M - earlyHeadM) / earlyHeadM).toBeLessThan(
      1e-6,
    );
  });
});
