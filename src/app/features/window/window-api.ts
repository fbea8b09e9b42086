import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  CellRunSchema,
  type InflowWindows,
  InflowWindowsSchema,
  type StartSweepRequest,
  type Sweep,
  type SweepList,
  SweepListSchema,
  SweepSchema,
} from '../../../../shared/contracts/sweeps';

/** The operating-window resources: sweeps, their cells opened as runs, and each bed's inflow window. */
@Injectable({ providedIn: 'root' })
export class WindowApi {
  private readonly http = inject(HttpClient);

  /** Starts a sweep; the server answers at once with the queued sweep. */
  async start(systemId: string, request: StartSweepRequest): Promise<Sweep> {
    return SweepSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/systems/${systemId}/sweeps`, request)),
    );
  }

  /** A system's sweeps, newest first, without cells. */
  async list(systemId: string): Promise<SweepList> {
    return SweepListSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/sweeps`)),
    );
  }

  /** One sweep; `withCells: false` for polling its progress. */
  async get(sweepId: string, withCells = true): Promise<Sweep> {
    const query = withCells ? '' : '?cells=0';
    return SweepSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/sweeps/${sweepId}${query}`)),
    );
  }

  /** Stops a sweep that is still going (the cells done so far stay). */
  async cancel(sweepId: string): Promise<Sweep> {
    return SweepSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/sweeps/${sweepId}/cancel`, {})),
    );
  }

  /** Deletes a sweep. */
  async remove(sweepId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/sweeps/${sweepId}`));
  }

  /** The stored full run of one cell (made on first asking); answers its run id. */
  async openCell(sweepId: string, index: number): Promise<string> {
    const body = await firstValueFrom(
      this.http.post<unknown>(`/api/sweeps/${sweepId}/cell-runs`, { index }),
    );
    return CellRunSchema.parse(body).runId;
  }

  /** Each bell-siphon bed's cycling inflow range and the inflow its pumps give it. */
  async inflowWindows(systemId: string): Promise<InflowWindows> {
    return InflowWindowsSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/inflow-window`)),
    );
  }
}
