import type { ValidationErrors } from '@angular/forms';

/** The fields of the sign-in form. */
export type SignInField = 'email' | 'password';

/**
 * The sentence under a sign-in field for its first validation error, or '' when it has none.
 * Each sentence says what to enter.
 */
export function fieldErrorMessage(field: SignInField, errors: ValidationErrors | null): string {
  if (!errors) return '';
  if (errors['required']) {
    return field === 'email' ? 'Enter the e-mail address of your account.' : 'Enter your password.';
  }
  if (errors['email']) return 'Enter an e-mail address in the form name@example.org.';
  return 'Check this field.';
}
