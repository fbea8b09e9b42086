import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type BuildSheet,
  BuildSheetSchema,
  type SizingReport,
  SizingReportSchema,
} from '../../../../shared/contracts/sizing';

/** The sizing checks and build sheet of a system, parsed with the contract. */
@Injectable({ providedIn: 'root' })
export class SizingApi {
  private readonly http = inject(HttpClient);

  /** The sizing checks (the server runs the what-ifs; takes a moment). */
  async report(
    systemId: string,
    query: { cutDuration?: string; leakDiameter?: string } = {},
  ): Promise<SizingReport> {
    let params = new HttpParams();
    for (const [key, value] of Object.entries(query)) if (value) params = params.set(key, value);
    return SizingReportSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/sizing`, { params })),
    );
  }

  /** The build sheet; `fittingDepth` (a length with its unit) overrides each standpipe's fitting depth. */
  async buildSheet(systemId: string, fittingDepth?: string): Promise<BuildSheet> {
    const params = fittingDepth ? new HttpParams().set('fittingDepth', fittingDepth) : undefined;
    return BuildSheetSchema.parse(
      await firstValueFrom(
        this.http.get<unknown>(`/api/systems/${systemId}/build-sheet`, params ? { params } : {}),
      ),
    );
  }
}
