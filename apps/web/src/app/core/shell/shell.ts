import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, computed, inject } from '@angular/core';
import { takeUntilDestroyed, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatDividerModule } from '@angular/material/divider';
import { MatIconModule } from '@angular/material/icon';
import { MatListModule } from '@angular/material/list';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { Router, RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { map } from 'rxjs';
import type { TeamSummary } from '@tallus/contracts';

import { AuthApi } from '../../auth/auth-api';
import { AuthStore } from '../../auth/auth-store';
import { NewTeamDialog } from '../../teams/new-team-dialog/new-team-dialog';
import { roleView } from '../../teams/roles';
import { TeamStore } from '../../teams/team-store';
import { Notifier } from '../notifier';
import { toProblem } from '../problem';
import { TEAM_SECTIONS } from './team-sections';

/** The frame around every signed-in screen: brand, team switcher, team navigation, account. */
@Component({
  selector: 'tl-shell',
  imports: [
    MatButtonModule,
    MatDividerModule,
    MatIconModule,
    MatListModule,
    MatMenuModule,
    MatSidenavModule,
    MatToolbarModule,
    RouterLink,
    RouterLinkActive,
    RouterOutlet,
  ],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell implements OnInit {
  private readonly authApi = inject(AuthApi);
  private readonly authStore = inject(AuthStore);
  private readonly teamStore = inject(TeamStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);

  /** Whether the screen is narrow (below a laptop): the navigation then slides over the page. */
  protected readonly isCompact = toSignal(
    inject(BreakpointObserver)
      .observe('(max-width: 959.98px)')
      .pipe(map((state) => state.matches)),
    { initialValue: false },
  );
  protected readonly user = this.authStore.user;
  protected readonly teams = this.teamStore.teams;
  protected readonly currentTeam = this.teamStore.currentTeam;
  protected readonly isOwner = this.teamStore.isOwner;
  protected readonly sections = TEAM_SECTIONS;
  protected readonly currentRole = computed(() => {
    const team = this.currentTeam();
    return team ? roleView(team.role) : null;
  });

  ngOnInit(): void {
    this.loadSession();
  }

  protected roleOf(team: TeamSummary) {
    return roleView(team.role);
  }

  protected openNewTeamDialog(): void {
    this.dialog
      .open(NewTeamDialog, { width: '420px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((team: TeamSummary | undefined) => {
        if (team) {
          this.notifier.success(`Team “${team.name}” created. You are its owner.`);
          void this.router.navigate(['/teams', team.id]);
        }
      });
  }

  protected signOut(): void {
    this.authStore.signOut();
    void this.router.navigate(['/sign-in']);
  }

  private loadSession(): void {
    this.authApi
      .me()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({
        next: (me) => this.authStore.setUser(me.user),
        error: (error: unknown) => this.showUnlessSessionEnded(error),
      });
    this.teamStore
      .ensureLoaded()
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({ error: (error: unknown) => this.showUnlessSessionEnded(error) });
  }

  private showUnlessSessionEnded(error: unknown): void {
    const problem = toProblem(error);
    // A 401 has already ended the session and routed to sign-in.
    if (problem.status !== 401) {
      this.notifier.problem(problem);
    }
  }
}
