import type { User as UserView } from '@tallus/contracts';
import type { User } from './user.entity';

/** A user as responses show it: never the password hash. */
export function toUserView(user: User): UserView {
  return { id: user.id, email: user.email, displayName: user.displayName };
}
