import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';

import { describeProblem } from '../../core/error-messages';
import { toProblem } from '../../core/problem';
import { roleView } from '../roles';
import { TeamStore } from '../team-store';
import { TeamsApi } from '../teams-api';

/** A team's overview: its name, the user's role, how many members it has, and what to do next. */
@Component({
  selector: 'tl-team-home',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink],
  templateUrl: './team-home.html',
  styleUrl: './team-home.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TeamHome {
  private readonly teamsApi = inject(TeamsApi);
  private readonly teamStore = inject(TeamStore);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  protected readonly team = this.teamStore.currentTeam;
  protected readonly role = computed(() => {
    const team = this.team();
    return team ? roleView(team.role) : null;
  });
  protected readonly members = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) => this.teamsApi.listMembers(teamId),
  });
  protected readonly memberCount = computed(() =>
    this.members.hasValue() ? this.members.value().length : null,
  );
  protected readonly membersError = computed(() => {
    const error = this.members.error();
    return error ? describeProblem(toProblem(error)) : null;
  });
}
