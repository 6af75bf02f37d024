import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectChange, MatSelectModule } from '@angular/material/select';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router } from '@angular/router';
import type { Member, Problem, Role } from '@tallus/contracts';

import { AuthStore } from '../../auth/auth-store';
import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { InviteForm } from '../invite-form/invite-form';
import { RemoveMemberDialog } from '../remove-member-dialog/remove-member-dialog';
import { ROLE_VIEWS, roleView } from '../roles';
import { TeamStore } from '../team-store';
import { MembersStore } from './members-store';

/** A refused member action, shown above the table until dismissed. */
interface ActionError {
  /** What did not happen, e.g. "Ana Owner stays owner." */
  outcome: string;
  /** Why, and what to do instead. */
  message: string;
}

/**
 * The team's members. Owners change roles, remove members, invite and see pending
 * invitations; everyone else reads the list.
 */
@Component({
  selector: 'tl-members',
  imports: [
    DatePipe,
    InviteForm,
    MatButtonModule,
    MatIconModule,
    MatProgressBarModule,
    MatSelectModule,
    MatTableModule,
    MatTooltipModule,
  ],
  providers: [MembersStore],
  templateUrl: './members.html',
  styleUrl: './members.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Members {
  private readonly store = inject(MembersStore);
  private readonly teamStore = inject(TeamStore);
  private readonly authStore = inject(AuthStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  protected readonly members = this.store.members;
  protected readonly invitations = this.store.invitations;
  protected readonly busyUserIds = this.store.busyUserIds;
  protected readonly isOwner = this.teamStore.isOwner;
  protected readonly team = this.teamStore.currentTeam;
  protected readonly roles = ROLE_VIEWS;
  protected readonly loadError = signal<string | null>(null);
  protected readonly actionError = signal<ActionError | null>(null);
  protected readonly currentUserId = computed(() => this.authStore.user()?.id ?? null);
  protected readonly memberColumns = computed(() =>
    this.isOwner() ? ['name', 'email', 'role', 'joined', 'actions'] : ['name', 'email', 'role', 'joined'],
  );
  protected readonly invitationColumns = ['email', 'role', 'sent', 'expires'];
  protected readonly roleView = roleView;

  constructor() {
    // Reload whenever the route switches to another team.
    effect(() => {
      const teamId = this.teamId();
      const isOwner = this.isOwner();
      untracked(() => this.load(teamId, isOwner));
    });
  }

  protected load(teamId: string, isOwner: boolean): void {
    this.loadError.set(null);
    this.store
      .load(teamId, isOwner)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({ error: (error: unknown) => this.loadError.set(describeProblem(toProblem(error))) });
  }

  protected reload(): void {
    this.load(this.teamId(), this.isOwner());
  }

  protected changeRole(member: Member, change: MatSelectChange<Role>): void {
    const role = change.value;
    this.actionError.set(null);
    this.store.changeRole(this.teamId(), member, role).subscribe({
      next: (updated) => {
        this.notifier.success(`${updated.displayName} is now ${roleView(updated.role).label.toLowerCase()}.`);
        if (updated.userId === this.currentUserId()) {
          // The user demoted themselves: their rights in this team changed.
          this.teamStore.load().subscribe();
        }
      },
      error: (error: unknown) => {
        // The select already shows the refused role: put the member's real one back.
        change.source.value = member.role;
        this.showActionError(`${member.displayName} stays ${roleView(member.role).label.toLowerCase()}.`, toProblem(error));
      },
    });
  }

  protected confirmRemoval(member: Member): void {
    const isSelf = member.userId === this.currentUserId();
    this.dialog
      .open(RemoveMemberDialog, { data: { member, teamName: this.team()?.name ?? '', isSelf }, width: '440px' })
      .afterClosed()
      .subscribe((isConfirmed: boolean | undefined) => {
        if (isConfirmed) {
          this.remove(member, isSelf);
        }
      });
  }

  protected dismissActionError(): void {
    this.actionError.set(null);
  }

  private remove(member: Member, isSelf: boolean): void {
    this.actionError.set(null);
    this.store.remove(this.teamId(), member).subscribe({
      next: () => {
        this.notifier.success(
          isSelf ? `You left “${this.team()?.name ?? 'the team'}”.` : `${member.displayName} was removed from the team.`,
        );
        if (isSelf) {
          this.teamStore.load().subscribe(() => void this.router.navigate(['/']));
        }
      },
      error: (error: unknown) =>
        this.showActionError(
          isSelf ? 'You are still a member.' : `${member.displayName} was not removed.`,
          toProblem(error),
        ),
    });
  }

  private showActionError(outcome: string, problem: Problem): void {
    this.actionError.set({ outcome, message: describeProblem(problem) });
  }
}
