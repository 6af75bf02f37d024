import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { Router } from '@angular/router';
import type { TeamSummary } from '@tallus/contracts';

import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { NewTeamDialog } from '../new-team-dialog/new-team-dialog';
import { TeamStore } from '../team-store';

/** The start page of a user who belongs to no team yet. */
@Component({
  selector: 'tl-welcome',
  imports: [MatButtonModule, MatIconModule],
  templateUrl: './welcome.html',
  styleUrl: './welcome.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Welcome {
  private readonly teamStore = inject(TeamStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  protected readonly teams = this.teamStore.teams;
  protected readonly loadError = signal<string | null>(null);

  protected openNewTeamDialog(): void {
    this.dialog
      .open(NewTeamDialog, { width: '420px' })
      .afterClosed()
      .subscribe((team: TeamSummary | undefined) => {
        if (team) {
          this.notifier.success(`Team “${team.name}” created. You are its owner.`);
          void this.router.navigate(['/teams', team.id]);
        }
      });
  }

  protected retry(): void {
    this.loadError.set(null);
    this.teamStore.load().subscribe({
      next: () => {
        const team = this.teamStore.preferredTeam();
        if (team) {
          void this.router.navigate(['/teams', team.id]);
        }
      },
      error: (error: unknown) => this.loadError.set(describeProblem(toProblem(error))),
    });
  }
}
