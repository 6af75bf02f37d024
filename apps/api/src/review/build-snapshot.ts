import type { EntityManager } from '@mikro-orm/postgresql';
import { isChemError, parseEquation, parseFormula, speciesKey } from '@tallus/chem';
import type { ReactionSetDetail, SnapshotSpecies } from '@tallus/contracts';
import { Species } from '../species/species.entity';
import { BUILTIN_SPECIES_VIEWS, toSpeciesView } from '../species/to-species-view';
import type { RevisionSnapshot } from './revision.entity';

/**
 * What a revision freezes of a set: its fields, its reactions and net reactions
 * with their stored results, and the catalogue species (team's first, then
 * built-in) whose formula appears in one of its reactions, with their formulas,
 * oxidation states and sources as they are now.
 *
 * @param tx EntityManager of the approving transaction
 * @param detail the set as {@link getReactionSet} read it in that transaction
 */
export async function buildSnapshot(tx: EntityManager, detail: ReactionSetDetail): Promise<RevisionSnapshot> {
  const used = new Set(detail.reactions.flatMap((reaction) => speciesKeysOf(reaction.equation)));
  const teamSpecies = await tx.find(Species, { team: detail.teamId }, { orderBy: { name: 'asc' } });
  const species: SnapshotSpecies[] = [];
  const seen = new Set<string>();
  const candidates = [...teamSpecies.map(toSpeciesView), ...BUILTIN_SPECIES_VIEWS];
  for (const candidate of candidates) {
    const key = speciesKey(parseFormula(candidate.formula));
    if (!used.has(key) || seen.has(key)) continue;
    seen.add(key);
    const { id, name, formula, phase, oxidationStates, source, molarMass } = candidate;
    species.push({ id, name, formula, phase, oxidationStates, source, molarMass });
  }
  return {
    set: { name: detail.name, description: detail.description, site: detail.site },
    reactions: detail.reactions,
    netReactions: detail.netReactions,
    species,
  };
}

function speciesKeysOf(equation: string): string[] {
  try {
    return parseEquation(equation).terms.map((term) => speciesKey(term.formula));
  } catch (error) {
    // A reaction whose text does not parse uses no catalogue species that can be named.
    if (isChemError(error)) return [];
    throw error;
  }
}
