import { NotFoundError as OrmNotFoundError, UniqueConstraintViolationException } from '@mikro-orm/core';
import { describe, expect, it } from 'vitest';
import { ChemError } from '@tallus/chem';
import { registerRequestSchema } from '@tallus/contracts';
import { z } from 'zod';
import {
  AuthenticationError,
  ChemInputError,
  ConflictError,
  ForbiddenError,
  GoneError,
  NotFoundError,
  RateLimitedError,
  ServiceUnavailableError,
} from '../errors/app-errors';
import { toProblem } from './to-problem';

const zodError = z.object({ email: z.email(), team: z.object({ name: z.string() }) }).safeParse({ email: 'x', team: {} }).error;
/** Errors shaped as body-parser (inside express.json()) throws them. */
const bodyParserError = (type: string, status: number) => Object.assign(new Error(type), { type, status, statusCode: status, expose: true });
const malformedJson = Object.assign(new SyntaxError('Unexpected token } in JSON'), { type: 'entity.parse.failed', status: 400, expose: true });

describe('toProblem', () => {
  it.each([
    ['a ZodError', zodError, 400, 'REQUEST_INVALID'],
    ['malformed JSON', malformedJson, 400, 'REQUEST_MALFORMED_JSON'],
    ['a body too large', bodyParserError('entity.too.large', 413), 413, 'REQUEST_TOO_LARGE'],
    ['an unsupported charset', bodyParserError('charset.unsupported', 415), 400, 'REQUEST_INVALID'],
    ['an AuthenticationError', new AuthenticationError('AUTH_INVALID_TOKEN', 'bad token'), 401, 'AUTH_INVALID_TOKEN'],
    ['a ForbiddenError', new ForbiddenError('TEAM_ROLE_REQUIRED', 'owners only'), 403, 'TEAM_ROLE_REQUIRED'],
    ['a NotFoundError', new NotFoundError('TEAM_NOT_FOUND', 'no team'), 404, 'TEAM_NOT_FOUND'],
    ["MikroORM's NotFoundError", new OrmNotFoundError('User not found'), 404, 'NOT_FOUND'],
    ['a ConflictError', new ConflictError('TEAM_LAST_OWNER', 'last owner'), 409, 'TEAM_LAST_OWNER'],
    ['a unique violation', new UniqueConstraintViolationException(new Error('duplicate key')), 409, 'CONFLICT'],
    ['a GoneError', new GoneError('INVITATION_EXPIRED', 'expired'), 410, 'INVITATION_EXPIRED'],
    ['a RateLimitedError', new RateLimitedError('AUTH_RATE_LIMITED', 'slow down'), 429, 'AUTH_RATE_LIMITED'],
    ['a ServiceUnavailableError', new ServiceUnavailableError('DATABASE_UNAVAILABLE', 'down'), 503, 'DATABASE_UNAVAILABLE'],
    ['a ChemError', new ChemError('FORMULA_MIXED_SITE', 'Give the proportions', { start: 0, end: 7 }), 422, 'FORMULA_MIXED_SITE'],
    ['a plain Error', new Error('connection reset by peer'), 500, 'INTERNAL_ERROR'],
    ['a thrown string', 'oops', 500, 'INTERNAL_ERROR'],
  ])('When the error is %s, then the status is %i with code %s', (_label, error, status, code) => {
    const problem = toProblem(error, 'req-1');

    expect(problem).toMatchObject({ status, code, type: `urn:tallus:problem:${code.toLowerCase().replaceAll('_', '-')}` });
    expect(problem.title).not.toBe('');
    expect(problem.detail).not.toBe('');
  });

  it('When the error is a ZodError, then each issue keeps its field path', () => {
    const problem = toProblem(zodError, 'req-1');

    expect(problem.issues?.map((issue) => issue.path)).toEqual([['email'], ['team', 'name']]);
  });

  it("When the ZodError comes from the contracts' own copy of zod, then it is still a 400 with paths", () => {
    const error = registerRequestSchema.safeParse({ email: 'owner@kestrel.example', displayName: 'Ada' }).error;

    const problem = toProblem(error, 'req-1');

    expect(problem.status).toBe(400);
    expect(problem.issues?.map((issue) => issue.path)).toEqual([['password']]);
  });

  it('When a ChemError comes with a field path, then the issue carries the path and the span', () => {
    const chemError = new ChemError('FORMULA_UNKNOWN_ELEMENT', 'Unknown element Xx', { start: 4, end: 6 });

    const problem = toProblem(new ChemInputError(['reactions', 2, 'equation'], chemError), 'req-1');

    expect(problem).toMatchObject({ status: 422, code: 'FORMULA_UNKNOWN_ELEMENT' });
    expect(problem.issues).toEqual([
      { code: 'FORMULA_UNKNOWN_ELEMENT', message: 'Unknown element Xx', path: ['reactions', 2, 'equation'], span: { start: 4, end: 6 } },
    ]);
  });

  it('When the error is unexpected, then the body carries the request id and hides the message', () => {
    const problem = toProblem(new Error('password=hunter2 leaked'), 'req-42');

    expect(problem.requestId).toBe('req-42');
    expect(JSON.stringify(problem)).not.toContain('hunter2');
  });

  it('When the error is expected, then the body carries its own detail and no request id', () => {
    const problem = toProblem(new ConflictError('TEAM_LAST_OWNER', 'A team keeps at least one owner.'), 'req-1');

    expect(problem.detail).toBe('A team keeps at least one owner.');
    expect(problem.requestId).toBeUndefined();
  });
});
