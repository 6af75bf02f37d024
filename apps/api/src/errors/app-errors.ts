import type { ChemError } from '@tallus/chem';
import type { ApiErrorCode } from '@tallus/contracts';

/**
 * Base of the errors that use cases throw for expected failures. Each carries
 * a code from the contracts and an English detail; which HTTP status it becomes
 * is decided in one place, `http/to-problem.ts`.
 */
export abstract class AppError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    detail: string,
  ) {
    super(detail);
    this.name = new.target.name;
  }
}

/** The thing asked for does not exist, or the caller may not know that it does (404). */
export class NotFoundError extends AppError {}

/** No valid session: no token, or a bad one, or wrong credentials (401). */
export class AuthenticationError extends AppError {}

/** The caller is known but lacks the right (403). */
export class ForbiddenError extends AppError {}

/** The request clashes with the current state (409). */
export class ConflictError extends AppError {}

/** The thing existed but is no longer usable, e.g. an expired invitation (410). */
export class GoneError extends AppError {}

/** Too many attempts in the current window (429). */
export class RateLimitedError extends AppError {}

/** A dependency such as the database does not answer (503). */
export class ServiceUnavailableError extends AppError {}

/** One problem of a request that failed a check beyond its schema: where (`path`) and what. */
export interface RequestIssue {
  code: string;
  message: string;
  path: Array<string | number>;
  span?: { start: number; end: number };
}

/**
 * The request is well-formed, but its content is wrong in ways the schema
 * cannot see, e.g. a malformed import file or a net reaction naming a reaction of
 * another set (400, with every issue and its path).
 */
export class BadRequestError extends AppError {
  constructor(
    code: ApiErrorCode,
    detail: string,
    readonly issues: RequestIssue[] = [],
  ) {
    super(code, detail);
  }
}

/**
 * A chemistry error from libs/chem with the path of the request field whose
 * text it is about, e.g. `['reactions', 2, 'equation']` (422).
 */
export class ChemInputError extends Error {
  constructor(
    readonly path: ReadonlyArray<string | number>,
    readonly chemError: ChemError,
  ) {
    super(chemError.message);
    this.name = 'ChemInputError';
  }
}
