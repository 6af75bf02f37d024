import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateSpeciesRequest, Species as SpeciesView, UpdateSpeciesRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { ConflictError } from '../errors/app-errors';
import { Team } from '../teams/team.entity';
import { assertVersion } from '../db/assert-version';
import { computeSpeciesFields } from './species-fields';
import { Species } from './species.entity';
import { toSpeciesView } from './to-species-view';

/** Who adds a species to which team. */
export interface CreateSpeciesInput {
  teamId: string;
  actorId: string;
  request: CreateSpeciesRequest;
}

/**
 * Adds a species to a team's catalogue; molar mass and composition are computed.
 *
 * @throws ChemInputError at `formula` (422 with span) or `oxidationStates`
 * @throws ConflictError SPECIES_DUPLICATE when the team has a species of that name or formula
 */
export async function createSpecies(em: EntityManager, input: CreateSpeciesInput): Promise<SpeciesView> {
  const { request } = input;
  const oxidationStates = request.oxidationStates ?? null;
  const fields = computeSpeciesFields(request.formula, oxidationStates);
  return em.transactional(async (tx) => {
    await assertUnique(tx, { teamId: input.teamId, name: request.name, formulaKey: fields.formulaKey });
    const species = tx.create(Species, {
      id: randomUUID(),
      team: ref(tx.getReference(Team, input.teamId)),
      name: request.name,
      phase: request.phase,
      oxidationStates,
      notes: request.notes ?? '',
      source: request.source ?? '',
      ...fields,
    });
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: 'species.created', entityType: 'species', entityId: species.id, summary: `Added species ${request.name} (${fields.formula})` });
    await tx.flush();
    return toSpeciesView(species);
  });
}

/** Who changes which species. */
export interface UpdateSpeciesInput {
  speciesId: string;
  actorId: string;
  request: UpdateSpeciesRequest;
}

/**
 * Changes a team species; a new formula is parsed and its mass recomputed.
 * Reactions keep their text; their stored results are recomputed on their next save.
 *
 * @throws ConflictError VERSION_CONFLICT when `version` is not the current one
 * @throws ChemInputError, ConflictError SPECIES_DUPLICATE as {@link createSpecies}
 */
export async function updateSpecies(em: EntityManager, input: UpdateSpeciesInput): Promise<SpeciesView> {
  const { request } = input;
  return em.transactional(async (tx) => {
    const species = await tx.findOneOrFail(Species, input.speciesId, { refresh: true });
    assertVersion(species.version, request.version);
    const formula = request.formula ?? species.formula;
    const oxidationStates = request.oxidationStates === undefined ? (species.oxidationStates ?? null) : request.oxidationStates;
    const fields = computeSpeciesFields(formula, oxidationStates);
    const name = request.name ?? species.name;
    await assertUnique(tx, { teamId: species.team.id, name, formulaKey: fields.formulaKey, exceptId: species.id });
    Object.assign(species, fields, { name, oxidationStates });
    if (request.phase !== undefined) species.phase = request.phase;
    if (request.notes !== undefined) species.notes = request.notes;
    if (request.source !== undefined) species.source = request.source;
    recordAudit(tx, { teamId: species.team.id, actorId: input.actorId, action: 'species.updated', entityType: 'species', entityId: species.id, summary: `Changed species ${name} (${formula})` });
    await tx.flush();
    return toSpeciesView(species);
  });
}

/**
 * Deletes a team species. Reactions that use it keep their text (they never
 * point at catalogue rows); vetted revisions keep the species as they froze it.
 */
export async function deleteSpecies(em: EntityManager, speciesId: string, actorId: string): Promise<void> {
  await em.transactional(async (tx) => {
    const species = await tx.findOneOrFail(Species, speciesId, { refresh: true });
    recordAudit(tx, { teamId: species.team.id, actorId, action: 'species.deleted', entityType: 'species', entityId: species.id, summary: `Deleted species ${species.name} (${species.formula})` });
    tx.remove(species);
    await tx.flush();
  });
}

async function assertUnique(em: EntityManager, query: { teamId: string; name: string; formulaKey: string; exceptId?: string }): Promise<void> {
  const clash = await em.findOne(Species, {
    team: query.teamId,
    $or: [{ name: query.name }, { formulaKey: query.formulaKey }],
    ...(query.exceptId ? { id: { $ne: query.exceptId } } : {}),
  });
  if (!clash) return;
  const what = clash.name === query.name ? `the name "${query.name}"` : `the same formula (${clash.name}, ${clash.formula})`;
  throw new ConflictError('SPECIES_DUPLICATE', `The team already has a species with ${what}.`);
}
