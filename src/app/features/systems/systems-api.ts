import { HttpClient } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type CreateSystemRequest,
  type ShareRequest,
  ShareSchema,
  type Share,
  type System,
  type SystemList,
  SystemListSchema,
  SystemSchema,
  type UpdateSystemRequest,
} from '../../../../shared/contracts/systems';
import { type DownloadedFile, attachmentFileName } from '../../ui/time-series-chart/save-blob';

/**
 * The `/api/systems` resource. Every answer is parsed with the shared contract, so a server that
 * drifts from it fails here loudly instead of deep inside a template.
 */
@Injectable({ providedIn: 'root' })
export class SystemsApi {
  private readonly http = inject(HttpClient);

  /** My systems, then those shared with me. */
  async list(): Promise<SystemList> {
    return SystemListSchema.parse(await firstValueFrom(this.http.get<unknown>('/api/systems')));
  }

  /** One system with its scenario document. */
  async get(id: string): Promise<System> {
    return SystemSchema.parse(await firstValueFrom(this.http.get<unknown>(`/api/systems/${id}`)));
  }

  /** Creates a system from a template or a scenario document. */
  async create(request: CreateSystemRequest): Promise<System> {
    return SystemSchema.parse(
      await firstValueFrom(this.http.post<unknown>('/api/systems', request)),
    );
  }

  /** Saves; a stale `version` fails with 409 `STALE_VERSION`. */
  async update(id: string, request: UpdateSystemRequest): Promise<System> {
    return SystemSchema.parse(
      await firstValueFrom(this.http.put<unknown>(`/api/systems/${id}`, request)),
    );
  }

  /** Deletes a system (its runs go with it). */
  async remove(id: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/systems/${id}`));
  }

  /** Copies a system; the copy is mine. */
  async duplicate(id: string, name?: string): Promise<System> {
    const body = name === undefined ? {} : { name };
    return SystemSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/systems/${id}/duplicate`, body)),
    );
  }

  /** Creates a system from a scenario file's contents; field errors name paths inside the file. */
  async importScenario(document: unknown): Promise<System> {
    return SystemSchema.parse(
      await firstValueFrom(this.http.post<unknown>('/api/systems/import', document)),
    );
  }

  /** The scenario file of a system and the name the server gives it. */
  async exportScenario(id: string): Promise<DownloadedFile> {
    const response = await firstValueFrom(
      this.http.get(`/api/systems/${id}/scenario.json`, {
        responseType: 'blob',
        observe: 'response',
      }),
    );
    const fileName = attachmentFileName(
      response.headers.get('Content-Disposition'),
      'scenario.json',
    );
    return { blob: response.body ?? new Blob(), fileName };
  }

  /** Shares a system with someone by e-mail (owner only). */
  async share(id: string, request: ShareRequest): Promise<Share> {
    return ShareSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/systems/${id}/shares`, request)),
    );
  }
}
