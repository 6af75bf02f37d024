import { massToJson } from '@tallus/chem';
import type { Species as SpeciesView } from '@tallus/contracts';
import { BUILTIN_SPECIES, type BuiltinSpecies } from './builtin-species';
import type { Species } from './species.entity';

/** A team species as responses show it. */
export function toSpeciesView(species: Species): SpeciesView {
  return {
    id: species.id,
    teamId: species.team.id,
    isBuiltin: false,
    name: species.name,
    formula: species.formula,
    phase: species.phase,
    oxidationStates: species.oxidationStates ?? null,
    notes: species.notes,
    source: species.source,
    molarMass: Number(species.molarMass),
    composition: species.composition,
    charge: species.charge,
    version: species.version,
    createdAt: species.createdAt.toISOString(),
    updatedAt: species.updatedAt.toISOString(),
  };
}

/**
 * The built-in catalogue as responses show it (id `builtin:<key>`, mass and composition
 * computed from the formula), computed once: the catalogue is a constant. Frozen, as
 * every request shares it.
 */
export const BUILTIN_SPECIES_VIEWS: readonly SpeciesView[] = Object.freeze(BUILTIN_SPECIES.map(toBuiltinSpeciesView));

function toBuiltinSpeciesView(species: BuiltinSpecies): SpeciesView {
  const mass = massToJson(species.formula);
  return Object.freeze({
    id: `builtin:${species.key}`,
    teamId: null,
    isBuiltin: true,
    name: species.name,
    formula: species.formula,
    phase: species.phase,
    oxidationStates: species.oxidationStates ? Object.freeze({ ...species.oxidationStates }) : null,
    notes: species.notes ?? '',
    source: species.source,
    molarMass: mass.molarMass,
    composition: Object.freeze(mass.composition),
    charge: mass.charge,
    version: 0,
    createdAt: null,
    updatedAt: null,
  });
}
