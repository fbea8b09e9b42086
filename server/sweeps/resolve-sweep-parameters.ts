/** Turns a sweep request into stored parameters: SI values, checked targets, the current design. */
import type { FieldError } from '../../shared/contracts/api-error';
import {
  SWEEP_DEFAULT_DURATION_S,
  SWEEP_MAX_CELLS,
  SWEEP_MAX_DURATION_S,
  SWEEP_PARAMETER_DIMENSIONS,
  type StartSweepRequest,
  type SweepAxis,
  type SweepAxisRequest,
  type SweepParameters,
} from '../../shared/contracts/sweeps';
import { parseQuantity, type Scenario } from '../../shared/scenario/index';
import { badRequest } from '../http/http-error';
import { SWEEP_PARAMETER_HANDLERS } from './sweep-parameter-handlers';

function readValue(
  axis: SweepAxisRequest,
  key: 'from' | 'to',
  path: string,
  fields: FieldError[],
): number {
  const parsed = parseQuantity(
    axis[key],
    SWEEP_PARAMETER_DIMENSIONS[axis.parameter],
    `${path}.${key}`,
  );
  if (!parsed.success) {
    fields.push(parsed.issue);
    return Number.NaN;
  }
  if (!SWEEP_PARAMETER_HANDLERS[axis.parameter].accepts(parsed.value)) {
    const hint =
      axis.parameter === 'valve-opening'
        ? 'an open fraction above 0 and at most 1'
        : axis.parameter === 'pump-flow-scale'
          ? 'a factor above 0 and at most 10'
          : 'a value above 0';
    fields.push({ path: `${path}.${key}`, message: `Choose ${hint}.` });
  }
  return parsed.value;
}

function resolveAxis(
  scenario: Scenario,
  axis: SweepAxisRequest,
  index: number,
  fields: FieldError[],
): SweepAxis {
  const path = `axes[${index}]`;
  const handler = SWEEP_PARAMETER_HANDLERS[axis.parameter];
  const target = { target: axis.target, ...(axis.outlet !== undefined && { outlet: axis.outlet }) };
  let current: number | null = null;
  try {
    current = handler.read(scenario, target);
  } catch (error) {
    fields.push({
      path: `${path}.target`,
      message: error instanceof Error ? error.message : String(error),
    });
  }
  const from = readValue(axis, 'from', path, fields);
  const to = readValue(axis, 'to', path, fields);
  if (from === to)
    fields.push({ path: `${path}.to`, message: 'Give the axis two different ends.' });
  return {
    parameter: axis.parameter,
    ...target,
    from,
    to,
    steps: axis.steps,
    current,
    label: handler.label(target),
  };
}

function resolveBedId(
  scenario: Scenario,
  requested: string | undefined,
  fields: FieldError[],
): string {
  const beds = scenario.vessels.filter((v) => v.kind === 'bed');
  if (requested === undefined) {
    const first = beds[0];
    if (!first)
      fields.push({ path: 'bedId', message: 'This system has no bed to map; add one first.' });
    return first?.id ?? '';
  }
  if (!beds.some((b) => b.id === requested))
    fields.push({ path: 'bedId', message: `"${requested}" is not a bed of this system.` });
  return requested;
}

function resolveDurationS(value: StartSweepRequest['duration'], fields: FieldError[]): number {
  if (value === undefined) return SWEEP_DEFAULT_DURATION_S;
  const parsed = parseQuantity(value, 'time', 'duration');
  if (!parsed.success) {
    fields.push(parsed.issue);
    return Number.NaN;
  }
  if (!(parsed.value > 0) || parsed.value > SWEEP_MAX_DURATION_S) {
    fields.push({
      path: 'duration',
      message: `Choose a duration above 0 and at most ${SWEEP_MAX_DURATION_S / 3600} h per cell.`,
    });
  }
  return parsed.value;
}

/**
 * The stored parameters of a sweep request on `scenario` (the system's normalised scenario), or a
 * 400 naming every field at fault: unknown targets, values of the wrong kind or out of range, two
 * axes on the same parameter, too many cells, no bed to map.
 */
export function resolveSweepParameters(
  scenario: Scenario,
  request: StartSweepRequest,
): SweepParameters {
  const fields: FieldError[] = [];
  const axes = request.axes.map((axis, index) => resolveAxis(scenario, axis, index, fields));
  const [first, second] = request.axes;
  if (
    first &&
    second &&
    first.parameter === second.parameter &&
    first.target === second.target &&
    first.outlet === second.outlet
  ) {
    fields.push({
      path: 'axes[1].parameter',
      message: 'The two axes vary the same thing; choose a different parameter or part.',
    });
  }
  const cells = axes.reduce((n, axis) => n * axis.steps, 1);
  if (cells > SWEEP_MAX_CELLS)
    fields.push({
      path: 'axes',
      message: `A sweep has at most ${SWEEP_MAX_CELLS} cells; this one would have ${cells}.`,
    });
  const bedId = resolveBedId(scenario, request.bedId, fields);
  const durationS = resolveDurationS(request.duration, fields);
  if (fields.length > 0)
    throw badRequest(`The sweep has ${fields.length} problem(s) to fix.`, fields);
  return { axes, bedId, durationS };
}
