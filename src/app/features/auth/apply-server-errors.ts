import { HttpErrorResponse } from '@angular/common/http';
import type { FormGroup } from '@angular/forms';
import { readApiError } from '../../core/http/read-api-error';

/**
 * Puts a failed call's field errors on the form's controls (as `{server: message}`) and returns
 * the sentence to show above the button, or null when every problem landed on a field.
 * `codeToField` sends whole-request codes to a field, e.g. `{EMAIL_TAKEN: 'email'}`.
 */
export function applyServerErrors(
  form: FormGroup,
  error: unknown,
  codeToField: Readonly<Record<string, string>> = {},
): string | null {
  if (!(error instanceof HttpErrorResponse)) throw error;
  if (error.status === 0)
    return 'The Tidewright server did not answer. Check your connection and try again.';
  const body = readApiError(error.error);
  if (!body) return `The server answered ${error.status}; try again in a moment.`;
  const target = codeToField[body.error.code];
  const fields =
    body.error.fields ?? (target ? [{ path: target, message: body.error.message }] : []);
  let unplaced = fields.length === 0;
  for (const field of fields) {
    const control = form.get(field.path);
    if (!control) {
      unplaced = true;
      continue;
    }
    control.setErrors({ ...control.errors, server: field.message });
    control.markAsTouched();
  }
  return unplaced ? body.error.message : null;
}
