import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * Which of these names a team's site records of one kind already use: one query for a whole
 * batch (a CSV import can hold thousands of rows).
 *
 * @param table the records' table; never user input
 */
export async function takenNames(em: EntityManager, table: 'water_analyses' | 'rock_samples', teamId: string, names: readonly string[]): Promise<Set<string>> {
  if (names.length === 0) return new Set();
  const rows = await em.execute<Array<{ name: string }>>(`select name from ${table} where team_id = ? and name in (?)`, [teamId, [...new Set(names)]]);
  return new Set(rows.map((row) => row.name));
}
