import { INVITATION_ACCEPT_PATH, type Role } from '@tallus/contracts';
import type { MailMessage } from '../mail/mailer';

/** What the invitation e-mail says. */
export interface InvitationEmailInput {
  to: string;
  teamName: string;
  inviterName: string;
  role: Role;
  token: string;
  expiresAt: Date;
  /** Origin of the client, e.g. http://127.0.0.1:4300; the link is `<origin>/invitations/accept?token=<token>`. */
  publicOrigin: string;
}

/** What each role may do, as the e-mail explains it (DESIGN.md §5). */
const ROLE_RIGHTS: Readonly<Record<Role, string>> = {
  owner: 'manage members, invitations and publishing, and everything below',
  reviewer: 'vet and return reaction sets, and write drafts',
  editor: 'write drafts of reaction sets',
  viewer: 'read the team’s reaction sets and site data',
};

/**
 * The plain-text invitation e-mail with its single-use link.
 *
 * @example composeInvitationEmail({...}).text // contains 'http://127.0.0.1:4300/invitations/accept?token=…'
 */
export function composeInvitationEmail(input: InvitationEmailInput): MailMessage {
  const link = `${input.publicOrigin}${INVITATION_ACCEPT_PATH}?token=${encodeURIComponent(input.token)}`;
  const text = [
    `${input.inviterName} invites you to join the team "${input.teamName}" on Tallus as ${input.role}.`,
    `As ${input.role} you can ${ROLE_RIGHTS[input.role]}.`,
    '',
    'To accept, sign in (or create an account) with this e-mail address and open:',
    link,
    '',
    `The link works once and expires on ${input.expiresAt.toISOString().replace('T', ' ').slice(0, 16)} UTC.`,
    'If you did not expect this invitation, ignore this message.',
  ].join('\n');
  return { to: input.to, subject: `Invitation to join ${input.teamName} on Tallus`, text };
}
