import { HttpErrorResponse } from '@angular/common/http';
import { readApiError } from '../../core/http/read-api-error';

/** The sentence for a failed admin call: the server's own message, else one about the connection. */
export function failureMessage(error: unknown): string {
  if (!(error instanceof HttpErrorResponse)) throw error;
  if (error.status === 0)
    return 'The Tidewright server did not answer. Check your connection and try again.';
  return (
    readApiError(error.error)?.error.message ??
    `The server answered ${error.status}; try again in a moment.`
  );
}
