import { describe, expect, it } from 'vitest';
import { emailSchema, newPasswordSchema, registerRequestSchema } from './auth';

describe('auth schemas', () => {
  it('When an e-mail address has spaces and capitals, then it is trimmed and lower-cased', () => {
    expect(emailSchema.parse('  Owner@Kestrel.Example ')).toBe('owner@kestrel.example');
  });

  it.each([
    ['nine chars', '123456789', false],
    ['ten chars', '1234567890', true],
    ['72 ASCII chars', 'a'.repeat(72), true],
    ['73 ASCII chars', 'a'.repeat(73), false],
    ['40 two-byte chars (80 bytes)', 'é'.repeat(40), false],
  ])('When a new password has %s, then it is accepted: %s', (_label, password, isAccepted) => {
    expect(newPasswordSchema.safeParse(password).success).toBe(isAccepted);
  });

  it('When a register body lacks every field, then each field path is reported', () => {
    const result = registerRequestSchema.safeParse({});

    expect(result.success).toBe(false);
    const paths = result.error?.issues.map((issue) => issue.path.join('.')).sort();
    expect(paths).toEqual(['displayName', 'email', 'password']);
  });
});
