import type { AbstractControl, ValidationErrors, ValidatorFn } from '@angular/forms';
import type { z } from 'zod';

/**
 * An Angular validator from a shared zod schema, so the form and the server apply the same rule:
 * `{zod: message}` with the schema's first message. Empty values pass (pair with `required`).
 */
export function zodValidator(schema: z.ZodType): ValidatorFn {
  return (control: AbstractControl): ValidationErrors | null => {
    if (control.value === '' || control.value === null) return null;
    const result = schema.safeParse(control.value);
    return result.success ? null : { zod: result.error.issues[0]?.message ?? 'Check this field.' };
  };
}
