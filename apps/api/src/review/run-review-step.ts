import { LockMode, ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReviewStepResponse } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { ConflictError, ForbiddenError } from '../errors/app-errors';
import type { Mailer } from '../mail/mailer';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { Reaction } from '../reactions/reaction.entity';
import { Membership } from '../teams/membership.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { buildSnapshot } from './build-snapshot';
import { ReviewComment } from './review-comment.entity';
import { Revision } from './revision.entity';
import { sendReviewMail } from './send-review-mail';

/** One review step on one set. */
export interface ReviewStepInput {
  step: 'submitted' | 'approved' | 'returned';
  setId: string;
  actorId: string;
  comment: string;
  /** The set version the request read, when it sends one. */
  version?: number;
}

/** What the step needs besides the database. */
export interface ReviewStepServices {
  mailer: Mailer;
  publicOrigin: string;
}

/**
 * Runs a review step in one transaction, then e-mails (DESIGN.md §5):
 * - `submitted` (from draft or returned, with ≥ 1 reaction) → in_review; mail to the team's
 *   reviewers and owners except the submitter;
 * - `approved` (from in_review, not by the submitter) → vetted, freezing revision n+1; mail to the submitter;
 * - `returned` (from in_review, not by the submitter, with a comment) → returned; mail to the submitter.
 *
 * @throws ConflictError REVIEW_STATE_INVALID, REVIEW_EMPTY_SET, VERSION_CONFLICT
 * @throws ForbiddenError REVIEW_SELF_APPROVAL
 */
export async function runReviewStep(em: EntityManager, services: ReviewStepServices, input: ReviewStepInput): Promise<ReviewStepResponse> {
  const outcome = await em.transactional(async (tx) => {
    const set = await tx.findOneOrFail(ReactionSet, input.setId, { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true });
    assertVersion(set.version, input.version);
    const revision = input.step === 'submitted' ? await submit(tx, set, input.actorId) : await decide(tx, set, input);
    tx.create(ReviewComment, { set: ref(set), action: input.step, author: ref(tx.getReference(User, input.actorId)), comment: input.comment, revision });
    const verb = { submitted: 'submitted for review', approved: `approved as revision ${revision}`, returned: 'returned to draft' }[input.step];
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: `reaction_set.${input.step}`, entityType: 'reaction_set', entityId: set.id, summary: `Reaction set "${set.name}" ${verb}` });
    await tx.flush();
    return { teamId: set.team.id, submitterId: set.submittedBy?.id ?? null, setName: set.name, revision };
  });
  const [actor, team] = await Promise.all([em.findOneOrFail(User, input.actorId), em.findOneOrFail(Team, outcome.teamId)]);
  const recipients = await recipientsOf(em, input, outcome);
  const mail = await sendReviewMail(services.mailer, recipients, {
    step: input.step,
    teamId: team.id,
    teamName: team.name,
    setId: input.setId,
    setName: outcome.setName,
    actorName: actor.displayName,
    comment: input.comment,
    revision: outcome.revision ?? undefined,
    publicOrigin: services.publicOrigin,
  });
  return { set: await getReactionSet(em, input.setId), mail };
}

async function submit(tx: EntityManager, set: ReactionSet, actorId: string): Promise<null> {
  if (set.reviewState !== 'draft' && set.reviewState !== 'returned') {
    throw new ConflictError('REVIEW_STATE_INVALID', `Only a draft or returned set can be submitted; this one is ${set.reviewState}.`);
  }
  if ((await tx.count(Reaction, { set: set.id })) === 0) throw new ConflictError('REVIEW_EMPTY_SET', 'Add at least one reaction before submitting the set.');
  set.reviewState = 'in_review';
  set.submittedBy = ref(tx.getReference(User, actorId));
  return null;
}

async function decide(tx: EntityManager, set: ReactionSet, input: ReviewStepInput): Promise<number | null> {
  if (set.reviewState !== 'in_review') {
    throw new ConflictError('REVIEW_STATE_INVALID', `Only a set under review can be approved or returned; this one is ${set.reviewState}.`);
  }
  if (set.submittedBy?.id === input.actorId) {
    throw new ForbiddenError('REVIEW_SELF_APPROVAL', 'You submitted this set: another reviewer or owner must approve or return it.');
  }
  if (input.step === 'returned') {
    set.reviewState = 'returned';
    return null;
  }
  const detail = await getReactionSet(tx, set.id);
  const number = set.currentRevision + 1;
  tx.create(Revision, {
    set: ref(set),
    number,
    snapshot: await buildSnapshot(tx, detail),
    reactionCount: detail.reactions.length,
    vettedBy: ref(tx.getReference(User, input.actorId)),
    vettedAt: new Date(),
  });
  set.currentRevision = number;
  set.reviewState = 'vetted';
  return number;
}

async function recipientsOf(em: EntityManager, input: ReviewStepInput, outcome: { teamId: string; submitterId: string | null }): Promise<string[]> {
  if (input.step !== 'submitted') {
    const submitter = outcome.submitterId ? await em.findOne(User, outcome.submitterId) : null;
    return submitter ? [submitter.email] : [];
  }
  const members = await em.find(Membership, { team: outcome.teamId, role: { $in: ['reviewer', 'owner'] }, user: { $ne: input.actorId } }, { populate: ['user'] });
  return members.map((member) => member.user.getEntity().email).sort();
}
