import { HttpErrorResponse, HttpHeaders } from '@angular/common/http';

import { toProblem } from './problem';

const problemHeaders = new HttpHeaders({ 'content-type': 'application/problem+json' });

describe('toProblem', () => {
  it('keeps an RFC 9457 body with its code and issues', () => {
    const body = {
      type: 'urn:tallus:problem:request-invalid',
      title: 'Invalid request',
      status: 400,
      detail: 'The request has 1 invalid field.',
      code: 'REQUEST_INVALID',
      issues: [{ code: 'too_small', message: 'Too short', path: ['password'] }],
    };
    const problem = toProblem(new HttpErrorResponse({ status: 400, error: body, headers: problemHeaders }));

    expect(problem).toEqual(body);
  });

  it('parses a problem body that arrived as text', () => {
    const body = JSON.stringify({ title: 'Conflict', status: 409, detail: 'Last owner', code: 'TEAM_LAST_OWNER' });
    const problem = toProblem(new HttpErrorResponse({ status: 409, error: body }));

    expect(problem.code).toBe('TEAM_LAST_OWNER');
    expect(problem.detail).toBe('Last owner');
  });

  it.each([
    { case: 'no answer (status 0)', response: { status: 0, error: new ProgressEvent('error') }, code: 'NETWORK', status: 0 },
    { case: 'an HTML error page', response: { status: 502, error: '<html>Bad gateway</html>' }, code: 'UNKNOWN', status: 502 },
    { case: 'an empty body', response: { status: 500, error: null }, code: 'UNKNOWN', status: 500 },
    { case: 'JSON that is no problem', response: { status: 418, error: { teapot: true } }, code: 'UNKNOWN', status: 418 },
  ])('falls back for $case', ({ response, code, status }) => {
    const problem = toProblem(new HttpErrorResponse(response));

    expect(problem.code).toBe(code);
    expect(problem.status).toBe(status);
    expect(problem.detail.length).toBeGreaterThan(0);
  });

  it('turns a thrown non-HTTP error into UNKNOWN', () => {
    expect(toProblem(new TypeError('x is undefined')).code).toBe('UNKNOWN');
  });
});
