import type { Problem } from '@tallus/contracts';

import { describeProblem, describeValidationErrors } from './error-messages';

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
