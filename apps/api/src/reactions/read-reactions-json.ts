import type { EntityManager } from '@mikro-orm/postgresql';

/**
 * A set's reactions with their stored results as the JSON text of the
 * `reactions` array of a set answer (same fields as {@link readReactionViews}),
 * built by PostgreSQL in one query. The GET of a set passes this text through:
 * for a set of hundreds of reactions, parsing the jsonb columns into objects
 * and serialising them again was most of the request's CPU time.
 */
export async function readReactionsJson(em: EntityManager, setId: string): Promise<string> {
  const rows = await em.execute<Array<{ reactions: string }>>(
    `select coalesce(json_agg(json_build_object(
        'id', id, 'setId', set_id, 'position', position, 'name', name, 'kind', kind, 'equation', equation,
        'reference', reference, 'citation', citation, 'notes', notes,
        'result', balance || jsonb_build_object('status', status, 'residuals', residuals, 'electrons', electron_budget, 'protonBudget', proton_budget),
        'version', version,
        'updatedAt', to_char(updated_at at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')
      ) order by position, id), '[]'::json)::text as reactions
       from reactions where set_id = ?`,
    [setId],
  );
  return rows[0]?.reactions ?? '[]';
}
