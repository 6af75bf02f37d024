import type { Ref } from '@mikro-orm/core';
import type { Actor } from '@tallus/contracts';
import type { User } from './user.entity';

/**
 * A user as records name them, from a populated reference.
 *
 * @param user a loaded (populated) reference, or null
 * @throws Error when the reference was not populated (a bug)
 */
export function toActor(user: Ref<User> | User | null | undefined): Actor | null {
  if (!user) return null;
  const entity = 'getEntity' in user ? user.getEntity() : user;
  return { id: entity.id, displayName: entity.displayName };
}
