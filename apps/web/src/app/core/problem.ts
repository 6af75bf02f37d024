import { HttpErrorResponse } from '@angular/common/http';
import type { ErrorCode, Problem, ProblemIssue } from '@tallus/contracts';

/** Code of the problem made up when the server could not be reached at all. */
export const NETWORK_CODE: ErrorCode = 'NETWORK';
/** Code of the problem made up when the server answered with something that is no problem body. */
export const UNKNOWN_CODE: ErrorCode = 'UNKNOWN';

/**
 * Turns whatever a failed API call threw into a problem body.
 *
 * An `HttpErrorResponse` carrying an RFC 9457 body gives that body; status 0 (no
 * answer: offline, refused, CORS) gives code `NETWORK`; any other failure gives
 * code `UNKNOWN` with the HTTP status when there was one.
 *
 * @param error what `catchError` received
 */
export function toProblem(error: unknown): Problem {
  if (!(error instanceof HttpErrorResponse)) {
    return unknownProblem(0, error instanceof Error ? error.message : undefined);
  }
  if (error.status === 0) {
    return {
      type: 'about:blank',
      title: 'Network error',
      status: 0,
      detail: 'Tallus could not reach its server. Check your connection and try again.',
      code: NETWORK_CODE,
    };
  }
  const body = parseBody(error.error);
  if (isProblemBody(body)) {
    const title = stringOr(body['title'], error.statusText || 'Error');
    return {
      type: stringOr(body['type'], 'about:blank'),
      title,
      status: typeof body['status'] === 'number' ? body['status'] : error.status,
      detail: stringOr(body['detail'], title),
      // A code this client does not know yet still carries the server's detail.
      code: stringOr(body['code'], UNKNOWN_CODE) as ErrorCode,
      ...(typeof body['requestId'] === 'string' ? { requestId: body['requestId'] } : {}),
      ...(Array.isArray(body['issues']) ? { issues: body['issues'] as ProblemIssue[] } : {}),
    };
  }
  return unknownProblem(error.status, error.statusText);
}

function unknownProblem(status: number, title: string | undefined): Problem {
  return {
    type: 'about:blank',
    title: title || 'Unexpected error',
    status,
    detail:
      status >= 500
        ? 'The server failed to answer this request. Try again in a moment.'
        : 'Something unexpected went wrong. Try again in a moment.',
    code: UNKNOWN_CODE,
  };
}

/** A body may arrive as text when the server sent JSON with an unexpected content type. */
function parseBody(body: unknown): unknown {
  if (typeof body !== 'string') {
    return body;
  }
  try {
    return JSON.parse(body);
  } catch {
    // Not JSON: an HTML error page from a proxy, for example. Treated as no problem body.
    return undefined;
  }
}

function stringOr(value: unknown, fallback: string): string {
  return typeof value === 'string' && value.length > 0 ? value : fallback;
}

function isProblemBody(body: unknown): body is Record<string, unknown> {
  return (
    typeof body === 'object' &&
    body !== null &&
    ('code' in body || 'detail' in body) &&
    ('title' in body || 'status' in body)
  );
}
