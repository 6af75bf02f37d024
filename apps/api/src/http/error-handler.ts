import type { ErrorRequestHandler } from 'express';
import { toProblem } from './to-problem';

/**
 * The one error middleware: logs, maps with {@link toProblem}, sends
 * `application/problem+json`. Unexpected errors are logged in full at `error`
 * level; expected ones are not logged beyond the request line.
 */
export const errorHandler: ErrorRequestHandler = (error, req, res, next) => {
  if (res.headersSent) return next(error);
  const problem = toProblem(error, req.id);
  if (problem.status >= 500) req.log.error({ err: error }, 'request failed');
  res.status(problem.status).type('application/problem+json').json(problem);
};
