import { HttpErrorResponse } from '@angular/common/http';
import { readApiError } from '../../core/http/read-api-error';

/**
 * The sentence to show for a failed classroom call: the server's own message when it sent one
 * (they say what to do), else one about the connection. Anything but an HTTP failure is rethrown.
 */
export function problemMessage(error: unknown): string {
  if (!(error instanceof HttpErrorResponse)) throw error;
  if (error.status === 0)
    return 'The Tidewright server did not answer. Check your connection and try again.';
  return (
    readApiError(error.error)?.error.message ??
    `The server answered ${error.status}; try again in a moment.`
  );
}
