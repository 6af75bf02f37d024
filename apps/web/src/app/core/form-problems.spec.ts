import { FormControl, FormGroup } from '@angular/forms';
import type { Problem } from '@tallus/contracts';

import { showProblemAtFields } from './form-problems';

function form(): FormGroup {
  return new FormGroup({ email: new FormControl(''), password: new FormControl('') });
}

const base: Omit<Problem, 'code'> = { type: 'about:blank', title: 'Bad', status: 400, detail: 'Bad request' };

describe('showProblemAtFields', () => {
  it('puts each issue at the control its path names', () => {
    const registration = form();
    const isShown = showProblemAtFields(registration, {
      ...base,
      code: 'REQUEST_INVALID',
      issues: [{ code: 'too_small', message: 'At least 10 characters', path: ['password'] }],
    });

    expect(isShown).toBe(true);
    expect(registration.get('password')?.errors).toEqual({ server: 'At least 10 characters' });
    expect(registration.get('email')?.errors).toBeNull();
  });

  it('puts a whole-field problem at the field its code names', () => {
    const registration = form();
    const isShown = showProblemAtFields(
      registration,
      { ...base, status: 409, code: 'AUTH_EMAIL_TAKEN' },
      { AUTH_EMAIL_TAKEN: 'email' },
    );

    expect(isShown).toBe(true);
    expect(registration.get('email')?.errors?.['server']).toContain('exists already');
  });

  it('reports when no field can show the problem', () => {
    expect(showProblemAtFields(form(), { ...base, status: 429, code: 'AUTH_RATE_LIMITED' })).toBe(false);
    expect(
      showProblemAtFields(form(), {
        ...base,
        code: 'REQUEST_INVALID',
        issues: [{ code: 'custom', message: 'x', path: ['unknownField'] }],
      }),
    ).toBe(false);
  });
});
