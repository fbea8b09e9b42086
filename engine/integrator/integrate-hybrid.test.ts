import { describe, expect, it } from 'vitest';
import { makeCashKarpStepper } from './cash-karp-stepper';
import type { HybridSystem, TrajectoryObserver } from './hybrid-system';
import { integrateHybrid } from './integrate-hybrid';
import type { IntegrateSettings } from './integrate-settings';

function settings(overrides: Partial<IntegrateSettings> = {}): IntegrateSettings {
  return {
    startS: 0,
    endS: 10,
    relativeTolerance: 1e-10,
    errorFloor: new Float64Array([1e-6]),
    maxStepS: 1,
    initialStepS: 1e-3,
    eventToleranceFraction: 1e-6,
    maxSteps: 1e6,
    maxTransitionsAtOneInstant: 20,
    ...overrides,
  };
}

/** Fills towards 1 (y' = 1 − y) until y reaches 0.8, then decays (y' = −y) until 0.2: period 2·ln 4. */
function relaxationOscillator(log: number[]): HybridSystem {
  let filling = true;
  return {
    stateSize: 1,
    eventCount: 1,
    derivative: (out, y) => {
      out[0] = filling ? 1 - (y[0] as number) : -(y[0] as number);
    },
    eventValues: (out, y) => {
      out[0] = filling ? 0.8 - (y[0] as number) : (y[0] as number) - 0.2;
    },
    nextTimedTransitionS: () => Infinity,
    transition: (timeS, _y, fired) => {
      if (fired.length === 0) return;
      filling = !filling;
      log.push(timeS);
    },
  };
}

const silent: TrajectoryObserver = {
  onSegment: () => {},
  beforeTransition: () => {},
  afterTransition: () => {},
};

describe('Cash–Karp stepper', () => {
  it('converges with fifth order at a fixed step on y′ = −2ty', () => {
    const errorAt = (stepS: number): number => {
      const stepper = makeCashKarpStepper(
        (out, y, t) => {
          out[0] = -2 * t * (y[0] as number);
        },
        1,
        {
          relativeTolerance: 1e10,
          errorFloor: new Float64Array(1),
          maxStepS: stepS,
          initialStepS: stepS,
        },
      );
      stepper.reset(0, new Float64Array([1]), undefined, stepS);
      while (stepper.timeS < 2) stepper.step(2);
      return Math.abs((stepper.state[0] as number) - Math.exp(-4));
    };
    const order = Math.log2(errorAt(0.05) / errorAt(0.025));
    expect(order).toBeGreaterThan(4.6);
    expect(order).toBeLessThan(5.4);
  });
});

describe('integrateHybrid', () => {
  it('locates switching times of a relaxation oscillator to within 1e-7 s of the analytic ones', () => {
    const log: number[] = [];
    const outcome = integrateHybrid(
      relaxationOscillator(log),
      new Float64Array([0.2]),
      settings(),
      silent,
    );
    expect(outcome.status).toBe('completed');
    const half = Math.log(4);
    expect(log.length).toBe(7);
    log.forEach((timeS, k) => expect(Math.abs(timeS - (k + 1) * half)).toBeLessThan(1e-7));
  });

  it('stops exactly at timed transitions and lets the model act there', () => {
    let rate = 1;
    const times: number[] = [];
    const system: HybridSystem = {
      stateSize: 1,
      eventCount: 0,
      derivative: (out) => {
        out[0] = rate;
      },
      eventValues: () => {},
      nextTimedTransitionS: (afterS) => (afterS < 2.5 ? 2.5 : Infinity),
      transition: (timeS, _y, _fired, timed) => {
        if (timed && timeS === 2.5) rate = -3;
        times.push(timeS);
      },
    };
    const y = new Float64Array([0]);
    let last = Number.NaN;
    const outcome = integrateHybrid(system, y, settings({ endS: 4 }), {
      onSegment: (seg) => {
        last = seg.y1[0] as number;
      },
      beforeTransition: () => {},
      afterTransition: () => {},
    });
    expect(outcome.status).toBe('completed');
    expect(times).toEqual([0, 2.5]);
    expect(last).toBeCloseTo(2.5 - 3 * 1.5, 12);
  });

  it('reports contiguous segments that end at the requested end time', () => {
    const starts: number[] = [];
    const ends: number[] = [];
    integrateHybrid(relaxationOscillator([]), new Float64Array([0.2]), settings({ endS: 3 }), {
      onSegment: (seg) => {
        starts.push(seg.t0S);
        ends.push(seg.t1S);
      },
      beforeTransition: () => {},
      afterTransition: () => {},
    });
    for (let k = 1; k < starts.length; k += 1) expect(starts[k]).toBe(ends[k - 1]);
    expect(ends[ends.length - 1]).toBe(3);
  });

  it('fails with the time reached when the derivative turns NaN', () => {
    const system: HybridSystem = {
      stateSize: 1,
      eventCount: 0,
      derivative: (out, _y, t) => {
        out[0] = t > 1.5 ? Number.NaN : 1;
      },
      eventValues: () => {},
      nextTimedTransitionS: () => Infinity,
      transition: () => {},
    };
    const outcome = integrateHybrid(system, new Float64Array([0]), settings(), silent);
    expect(outcome.status).toBe('failed');
    expect(outcome.endS).toBeLessThanOrEqual(1.5);
    if (outcome.status === 'failed') expect(outcome.reason).toMatch(/NaN|not finite/);
  });

  it('keeps an event that is already past after a transition disarmed, so a sliding surface does not chatter', () => {
    let up = false;
    let flips = 0;
    const system: HybridSystem = {
      stateSize: 1,
      eventCount: 1,
      derivative: (out) => {
        out[0] = up ? 1 : -1;
      },
      eventValues: (out, y) => {
        out[0] = up ? -(y[0] as number) : (y[0] as number);
      },
      nextTimedTransitionS: () => Infinity,
      transition: (_t, _y, fired) => {
        if (fired.length === 0) return;
        up = !up;
        flips += 1;
      },
    };
    const outcome = integrateHybrid(system, new Float64Array([1]), settings(), silent);
    expect(outcome.status).toBe('completed');
    expect(flips).toBeLessThanOrEqual(10);
  });

  it('ends as failed when a model re-arms its event at once after every transition', () => {
    const system: HybridSystem = {
      stateSize: 1,
      eventCount: 1,
      derivative: (out) => {
        out[0] = -1;
      },
      eventValues: (out, y) => {
        out[0] = y[0] as number;
      },
      nextTimedTransitionS: () => Infinity,
      transition: (_t, y, fired) => {
        if (fired.length > 0) y[0] = 1e-300;
      },
    };
    const outcome = integrateHybrid(
      system,
      new Float64Array([1]),
      settings({ maxSteps: 100_000 }),
      silent,
    );
    expect(outcome.status).toBe('failed');
    expect(outcome.endS).toBeLessThan(2);
  });

  it('stops cooperatively when asked', () => {
    let polls = 0;
    const outcome = integrateHybrid(
      relaxationOscillator([]),
      new Float64Array([0.2]),
      settings({
        shouldStop: () => {
          polls += 1;
          return polls > 5;
        },
      }),
      silent,
    );
    expect(outcome.status).toBe('stopped');
    expect(outcome.endS).toBeGreaterThan(0);
    expect(outcome.endS).toBeLessThan(10);
  });

  it('counts steps, rejected steps, evaluations and events', () => {
    const outcome = integrateHybrid(
      relaxationOscillator([]),
      new Float64Array([0.2]),
      settings(),
      silent,
    );
    expect(outcome.stats.events).toBe(7);
    expect(outcome.stats.steps).toBeGreaterThan(7);
    expect(outcome.stats.rhsEvaluations).toBeGreaterThanOrEqual(5 * outcome.stats.steps);
    expect(outcome.stats.rejected).toBeGreaterThanOrEqual(0);
  });

  it('takes an event the step interpolant placed a little early without another full step past it', () => {
    // A draining tank, y′ = −√y from y = 1, reaches y = 0.1 at t = 2(1 − √0.1) (closed form of
    // Torricelli drainage). At this tolerance the cubic interpolant puts the crossing slightly
    // before the integrated one, so the first cut stops just short of the event.
    const eventS = 2 * (1 - Math.sqrt(0.1));
    let drained = false;
    const evaluatedAtS: number[] = [];
    let transitionS = Number.NaN;
    const system: HybridSystem = {
      stateSize: 1,
      eventCount: 1,
      derivative: (out, y, t) => {
        if (!drained) evaluatedAtS.push(t);
        out[0] = drained ? 0 : -Math.sqrt(Math.max(0, y[0] as number));
      },
      eventValues: (out, y) => {
        out[0] = drained ? 1 : (y[0] as number) - 0.1;
      },
      nextTimedTransitionS: () => Infinity,
      transition: (t, _y, fired) => {
        if (fired.length === 0) return;
        drained = true;
        transitionS = t;
      },
    };
    integrateHybrid(
      system,
      new Float64Array([1]),
      settings({ relativeTolerance: 1e-8, errorFloor: new Float64Array([1e-3]), maxStepS: 5 }),
      silent,
    );
    expect(Math.abs(transitionS - eventS)).toBeLessThan(1e-7);
    // The step that detected the event looks past it (its stages and end evaluation); a second
    // full step past it (another six evaluations) is the waste this guards against.
    const pastEvent = evaluatedAtS.filter((t) => t > transitionS + 1e-9);
    expect(pastEvent.length).toBeGreaterThan(0);
    expect(pastEvent.length).toBeLessThan(12);
  });
});
