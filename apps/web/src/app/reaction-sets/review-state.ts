import type { ReviewState } from '@tallus/contracts';

/** How a review state appears: an icon and a word, and what it means for editing. */
export interface ReviewStateView {
  label: string;
  icon: string;
  tone: 'success' | 'warning' | 'danger' | 'info';
  meaning: string;
}

/** Screen views of the review states (DESIGN.md §2). */
export const REVIEW_STATE_VIEWS: Readonly<Record<ReviewState, ReviewStateView>> = {
  draft: { label: 'draft', icon: 'edit_note', tone: 'info', meaning: 'Being written. Submit it for review when it is ready.' },
  in_review: { label: 'in review', icon: 'hourglass_top', tone: 'warning', meaning: 'Waiting for a reviewer. Edits are locked until it is approved or returned.' },
  returned: { label: 'returned', icon: 'undo', tone: 'danger', meaning: 'A reviewer sent it back with comments. Revise and submit again.' },
  vetted: { label: 'vetted', icon: 'verified', tone: 'success', meaning: 'Approved and frozen as a revision. An edit starts a new draft.' },
};

/**
 * The view of a review state.
 *
 * @param state a review state from the API
 */
export function reviewStateView(state: ReviewState): ReviewStateView {
  return REVIEW_STATE_VIEWS[state] ?? REVIEW_STATE_VIEWS.draft;
}
