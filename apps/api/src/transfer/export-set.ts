import type { EntityManager } from '@mikro-orm/postgresql';
import { EXPORT_CSV_COLUMNS, REACTION_SET_FILE_FORMAT, REACTION_SET_FILE_VERSION, type ReactionSetDetail, type ReactionSetFile } from '@tallus/contracts';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { buildSnapshot } from '../review/build-snapshot';
import { writeCsv } from '../site-data/csv-table';

/**
 * A set as a Tallus reaction-set file (format version 1): its fields, reactions,
 * net reactions (members by index) and the team species its reactions use.
 * Computed results are left out: whoever imports the file recomputes them.
 */
export async function exportSetJson(em: EntityManager, setId: string): Promise<ReactionSetFile> {
  const detail = await getReactionSet(em, setId);
  const snapshot = await buildSnapshot(em, detail);
  const indexOf = new Map(detail.reactions.map((reaction, index) => [reaction.id, index]));
  return {
    format: REACTION_SET_FILE_FORMAT,
    version: REACTION_SET_FILE_VERSION,
    exportedAt: new Date().toISOString(),
    set: { name: detail.name, description: detail.description, site: detail.site },
    reactions: detail.reactions.map(({ name, kind, equation, reference, citation, notes }) => ({ name, kind, equation, reference, citation, notes })),
    netReactions: detail.netReactions.map((net) => ({
      name: net.name,
      reactions: net.reactions.map((member) => ({ index: indexOf.get(member.reactionId)!, multiplier: member.multiplier })),
      cancel: net.cancel,
    })),
    species: snapshot.species
      .filter((species) => !species.id.startsWith('builtin:'))
      .map(({ name, formula, phase, oxidationStates, source }) => ({ name, formula, phase, oxidationStates, source, notes: '' })),
  };
}

/**
 * One CSV row per reaction, with its stored results (columns: {@link EXPORT_CSV_COLUMNS}),
 * CRLF line ends; names and notes are user text, so cells a spreadsheet would run
 * as formulas are guarded as in every CSV export.
 */
export function toCsv(detail: ReactionSetDetail): string {
  const rows = detail.reactions.map((reaction) => {
    const { result } = reaction;
    const values: Record<(typeof EXPORT_CSV_COLUMNS)[number], string | number> = {
      position: reaction.position + 1,
      name: reaction.name,
      kind: reaction.kind,
      equation: reaction.equation,
      reference: result.protonBudget?.reference ?? reaction.reference ?? '',
      status: result.status,
      balanced_equation: result.balancedEquation ?? '',
      proton_per_mole: result.protonBudget?.perMole ?? '',
      proton_mol_per_kg: result.protonBudget?.perKg ?? '',
      electrons_transferred: result.electrons?.transferred ?? '',
      o2_demand: result.electrons?.o2Demand ?? '',
      residuals: Object.entries(result.residuals).filter(([, value]) => value !== '0').map(([label, value]) => `${label}=${value}`).join('; '),
      citation: reaction.citation,
      notes: reaction.notes,
    };
    return EXPORT_CSV_COLUMNS.map((column) => values[column]);
  });
  return writeCsv(EXPORT_CSV_COLUMNS, rows, { newline: '\r\n' });
}
