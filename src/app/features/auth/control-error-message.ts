import type { ValidationErrors } from '@angular/forms';

/**
 * The sentence under a field for its first error: `required` → `whenEmpty`, then the message of a
 * shared-schema (`zod`) or server (`server`) error, then Angular's e-mail check. '' when valid.
 */
export function controlErrorMessage(errors: ValidationErrors | null, whenEmpty: string): string {
  if (!errors) return '';
  if (errors['required']) return whenEmpty;
  for (const key of ['server', 'zod']) {
    const message: unknown = errors[key];
    if (typeof message === 'string') return message;
  }
  if (errors['email']) return 'Enter an e-mail address in the form name@example.org.';
  return 'Check this field.';
}
