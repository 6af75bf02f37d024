import { CHEM_ERROR_CODES } from '@tallus/chem';
import { z } from 'zod';

/**
 * The API's own machine-readable codes, plus the two codes the client uses
 * when no problem body arrives (`NETWORK`, `UNKNOWN`). The chemistry engine's
 * codes join them in {@link ERROR_CODES}.
 */
export const API_ERROR_CODES = [
  /** The body, query or a parameter does not match its schema (400, with `issues`). */
  'REQUEST_INVALID',
  /** The body is not valid JSON (400). */
  'REQUEST_MALFORMED_JSON',
  /** The request body is larger than the API accepts (413). */
  'REQUEST_TOO_LARGE',
  /** The route needs a signed-in user and no token came (401). */
  'AUTH_REQUIRED',
  /** The bearer token is malformed, forged, expired, or names a user that no longer exists (401). */
  'AUTH_INVALID_TOKEN',
  /** E-mail address or password is wrong (401). */
  'AUTH_INVALID_CREDENTIALS',
  /** Registration with an e-mail address that already has an account (409). */
  'AUTH_EMAIL_TAKEN',
  /** Too many sign-in or registration attempts; retry later (429). */
  'AUTH_RATE_LIMITED',
  /** The team does not exist or the caller is not a member (404). */
  'TEAM_NOT_FOUND',
  /** The caller is a member, but their role is too low for this action (403). */
  'TEAM_ROLE_REQUIRED',
  /** The change would leave the team without an owner (409). */
  'TEAM_LAST_OWNER',
  /** No such member in this team (404). */
  'MEMBER_NOT_FOUND',
  /** No invitation matches the token (404). */
  'INVITATION_NOT_FOUND',
  /** The invitation was already accepted (409). */
  'INVITATION_USED',
  /** The invitation is past its expiry (410). */
  'INVITATION_EXPIRED',
  /** The signed-in user's e-mail address is not the invited one (403). */
  'INVITATION_WRONG_USER',
  /** The invited address already belongs to a member of the team (409). */
  'INVITATION_ALREADY_MEMBER',
  /** No route or resource at this address (404). */
  'NOT_FOUND',
  /** A concurrent or duplicate write was refused (409). */
  'CONFLICT',
  /** The database does not answer; `GET /api/health` says so (503). */
  'DATABASE_UNAVAILABLE',
  /** The server failed; the body carries a request id for the logs (500). */
  'INTERNAL_ERROR',
  /** Client only: the request never got an answer. */
  'NETWORK',
  /** Client only: the answer was an error without a problem body. */
  'UNKNOWN',
] as const;

/** One of {@link API_ERROR_CODES}. */
export type ApiErrorCode = (typeof API_ERROR_CODES)[number];

/** Every code a problem body (or one of its issues) may carry: the API's and the chemistry engine's. */
export const ERROR_CODES = [...API_ERROR_CODES, ...CHEM_ERROR_CODES] as const;

/** One of {@link ERROR_CODES}. */
export type ErrorCode = (typeof ERROR_CODES)[number];

/** Parses an error code. */
export const errorCodeSchema = z.enum(ERROR_CODES);
