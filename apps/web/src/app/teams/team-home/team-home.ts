import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import type { ReactionSetDetail } from '@tallus/contracts';

import { errorText } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { ImportDialog } from '../../reaction-sets/import-dialog/import-dialog';
import { NewSetDialog } from '../../reaction-sets/new-set-dialog/new-set-dialog';
import { ReactionSetsApi } from '../../reaction-sets/reaction-sets-api';
import { SetTable } from '../../reaction-sets/set-table/set-table';
import { roleView } from '../roles';
import { TeamStore } from '../team-store';

/** A team's home: its reaction sets, the review queue for reviewers, and recent activity. */
@Component({
  selector: 'tl-team-home',
  imports: [DatePipe, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SetTable],
  templateUrl: './team-home.html',
  styleUrl: './team-home.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamHome {
  private readonly api = inject(ReactionSetsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  protected readonly team = this.teamStore.currentTeam;
  protected readonly role = computed(() => {
    const team = this.team();
    return team ? roleView(team.role) : null;
  });
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly isReviewer = this.teamStore.isReviewer;
  protected readonly sets = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) => this.api.listSets(teamId),
  });
  protected readonly activity = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) => this.api.activity(teamId, 12),
  });
  protected readonly reviewQueue = computed(() =>
    this.sets.hasValue() ? this.sets.value().filter((set) => set.reviewState === 'in_review') : [],
  );
  protected readonly setsError = computed(() => errorText(this.sets.error()));
  protected readonly activityError = computed(() => errorText(this.activity.error()));

  protected openNewSet(): void {
    this.dialog
      .open(NewSetDialog, { data: { teamId: this.teamId() }, autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((set: ReactionSetDetail | undefined) => set && this.openSet(set, `Reaction set “${set.name}” created as a draft.`));
  }

  protected openImport(): void {
    this.dialog
      .open(ImportDialog, { data: { teamId: this.teamId() }, width: '560px' })
      .afterClosed()
      .subscribe((set: ReactionSetDetail | undefined) => set && this.openSet(set, `Imported “${set.name}” with ${set.reactions.length} reactions.`));
  }

  private openSet(set: ReactionSetDetail, message: string): void {
    this.notifier.success(message);
    void this.router.navigate(['/teams', this.teamId(), 'reaction-sets', set.id]);
  }
}
