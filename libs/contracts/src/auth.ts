import { z } from 'zod';
import { roleSchema } from './roles';

/** An e-mail address, trimmed and lower-cased before it is checked. */
export const emailSchema = z.string().trim().toLowerCase().max(254).pipe(z.email());

/**
 * A new password: 10 to 72 characters. bcrypt reads at most 72 bytes, so a
 * longer one would be silently cut; it is refused instead.
 */
export const newPasswordSchema = z
  .string()
  .min(10)
  .max(72)
  .refine((password) => new TextEncoder().encode(password).length <= 72, {
    message: 'Password must be at most 72 bytes in UTF-8',
  });

/** A display name: 1 to 80 characters after trimming. */
export const displayNameSchema = z.string().trim().min(1).max(80);

/** Body of `POST /api/auth/register`. */
export const registerRequestSchema = z.object({
  email: emailSchema,
  password: newPasswordSchema,
  displayName: displayNameSchema,
});
export type RegisterRequest = z.infer<typeof registerRequestSchema>;

/** Body of `POST /api/auth/login`. The password is only required, not re-checked for length. */
export const loginRequestSchema = z.object({
  email: emailSchema,
  password: z.string().min(1).max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** A user as every response shows it. */
export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
});
export type User = z.infer<typeof userSchema>;

/** Answer of register (201) and login (200): a bearer token and its user. */
export const authSessionSchema = z.object({
  /** JSON Web Token (HS256); send it as `Authorization: Bearer <token>`. */
  token: z.string(),
  user: userSchema,
});
export type AuthSession = z.infer<typeof authSessionSchema>;

/** One team the current user belongs to. */
export const membershipSchema = z.object({
  teamId: z.uuid(),
  teamName: z.string(),
  role: roleSchema,
});
export type Membership = z.infer<typeof membershipSchema>;

/** Answer of `GET /api/auth/me`. */
export const meResponseSchema = z.object({
  user: userSchema,
  memberships: z.array(membershipSchema),
});
export type MeResponse = z.infer<typeof meResponseSchema>;
