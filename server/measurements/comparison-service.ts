/** `GET /api/measurements/:mid/compare?run=`: a measurement against a run of the same system, ready to overlay. */

import {
  StopwatchEntrySchema,
  type CycleFigures,
  type MeasuredSeries,
  type MeasurementComparison,
  type StopwatchEntry,
} from '../../shared/contracts/measurements';
import type { User } from '../../shared/contracts/auth';
import type { Database } from '../db/database';
import { badRequest, HttpError } from '../http/http-error';
import { findRunSeries } from '../runs/runs-repository';
import { requireRun } from '../runs/runs-service';
import { decodeSeries, type DecodedSeries } from '../runs/series-codec';
import { cycleFigures, figuresFromSpreads, type DrainCycle } from './cycle-figures';
import { compareFigures } from './compare-figures';
import { detectLevelCycles } from './detect-level-cycles';
import type { MeasurementHead } from './measurements-repository';
import { loadMeasuredSeries, requireMeasurement } from './measurements-service';
import { simulatedDrainCycles, type CycleEvent } from './simulated-drain-cycles';
import { stopwatchSpreads } from './stopwatch-spreads';
import { systemVessels } from './system-vessels';

/** Evenly strided indices, first and last kept. */
function stride(n: number, maxPoints: number): number[] {
  if (n <= maxPoints) return Array.from({ length: n }, (_, i) => i);
  return Array.from({ length: maxPoints }, (_, k) => Math.round((k * (n - 1)) / (maxPoints - 1)));
}

/** Linear interpolation in a sampled channel. */
function interpolator(t: Float64Array, values: Float64Array): (timeS: number) => number {
  return (timeS) => {
    let lo = 0;
    let hi = t.length - 1;
    while (hi - lo > 1) {
      const mid = (lo + hi) >> 1;
      if ((t[mid] ?? 0) <= timeS) lo = mid;
      else hi = mid;
    }
    const t0 = t[lo] ?? 0;
    const t1 = t[hi] ?? t0;
    const f = t1 > t0 ? (timeS - t0) / (t1 - t0) : 0;
    return (values[lo] ?? Number.NaN) * (1 - f) + (values[hi] ?? Number.NaN) * f;
  };
}

async function runSeriesOrThrow(db: Database, runId: string): Promise<DecodedSeries> {
  const stored = await findRunSeries(db, runId);
  if (!stored?.series)
    throw new HttpError(
      409,
      'RUN_HAS_NO_SERIES',
      'This run has no time series yet; wait for it to finish or run the system again.',
    );
  return decodeSeries(stored.series);
}

/** Simulated cycles after the first (which starts from the initial level), else all of them. */
function steady(cycles: DrainCycle[]): DrainCycle[] {
  return cycles.length >= 3 ? cycles.slice(1) : cycles;
}

/** The measured side: a CSV's series per vessel, or a stopwatch log's entries. */
interface MeasuredSide {
  series: MeasuredSeries | null;
  entries: StopwatchEntry[];
  beds: string[];
}

async function measuredSide(db: Database, head: MeasurementHead): Promise<MeasuredSide> {
  if (head.kind === 'stopwatch') {
    const entries = StopwatchEntrySchema.array().parse(head.stopwatch);
    return { series: null, entries, beds: [...new Set(entries.map((e) => e.bed))] };
  }
  const series = await loadMeasuredSeries(db, head.id);
  return { series, entries: [], beds: series.beds.map((b) => b.bed) };
}

/** The vessel to compare: the asked one, else the first measured one the run simulated; 400 otherwise. */
function chooseVessel(side: MeasuredSide, series: DecodedSeries, asked: string | undefined) {
  const simulatedBeds = side.beds.filter((b) => series.channels.some((c) => c.id === `level:${b}`));
  const bed = asked ?? simulatedBeds[0] ?? side.beds[0];
  const channel = series.channels.find((c) => c.id === `level:${bed}`);
  if (!bed || !channel || !side.beds.includes(bed)) {
    throw badRequest(
      `Choose a vessel that is both measured and simulated: ${simulatedBeds.join(', ') || 'none'}.`,
      [{ path: 'bed', message: 'Not measured or not in this run.' }],
    );
  }
  return { bed, channel, simulatedBeds };
}

/** Compares and aligns; see the contract's `MeasurementComparisonSchema`. */
export async function compareMeasurement(
  db: Database,
  user: User,
  measurementId: string,
  query: { run: string; bed?: string | undefined; maxPoints: number },
): Promise<MeasurementComparison> {
  const { head, system } = await requireMeasurement(db, user, measurementId, 'read');
  const run = await requireRun(db, user, query.run, 'read');
  if (run.systemId !== head.systemId) {
    throw badRequest('Compare with a run of the same system.', [
      { path: 'run', message: 'A run of another system.' },
    ]);
  }
  const series = await runSeriesOrThrow(db, run.id);
  const side = await measuredSide(db, head);
  const { bed, channel, simulatedBeds } = chooseVessel(side, series, query.bed);
  const events = (Array.isArray(run.events) ? run.events : []) as CycleEvent[];
  const simCycles = steady(
    simulatedDrainCycles(events, bed, interpolator(series.t_s, channel.values)),
  );
  const bedSeries = side.series?.beds.find((b) => b.bed === bed);
  // Only beds flood and drain; a tank's or sump's level is overlaid without cycle figures.
  const isBed = systemVessels(system.scenario).beds.includes(bed);
  const measuredCycles =
    bedSeries && isBed ? detectLevelCycles(bedSeries.t_s, bedSeries.level_m) : [];
  const measured: CycleFigures = bedSeries
    ? cycleFigures(measuredCycles)
    : figuresFromSpreads(stopwatchSpreads(side.entries, bed));
  const simulated = cycleFigures(simCycles);
  const offsetS =
    measuredCycles[0] && simCycles[0] ? simCycles[0].primeS - measuredCycles[0].primeS : 0;
  const endS = series.t_s[series.t_s.length - 1] ?? 0;
  const keepSim = stride(series.t_s.length, query.maxPoints);
  return {
    measurementId,
    runId: run.id,
    bed,
    beds: simulatedBeds,
    offsetS,
    measured,
    simulated,
    rows: compareFigures(measured, simulated),
    measuredSeries: bedSeries ? shiftedSeries(bedSeries, offsetS, endS, query.maxPoints) : null,
    simulatedSeries: {
      t_s: keepSim.map((i) => series.t_s[i] ?? 0),
      level_m: keepSim.map((i) => channel.values[i] ?? Number.NaN),
    },
  };
}

/** The measured samples on the run's clock, inside the run's span, thinned. */
function shiftedSeries(
  series: { t_s: number[]; level_m: number[] },
  offsetS: number,
  endS: number,
  maxPoints: number,
): { t_s: number[]; level_m: number[] } {
  const inside = series.t_s
    .map((t, i) => ({ t: t + offsetS, y: series.level_m[i] ?? 0 }))
    .filter((p) => p.t >= 0 && p.t <= endS);
  const keep = stride(inside.length, maxPoints);
  return { t_s: keep.map((i) => inside[i]?.t ?? 0), level_m: keep.map((i) => inside[i]?.y ?? 0) };
}
