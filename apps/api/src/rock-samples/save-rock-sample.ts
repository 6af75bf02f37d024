import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateRockSampleRequest, RockSample as RockSampleView, TeamSettingsValues, UpdateRockSampleRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { ConflictError } from '../errors/app-errors';
import { takenNames } from '../site-data/taken-names';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { Team } from '../teams/team.entity';
import { computeRockFigures } from './compute-rock-figures';
import { RockSample } from './rock-sample.entity';
import { rockInputsOf, toRockView } from './to-rock-view';

/**
 * Adds rock samples to a team in the caller's transaction, after checking
 * modes and oxides with libs/chem and the names for duplicates. Used by create
 * (one) and the CSV import (many).
 *
 * @param input.settings the team's settings when the caller already has them (else loaded)
 * @throws ChemInputError at `modes.<i>.formula` or `oxides.<key>`; ConflictError ROCK_SAMPLE_DUPLICATE
 */
export async function addRockSamples(
  tx: EntityManager,
  input: { teamId: string; actorId: string; requests: CreateRockSampleRequest[]; action: string; settings?: TeamSettingsValues },
): Promise<RockSample[]> {
  const settings = input.settings ?? (await loadTeamSettings(tx, input.teamId));
  // One query for the whole batch; names added earlier in the batch join the set as they go.
  const taken = await takenNames(tx, 'rock_samples', input.teamId, input.requests.map((request) => request.name));
  const rows = [];
  for (const request of input.requests) {
    const { name, site, lithology, notes, ...measured } = request;
    computeRockFigures(measured, settings);
    if (taken.has(name)) throw duplicateName(name);
    taken.add(name);
    const row = tx.create(RockSample, { id: randomUUID(), team: ref(tx.getReference(Team, input.teamId)), name, site, lithology, notes, ...measured });
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: input.action, entityType: 'rock_sample', entityId: row.id, summary: `Added rock sample ${name}` });
    rows.push(row);
  }
  await tx.flush();
  return rows;
}

/** Adds one rock sample. */
export async function createRockSample(em: EntityManager, input: { teamId: string; actorId: string; request: CreateRockSampleRequest }): Promise<RockSampleView> {
  return em.transactional(async (tx) => {
    const settings = await loadTeamSettings(tx, input.teamId);
    const [row] = await addRockSamples(tx, { teamId: input.teamId, actorId: input.actorId, requests: [input.request], action: 'rock_sample.created', settings });
    return toRockView(row, settings);
  });
}

/**
 * Changes a rock sample.
 *
 * @throws ConflictError VERSION_CONFLICT, ROCK_SAMPLE_DUPLICATE; ChemInputError
 */
export async function updateRockSample(em: EntityManager, input: { id: string; actorId: string; request: UpdateRockSampleRequest }): Promise<RockSampleView> {
  const { version, ...changes } = input.request;
  return em.transactional(async (tx) => {
    const row = await tx.findOneOrFail(RockSample, input.id, { refresh: true });
    assertVersion(row.version, version);
    const teamId = row.team.id;
    if (changes.name !== undefined && changes.name !== row.name && (await takenNames(tx, 'rock_samples', teamId, [changes.name])).size > 0) throw duplicateName(changes.name);
    const defined = Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined));
    const settings = await loadTeamSettings(tx, teamId);
    computeRockFigures({ ...rockInputsOf(row), ...defined }, settings);
    Object.assign(row, defined);
    recordAudit(tx, { teamId, actorId: input.actorId, action: 'rock_sample.updated', entityType: 'rock_sample', entityId: row.id, summary: `Changed rock sample ${row.name}` });
    await tx.flush();
    return toRockView(row, settings);
  });
}

/** Deletes a rock sample. */
export async function deleteRockSample(em: EntityManager, id: string, actorId: string): Promise<void> {
  await em.transactional(async (tx) => {
    const row = await tx.findOneOrFail(RockSample, id, { refresh: true });
    recordAudit(tx, { teamId: row.team.id, actorId, action: 'rock_sample.deleted', entityType: 'rock_sample', entityId: row.id, summary: `Deleted rock sample ${row.name}` });
    tx.remove(row);
    await tx.flush();
  });
}


function duplicateName(name: string): ConflictError {
  return new ConflictError('ROCK_SAMPLE_DUPLICATE', `The team already has a rock sample named "${name}".`);
}
