import { describe, expect, it } from 'vitest';
import { hasRole, ROLES, type Role } from './roles';

describe('hasRole', () => {
  it.each<[Role, Role, boolean]>([
    ['owner', 'owner', true],
    ['owner', 'viewer', true],
    ['reviewer', 'owner', false],
    ['reviewer', 'reviewer', true],
    ['reviewer', 'editor', true],
    ['editor', 'reviewer', false],
    ['editor', 'editor', true],
    ['editor', 'viewer', true],
    ['viewer', 'editor', false],
    ['viewer', 'viewer', true],
  ])('When a %s acts where %s is required, then the answer is %s', (actual, required, expected) => {
    expect(hasRole(actual, required)).toBe(expected);
  });

  it('When every role is compared with itself, then each one suffices', () => {
    expect(ROLES.every((role) => hasRole(role, role))).toBe(true);
  });
});
