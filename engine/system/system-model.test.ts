import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseScenario, type Scenario } from '../../shared/scenario';
import { SystemModel } from './system-model';

function load(name: string): Scenario {
  const parsed = parseScenario(
    JSON.parse(readFileSync(join(__dirname, '../../scenarios', name), 'utf8')),
  );
  if (!parsed.success) throw new Error(name);
  return parsed.scenario;
}

/** A deterministic pseudo-random sequence in [0, 1) (Park–Miller). */
function random(seed: number): () => number {
  let state = seed;
  return () => {
    state = (state * 48271) % 2147483647;
    return state / 2147483647;
  };
}

describe('SystemModel', () => {
  it('moves water only between water components: the water rates sum to zero at any state', () => {
    const model = new SystemModel(load('greenhouse-three-beds.json'));
    const y = model.initialState();
    model.transition(0, y, [], true);
    const next = random(7);
    const dy = new Float64Array(model.stateSize);
    for (let trial = 0; trial < 50; trial += 1) {
      const state = Float64Array.from(y);
      for (const vessel of model.parts.vessels)
        state[vessel.index] = next() * vessel.geometry.rimVolumeM3;
      model.derivative(dy, state, trial);
      let sum = 0;
      let scale = 0;
      for (const index of model.parts.layout.waterIndices) {
        sum += dy[index] as number;
        scale += Math.abs(dy[index] as number);
      }
      expect(scale).toBeGreaterThan(0);
      expect(Math.abs(sum)).toBeLessThanOrEqual(1e-15 * scale);
    }
  });

  it('holds a brimful vessel at its rim and sends the surplus to its rim sink', () => {
    const parsed = parseScenario({
      format: 'scenario/1',
      name: 'pump into a full tank',
      vessels: [
        {
          id: 'low',
          kind: 'tank',
          shape: { type: 'box', length: 1, width: 1 },
          height: 1,
          initialLevel: 0.8,
        },
        {
          id: 'high',
          kind: 'tank',
          shape: { type: 'box', length: 0.5, width: 0.5 },
          floorElevation: 1.2,
          height: 0.4,
          initialLevel: 0.4,
        },
      ],
      pumps: [
        {
          id: 'p',
          in: 'low',
          maxHead: 3,
          maxFlow: '1000 L/h',
          main: { length: 1, innerDiameter: 0.02 },
          outlets: [{ to: 'high', elevation: 1.7, pipe: { length: 1, innerDiameter: 0.02 } }],
        },
      ],
    });
    if (!parsed.success) throw new Error(JSON.stringify(parsed.issues));
    const model = new SystemModel(parsed.scenario);
    const y = model.initialState();
    model.transition(0, y, [], true);
    const high = model.parts.vessels[1];
    if (!high) throw new Error('no vessel');
    y[high.index] = high.geometry.rimVolumeM3 * (1 + 1e-12);
    model.transition(0, y, [high.eventOffset], false);
    expect(high.brimful).toBe(true);
    expect(y[high.index]).toBe(high.geometry.rimVolumeM3);
    const dy = new Float64Array(model.stateSize);
    model.derivative(dy, y, 0);
    expect(Math.abs(dy[high.index] as number)).toBeLessThan(1e-18);
    expect(dy[high.rimSinkIndex]).toBeGreaterThan(0);
    expect(dy[high.rimSinkIndex]).toBeCloseTo(-(dy[0] as number), 15);
  });

  it('serves flows at a state from its cache only while the modes are unchanged', () => {
    const model = new SystemModel(load('tabletop-classroom.json'));
    const y = model.initialState();
    model.transition(0, y, [], true);
    const dy = new Float64Array(model.stateSize);
    model.derivative(dy, y, 5);
    const first = Array.from(model.flowsAt(y, 5).flowM3PerS);
    const pump = model.parts.pumps[0];
    if (!pump) throw new Error('no pump');
    pump.commandedOn = false;
    model.transition(5, y, [], false);
    const second = Array.from(model.flowsAt(y, 5).flowM3PerS);
    expect(first.some((q) => q > 0)).toBe(true);
    expect(second.every((q) => q === 0)).toBe(true);
  });

  it('gives the same event values from its cached evaluation as from a fresh one, even when the evaluated array was reused since', () => {
    const scenario = load('greenhouse-three-beds.json');
    const cached = new SystemModel(scenario);
    const fresh = new SystemModel(scenario);
    const y = cached.initialState();
    cached.transition(0, y, [], true);
    fresh.transition(0, Float64Array.from(y), [], true);
    const next = random(11);
    const reused = new Float64Array(cached.stateSize);
    const dy = new Float64Array(cached.stateSize);
    const fromCache = new Float64Array(cached.eventCount);
    const expected = new Float64Array(fresh.eventCount);
    for (let trial = 0; trial < 20; trial += 1) {
      const state = Float64Array.from(y);
      for (const vessel of cached.parts.vessels)
        state[vessel.index] = next() * vessel.geometry.rimVolumeM3;
      reused.set(state);
      cached.derivative(dy, reused, trial);
      reused.fill(0); // the stepper reuses its stage arrays
      cached.eventValues(fromCache, state, trial);
      fresh.eventValues(expected, Float64Array.from(state), trial);
      expect(Array.from(fromCache)).toEqual(Array.from(expected));
    }
  });
});
