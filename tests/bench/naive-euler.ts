import type { SystemModel } from '../../engine/index';

/**
 * A naive fixed-step explicit Euler integration of the same system model, for comparison only:
 * y ← y + h·f(y), events checked at step ends and switched there (no location), timed transitions
 * taken at the first step end at or after their time. Returns the number of steps.
 */
export function integrateNaiveEuler(model: SystemModel, durationS: number, stepS: number): number {
  const y = model.initialState();
  const f = new Float64Array(model.stateSize);
  const g = new Float64Array(model.eventCount);
  const armed = new Uint8Array(model.eventCount);
  model.transition(0, y, [], true);
  const rearm = (t: number): void => {
    model.eventValues(g, y, t);
    for (let i = 0; i < g.length; i += 1) armed[i] = (g[i] as number) > 0 ? 1 : 0;
  };
  rearm(0);
  let nextTimed = model.nextTimedTransitionS(0);
  let steps = 0;
  for (let t = 0; t < durationS;) {
    model.derivative(f, y, t);
    for (let i = 0; i < y.length; i += 1) y[i] = (y[i] as number) + stepS * (f[i] as number);
    t += stepS;
    steps += 1;
    model.eventValues(g, y, t);
    const fired: number[] = [];
    for (let i = 0; i < g.length; i += 1) {
      if (armed[i] === 1 && (g[i] as number) <= 0) fired.push(i);
      else if ((g[i] as number) > 0) armed[i] = 1;
    }
    const timed = t >= nextTimed;
    if (fired.length > 0 || timed) {
      model.transition(t, y, fired, timed);
      rearm(t);
      if (timed) nextTimed = model.nextTimedTransitionS(t);
    }
  }
  return steps;
}
