import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CopiedFrom, ReactionSetFile } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { computeNetResult } from '../net-reactions/compute-net-result';
import { NetReaction } from '../net-reactions/net-reaction.entity';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { computeReactionResult } from '../reactions/compute-reaction-result';
import { Reaction } from '../reactions/reaction.entity';
import { toResultColumns } from '../reactions/to-reaction-view';
import { loadOxidationStates } from '../species/load-oxidation-states';
import { computeSpeciesFields } from '../species/species-fields';
import { Species } from '../species/species.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/** A set's content with net-reaction members as 0-based indexes into `reactions` (checked by the caller). */
export type SetContent = Omit<ReactionSetFile, 'format' | 'version' | 'exportedAt' | 'netReactions'> & {
  netReactions: Array<{ name: string; members: Array<{ index: number; multiplier: string | null }>; cancel: string[] }>;
};

/** Where the content goes, who writes it, and what the audit calls it. */
export interface CreateSetTarget {
  teamId: string;
  actorId: string;
  action: 'reaction_set.imported' | 'reaction_set.copied' | 'reaction_set.created';
  copiedFrom?: CopiedFrom;
}

/**
 * Creates a draft set from content (an import file or a library revision) inside
 * the caller's transaction: first the team species it brings that the team lacks
 * (same formula: the team's own is kept), then the reactions and net reactions,
 * each computed with libs/chem as on any save.
 *
 * @returns the new set's id
 */
export async function createSetFromContent(tx: EntityManager, content: SetContent, target: CreateSetTarget): Promise<string> {
  const team = ref(tx.getReference(Team, target.teamId));
  await addMissingSpecies(tx, target.teamId, content.species);
  await tx.flush();
  const oxidationStates = await loadOxidationStates(tx, target.teamId);
  const actor = ref(tx.getReference(User, target.actorId));
  const set = tx.create(ReactionSet, { id: randomUUID(), ...content.set, team, createdBy: actor, updatedBy: actor, copiedFrom: target.copiedFrom ?? null });
  const reactions = content.reactions.map((reaction, position) =>
    tx.create(Reaction, {
      id: randomUUID(),
      ...reaction,
      set: ref(set),
      position,
      ...toResultColumns(computeReactionResult({ equation: reaction.equation, reference: reaction.reference, oxidationStates })),
    }),
  );
  const equations = new Map(reactions.map((reaction) => [reaction.id, { equation: reaction.balance.balancedEquation ?? reaction.equation }]));
  content.netReactions.forEach((net, position) => {
    const members = net.members.map((member) => ({ reactionId: reactions[member.index]!.id, multiplier: member.multiplier }));
    const result = computeNetResult({ members, equations, cancel: net.cancel, oxidationStates });
    tx.create(NetReaction, { id: randomUUID(), set: ref(set), position, name: net.name, members, cancel: net.cancel, status: result.status, result });
  });
  const how = target.copiedFrom
    ? `copied from ${target.copiedFrom.teamName}'s library (revision ${target.copiedFrom.revision})`
    : target.action === 'reaction_set.imported' ? 'imported from a file' : 'created';
  recordAudit(tx, { teamId: target.teamId, actorId: target.actorId, action: target.action, entityType: 'reaction_set', entityId: set.id, summary: `Reaction set "${set.name}" ${how}` });
  await tx.flush();
  return set.id;
}

async function addMissingSpecies(tx: EntityManager, teamId: string, species: SetContent['species']): Promise<void> {
  if (species.length === 0) return;
  const existing = await tx.find(Species, { team: teamId }, { fields: ['name', 'formulaKey'] });
  const names = new Set(existing.map((entry) => entry.name));
  const keys = new Set(existing.map((entry) => entry.formulaKey));
  for (const entry of species) {
    const fields = computeSpeciesFields(entry.formula, entry.oxidationStates);
    if (keys.has(fields.formulaKey)) continue;
    // A different species already holds the name: keep both, the newcomer marked as brought in.
    const name = names.has(entry.name) ? `${entry.name} (imported)`.slice(0, 160) : entry.name;
    tx.create(Species, { id: randomUUID(), ...entry, ...fields, name, team: ref(tx.getReference(Team, teamId)) });
    names.add(name);
    keys.add(fields.formulaKey);
  }
}
