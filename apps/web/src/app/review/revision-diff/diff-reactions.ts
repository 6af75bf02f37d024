/** What a reaction diff compares of each reaction. */
export interface DiffableReaction {
  id: string;
  name: string;
  kind: string;
  equation: string;
  reference: string | null;
  citation: string;
  notes: string;
}

/** One row of the difference between two versions of a set. */
export interface ReactionChange {
  change: 'added' | 'removed' | 'changed' | 'unchanged';
  name: string;
  /** Fields that differ (for `changed`), in screen words. */
  fields: string[];
  before: DiffableReaction | null;
  after: DiffableReaction | null;
}

const FIELDS: readonly (keyof DiffableReaction)[] = ['name', 'kind', 'equation', 'reference', 'citation', 'notes'];

/**
 * The difference between two versions of a set's reactions: reactions are matched by id (a
 * revision keeps the ids of the set), then by name; the rows follow the newer order, removed
 * reactions last.
 *
 * @param before the older reactions, in order
 * @param after the newer reactions, in order
 */
export function diffReactions(before: readonly DiffableReaction[], after: readonly DiffableReaction[]): ReactionChange[] {
  const unmatched = [...before];
  const rows: ReactionChange[] = after.map((next) => {
    const index = findMatch(unmatched, next);
    if (index < 0) return { change: 'added', name: next.name, fields: [], before: null, after: next };
    const [previous] = unmatched.splice(index, 1);
    const fields = FIELDS.filter((field) => (previous[field] ?? '') !== (next[field] ?? ''));
    return { change: fields.length > 0 ? 'changed' : 'unchanged', name: next.name, fields, before: previous, after: next };
  });
  return [...rows, ...unmatched.map((previous): ReactionChange => ({ change: 'removed', name: previous.name, fields: [], before: previous, after: null }))];
}

function findMatch(candidates: readonly DiffableReaction[], target: DiffableReaction): number {
  const byId = candidates.findIndex((candidate) => candidate.id === target.id);
  return byId >= 0 ? byId : candidates.findIndex((candidate) => candidate.name === target.name);
}
