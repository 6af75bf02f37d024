import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReactionSetDetail } from '@tallus/contracts';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { createSetFromContent, type SetContent } from '../transfer/create-set-from-content';
import { getPublication } from './publications';

/** Which publication goes to which team, copied by whom. */
export interface CopyPublicationInput {
  publicationId: string;
  teamId: string;
  actorId: string;
}

/**
 * Copies a published revision into a team as a new draft set that records where
 * it came from (publication, team, set, revision). The reactions are recomputed
 * with the target team's catalogue; the team species the revision used are added
 * where the team lacks them. One transaction.
 *
 * @throws NotFoundError PUBLICATION_NOT_FOUND
 */
export async function copyPublication(em: EntityManager, input: CopyPublicationInput): Promise<ReactionSetDetail> {
  const publication = await getPublication(em, input.publicationId);
  const { snapshot } = publication;
  const indexOf = new Map(snapshot.reactions.map((reaction, index) => [reaction.id, index]));
  const content: SetContent = {
    set: snapshot.set,
    reactions: snapshot.reactions.map(({ name, kind, equation, reference, citation, notes }) => ({ name, kind, equation, reference, citation, notes })),
    netReactions: snapshot.netReactions.map((net) => ({
      name: net.name,
      members: net.reactions.filter((member) => indexOf.has(member.reactionId)).map((member) => ({ index: indexOf.get(member.reactionId)!, multiplier: member.multiplier })),
      cancel: net.cancel,
    })),
    species: snapshot.species
      .filter((species) => !species.id.startsWith('builtin:'))
      .map(({ name, formula, phase, oxidationStates, source }) => ({ name, formula, phase, oxidationStates, source, notes: '' })),
  };
  const copiedFrom = { publicationId: publication.id, teamName: publication.teamName, setName: publication.setName, revision: publication.revision };
  return em.transactional(async (tx) => {
    const setId = await createSetFromContent(tx, content, { teamId: input.teamId, actorId: input.actorId, action: 'reaction_set.copied', copiedFrom });
    return getReactionSet(tx, setId);
  });
}
