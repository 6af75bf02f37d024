import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';
import { map, switchMap } from 'rxjs';

import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { roleView } from '../../teams/roles';
import { TeamStore } from '../../teams/team-store';
import { AuthApi } from '../auth-api';
import { AuthStore } from '../auth-store';

/**
 * The page an invitation e-mail links to (`/invitations/accept?token=…`). The route's
 * guard has made sure the user is signed in; accepting joins the team and opens it.
 */
@Component({
  selector: 'tl-accept-invitation',
  imports: [MatButtonModule, MatCardModule, MatIconModule, MatProgressBarModule, RouterLink],
  templateUrl: './accept-invitation.html',
  styleUrl: './accept-invitation.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AcceptInvitation {
  private readonly authApi = inject(AuthApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  /** The invitation's token (query parameter). */
  readonly token = input<string>();

  protected readonly user = inject(AuthStore).user;
  protected readonly isAccepting = signal(false);
  protected readonly error = signal<string | null>(null);

  protected accept(): void {
    const token = this.token();
    if (!token || this.isAccepting()) {
      return;
    }
    this.isAccepting.set(true);
    this.error.set(null);
    this.authApi
      .acceptInvitation(token)
      .pipe(
        // The new team must be in the list before its route's guard checks membership.
        switchMap((accepted) => this.teamStore.load().pipe(map(() => accepted))),
      )
      .subscribe({
        next: (accepted) => {
          this.notifier.success(`You joined “${accepted.teamName}” as ${roleView(accepted.role).label.toLowerCase()}.`);
          void this.router.navigate(['/teams', accepted.teamId]);
        },
        error: (error: unknown) => {
          this.isAccepting.set(false);
          this.error.set(describeProblem(toProblem(error)));
        },
      });
  }
}
