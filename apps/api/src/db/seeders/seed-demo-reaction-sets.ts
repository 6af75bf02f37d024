import type { EntityManager } from '@mikro-orm/postgresql';
import { publishSet } from '../../library/publications';
import type { Mailer } from '../../mail/mailer';
import { ReactionSet } from '../../reaction-sets/reaction-set.entity';
import { runReviewStep } from '../../review/run-review-step';
import { Membership } from '../../teams/membership.entity';
import { createSetFromContent } from '../../transfer/create-set-from-content';
import { DEMO_REACTION_SETS } from './demo-reaction-sets';

/** Seeding sends no e-mail: the demo's review steps happened "before" anyone signed in. */
const NO_MAIL: Mailer = { send: async () => undefined, close: () => undefined };

/**
 * Adds the demo reaction sets that are missing (found by name in their team)
 * and walks each to its demo state through the same use cases as the API:
 * written by the team's editor, submitted by the editor, approved by the
 * reviewer, published by the owner. Their audit events come with them.
 *
 * @returns how many sets were added
 */
export async function seedDemoReactionSets(em: EntityManager): Promise<number> {
  let added = 0;
  for (const demo of DEMO_REACTION_SETS) {
    const members = await em.find(Membership, { team: { name: demo.team }, user: { email: { $like: '%.example' } } }, { populate: ['user'] });
    const byRole = (role: string) => members.find((member) => member.role === role && member.user.getEntity().email.startsWith(`${role}@`));
    const [owner, reviewer, editor] = [byRole('owner'), byRole('reviewer'), byRole('editor')];
    if (!owner || !reviewer || !editor) continue;
    const teamId = owner.team.id;
    if ((await em.count(ReactionSet, { team: teamId, name: demo.content.set.name })) > 0) continue;
    const setId = await em.transactional((tx) => createSetFromContent(tx, demo.content, { teamId, actorId: editor.user.id, action: 'reaction_set.created' }));
    const services = { mailer: NO_MAIL, publicOrigin: '' };
    if (demo.state !== 'draft') {
      await runReviewStep(em, services, { step: 'submitted', setId, actorId: editor.user.id, comment: 'Ready for review.' });
    }
    if (demo.state === 'published') {
      await runReviewStep(em, services, { step: 'approved', setId, actorId: reviewer.user.id, comment: 'Checked against the cited sources.' });
      await publishSet(em, setId, owner.user.id);
    }
    added++;
  }
  return added;
}
