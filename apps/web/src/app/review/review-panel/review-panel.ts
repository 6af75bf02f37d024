import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { RevisionSummary } from '@tallus/contracts';
import { Observable } from 'rxjs';

import { AuthStore } from '../../auth/auth-store';
import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { ReactionSetStore } from '../../reaction-sets/reaction-set-store';
import { ReactionSetsApi } from '../../reaction-sets/reaction-sets-api';
import { reviewStateView } from '../../reaction-sets/review-state';
import { TeamStore } from '../../teams/team-store';
import { RevisionDiff } from '../revision-diff/revision-diff';

/** Value of the comparison selects that stands for the set as it is now. */
const CURRENT = 0;

const ACTION_LABELS: Readonly<Record<string, string>> = { submitted: 'submitted', returned: 'returned', approved: 'approved' };

/**
 * The review of a set: submit (editors), approve or return with a comment (reviewers other than
 * the submitter), publish to the library (owners, vetted sets); the review history; the vetted
 * revisions and the difference between two of them.
 */
@Component({
  selector: 'tl-review-panel',
  imports: [DatePipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule, ReactiveFormsModule, RevisionDiff],
  templateUrl: './review-panel.html',
  styleUrl: './review-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewPanel {
  private readonly store = inject(ReactionSetStore);
  private readonly api = inject(ReactionSetsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly authStore = inject(AuthStore);
  private readonly notifier = inject(Notifier);

  protected readonly set = this.store.set;
  protected readonly comment = new FormControl('', { nonNullable: true });
  protected readonly isWorking = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly compareFrom = signal<number | null>(null);
  protected readonly compareTo = signal<number>(CURRENT);
  protected readonly current = CURRENT;
  protected readonly actionLabels = ACTION_LABELS;

  protected readonly isOwner = this.teamStore.isOwner;
  protected readonly stateView = computed(() => reviewStateView(this.set()?.reviewState ?? 'draft'));
  protected readonly isSubmitter = computed(() => {
    const submitter = this.set()?.submittedBy;
    return submitter !== null && submitter !== undefined && submitter.id === this.authStore.user()?.id;
  });
  protected readonly canSubmit = computed(() => {
    const state = this.set()?.reviewState;
    return this.teamStore.canWrite() && (state === 'draft' || state === 'returned');
  });
  protected readonly canDecide = computed(() => this.set()?.reviewState === 'in_review' && this.teamStore.isReviewer());
  /** Vetted revisions, newest first (as the API sends them; sorted again, as cheap insurance). */
  protected readonly revisions = computed(() => [...(this.set()?.revisions ?? [])].sort((a, b) => b.number - a.number));
  protected readonly latestRevision = computed((): RevisionSummary | null => this.revisions()[0] ?? null);
  protected readonly canPublish = computed(
    () => this.set()?.reviewState === 'vetted' && this.isOwner() && this.latestRevision()?.publicationId === null,
  );
  protected readonly history = computed(() => [...(this.set()?.comments ?? [])].sort((a, b) => b.createdAt.localeCompare(a.createdAt)));

  private readonly setId = computed(() => this.set()?.id ?? null);
  /** The older side of the comparison: the user's choice, else the latest revision. */
  protected readonly effectiveFrom = computed(() => this.compareFrom() ?? this.latestRevision()?.number ?? null);
  private readonly fromRevision = rxResource({
    params: () => revisionKey(this.setId(), this.effectiveFrom()),
    stream: ({ params }) => this.api.getRevision(params.setId, params.number),
  });
  private readonly toRevision = rxResource({
    params: () => revisionKey(this.setId(), this.compareTo()),
    stream: ({ params }) => this.api.getRevision(params.setId, params.number),
  });
  protected readonly comparison = computed(() => {
    const from = this.fromRevision.value();
    const to = this.compareTo() === CURRENT ? { reactions: this.store.reactions() } : this.toRevision.value();
    return from && to ? { before: from.reactions, after: to.reactions } : null;
  });
  protected readonly isComparing = computed(() => this.fromRevision.isLoading() || this.toRevision.isLoading());

  protected step(step: 'submit' | 'approve' | 'return'): void {
    if (step === 'return' && !this.comment.value.trim()) {
      this.error.set('Say what to change: a return needs a comment for the author.');
      return;
    }
    this.run(this.store.review(step, this.comment.value), (sent) => {
      const done = { submit: 'Submitted for review', approve: 'Approved: a new vetted revision is frozen', return: 'Returned to the author' }[step];
      this.notifier.success(sent.length > 0 ? `${done}. E-mail sent to ${sent.join(', ')}.` : `${done}.`);
      this.comment.reset();
    });
  }

  protected publish(): void {
    this.run(this.store.publish(), (publication) =>
      this.notifier.success(`Revision ${publication.revision} is in the library: every team can read and copy it.`),
    );
  }

  private run<T>(request: Observable<T>, onDone: (value: T) => void): void {
    this.isWorking.set(true);
    this.error.set(null);
    request.subscribe({
      next: (value) => {
        this.isWorking.set(false);
        onDone(value);
      },
      error: (error: unknown) => {
        this.isWorking.set(false);
        this.error.set(describeProblem(toProblem(error)));
      },
    });
  }
}

/** The revision to load, or undefined (nothing to load) for "the set as it is now" or no choice. */
function revisionKey(setId: string | null, number: number | null): { setId: string; number: number } | undefined {
  return setId && number ? { setId, number } : undefined;
}
