import type { EntityManager } from '@mikro-orm/postgresql';
import type { BalanceStatus, StatusCounts } from '@tallus/contracts';
import { emptyStatusCounts } from './to-set-view';

/**
 * Reactions of each set counted by stored balance status, in one grouped query.
 *
 * @returns counts by set id; every asked id is present
 */
export async function countStatuses(em: EntityManager, setIds: readonly string[]): Promise<Map<string, StatusCounts>> {
  const counts = new Map(setIds.map((id) => [id, emptyStatusCounts()]));
  if (setIds.length === 0) return counts;
  const rows = await em.execute<Array<{ set_id: string; status: BalanceStatus; count: string }>>(
      `select set_id, status, count(*) as count from reactions where set_id in (${setIds.map(() => '?').join(', ')}) group by set_id, status`,
      [...setIds],
    );
  for (const row of rows) {
    const forSet = counts.get(row.set_id);
    if (forSet) forSet[row.status] = Number(row.count);
  }
  return counts;
}
