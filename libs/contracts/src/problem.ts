import { z } from 'zod';
import { errorCodeSchema } from './error-codes';

/** A span of characters in a text field: 0-based, end-exclusive offsets. */
export const textSpanSchema = z.object({
  start: z.number().int().nonnegative(),
  end: z.number().int().nonnegative(),
});

/** A 0-based, end-exclusive span of characters in a text field. */
export type TextSpan = z.infer<typeof textSpanSchema>;

/** One thing wrong with a request: which field (`path`), what, and for text where. */
export const problemIssueSchema = z.object({
  /** Machine-readable code of this issue, e.g. zod's `too_small` or a chemistry code. */
  code: z.string(),
  message: z.string(),
  /** Path of the field inside the body, query or params, e.g. `['email']` or `['reactions', 2, 'equation']`. */
  path: z.array(z.union([z.string(), z.number()])),
  span: textSpanSchema.optional(),
});

/** One thing wrong with a request. */
export type ProblemIssue = z.infer<typeof problemIssueSchema>;

/** An RFC 9457 problem body (`application/problem+json`) with Tallus's `code` and `issues`. */
export const problemSchema = z.object({
  /** URI that names the kind of problem: `urn:tallus:problem:<code in kebab case>`. */
  type: z.string(),
  title: z.string(),
  status: z.number().int(),
  detail: z.string(),
  code: errorCodeSchema,
  /** Id of the request in the server's logs. */
  requestId: z.string().optional(),
  issues: z.array(problemIssueSchema).optional(),
});

/** An RFC 9457 problem body with Tallus's `code` and `issues`. */
export type Problem = z.infer<typeof problemSchema>;

/**
 * The `type` URI of a problem with the given code.
 *
 * @example problemTypeFor('TEAM_LAST_OWNER') // 'urn:tallus:problem:team-last-owner'
 */
export function problemTypeFor(code: string): string {
  return `urn:tallus:problem:${code.toLowerCase().replaceAll('_', '-')}`;
}
