import type { EntityManager } from '@mikro-orm/postgresql';
import type { LoginRequest } from '@tallus/contracts';
import bcrypt from 'bcryptjs';
import { AuthenticationError } from '../errors/app-errors';
import { User } from '../users/user.entity';

/**
 * A bcrypt hash of a random password, compared against when the address is
 * unknown, so that the answer takes about as long as for a known address
 * (cost 12, the default BCRYPT_COST).
 */
const TIMING_DECOY_HASH = '$2b$12$8KTAdaL7GDDTVOX8j4/xwugEK9GW1Xzp5DzF0GpS04vXCZ4XHIzuG';

/**
 * Checks an e-mail address and password.
 *
 * @returns the user they belong to
 * @throws AuthenticationError AUTH_INVALID_CREDENTIALS when either is wrong (the answer does not say which)
 */
export async function signIn(em: EntityManager, input: LoginRequest): Promise<User> {
  const user = await em.findOne(User, { email: input.email }, { populate: ['passwordHash'] });
  const isMatch = await bcrypt.compare(input.password, user?.passwordHash ?? TIMING_DECOY_HASH);
  if (!user || !isMatch) throw new AuthenticationError('AUTH_INVALID_CREDENTIALS', 'The e-mail address or the password is wrong.');
  return user;
}
