import type { SystemModel } from '../system/system-model';
import type { SeriesChannel } from './run-result';

/** A channel's description without its values. */
export type ChannelSpec = Omit<SeriesChannel, 'values'>;

/** Reads every series channel of a model at a state. */
export interface SeriesProbe {
  readonly specs: readonly ChannelSpec[];
  /** Indices (into specs) of the bed phase channels. */
  readonly phaseChannels: readonly number[];
  /** Writes the value of every channel at (y, t) into `out`. */
  sample(y: Float64Array, timeS: number, out: Float64Array): void;
}

const BELL_PHASE_CODE = { filling: 0, spilling: 1, siphoning: 3 } as const;

/**
 * The channels of a run: every vessel's level (m above its floor) and volume, every flow channel
 * (pump outlets, drains, weep holes, overflows, leaks, rim spills), every pump's flow, head and
 * power, and every bed's phase (0 filling, 1 spilling, 2 priming, 3 siphoning, 4 break).
 */
export function makeSeriesProbe(model: SystemModel): SeriesProbe {
  const { vessels, channels, pumps, bells, standpipes } = model.parts;
  const specs: ChannelSpec[] = [
    ...vessels.map((v): ChannelSpec => ({
      id: `level:${v.vessel.id}`,
      kind: 'level',
      where: v.vessel.id,
      unit: 'm',
    })),
    ...vessels.map((v): ChannelSpec => ({
      id: `volume:${v.vessel.id}`,
      kind: 'volume',
      where: v.vessel.id,
      unit: 'm3',
    })),
    ...channels.map((c): ChannelSpec => ({ id: c.id, kind: 'flow', where: c.where, unit: 'm3/s' })),
    ...pumps.flatMap((p): ChannelSpec[] => [
      { id: `flow:${p.id}`, kind: 'flow', where: p.id, unit: 'm3/s' },
      { id: `head:${p.id}`, kind: 'head', where: p.id, unit: 'm' },
      { id: `power:${p.id}`, kind: 'power', where: p.id, unit: 'W' },
    ]),
    ...bells.map((b): ChannelSpec => ({
      id: `phase:${b.bedId}`,
      kind: 'phase',
      where: b.bedId,
      unit: '',
    })),
    ...standpipes.map((s): ChannelSpec => ({
      id: `phase:${s.bedId}`,
      kind: 'phase',
      where: s.bedId,
      unit: '',
    })),
  ];
  const firstPhase = specs.length - bells.length - standpipes.length;
  return {
    specs,
    phaseChannels: Array.from(
      { length: bells.length + standpipes.length },
      (_, i) => firstPhase + i,
    ),
    sample: (y, timeS, out) => {
      const ctx = model.flowsAt(y, timeS);
      let k = 0;
      for (const v of vessels) out[k++] = ctx.levelM[v.index] as number;
      for (const v of vessels) out[k++] = y[v.index] as number;
      for (let c = 0; c < channels.length; c += 1) out[k++] = ctx.flowM3PerS[c] as number;
      for (const p of pumps) {
        out[k++] = p.reading.flowM3PerS;
        out[k++] = p.reading.headM;
        out[k++] = p.reading.powerW;
      }
      for (const b of bells) out[k++] = BELL_PHASE_CODE[b.phase];
      for (const s of standpipes) out[k++] = s.phase === 'spilling' ? 1 : 0;
    },
  };
}
