import type { EntityManager } from '@mikro-orm/postgresql';
import type { OxidationStateMap } from '@tallus/chem';
import { BUILTIN_SPECIES } from './builtin-species';
import { Species } from './species.entity';

/** The built-in catalogue's explicit states by formula, built once: the catalogue is a constant. */
const BUILTIN_OXIDATION_STATES: Readonly<Record<string, Readonly<Record<string, string>>>> = Object.freeze(
  Object.fromEntries(BUILTIN_SPECIES.flatMap((species) => (species.oxidationStates ? [[species.formula, Object.freeze({ ...species.oxidationStates })]] : []))),
);

/**
 * The explicit oxidation states a team's reactions are checked with: those of
 * the built-in catalogue (pyrite, magnetite, …), overridden by the team's own
 * species, keyed by formula as libs/chem's `checkEquation` takes them.
 *
 * @param em an EntityManager (inside the write's transaction, so the states are those of the save)
 * @param teamId the team
 */
export async function loadOxidationStates(em: EntityManager, teamId: string): Promise<OxidationStateMap> {
  const teamSpecies = await em.find(Species, { team: teamId, oxidationStates: { $ne: null } }, { fields: ['formula', 'oxidationStates'] });
  if (teamSpecies.length === 0) return BUILTIN_OXIDATION_STATES;
  const map: Record<string, Readonly<Record<string, string>>> = { ...BUILTIN_OXIDATION_STATES };
  for (const species of teamSpecies) {
    if (species.oxidationStates) map[species.formula] = { ...species.oxidationStates };
  }
  return map;
}
