import type { ReviewStepResponse } from '@tallus/contracts';
import type { Mailer } from '../mail/mailer';
import { composeReviewEmail, type ReviewEmailInput } from './compose-review-email';

/**
 * Sends one review e-mail to each address, after the step has committed. A
 * refused or unreachable SMTP server does not undo the step: the answer says
 * which addresses failed.
 */
export async function sendReviewMail(mailer: Mailer, recipients: readonly string[], message: Omit<ReviewEmailInput, 'to'>): Promise<ReviewStepResponse['mail']> {
  const outcomes = await Promise.allSettled(recipients.map((to) => mailer.send(composeReviewEmail({ ...message, to }))));
  return {
    sent: recipients.filter((_, index) => outcomes[index]!.status === 'fulfilled'),
    failed: recipients.filter((_, index) => outcomes[index]!.status === 'rejected'),
  };
}
