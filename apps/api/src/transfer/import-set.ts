import type { EntityManager } from '@mikro-orm/postgresql';
import { reactionSetFileSchema, type ReactionSetDetail, type ReactionSetFile } from '@tallus/contracts';
import { BadRequestError, ChemInputError, type RequestIssue } from '../errors/app-errors';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { computeSpeciesFields } from '../species/species-fields';
import { createSetFromContent, type SetContent } from './create-set-from-content';

/**
 * Reads a Tallus reaction-set file into content ready to save, checking
 * everything first: JSON syntax, the schema, net-reaction members (index in
 * range, or a name that names exactly one reaction), species formulas.
 * Equations are not refused: one that does not parse is saved as `invalid`,
 * as the editor would save it.
 *
 * @throws BadRequestError IMPORT_INVALID with every issue and its JSON path
 */
export function readImportFile(buffer: Buffer): SetContent {
  let json: unknown;
  try {
    json = JSON.parse(buffer.toString('utf8'));
  } catch (error) {
    throw invalid([{ code: 'JSON_SYNTAX', message: error instanceof Error ? error.message : 'Not JSON', path: [] }]);
  }
  const parsed = reactionSetFileSchema.safeParse(json);
  if (!parsed.success) {
    throw invalid(parsed.error.issues.map((issue) => ({ code: issue.code, message: issue.message, path: issue.path.map((key) => (typeof key === 'symbol' ? String(key) : key)) })));
  }
  const file = parsed.data;
  const issues: RequestIssue[] = [...memberIssues(file), ...speciesIssues(file)];
  if (issues.length > 0) throw invalid(issues);
  return toContent(file);
}

/**
 * Imports a file as a new draft set of the team, in one transaction: nothing is saved when anything fails.
 *
 * @throws BadRequestError IMPORT_INVALID (see {@link readImportFile})
 */
export async function importSet(em: EntityManager, input: { teamId: string; actorId: string; file: Buffer }): Promise<ReactionSetDetail> {
  const content = readImportFile(input.file);
  return em.transactional(async (tx) => {
    const setId = await createSetFromContent(tx, content, { teamId: input.teamId, actorId: input.actorId, action: 'reaction_set.imported' });
    return getReactionSet(tx, setId);
  });
}

function invalid(issues: RequestIssue[]): BadRequestError {
  return new BadRequestError('IMPORT_INVALID', `The file is not a valid Tallus reaction set (${issues.length} problem${issues.length === 1 ? '' : 's'}); nothing was saved.`, issues);
}

function memberIssues(file: ReactionSetFile): RequestIssue[] {
  return file.netReactions.flatMap((net, netIndex) =>
    net.reactions.flatMap((member, memberIndex): RequestIssue[] => {
      const path = ['netReactions', netIndex, 'reactions', memberIndex];
      if (member.index !== undefined) {
        return member.index < file.reactions.length ? [] : [{ code: 'IMPORT_UNKNOWN_REACTION', message: `No reaction ${member.index} (the file has ${file.reactions.length}).`, path: [...path, 'index'] }];
      }
      const matches = file.reactions.filter((reaction) => reaction.name === member.name).length;
      return matches === 1 ? [] : [{ code: 'IMPORT_UNKNOWN_REACTION', message: matches === 0 ? `No reaction named "${member.name}".` : `${matches} reactions are named "${member.name}": use index.`, path: [...path, 'name'] }];
    }),
  );
}

function speciesIssues(file: ReactionSetFile): RequestIssue[] {
  return file.species.flatMap((species, index): RequestIssue[] => {
    try {
      computeSpeciesFields(species.formula, species.oxidationStates);
      return [];
    } catch (error) {
      if (!(error instanceof ChemInputError)) throw error;
      const { code, message, span } = error.chemError;
      return [{ code, message, path: ['species', index, ...error.path], span: { start: span.start, end: span.end } }];
    }
  });
}

function toContent(file: ReactionSetFile): SetContent {
  return {
    set: file.set,
    reactions: file.reactions,
    species: file.species,
    netReactions: file.netReactions.map((net) => ({
      name: net.name,
      cancel: net.cancel,
      members: net.reactions.map((member) => ({
        index: member.index ?? file.reactions.findIndex((reaction) => reaction.name === member.name),
        multiplier: member.multiplier ?? null,
      })),
    })),
  };
}
