import type { EntityManager } from '@mikro-orm/postgresql';
import type { OxidationStateMap } from '@tallus/chem';
import { BUILTIN_SPECIES } from './builtin-species';
import { Species } from './species.entity';

/**
 * The explicit oxidation states a team's reactions are checked with: those of
 * the built-in catalogue (pyrite, magnetite, …), overridden by the team's own
 * species, keyed by formula as libs/chem's `checkEquation` takes them.
 *
 * @param em an EntityManager (inside the write's transaction, so the states are those of the save)
 * @param teamId the team
 */
export async function loadOxidationStates(em: EntityManager, teamId: string): Promise<OxidationStateMap> {
  const map: Record<string, Record<string, string>> = {};
  for (const species of BUILTIN_SPECIES) {
    if (species.oxidationStates) map[species.formula] = { ...species.oxidationStates };
  }
  const teamSpecies = await em.find(Species, { team: teamId, oxidationStates: { $ne: null } }, { fields: ['formula', 'oxidationStates'] });
  for (const species of teamSpecies) {
    if (species.oxidationStates) map[species.formula] = { ...species.oxidationStates };
  }
  return map;
}
