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
  /** No such team species, or not in a team of the caller's (404). */
  'SPECIES_NOT_FOUND',
  /** A species of the same name or formula already exists in the team (409). */
  'SPECIES_DUPLICATE',
  /** No such reaction set, or not in a team of the caller's (404). */
  'REACTION_SET_NOT_FOUND',
  /** No such reaction, or not in a team of the caller's (404). */
  'REACTION_NOT_FOUND',
  /** No such net reaction, or not in a team of the caller's (404). */
  'NET_REACTION_NOT_FOUND',
  /** A net reaction names a reaction that is not in its set (400, with the path). */
  'NET_REACTION_UNKNOWN_REACTION',
  /** The reorder list is not exactly the set's reactions (409: reload and retry). */
  'REORDER_MISMATCH',
  /** The record changed since the version the request carries (409: reload, then retry). */
  'VERSION_CONFLICT',
  /** The set is under review: no edits until it is approved or returned (409). */
  'REVIEW_LOCKED',
  /** The review step does not apply to the set's current state (409), e.g. approving a draft. */
  'REVIEW_STATE_INVALID',
  /** A set without reactions cannot be submitted (409). */
  'REVIEW_EMPTY_SET',
  /** The submitter of a set cannot approve or return it (403). */
  'REVIEW_SELF_APPROVAL',
  /** A set with vetted revisions is kept: revisions stay readable forever (409). */
  'REACTION_SET_HAS_REVISIONS',
  /** No such revision of the set (404). */
  'REVISION_NOT_FOUND',
  /** Only a vetted set can be published (409). */
  'PUBLISH_NOT_VETTED',
  /** This revision is already in the library (409). */
  'PUBLISH_ALREADY_PUBLISHED',
  /** No such library publication (404). */
  'PUBLICATION_NOT_FOUND',
  /** No such water analysis, or not in a team of the caller's (404). */
  'WATER_ANALYSIS_NOT_FOUND',
  /** The team already has a water analysis of that sample name (409). */
  'WATER_ANALYSIS_DUPLICATE',
  /** The water analysis is used by mass-balance models; delete or change them first (409). */
  'WATER_ANALYSIS_IN_USE',
  /** No such mass-balance model, or not in a team of the caller's (404). */
  'MASS_BALANCE_MODEL_NOT_FOUND',
  /** A model names a water analysis that is not in its team (400, with the path). */
  'MASS_BALANCE_UNKNOWN_WATER',
  /** A model phase names a species that is not in the team's or the built-in catalogue (400, with the path). */
  'MASS_BALANCE_UNKNOWN_SPECIES',
  /** No such rock sample, or not in a team of the caller's (404). */
  'ROCK_SAMPLE_NOT_FOUND',
  /** The team already has a rock sample of that name (409). */
  'ROCK_SAMPLE_DUPLICATE',
  /** The weathering reaction of a recalculated formula does not balance, so it cannot be added to a set (409). */
  'MINERAL_FORMULA_NO_REACTION',
  /** The import file is malformed; `issues` lists every problem with its path (400). Nothing was saved. */
  'IMPORT_INVALID',
  /** Too many computation requests; retry later (429). */
  'CHEM_RATE_LIMITED',
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
