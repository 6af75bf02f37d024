import { z } from 'zod';

/**
 * A member's rights in one team, strongest first (DESIGN.md §5):
 * `viewer` reads; `editor` writes drafts; `reviewer` also vets and returns;
 * `owner` also manages members, invitations and publishing.
 */
export const ROLES = ['owner', 'reviewer', 'editor', 'viewer'] as const;

/** One of {@link ROLES}. */
export type Role = (typeof ROLES)[number];

/** Parses a role name; anything outside {@link ROLES} fails. */
export const roleSchema = z.enum(ROLES);

/** Rank of each role: a higher rank includes every right of a lower one. */
const ROLE_RANK: Readonly<Record<Role, number>> = { owner: 4, reviewer: 3, editor: 2, viewer: 1 };

/**
 * Whether a member with role `actual` may do what needs role `required`.
 *
 * @param actual the member's role in the team
 * @param required the weakest role that may act
 * @returns true when `actual` ranks at least as high as `required`
 * @example hasRole('reviewer', 'editor') // true
 */
export function hasRole(actual: Role, required: Role): boolean {
  return ROLE_RANK[actual] >= ROLE_RANK[required];
}
