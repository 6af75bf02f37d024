import { Injectable, inject, signal } from '@angular/core';
import { Observable, forkJoin, of, tap } from 'rxjs';
import type { Invitation, Member, Role } from '@tallus/contracts';

import { TeamsApi } from '../teams-api';

/**
 * The members and pending invitations of one team, for the members page (provided by it).
 * Calls return Observables so the page decides how to show their outcome.
 */
@Injectable()
export class MembersStore {
  private readonly api = inject(TeamsApi);

  private readonly membersState = signal<Member[] | null>(null);
  private readonly invitationsState = signal<Invitation[] | null>(null);
  private readonly busyUserIdsState = signal<ReadonlySet<string>>(new Set());

  /** The team's members, owners first, then by name; null until loaded. */
  readonly members = this.membersState.asReadonly();
  /** Pending invitations, newest first; null until loaded or when the user may not see them. */
  readonly invitations = this.invitationsState.asReadonly();
  /** Members with a change under way, whose controls wait. */
  readonly busyUserIds = this.busyUserIdsState.asReadonly();

  /**
   * Loads members, and pending invitations when the user is an owner.
   *
   * @param teamId the team
   * @param isOwner whether the user owns the team (only owners see invitations)
   */
  load(teamId: string, isOwner: boolean): Observable<unknown> {
    this.membersState.set(null);
    this.invitationsState.set(null);
    return forkJoin([
      this.api.listMembers(teamId).pipe(tap((members) => this.membersState.set(sortMembers(members)))),
      isOwner
        ? this.api.listInvitations(teamId).pipe(tap((invitations) => this.invitationsState.set(sortInvitations(invitations))))
        : of(null),
    ]);
  }

  /** Gives a member another role; the list shows it once the API agrees. */
  changeRole(teamId: string, member: Member, role: Role): Observable<Member> {
    return this.whileBusy(
      member.userId,
      this.api.changeRole(teamId, member.userId, role).pipe(
        tap((updated) =>
          this.membersState.update((members) =>
            // Kept in place (not re-sorted) so the row does not jump away from the pointer.
            (members ?? []).map((each) => (each.userId === updated.userId ? updated : each)),
          ),
        ),
      ),
    );
  }

  /** Removes a member; the list drops them once the API agrees. */
  remove(teamId: string, member: Member): Observable<void> {
    return this.whileBusy(
      member.userId,
      this.api.removeMember(teamId, member.userId).pipe(
        tap(() =>
          this.membersState.update((members) => (members ?? []).filter((each) => each.userId !== member.userId)),
        ),
      ),
    );
  }

  /** Invites someone and refreshes the pending invitations. */
  invite(teamId: string, invitation: { email: string; role: Role }): Observable<Invitation> {
    return this.api.invite(teamId, invitation).pipe(
      tap((created) =>
        this.invitationsState.update((invitations) =>
          sortInvitations([created, ...(invitations ?? []).filter((each) => each.id !== created.id)]),
        ),
      ),
    );
  }

  private whileBusy<T>(userId: string, call: Observable<T>): Observable<T> {
    this.busyUserIdsState.update((ids) => new Set(ids).add(userId));
    const done = () =>
      this.busyUserIdsState.update((ids) => {
        const next = new Set(ids);
        next.delete(userId);
        return next;
      });
    return call.pipe(tap({ finalize: done }));
  }
}

const ROLE_ORDER: Readonly<Record<Role, number>> = { owner: 0, reviewer: 1, editor: 2, viewer: 3 };

function sortMembers(members: Member[]): Member[] {
  return [...members].sort(
    (a, b) => ROLE_ORDER[a.role] - ROLE_ORDER[b.role] || a.displayName.localeCompare(b.displayName),
  );
}

function sortInvitations(invitations: Invitation[]): Invitation[] {
  return [...invitations].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
}
