import { AbstractControl, FormGroup } from '@angular/forms';
import type { Problem } from '@tallus/contracts';

import { describeIssue, describeProblem } from './error-messages';

/**
 * Shows a problem's field issues at their fields: each issue whose path names a control
 * of the form sets a `server` error on it, which the field's `mat-error` displays.
 * A problem without issues can still belong to a field, by its code (`fieldsByCode`).
 *
 * @param form the form that was submitted
 * @param problem the API's answer
 * @param fieldsByCode codes that concern one control as a whole, e.g. `{ AUTH_EMAIL_TAKEN: 'email' }`
 * @returns whether at least one field now shows the problem; if not, the caller shows it elsewhere
 */
export function showProblemAtFields(
  form: FormGroup,
  problem: Problem,
  fieldsByCode: Readonly<Record<string, string>> = {},
): boolean {
  let isShown = false;
  for (const issue of problem.issues ?? []) {
    const control = controlAt(form, issue.path);
    if (control) {
      markServerError(control, describeIssue(issue));
      isShown = true;
    }
  }
  const fieldName = fieldsByCode[problem.code];
  const control = fieldName === undefined ? null : form.get(fieldName);
  if (control) {
    markServerError(control, describeProblem(problem));
    isShown = true;
  }
  return isShown;
}

function controlAt(form: FormGroup, path: readonly (string | number)[]): AbstractControl | null {
  return path.length === 0 ? null : form.get(path.map(String));
}

function markServerError(control: AbstractControl, message: string): void {
  control.setErrors({ ...control.errors, server: message });
  control.markAsTouched();
}
