import { HttpErrorResponse } from '@angular/common/http';
import { readApiError } from '../../core/http/read-api-error';

/** The message of a failed API call in words for the page (the server's own, else `fallback`). */
export function problemWords(error: unknown, fallback: string): string {
  if (error instanceof HttpErrorResponse) {
    const api = readApiError(error.error)?.error;
    if (api)
      return api.fields?.length
        ? `${api.message} ${api.fields.map((f) => `${f.path}: ${f.message}`).join('; ')}`
        : api.message;
  }
  return fallback;
}
