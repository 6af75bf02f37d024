import type { Role } from '@tallus/contracts';
import { expect } from 'vitest';
import { addMember, createTeam, registerUser, type SignedInUser, type TestApp } from './test-app';

/** Who calls a route in a role matrix: a member of each role, or a user of another team. */
export type Actor = Role | 'outsider';

/** The actors in the order every matrix lists them. */
export const ACTORS: readonly Actor[] = ['owner', 'reviewer', 'editor', 'viewer', 'outsider'];

/** Expected status of a route for each actor. */
export type Statuses = Record<Actor, number>;

/** The `[route, actor, status]` rows of a matrix, for `it.each`. */
export function matrixCases(matrix: Record<string, Statuses>): Array<readonly [string, Actor, number]> {
  return Object.entries(matrix).flatMap(([route, statuses]) => ACTORS.map((actor) => [route, actor, statuses[actor]] as const));
}

/**
 * Registers a team's owner, reviewer, editor and viewer (into `actors`), an editor `author` who
 * arranges the records the actors act on, and an outsider with a team of their own.
 */
export async function enrolMatrixTeam(testApp: TestApp, actors: Record<Actor, SignedInUser>, teamName: string): Promise<{ teamId: string; author: SignedInUser }> {
  actors.owner = await registerUser(testApp.app, 'owner');
  const teamId = await createTeam(testApp.app, actors.owner, teamName);
  for (const role of ['reviewer', 'editor', 'viewer'] as const) {
    actors[role] = await registerUser(testApp.app, role);
    await addMember(testApp, teamId, actors[role], role);
  }
  const author = await registerUser(testApp.app, 'author');
  await addMember(testApp, teamId, author, 'editor');
  actors.outsider = await registerUser(testApp.app, 'outsider');
  await createTeam(testApp.app, actors.outsider, 'Elsewhere');
  return { teamId, author };
}

/** Asserts an answer's status and, for refusals, the code that goes with it. */
export function expectMatrixAnswer(response: { status: number; body: { code?: string } }, status: number): void {
  expect(response.status, JSON.stringify(response.body)).toBe(status);
  if (status === 403) expect(response.body.code).toBe('TEAM_ROLE_REQUIRED');
  if (status === 404) expect(response.body.code).toMatch(/_NOT_FOUND$/);
}
