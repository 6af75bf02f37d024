import type { ApiErrorCode } from '@tallus/contracts';
import { NotFoundError } from '../errors/app-errors';

/** The part of a zod schema these helpers use; typed structurally so any copy of zod fits. */
interface ParsingSchema<Output> {
  parse(input: unknown): Output;
  safeParse(input: unknown): { success: true; data: Output } | { success: false };
}

/**
 * Parses a request body (or query) with its contracts schema.
 *
 * @throws ZodError, which becomes 400 REQUEST_INVALID with the field paths
 */
export function parseBody<Output>(schema: ParsingSchema<Output>, body: unknown): Output {
  return schema.parse(body ?? {});
}

/**
 * Parses a route parameter that names a resource. A malformed id names
 * nothing, so it answers 404 like an id the caller may not see, never 400:
 * the answer must not tell an outsider which ids are well formed.
 *
 * @throws NotFoundError with `code` when the value does not parse
 */
export function parseIdParam<Output>(schema: ParsingSchema<Output>, value: unknown, code: ApiErrorCode): Output {
  const parsed = schema.safeParse(value);
  if (!parsed.success) throw new NotFoundError(code, 'No such resource, or you are not allowed to see it.');
  return parsed.data;
}
