import { HttpErrorResponse } from '@angular/common/http';
import type { Problem } from '@tallus/contracts';

import { describeProblem, describeValidationErrors, errorText } from './error-messages';
import { toProblem } from './problem';

const problem = (code: Problem['code'], detail: string): Problem => ({
  type: 'about:blank',
  title: 'Title',
  status: 409,
  detail,
  code,
});

describe('describeProblem', () => {
  it('prefers the text kept for the code', () => {
    expect(describeProblem(problem('TEAM_LAST_OWNER', 'server text'))).toContain('at least one owner');
  });

  it('falls back to the API detail for other codes', () => {
    expect(describeProblem(problem('CONFLICT', 'The row changed meanwhile.'))).toBe('The row changed meanwhile.');
  });

  it('shows the specific detail of an UNKNOWN problem, e.g. that the server failed', () => {
    const failed = toProblem(new HttpErrorResponse({ status: 502, error: '<html>Bad gateway</html>' }));

    expect(describeProblem(failed)).toContain('The server failed to answer');
  });

  it('shows a detail set for an UNKNOWN problem after toProblem, e.g. by the global error handler', () => {
    const updated = { ...toProblem(new Error('Failed to fetch dynamically imported module')), detail: 'Tallus was updated.' };

    expect(describeProblem(updated)).toBe('Tallus was updated.');
  });

  it('tells that the server could not be reached when there was no answer', () => {
    const offline = toProblem(new HttpErrorResponse({ status: 0, error: new ProgressEvent('error') }));

    expect(describeProblem(offline)).toContain('could not reach its server');
  });
});

describe('errorText', () => {
  it('gives no text when nothing failed', () => {
    expect(errorText(undefined)).toBeNull();
  });

  it('describes what a failed call threw', () => {
    expect(errorText(new HttpErrorResponse({ status: 0, error: new ProgressEvent('error') }))).toContain('could not reach its server');
  });
});

describe('describeValidationErrors', () => {
  it.each([
    { errors: null, text: '' },
    { errors: { required: true }, text: 'Required.' },
    { errors: { minlength: { requiredLength: 10, actualLength: 3 } }, text: 'Use at least 10 characters.' },
    { errors: { server: 'E-mail taken' }, text: 'E-mail taken' },
    { errors: { min: { min: 0, actual: -1 } }, text: 'Give 0 or more.' },
    { errors: { max: { max: 100, actual: 120 } }, text: 'Give 100 or less.' },
  ])('describes $errors', ({ errors, text }) => {
    expect(describeValidationErrors(errors)).toBe(text);
  });
});
