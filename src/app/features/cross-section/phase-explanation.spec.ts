import greenhouseFile from '../../../../scenarios/greenhouse-three-beds.json';
import { parseScenario } from '../../../../shared/scenario';
import { buildCrossSectionScene } from './cross-section-scene';
import { explainPhase } from './phase-explanation';
import { SeriesReader } from './series-reader';

const parsed = parseScenario(greenhouseFile);
if (!parsed.success) throw new Error('The greenhouse example is invalid.');
const scenario = parsed.scenario;
const scene = buildCrossSectionScene(scenario);
const bed = scene.beds.find((b) => b.id === 'bed-north');
if (!bed || bed.drain.type !== 'bell-siphon') throw new Error('bed-north lost its bell siphon');
const bellDrain = bed.drain;
const G = 9.80665;

function reader(levelM: number, drainM3PerS: number, sumpLevelM = 0.3) {
  return new SeriesReader({
    t_s: [0, 100],
    channels: [
      { id: 'level:bed-north', values: [levelM, levelM] },
      { id: 'flow:bed-north.drain', values: [drainM3PerS, drainM3PerS] },
      { id: 'flow:sump-pump.outlet[1]', values: [2e-4, 2e-4] },
      { id: 'level:sump', values: [sumpLevelM, sumpLevelM] },
    ],
  });
}

const explain = (
  phase: 'filling' | 'spilling' | 'priming' | 'siphoning' | 'break',
  r: SeriesReader,
) =>
  explainPhase({
    scenario,
    bed,
    reader: r,
    reading: { phase, sinceS: 0 },
    timeS: 50,
    system: 'metric',
  });

describe('explainPhase', () => {
  it('explains spilling with the rim weir at the live head: C_w·π·D_o·H^1.5', () => {
    const headM = 0.004;
    const e = explain('spilling', reader(bed.drain.standpipe.height + headM, 1e-4));
    const { weirCoefficient: cw, outerDiameter: d } = bed.drain.standpipe;
    const litresPerMinute = cw * Math.PI * d * headM ** 1.5 * 60000;
    expect(e.law).toBe('weir over the standpipe rim');
    expect(e.substituted).toContain(`× ${Number(headM.toPrecision(3))}^1.5`);
    expect(e.substituted).toMatch(new RegExp(`= ${Number(litresPerMinute.toPrecision(3))} L/min$`));
    const spill = e.values.find((v) => v.symbol === 'Q/√(gD_i⁵)')?.value;
    const expected = 1e-4 / Math.sqrt(G * bed.drain.standpipe.innerDiameter ** 5);
    expect(Number(spill)).toBeCloseTo(expected, 2);
  });

  it('explains siphoning by the energy balance, with ΣK = 2gΔz/v² from the live flow', () => {
    const levelM = 0.2;
    const flow = 6e-4;
    const e = explain('siphoning', reader(levelM, flow));
    // The outlet (−0.2 m) is above the sump's surface (−0.75 + 0.3 m), so it runs free.
    const dropM = bed.floorM + levelM - bed.drain.outletElevation;
    const v = flow / ((Math.PI / 4) * bed.drain.pipe.innerDiameter ** 2);
    expect(e.law).toBe('energy balance, bed surface to outlet');
    expect(Number(e.values.find((x) => x.symbol === 'ΣK')?.value)).toBeCloseTo(
      (2 * G * dropM) / v ** 2,
      1,
    );
    // With the sump brimming over the outlet, the sump's surface is the tail water.
    const drowned = explain('siphoning', reader(levelM, flow, 0.65));
    expect(drowned.values.find((x) => x.symbol === 'Δz')?.value).toBe(
      `${Number((bed.floorM + levelM - (-0.75 + 0.65)).toPrecision(3))} m`,
    );
  });

  it('explains filling as storage: the rise is the inflow over the pore area', () => {
    const e = explain('filling', reader(0.1, 0));
    const area = 1.2 * 0.8;
    const rise = (2e-4 / (area * bed.media.porosity)) * 60000;
    expect(e.substituted).toMatch(new RegExp(`= ${Number(rise.toPrecision(3))} mm/min$`));
  });

  it('gives the priming flow k_p·√(g·D⁵) and the break level', () => {
    const priming = explain('priming', reader(0.26, 2e-4));
    const prime =
      bellDrain.primingCoefficient * Math.sqrt(G * bed.drain.standpipe.innerDiameter ** 5);
    expect(priming.substituted).toMatch(
      new RegExp(`= ${Number((prime * 60000).toPrecision(3))} L/min$`),
    );
    const broke = explain('break', reader(0.025, 0));
    expect(broke.values.find((v) => v.symbol === 'H_i')?.value).toBe('0.025 m');
  });
});
