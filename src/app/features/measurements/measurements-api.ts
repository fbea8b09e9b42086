import { HttpClient, HttpParams } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import {
  type Calibration,
  type CalibrationList,
  CalibrationListSchema,
  CalibrationSchema,
  type CreateStopwatchRequest,
  type CsvImportOptionsInput,
  type CsvPreview,
  CsvPreviewSchema,
  type CurrentCalibration,
  CurrentCalibrationSchema,
  type Measurement,
  type MeasurementComparison,
  MeasurementComparisonSchema,
  type MeasurementList,
  MeasurementListSchema,
  MeasurementSchema,
  type StartCalibrationRequest,
} from '../../../../shared/contracts/measurements';

/** A CSV to send: a chosen file, or pasted text with a file name. */
export type CsvSource =
  { kind: 'file'; file: File } | { kind: 'text'; text: string; fileName: string };

function body(source: CsvSource, options: CsvImportOptionsInput | undefined): FormData | object {
  if (source.kind === 'text')
    return { fileName: source.fileName, text: source.text, ...(options ? { options } : {}) };
  const form = new FormData();
  form.append('file', source.file, source.file.name);
  if (options) form.append('options', JSON.stringify(options));
  return form;
}

/** The measurements and calibrations resources, parsed with the shared contract. */
@Injectable({ providedIn: 'root' })
export class MeasurementsApi {
  private readonly http = inject(HttpClient);

  /** A system's measurements, newest first. */
  async list(systemId: string): Promise<MeasurementList> {
    return MeasurementListSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/measurements`)),
    );
  }

  /** Parses a CSV without storing it; with no options the server guesses them. */
  async preview(
    systemId: string,
    source: CsvSource,
    options?: CsvImportOptionsInput,
  ): Promise<CsvPreview> {
    const answer = await firstValueFrom(
      this.http.post<unknown>(
        `/api/systems/${systemId}/measurements/preview`,
        body(source, options),
      ),
    );
    return CsvPreviewSchema.parse(answer);
  }

  /** Stores a CSV with its options. */
  async create(
    systemId: string,
    source: CsvSource,
    options: CsvImportOptionsInput,
  ): Promise<Measurement> {
    return MeasurementSchema.parse(
      await firstValueFrom(
        this.http.post<unknown>(`/api/systems/${systemId}/measurements`, body(source, options)),
      ),
    );
  }

  /** Stores a stopwatch log. */
  async createStopwatch(systemId: string, request: CreateStopwatchRequest): Promise<Measurement> {
    return MeasurementSchema.parse(
      await firstValueFrom(
        this.http.post<unknown>(`/api/systems/${systemId}/measurements/stopwatch`, request),
      ),
    );
  }

  /** Deletes one measurement. */
  async remove(measurementId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/measurements/${measurementId}`));
  }

  /** Where the original file downloads from. */
  originalUrl(measurementId: string): string {
    return `/api/measurements/${measurementId}/original`;
  }

  /** A measurement against a run, ready to overlay. */
  async compare(
    measurementId: string,
    runId: string,
    bed?: string,
  ): Promise<MeasurementComparison> {
    let params = new HttpParams().set('run', runId).set('maxPoints', 2000);
    if (bed) params = params.set('bed', bed);
    return MeasurementComparisonSchema.parse(
      await firstValueFrom(
        this.http.get<unknown>(`/api/measurements/${measurementId}/compare`, { params }),
      ),
    );
  }

  /** Fits coefficients to measurements (answers when the fit is done). */
  async calibrate(systemId: string, request: StartCalibrationRequest): Promise<Calibration> {
    return CalibrationSchema.parse(
      await firstValueFrom(
        this.http.post<unknown>(`/api/systems/${systemId}/calibrations`, request),
      ),
    );
  }

  /** A system's fits, newest first. */
  async calibrations(systemId: string): Promise<CalibrationList> {
    return CalibrationListSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/calibrations`)),
    );
  }

  /** The calibrated values kept on a system. */
  async current(systemId: string): Promise<CurrentCalibration> {
    return CurrentCalibrationSchema.parse(
      await firstValueFrom(this.http.get<unknown>(`/api/systems/${systemId}/calibration`)),
    );
  }

  /** Keeps a fit's values on its system. */
  async apply(calibrationId: string): Promise<CurrentCalibration> {
    return CurrentCalibrationSchema.parse(
      await firstValueFrom(this.http.post<unknown>(`/api/calibrations/${calibrationId}/apply`, {})),
    );
  }

  /** Goes back to the scenario's own coefficients. */
  async clear(systemId: string): Promise<void> {
    await firstValueFrom(this.http.delete(`/api/systems/${systemId}/calibration`));
  }
}
