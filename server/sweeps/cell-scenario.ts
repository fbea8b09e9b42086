/** The scenario of one sweep cell: the system's scenario with the cell's values written in. */
import type { SweepAxis, SweepParameters } from '../../shared/contracts/sweeps';
import { formatIssuePath, type Scenario } from '../../shared/scenario/index';
import { checkScenarioRules } from '../../shared/scenario/check-scenario-rules';
import { SWEEP_PARAMETER_HANDLERS } from './sweep-parameter-handlers';

/** Value number `i` of an axis (0 … steps−1), evenly spaced with both ends included. */
export function axisValue(axis: Pick<SweepAxis, 'from' | 'to' | 'steps'>, i: number): number {
  if (i === axis.steps - 1) return axis.to;
  return axis.from + ((axis.to - axis.from) * i) / (axis.steps - 1);
}

/** Number of cells of a sweep: the product of the axes' steps. */
export function cellCount(parameters: Pick<SweepParameters, 'axes'>): number {
  return parameters.axes.reduce((n, axis) => n * axis.steps, 1);
}

/** The axis values of cell `index` = i + steps₀·j, in axis order. */
export function cellValues(parameters: Pick<SweepParameters, 'axes'>, index: number): number[] {
  const [first, second] = parameters.axes;
  if (!first) return [];
  const i = index % first.steps;
  const values = [axisValue(first, i)];
  if (second) values.push(axisValue(second, Math.floor(index / first.steps)));
  return values;
}

/** A value in words a builder reads: "×1.2", "60 % open", "120 mm", "400 L". */
export function describeAxisValue(axis: Pick<SweepAxis, 'parameter'>, value: number): string {
  const round = (x: number): number => Number(x.toPrecision(4));
  if (axis.parameter === 'pump-flow-scale') return `×${round(value)}`;
  if (axis.parameter === 'valve-opening') return `${round(value * 100)} % open`;
  if (axis.parameter === 'vessel-volume') return `${round(value * 1000)} L`;
  return `${round(value * 1000)} mm`;
}

/** A cell's scenario, or why its values make an impossible system. */
export type CellScenario = { scenario: Scenario } | { problem: string };

/**
 * The scenario of cell `index`: `base` with each axis's value written in, the run lasting the
 * sweep's duration, and the name saying which cell it is. Values that break a cross-field rule of
 * the scenario format (an intake above the standpipe, a standpipe taller than its bed...) give the
 * first broken rule as `problem`.
 */
export function cellScenario(
  base: Scenario,
  parameters: SweepParameters,
  index: number,
): CellScenario {
  const values = cellValues(parameters, index);
  let scenario = base;
  parameters.axes.forEach((axis, k) => {
    scenario = SWEEP_PARAMETER_HANDLERS[axis.parameter].write(scenario, axis, values[k] as number);
  });
  const [issue] = checkScenarioRules(scenario);
  if (issue) return { problem: `${formatIssuePath(issue.path)}: ${issue.message}` };
  const where = parameters.axes
    .map((axis, k) => `${axis.label} ${describeAxisValue(axis, values[k] as number)}`)
    .join(', ');
  return {
    scenario: {
      ...scenario,
      name: `${base.name} (window cell: ${where})`.slice(0, 200),
      run: { ...scenario.run, duration: parameters.durationS },
    },
  };
}
