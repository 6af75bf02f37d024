import type { Role } from '@tallus/contracts';

/** How a role appears on screen: a word, an icon beside it, and what it allows ("You can …"). */
export interface RoleView {
  role: Role;
  label: string;
  icon: string;
  rights: string;
}

/** Every role, from most to least rights. */
export const ROLE_VIEWS: readonly RoleView[] = [
  { role: 'owner', label: 'Owner', icon: 'shield_person', rights: 'do all a reviewer does, and manage members, invitations and publishing' },
  { role: 'reviewer', label: 'Reviewer', icon: 'rate_review', rights: 'write drafts, and vet or return reaction sets' },
  { role: 'editor', label: 'Editor', icon: 'edit_note', rights: 'read the team’s work and write drafts' },
  { role: 'viewer', label: 'Viewer', icon: 'visibility', rights: 'read the team’s work' },
];

/**
 * The screen view of one role.
 *
 * @param role a role from the API
 */
export function roleView(role: Role): RoleView {
  return ROLE_VIEWS.find((view) => view.role === role) ?? ROLE_VIEWS[ROLE_VIEWS.length - 1];
}

/** Rank of each role: a higher rank includes every right of a lower one (as the API ranks them). */
const ROLE_RANK: Readonly<Record<Role, number>> = { owner: 4, reviewer: 3, editor: 2, viewer: 1 };

/**
 * Whether a member with role `actual` may do what needs role `required`.
 * Kept here rather than imported from the contracts so that zod stays out of the bundle.
 *
 * @param actual the member's role
 * @param required the weakest role that may act
 */
export function hasRoleAtLeast(actual: Role, required: Role): boolean {
  return ROLE_RANK[actual] >= ROLE_RANK[required];
}
