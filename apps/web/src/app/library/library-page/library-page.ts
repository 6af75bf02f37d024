import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { Router } from '@angular/router';
import { of } from 'rxjs';
import type { TeamSummary } from '@tallus/contracts';

import { BalanceStatus } from '../../chem-view/balance-status/balance-status';
import { EquationView } from '../../chem-view/equation-view/equation-view';
import { Fraction } from '../../chem-view/fraction/fraction';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { errorText } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { hasRoleAtLeast } from '../../teams/roles';
import { TeamStore } from '../../teams/team-store';
import { LibraryApi } from '../library-api';

/** The library: vetted sets that teams have published; preview one and copy it into one of my teams. */
@Component({
  selector: 'tl-library-page',
  imports: [BalanceStatus, DatePipe, EquationView, Fraction, FormulaText, MatButtonModule, MatFormFieldModule, MatIconModule, MatProgressBarModule, MatSelectModule],
  templateUrl: './library-page.html',
  styleUrl: './library-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LibraryPage {
  private readonly api = inject(LibraryApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  /** The current team's id (route parameter): the default target of a copy. */
  readonly teamId = input.required<string>();

  protected readonly selectedId = signal<string | null>(null);
  protected readonly targetTeamId = signal<string | null>(null);
  protected readonly isCopying = signal(false);
  protected readonly publications = rxResource({ stream: () => this.api.list() });
  protected readonly preview = rxResource({
    params: () => this.selectedId(),
    stream: ({ params: id }) => (id ? this.api.get(id) : of(null)),
  });
  protected readonly writableTeams = computed(() => (this.teamStore.teams() ?? []).filter((team) => hasRoleAtLeast(team.role, 'editor')));
  protected readonly target = computed((): TeamSummary | null => {
    const chosen = this.targetTeamId() ?? this.teamId();
    return this.writableTeams().find((team) => team.id === chosen) ?? this.writableTeams()[0] ?? null;
  });
  protected readonly listError = computed(() => errorText(this.publications.error()));

  protected select(id: string): void {
    this.selectedId.set(id);
  }

  protected copy(): void {
    const publicationId = this.selectedId();
    const team = this.target();
    if (!publicationId || !team) return;
    this.isCopying.set(true);
    this.api.copy(publicationId, team.id).subscribe({
      next: (set) => {
        this.isCopying.set(false);
        this.notifier.success(`Copied into ${team.name} as the draft “${set.name}”.`);
        void this.router.navigate(['/teams', team.id, 'reaction-sets', set.id]);
      },
      error: (error: unknown) => {
        this.isCopying.set(false);
        this.notifier.problem(toProblem(error));
      },
    });
  }
}
