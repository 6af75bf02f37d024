import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { SPECIES_PHASES, type SpeciesOxidationStates } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';

/**
 * A species of a team's catalogue, on top of the built-in starter catalogue.
 * Molar mass, composition, charge and the identity key are computed from the
 * formula on every save, never typed.
 */
export const Species = defineEntity({
  name: 'Species',
  tableName: 'species',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    name: p.string().length(160),
    formula: p.string().length(200),
    phase: p.enum([...SPECIES_PHASES]),
    oxidationStates: p.json<SpeciesOxidationStates>().nullable(),
    notes: p.text().default(''),
    source: p.string().length(500).default(''),
    /** g/mol, IUPAC 2021 abridged atomic weights. */
    molarMass: p.double(),
    /** Exact atoms per formula unit as text, e.g. `{"Na": "31/50"}`. */
    composition: p.json<Record<string, string>>(),
    charge: p.string().length(40),
    /** libs/chem's phased species key: equal for formulas of the same species. */
    formulaKey: p.string().length(400),
  },
  uniques: [{ properties: ['team', 'name'] }, { properties: ['team', 'formulaKey'] }],
});

/** A species of a team's catalogue. */
export type Species = InferEntity<typeof Species>;
