import { AbstractControl, ValidationErrors } from '@angular/forms';

/**
 * Refuses text that is only spaces (a name of "   " is no name).
 *
 * @param control a text control
 * @returns `{ whitespace: true }` for blank non-empty text, else null
 */
export function notBlank(control: AbstractControl<string | null>): ValidationErrors | null {
  const value = control.value ?? '';
  return value.length > 0 && value.trim().length === 0 ? { whitespace: true } : null;
}
