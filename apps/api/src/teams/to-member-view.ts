import type { Member } from '@tallus/contracts';
import type { Membership } from './membership.entity';

/** A membership as the members routes show it. The user must be loaded. */
export function toMemberView(membership: Membership): Member {
  const user = membership.user.getEntity();
  return {
    userId: user.id,
    email: user.email,
    displayName: user.displayName,
    role: membership.role,
    joinedAt: membership.createdAt.toISOString(),
  };
}
