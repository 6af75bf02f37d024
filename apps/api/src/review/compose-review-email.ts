import { reactionSetPagePath } from '@tallus/contracts';
import type { MailMessage } from '../mail/mailer';

/** What a review e-mail says. */
export interface ReviewEmailInput {
  step: 'submitted' | 'approved' | 'returned';
  to: string;
  teamId: string;
  teamName: string;
  setId: string;
  setName: string;
  actorName: string;
  comment: string;
  /** The revision an approval created. */
  revision?: number;
  /** Origin of the client; the link is `<origin>/teams/<teamId>/reaction-sets/<setId>`. */
  publicOrigin: string;
}

const FIRST_LINE: Readonly<Record<ReviewEmailInput['step'], (input: ReviewEmailInput) => string>> = {
  submitted: (input) => `${input.actorName} submitted the reaction set "${input.setName}" of ${input.teamName} for review.`,
  approved: (input) => `${input.actorName} approved the reaction set "${input.setName}" of ${input.teamName}: it is vetted as revision ${input.revision}.`,
  returned: (input) => `${input.actorName} returned the reaction set "${input.setName}" of ${input.teamName} to draft with comments.`,
};

const SUBJECT: Readonly<Record<ReviewEmailInput['step'], string>> = {
  submitted: 'Review requested',
  approved: 'Approved',
  returned: 'Returned with comments',
};

/**
 * The plain-text e-mail of a review step: a submission to the team's
 * reviewers and owners, a decision to the submitter.
 *
 * @example composeReviewEmail({ step: 'returned', ... }).text // contains the comment and the link to the set
 */
export function composeReviewEmail(input: ReviewEmailInput): MailMessage {
  const link = `${input.publicOrigin}${reactionSetPagePath(input.teamId, input.setId)}`;
  const lines = [FIRST_LINE[input.step](input), ''];
  if (input.comment) lines.push('Comment:', input.comment, '');
  lines.push('Open the set:', link);
  if (input.step === 'submitted') lines.push('', 'Any reviewer or owner of the team other than the submitter can approve it or return it.');
  return { to: input.to, subject: `${SUBJECT[input.step]}: ${input.setName} (${input.teamName})`, text: lines.join('\n') };
}
