import type { AttributeWriter } from './attribute-writer';
import { BREAK_SHOWN_S, type BedPhaseReading, PRIMING_SHOWN_S } from './bed-phase';
import type { CloseUpHandles } from './draw-close-up';
import { formatClock } from './format-clock';
import { PHASE_WORDS } from './phase-words';
import type { SceneFrame } from './scene-frame';
import type { BedHandles, PipeHandles, SceneHandles } from './scene-handles';
import { PAINT } from './scene-palette';
import type { SceneState } from './scene-sampler';

/** How the flow marks move: below `stillM3PerS` none show; speed and spacing follow the flow. */
const MARKS = {
  stillM3PerS: 1e-7,
  dashPx: 3,
  slowPxPerS: 14,
  fastPxPerS: 110,
  sparsePx: 26,
  densePx: 5,
};

/** What one frame paints, besides the state itself. */
export interface PaintContext {
  readonly frame: SceneFrame;
  readonly writer: AttributeWriter;
  /** Flow at which the marks are densest and fastest, m³/s. */
  readonly busiestM3PerS: number;
  /** Wall seconds since the last frame (0 when paused): how far the marks move. */
  readonly wallStepS: number;
  /** Each pipe's current mark offset, user units (carried from frame to frame). */
  readonly offsets: Float64Array;
  /** The priming coefficient of each bed's drain (NaN without a bell). */
  readonly primingCoefficients: readonly number[];
  readonly speed: number;
}

/** Paints the moving parts of the scene for one state; writes only attributes that changed. */
export function paintScene(handles: SceneHandles, state: SceneState, context: PaintContext): void {
  const { frame, writer } = context;
  handles.water.forEach(({ vessel, rect }, i) => {
    const level = Math.min(vessel.heightM, Math.max(0, state.levelsM[i] ?? 0)) || 0;
    writer.attr(rect, 'y', frame.py(vessel.floorM + level).toFixed(2));
    writer.attr(rect, 'height', (level * frame.pzPerM).toFixed(2));
  });
  handles.beds.forEach((bed, i) => paintBedState(bed, state, i, context));
  handles.pipes.forEach((pipe, i) => paintPipe(pipe, state, i, context));
  handles.pumps.forEach(({ body, state: text }, i) => {
    const pumpState = state.pumps[i] ?? 'off';
    const fill =
      pumpState === 'on' ? PAINT.pumpOn : pumpState === 'dry' ? PAINT.pumpDry : PAINT.pumpOff;
    writer.style(body, 'fill', fill);
    writer.style(body, 'stroke-dasharray', pumpState === 'dry' ? '3 2' : 'none');
    writer.text(
      text,
      pumpState === 'on' ? 'pump on' : pumpState === 'dry' ? 'pump dry!' : 'pump off',
    );
  });
  writer.text(handles.clock, `${formatClock(state.timeS, true)} · ${context.speed}×`);
}

/** One bed's drain parts and tag (phase, and the spill number against k_p while spilling). */
export function paintBedState(
  bed: BedHandles,
  state: SceneState,
  bedIndex: number,
  context: PaintContext,
): void {
  const reading = state.phases[bedIndex] ?? { phase: 'filling', sinceS: Infinity };
  paintBed(bed, reading, state.levelsM[bed.vesselIndex] || 0, context);
  const spill = state.spillNumbers[bedIndex] ?? Number.NaN;
  const kp = context.primingCoefficients[bedIndex] ?? Number.NaN;
  context.writer.text(bed.phaseText, PHASE_WORDS[reading.phase].label);
  context.writer.text(
    bed.spillText,
    Number.isFinite(spill) ? `spill number ${spill.toFixed(2)} / ${kp.toFixed(2)}` : '',
  );
}

/** Water inside the bell and the standpipe bore for the bed's phase. */
function paintBed(
  handles: BedHandles,
  reading: BedPhaseReading,
  levelM: number,
  context: PaintContext,
): void {
  const { bed } = handles;
  const { frame, writer } = context;
  const standpipeM = bed.drain.standpipe.height;
  const topM = bed.bellTopM ?? standpipeM;
  const primed = Math.min(1, reading.sinceS / PRIMING_SHOWN_S);
  const broken = Math.min(1, reading.sinceS / BREAK_SHOWN_S);
  const outside = Math.min(topM, Math.max(0, levelM));
  const inside = {
    filling: outside,
    spilling: outside,
    priming: outside + (topM - outside) * primed,
    siphoning: topM,
    break: topM - (topM - outside) * broken,
  }[reading.phase];
  if (handles.bellWater) {
    writer.attr(handles.bellWater, 'y', frame.py(bed.floorM + inside).toFixed(2));
    writer.attr(handles.bellWater, 'height', (inside * frame.pzPerM).toFixed(2));
  }
  const boreFull = { filling: 0, spilling: 1, priming: primed, siphoning: 1, break: 1 - broken }[
    reading.phase
  ];
  const innerPx = bed.drain.standpipe.innerDiameter * frame.pxPerM;
  const widthPx = reading.phase === 'spilling' ? Math.max(1, innerPx * 0.3) : innerPx;
  const heightM = standpipeM * boreFull;
  writer.attr(handles.boreWater, 'x', (frame.px(bed.centreXM) - widthPx / 2).toFixed(2));
  writer.attr(handles.boreWater, 'width', widthPx.toFixed(2));
  writer.attr(handles.boreWater, 'y', frame.py(bed.floorM + heightM).toFixed(2));
  writer.attr(handles.boreWater, 'height', (heightM * frame.pzPerM).toFixed(2));
}

/** A pipe runs full while its bed siphons (or its pump runs); its marks follow the flow. */
function paintPipe(
  handles: PipeHandles,
  state: SceneState,
  index: number,
  context: PaintContext,
): void {
  const { writer } = context;
  const flow = state.flowsM3PerS[index] ?? Number.NaN;
  const moving = Number.isFinite(flow) && Math.abs(flow) > MARKS.stillM3PerS;
  writer.style(handles.water, 'opacity', fullness(handles, state, moving).toFixed(2));
  if (!moving) {
    writer.style(handles.marks, 'opacity', '0');
    return;
  }
  const share = Math.min(1, Math.abs(flow) / Math.max(context.busiestM3PerS, MARKS.stillM3PerS));
  const gap = MARKS.sparsePx + (MARKS.densePx - MARKS.sparsePx) * share;
  const speedPx = MARKS.slowPxPerS + (MARKS.fastPxPerS - MARKS.slowPxPerS) * share;
  const offset =
    ((context.offsets[index] ?? 0) - Math.sign(flow) * speedPx * context.wallStepS) % 1e6;
  context.offsets[index] = offset;
  writer.style(handles.marks, 'opacity', '1');
  writer.attr(handles.marks, 'stroke-dasharray', `${MARKS.dashPx} ${gap.toFixed(1)}`);
  writer.attr(handles.marks, 'stroke-dashoffset', offset.toFixed(1));
}

/** How full a pipe's water shows: a drain by its bed's phase, a pump line while it delivers. */
function fullness(handles: PipeHandles, state: SceneState, moving: boolean): number {
  const reading = state.phases[handles.bedIndex];
  if (handles.pipe.kind === 'drain' && reading) return drainFullness(reading);
  return handles.pipe.kind === 'pump-line' && moving ? 1 : 0;
}

/** How full a bed's drain runs in a phase: full while siphoning, filling and emptying around it. */
export function drainFullness(reading: BedPhaseReading): number {
  if (reading.phase === 'siphoning') return 1;
  if (reading.phase === 'priming') return Math.min(1, reading.sinceS / PRIMING_SHOWN_S);
  if (reading.phase === 'break') return 1 - Math.min(1, reading.sinceS / BREAK_SHOWN_S);
  return 0;
}

/** The close-up of one bed: the water around the bell, and the bell and standpipe as in the scene. */
export function paintCloseUp(
  closeUp: CloseUpHandles,
  state: SceneState,
  context: PaintContext,
): void {
  const { frame } = closeUp;
  const bed = closeUp.bed.bed;
  const level = Math.min(bed.heightM, Math.max(0, state.levelsM[closeUp.bed.vesselIndex] || 0));
  context.writer.attr(closeUp.water, 'y', frame.py(bed.floorM + level).toFixed(2));
  context.writer.attr(closeUp.water, 'height', (level * frame.pzPerM).toFixed(2));
  paintBedState(closeUp.bed, state, closeUp.bedIndex, { ...context, frame });
}
