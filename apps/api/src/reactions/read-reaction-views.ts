import type { EntityManager } from '@mikro-orm/postgresql';
import type { Reaction as ReactionView } from '@tallus/contracts';
import type { Reaction } from './reaction.entity';

/** One row of the reactions table as the driver returns it (jsonb parsed, timestamptz as Date). */
interface ReactionRow {
  id: string;
  set_id: string;
  position: number;
  name: string;
  kind: Reaction['kind'];
  equation: string;
  reference: string | null;
  citation: string;
  notes: string;
  status: Reaction['status'];
  residuals: Reaction['residuals'];
  proton_budget: Reaction['protonBudget'] | null;
  electron_budget: Reaction['electronBudget'] | null;
  balance: Reaction['balance'];
  version: number;
  updated_at: Date;
}

/**
 * A set's reactions with their stored results, in order, read in one query
 * straight into response views: no entities are built, since a set of
 * hundreds of reactions is only read here (the write paths load entities).
 *
 * @param em an EntityManager (inside a transaction, its connection is used)
 */
export async function readReactionViews(em: EntityManager, setId: string): Promise<ReactionView[]> {
  const rows = await em.execute<ReactionRow[]>(
    `select id, set_id, position, name, kind, equation, reference, citation, notes, status, residuals, proton_budget, electron_budget, balance, version, updated_at
       from reactions where set_id = ? order by position, id`,
    [setId],
  );
  return rows.map((row) => ({
    id: row.id,
    setId: row.set_id,
    position: row.position,
    name: row.name,
    kind: row.kind,
    equation: row.equation,
    reference: row.reference,
    citation: row.citation,
    notes: row.notes,
    result: { status: row.status, ...row.balance, residuals: row.residuals, electrons: row.electron_budget ?? null, protonBudget: row.proton_budget ?? null },
    version: row.version,
    updatedAt: new Date(row.updated_at).toISOString(),
  }));
}
