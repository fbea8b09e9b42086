import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type RunSeries,
  RunSeriesSchema,
  RunWithSnapshotSchema,
} from '../../../../shared/contracts/runs';
import { type Scenario, parseScenario } from '../../../../shared/scenario';

/** The most samples the cross-section asks for: a day at 10 s plus the event samples. */
export const CROSS_SECTION_MAX_POINTS = 16_000;

/**
 * The channels the cross-section draws from: every vessel's level, each drain, overflow, leak and
 * pump outlet flow, each pump's flow, and each bed's phase (ids as the engine names them).
 */
export function crossSectionChannels(scenario: Scenario): string[] {
  return [
    ...scenario.vessels.map((v) => `level:${v.id}`),
    ...scenario.vessels.flatMap((v) => (v.kind === 'bed' ? [`flow:${v.id}.drain`] : [])),
    ...scenario.vessels.flatMap((v) => (v.overflow ? [`flow:${v.id}.overflow`] : [])),
    ...scenario.leaks.map((_, k) => `flow:leak[${k}]`),
    ...scenario.pumps.flatMap((p) => [
      `flow:${p.id}`,
      ...p.outlets.map((_, i) => `flow:${p.id}.outlet[${i}]`),
    ]),
    ...scenario.vessels.flatMap((v) => (v.kind === 'bed' ? [`phase:${v.id}`] : [])),
  ];
}

/** What the cross-section of a stored run needs from the API, parsed with the shared contracts. */
@Injectable({ providedIn: 'root' })
export class CrossSectionApi {
  private readonly http = inject(HttpClient);

  /** The normalised scenario the run used (its stored snapshot). */
  async runScenario(runId: string): Promise<Scenario> {
    const params = new HttpParams().set('snapshot', '1');
    const run = RunWithSnapshotSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/runs/${runId}`, { params })),
    );
    const parsed = parseScenario(run.scenario);
    if (!parsed.success) {
      const first = parsed.issues[0];
      throw new Error(
        `The run's stored system could not be read (${first?.path ?? ''}: ${first?.message ?? ''}).`,
      );
    }
    return parsed.scenario;
  }

  /** The run's series for the drawing: only the channels it draws, nearly every sample. */
  async runSeries(runId: string, scenario: Scenario): Promise<RunSeries> {
    const params = new HttpParams()
      .set('channels', crossSectionChannels(scenario).join(','))
      .set('maxPoints', CROSS_SECTION_MAX_POINTS);
    return RunSeriesSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/runs/${runId}/series`, { params })),
    );
  }
}
