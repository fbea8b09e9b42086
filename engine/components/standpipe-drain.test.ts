import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario';
import { waterKinematicViscosityM2PerS } from '../hydraulics/water-properties';
import { SystemModel } from '../system/system-model';
import { bellSpillFlowM3PerS } from './bell-spill-flow';
import { siphonFullBoreFlowM3PerS } from './siphon-flow';
import type { StandpipeComponent } from './standpipe-drain';

/** The timer-driven standpipe example, its bed started above the standpipe top, drain pipe of `boreM`. */
function standpipeBed(boreM: number, headOverRimM: number): Scenario {
  const file = JSON.parse(
    readFileSync(join(import.meta.dirname, '../../scenarios/timer-standpipe-bed.json'), 'utf8'),
  );
  const bed = file.vessels[1];
  bed.drain.pipe.innerDiameter = boreM;
  bed.initialLevel = 0.22 + headOverRimM;
  const parsed = parseScenario(file);
  if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
  return parsed.scenario;
}

/** Mode and spill flow of the bed's standpipe after the model settles its modes at t = 0. */
function settled(scenario: Scenario): { pipeLimits: boolean; spillM3PerS: number } {
  const model = new SystemModel(scenario);
  const y = model.initialState();
  model.transition(0, y, [], false);
  const drain = model.parts.components.find(
    (c): c is StandpipeComponent => 'pipeLimits' in c && 'bedId' in c,
  );
  if (!drain) throw new Error('no standpipe');
  const channel = model.parts.channels.findIndex((c) => c.id === 'flow:bed.drain');
  const spill = model.flowsAt(y, 0).flowM3PerS[channel] as number;
  return { pipeLimits: drain.pipeLimits, spillM3PerS: spill };
}

describe('standpipe drain', () => {
  it('spills what the rim passes while the drain pipe can carry it, and the pipe capacity once it cannot', () => {
    const headOverRimM = 0.01;
    const wide = standpipeBed(0.0266, headOverRimM);
    const narrow = standpipeBed(0.004, headOverRimM);
    const wideDrain = wide.vessels[1]?.kind === 'bed' ? wide.vessels[1].drain : undefined;
    const narrowDrain = narrow.vessels[1]?.kind === 'bed' ? narrow.vessels[1].drain : undefined;
    if (wideDrain?.type !== 'standpipe' || narrowDrain?.type !== 'standpipe')
      throw new Error('expected standpipe drains');
    const rim = bellSpillFlowM3PerS(wideDrain.standpipe, headOverRimM);
    // Bed floor at 0.85 m, surface 0.23 m above it, outlet at 0.7 m.
    const dropM = 0.85 + 0.22 + headOverRimM - 0.7;
    const { friction } = wide.run;
    const wideCapacity = siphonFullBoreFlowM3PerS(
      wideDrain,
      dropM,
      friction,
      waterKinematicViscosityM2PerS(wide.water.temperature),
      wide.lossCoefficients,
    );
    const narrowCapacity = siphonFullBoreFlowM3PerS(
      narrowDrain,
      dropM,
      friction,
      waterKinematicViscosityM2PerS(narrow.water.temperature),
      narrow.lossCoefficients,
    );
    expect(wideCapacity).toBeGreaterThan(rim);
    expect(narrowCapacity).toBeLessThan(rim);

    const w = settled(wide);
    expect(w.pipeLimits).toBe(false);
    expect(w.spillM3PerS).toBeCloseTo(rim, 12);
    const n = settled(narrow);
    expect(n.pipeLimits).toBe(true);
    expect(Math.abs(n.spillM3PerS - narrowCapacity) / narrowCapacity).toBeLessThan(1e-7);
  });
});
