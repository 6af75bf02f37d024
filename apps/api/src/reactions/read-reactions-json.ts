import type { EntityManager } from '@mikro-orm/postgresql';
import type { BalanceStatus, StatusCounts } from '@tallus/contracts';
import { isoTimestampSql } from '../db/iso-timestamp-sql';

/** A set's reactions as JSON text, with the set version they belong to and their counts by status. */
export interface ReactionsJson {
  /** The set's version in the same snapshot as the reactions. */
  version: number;
  /** JSON text of the `reactions` array of a set answer. */
  reactions: string;
  counts: Partial<StatusCounts>;
}

/**
 * A set's reactions with their stored results as the JSON text of the
 * `reactions` array of a set answer (same fields as `readReactionViews`),
 * built by PostgreSQL in one statement together with the set's version and the
 * counts by status, so all three come from one snapshot. The GET of a set passes
 * the text through: for a set of hundreds of reactions, parsing the jsonb columns
 * into objects and serialising them again was most of the request's CPU time.
 *
 * @returns `undefined` when the set does not exist
 */
export async function readReactionsJson(em: EntityManager, setId: string): Promise<ReactionsJson | undefined> {
  const rows = await em.execute<Array<{ version: number; reactions: string; counts: Record<BalanceStatus, number> | null }>>(
    `select s.version,
       (select coalesce(json_agg(json_build_object(
          'id', r.id, 'setId', r.set_id, 'position', r.position, 'name', r.name, 'kind', r.kind, 'equation', r.equation,
          'reference', r.reference, 'citation', r.citation, 'notes', r.notes,
          'result', r.balance || jsonb_build_object('status', r.status, 'residuals', r.residuals, 'electrons', r.electron_budget, 'protonBudget', r.proton_budget),
          'version', r.version,
          'updatedAt', ${isoTimestampSql('r.updated_at')}
        ) order by r.position, r.id), '[]'::json)::text from reactions r where r.set_id = s.id) as reactions,
       (select json_object_agg(c.status, c.count) from
          (select status, count(*) as count from reactions where set_id = s.id group by status) c) as counts
     from reaction_sets s where s.id = ?`,
    [setId],
  );
  const row = rows[0];
  return row ? { version: Number(row.version), reactions: row.reactions, counts: row.counts ?? {} } : undefined;
}
