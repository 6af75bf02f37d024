import type { OxidationStateMap } from '@tallus/chem';
import type { Species } from '@tallus/contracts';

/**
 * The explicit oxidation states the server checks a team's reactions with: the built-in
 * catalogue's, then the team's own species, which win for the same formula. Species without
 * explicit states are left to the engine's rules.
 *
 * @param builtin the built-in starter catalogue
 * @param team the team's own species
 */
export function toOxidationStateMap(builtin: readonly Species[], team: readonly Species[]): OxidationStateMap {
  const map: Record<string, Record<string, string>> = {};
  for (const species of [...builtin, ...team]) {
    if (species.oxidationStates) map[species.formula] = { ...species.oxidationStates };
  }
  return map;
}
