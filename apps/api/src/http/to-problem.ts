import { OptimisticLockError, NotFoundError as OrmNotFoundError, UniqueConstraintViolationException } from '@mikro-orm/core';
import { isChemError, type ChemError } from '@tallus/chem';
import { problemTypeFor, type ErrorCode, type Problem, type ProblemIssue } from '@tallus/contracts';
import { MulterError } from 'multer';
import { ZodError } from 'zod';
import {
  AppError,
  AuthenticationError,
  BadRequestError,
  ChemInputError,
  ConflictError,
  ForbiddenError,
  GoneError,
  NotFoundError,
  RateLimitedError,
  ServiceUnavailableError,
} from '../errors/app-errors';

/** HTTP status and title of each kind of expected failure. */
const APP_ERROR_STATUS: ReadonlyArray<[abstract new (...args: never[]) => AppError, number, string]> = [
  [BadRequestError, 400, 'Bad Request'],
  [NotFoundError, 404, 'Not Found'],
  [AuthenticationError, 401, 'Unauthorized'],
  [ForbiddenError, 403, 'Forbidden'],
  [ConflictError, 409, 'Conflict'],
  [GoneError, 410, 'Gone'],
  [RateLimitedError, 429, 'Too Many Requests'],
  [ServiceUnavailableError, 503, 'Service Unavailable'],
];

/**
 * Turns anything thrown while handling a request into an RFC 9457 problem body:
 * ZodError → 400 REQUEST_INVALID with field paths; ChemError → 422 with its
 * code, span and (through {@link ChemInputError}) the field path; the API's
 * own errors → their status; a unique violation → 409; anything else → 500
 * with a generic detail and the request id.
 * Pure: it neither logs nor sends.
 *
 * @param error the thrown value
 * @param requestId id of the request in the logs; only 500 bodies carry it
 */
export function toProblem(error: unknown, requestId: string): Problem {
  if (error instanceof ZodError) {
    return problem(400, 'Bad Request', 'REQUEST_INVALID', 'The request does not match its schema.', {
      issues: error.issues.map(toIssue),
    });
  }
  const bodyError = bodyParserError(error);
  if (bodyError === 'entity.parse.failed') {
    return problem(400, 'Bad Request', 'REQUEST_MALFORMED_JSON', 'The request body is not valid JSON.');
  }
  if (bodyError === 'entity.too.large') {
    return problem(413, 'Content Too Large', 'REQUEST_TOO_LARGE', 'The request body is larger than the API accepts.');
  }
  if (bodyError) {
    return problem(400, 'Bad Request', 'REQUEST_INVALID', 'The request body cannot be read (encoding or charset).');
  }
  if (error instanceof ChemInputError || isChemError(error)) {
    const [chemError, path] = error instanceof ChemInputError ? [error.chemError, error.path] : [error, []];
    return problem(422, 'Unprocessable Content', chemError.code, chemError.message, { issues: [toChemIssue(chemError, path)] });
  }
  if (error instanceof AppError) {
    const [, status, title] = APP_ERROR_STATUS.find(([type]) => error instanceof type) ?? [AppError, 500, 'Internal Server Error'];
    return problem(status, title, error.code, error.message, error instanceof BadRequestError ? { issues: error.issues } : {});
  }
  if (error instanceof OptimisticLockError) {
    return problem(409, 'Conflict', 'VERSION_CONFLICT', 'The record changed while this request was handled; reload it and retry.');
  }
  if (error instanceof MulterError) return uploadProblem(error);
  if (error instanceof OrmNotFoundError) {
    return problem(404, 'Not Found', 'NOT_FOUND', 'No such resource.');
  }
  if (error instanceof UniqueConstraintViolationException) {
    return problem(409, 'Conflict', 'CONFLICT', 'A record with the same unique values already exists.');
  }
  return problem(500, 'Internal Server Error', 'INTERNAL_ERROR', 'The server failed to handle the request; quote the request id when reporting it.', {
    requestId,
  });
}

/** A multipart upload that multer refused: too large (413) or not the expected field (400). */
function uploadProblem(error: MulterError): Problem {
  if (error.code === 'LIMIT_FILE_SIZE') {
    return problem(413, 'Content Too Large', 'REQUEST_TOO_LARGE', 'The uploaded file is larger than the API accepts.');
  }
  return problem(400, 'Bad Request', 'REQUEST_INVALID', `The upload does not match the form: ${error.message}.`, {
    issues: [{ code: error.code, message: error.message, path: error.field ? [error.field] : [] }],
  });
}

function problem(status: number, title: string, code: ErrorCode, detail: string, extra: Partial<Problem> = {}): Problem {
  return { type: problemTypeFor(code), title, status, detail, code, ...extra };
}

function toChemIssue(error: ChemError, path: ReadonlyArray<string | number>): ProblemIssue {
  return { code: error.code, message: error.message, path: [...path], span: { start: error.span.start, end: error.span.end } };
}

function toIssue(issue: ZodError['issues'][number]): ProblemIssue {
  return { code: issue.code, message: issue.message, path: issue.path.map((key) => (typeof key === 'symbol' ? String(key) : key)) };
}

/** The `type` of an error from express.json() (body-parser), which marks its client errors with `expose`. */
function bodyParserError(error: unknown): string | undefined {
  if (!(error instanceof Error)) return undefined;
  const { type, expose, status } = error as Error & { type?: unknown; expose?: unknown; status?: unknown };
  const isClientError = expose === true && typeof status === 'number' && status >= 400 && status < 500;
  return isClientError && typeof type === 'string' ? type : undefined;
}
