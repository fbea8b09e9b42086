import { formatSignificant as fmt } from '../results/format-significant';
import { switchDue, type ModelContext, type SwitchInput } from '../system/model-context';
import type { PumpLineComponent } from './pump-line';

/**
 * Restart margin above the pump intake after running dry, m: the level must be back 10 mm above
 * the intake (plus the water needed to refill an empty line) before the pump runs again. Common
 * practice, no source: it keeps a pump at the edge of its intake from chattering.
 */
export const DRY_RESTART_MARGIN_M = 0.01;

/** Height of the destination surface above outlet i, m (negative when the outlet is clear). */
export function submergenceM(c: PumpLineComponent, ctx: ModelContext, i: number): number {
  const outlet = c.pump.outlets[i];
  const wired = c.wiring.outlets[i];
  if (outlet === undefined || wired === undefined) return -Infinity;
  return (ctx.surfaceM[wired.destination.index] as number) - outlet.elevation;
}

/** Source volume above which the pump may (re)start, m³: intake + margin, plus refilling an empty line. */
export function startVolumeM3(c: PumpLineComponent, marginM: number): number {
  const geometry = c.wiring.source.geometry;
  return (
    geometry.volumeAtLevelM3(c.pump.intakeHeight + marginM) + (c.lineFull ? 0 : c.lineVolumeM3)
  );
}

/** Sets the dry flag and keeps the dry-time total. */
function setDry(c: PumpLineComponent, dry: boolean, timeS: number): void {
  if (dry === c.dry) return;
  if (dry) c.drySinceS = timeS;
  else c.dryTotalS += timeS - c.drySinceS;
  c.dry = dry;
}

const DRY = 0;
const RESTART = 1;
const SIPHON_END = 2;

/**
 * Applies a pump line's switches at one instant, in this order: commanded/power/float changes,
 * running dry, restarting, the end of a back-siphon. Each switch conditions on a strict inequality
 * unless its event fired, so the pump cannot flip back and forth at one instant.
 */
export function switchPumpLine(c: PumpLineComponent, input: SwitchInput): boolean {
  const wants = c.commandedOn && c.wiring.power.on && c.floatStops === 0;
  if (wants !== c.wanted) {
    c.wanted = wants;
    logCommand(c, input, wants);
    if (!wants) {
      setDry(c, false, input.ctx.timeS);
      if (c.running) stop(c, input);
      return true;
    }
    tryStart(c, input, 'pump-on');
    return true;
  }
  if (!wants) return endBackSiphon(c, input);
  return switchWhileWanted(c, input);
}

function switchWhileWanted(c: PumpLineComponent, input: SwitchInput): boolean {
  const { ctx, fired, state } = input;
  const o = c.eventOffset;
  const source = c.wiring.source;
  if (
    c.running &&
    switchDue(fired, o + DRY, (ctx.levelM[source.index] as number) - c.pump.intakeHeight)
  ) {
    setDry(c, true, ctx.timeS);
    input.log({
      t_s: ctx.timeS,
      kind: 'pump-dry',
      where: c.id,
      detail: `The level in ${source.vessel.id} fell to the pump intake (${fmt(c.pump.intakeHeight)} m above its floor): the pump runs dry and delivers nothing.`,
      values: { intakeHeightM: c.pump.intakeHeight },
    });
    stop(c, input);
    return true;
  }
  if (
    !c.running &&
    c.dry &&
    switchDue(
      fired,
      o + RESTART,
      startVolumeM3(c, DRY_RESTART_MARGIN_M) - (state[source.index] as number),
    )
  ) {
    tryStart(c, input, 'pump-restart');
    return true;
  }
  return endBackSiphon(c, input);
}

/** Starts the pump when the source holds enough water above the intake (to refill the line); else it is dry. */
function tryStart(
  c: PumpLineComponent,
  input: SwitchInput,
  kind: 'pump-on' | 'pump-restart',
): void {
  const { state, ctx } = input;
  const source = c.wiring.source;
  const sourceVolume = state[source.index] as number;
  const margin = kind === 'pump-restart' ? DRY_RESTART_MARGIN_M : 0;
  if (!(sourceVolume > startVolumeM3(c, margin))) {
    if (!c.dry) {
      setDry(c, true, ctx.timeS);
      input.log({
        t_s: ctx.timeS,
        kind: 'pump-dry',
        where: c.id,
        detail: `The pump cannot start: ${source.vessel.id} holds too little water above the intake (${fmt(c.pump.intakeHeight)} m) to fill the line.`,
        values: { intakeHeightM: c.pump.intakeHeight },
      });
    }
    return;
  }
  if (!c.lineFull) {
    state[source.index] = sourceVolume - c.lineVolumeM3;
    state[c.wiring.heldIndex] = (state[c.wiring.heldIndex] as number) + c.lineVolumeM3;
    c.lineFull = true;
  }
  setDry(c, false, ctx.timeS);
  c.backSiphoning = false;
  c.running = true;
  if (kind === 'pump-restart') {
    input.log({
      t_s: ctx.timeS,
      kind,
      where: c.id,
      detail: `${source.vessel.id} is back above the intake plus ${fmt(DRY_RESTART_MARGIN_M * 1000)} mm: the pump runs again.`,
    });
  }
}

/** Stops the pump; without a check valve the line drains back, or back-siphons through a drowned outlet. */
function stop(c: PumpLineComponent, input: SwitchInput): void {
  c.running = false;
  if (c.pump.checkValve || !c.lineFull) return;
  if (c.outletsSubmerged(input.ctx)) {
    c.backSiphoning = true;
    input.log({
      t_s: input.ctx.timeS,
      kind: 'back-siphon-start',
      where: c.id,
      detail: `The outlets are under water and there is no check valve: water siphons back through the stopped pump into ${c.wiring.source.vessel.id}.`,
    });
    return;
  }
  drainBack(c, input);
}

/** The water in the pipes runs back into the source through the pump. */
function drainBack(c: PumpLineComponent, input: SwitchInput): void {
  const { state } = input;
  const held = state[c.wiring.heldIndex] as number;
  state[c.wiring.heldIndex] = 0;
  state[c.wiring.source.index] = (state[c.wiring.source.index] as number) + held;
  c.lineFull = false;
}

function endBackSiphon(c: PumpLineComponent, input: SwitchInput): boolean {
  if (!c.backSiphoning) return false;
  let g = Infinity;
  for (let i = 0; i < c.pump.outlets.length; i += 1) g = Math.min(g, submergenceM(c, input.ctx, i));
  if (!(g < 0 || (g <= 0 && input.fired[c.eventOffset + SIPHON_END] === 1))) return false;
  c.backSiphoning = false;
  drainBack(c, input);
  input.log({
    t_s: input.ctx.timeS,
    kind: 'back-siphon-end',
    where: c.id,
    detail:
      'An outlet is clear of the water again: air enters and the back-siphon stops; the line drains back.',
  });
  return true;
}

function logCommand(c: PumpLineComponent, input: SwitchInput, wants: boolean): void {
  const reason = !c.wiring.power.on
    ? 'power cut'
    : !c.commandedOn
      ? 'switched off by the schedule'
      : c.floatStops > 0
        ? 'held off by a float switch'
        : 'switched on';
  const detail = wants ? 'The pump is switched on.' : `The pump stops: ${reason}.`;
  input.log({ t_s: input.ctx.timeS, kind: wants ? 'pump-on' : 'pump-off', where: c.id, detail });
}
