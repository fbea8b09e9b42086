import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type Run,
  type RunComparison,
  RunComparisonSchema,
  type RunList,
  type RunListQuery,
  RunListSchema,
  RunSchema,
  type RunSeries,
  RunSeriesSchema,
  type RunStarted,
  RunStartedSchema,
  type StartRunRequest,
} from '../../../../shared/contracts/runs';
import { type DownloadedFile, attachmentFileName } from '../../ui/time-series-chart/save-blob';

/** What starting a run answered: the ended run (201), or a run still going (202). */
export type StartedRun = { kind: 'ended'; run: Run } | { kind: 'started'; started: RunStarted };

/** The runs resource: start, list, read, cancel, series and comparison, parsed with the contract. */
@Injectable({ providedIn: 'root' })
export class RunsApi {
  private readonly http = inject(HttpClient);

  /** Starts a run of the system's saved scenario. */
  async start(systemId: string, request: StartRunRequest = {}): Promise<StartedRun> {
    const response = await firstValueFrom(
      this.http.post<unknown>(`/api/systems/${systemId}/runs`, request, { observe: 'response' }),
    );
    if (response.status === 202)
      return { kind: 'started', started: RunStartedSchema.parse(response.body) };
    return { kind: 'ended', run: RunSchema.parse(response.body) };
  }

  /** A page of a system's runs. */
  async list(systemId: string, query: Partial<RunListQuery>): Promise<RunList> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) {
      if (value !== undefined) params = params.set(key, String(value));
    }
    return RunListSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/runs`, { params })),
    );
  }

  /** One run with its summary, verdicts and events (no series). */
  async get(runId: string): Promise<Run> {
    return RunSchema.parse(await firstValueFrom(this.http.get<unknown>(`/api/runs/${runId}`)));
  }

  /** Asks the server to stop a queued or running run. */
  async cancel(runId: string): Promise<Run> {
    return RunSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/runs/${runId}/cancel`, {})),
    );
  }

  /** The run's series, thinned to at most `maxPoints` samples per channel. */
  async series(runId: string, maxPoints = 2000): Promise<RunSeries> {
    const params = new HttpParams().set('maxPoints', maxPoints);
    return RunSeriesSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/runs/${runId}/series`, { params })),
    );
  }

  /** Two runs compared figure by figure. */
  async compare(a: string, b: string): Promise<RunComparison> {
    const params = new HttpParams().set('a', a).set('b', b);
    return RunComparisonSchema.parse(
      await firstValueFrom(this.http.get<unknown>('/api/runs/compare', { params })),
    );
  }

  /** A download served by the API (`series.csv`, `result.json`) and the name the server gives it. */
  async download(runId: string, file: 'series.csv' | 'result.json'): Promise<DownloadedFile> {
    const response = await firstValueFrom(
      this.http.get(`/api/runs/${runId}/${file}`, { responseType: 'blob', observe: 'response' }),
    );
    const fileName = attachmentFileName(
      response.headers.get('Content-Disposition'),
      `run-${runId}-${file}`,
    );
    return { blob: response.body ?? new Blob(), fileName };
  }
}
