import type { EntityManager } from '@mikro-orm/postgresql';
import type { RegisterRequest } from '@tallus/contracts';
import bcrypt from 'bcryptjs';
import { ConflictError } from '../errors/app-errors';
import { User } from '../users/user.entity';

/**
 * Creates an account.
 *
 * @param em request-scoped EntityManager
 * @param input parsed body: e-mail (lower-cased), password, display name
 * @param bcryptCost bcrypt cost factor (≥ 10)
 * @throws ConflictError AUTH_EMAIL_TAKEN when the address already has an account
 */
export async function registerUser(em: EntityManager, input: RegisterRequest, bcryptCost: number): Promise<User> {
  if ((await em.count(User, { email: input.email })) > 0) {
    throw new ConflictError('AUTH_EMAIL_TAKEN', 'An account with this e-mail address already exists.');
  }
  const passwordHash = await bcrypt.hash(input.password, bcryptCost);
  const user = em.create(User, { email: input.email, displayName: input.displayName, passwordHash });
  await em.flush();
  return user;
}
