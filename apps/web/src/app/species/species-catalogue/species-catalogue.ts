import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginator, MatPaginatorModule } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSort, MatSortModule } from '@angular/material/sort';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { Species } from '@tallus/contracts';
import { forkJoin, map } from 'rxjs';

import { errorText } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { TeamStore } from '../../teams/team-store';
import { SpeciesApi } from '../species-api';
import { formatOxidationStates } from '../species-dialog/oxidation-states-text';
import { SpeciesDialog } from '../species-dialog/species-dialog';
import { FormulaText } from '../../chem-view/formula-text/formula-text';

/** The team's species catalogue on top of the built-in one: sort, filter, page; add and edit the team's own. */
@Component({
  selector: 'tl-species-catalogue',
  imports: [
    FormulaText,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatPaginatorModule,
    MatProgressBarModule,
    MatSortModule,
    MatTableModule,
    MatTooltipModule,
  ],
  templateUrl: './species-catalogue.html',
  styleUrl: './species-catalogue.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpeciesCatalogue {
  private readonly api = inject(SpeciesApi);
  private readonly teamStore = inject(TeamStore);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();
  private readonly sort = viewChild(MatSort);
  private readonly paginator = viewChild(MatPaginator);

  protected readonly columns = ['name', 'formula', 'phase', 'molarMass', 'oxidationStates', 'source', 'actions'];
  protected readonly dataSource = new MatTableDataSource<Species>([]);
  protected readonly filter = signal('');
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly species = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) =>
      forkJoin([this.api.listTeamSpecies(teamId), this.api.listBuiltin()]).pipe(map(([own, builtin]) => [...own, ...builtin])),
  });
  protected readonly ownCount = computed(() => (this.species.hasValue() ? this.species.value().filter((entry) => !entry.isBuiltin).length : 0));
  protected readonly loadError = computed(() => errorText(this.species.error()));

  constructor() {
    this.dataSource.filterPredicate = (entry, filter) =>
      `${entry.name} ${entry.formula} ${entry.phase} ${entry.source}`.toLowerCase().includes(filter);
    this.dataSource.sortingDataAccessor = (entry, column) =>
      column === 'molarMass' ? entry.molarMass : String((entry as unknown as Record<string, unknown>)[column] ?? '').toLowerCase();
    effect(() => {
      const rows = this.species.hasValue() ? this.species.value() : [];
      const sort = this.sort();
      const paginator = this.paginator();
      untracked(() => {
        this.dataSource.data = rows;
        if (sort) this.dataSource.sort = sort;
        if (paginator) this.dataSource.paginator = paginator;
      });
    });
  }

  protected applyFilter(text: string): void {
    this.filter.set(text);
    this.dataSource.filter = text.trim().toLowerCase();
    this.dataSource.paginator?.firstPage();
  }

  protected statesText(entry: Species): string {
    return formatOxidationStates(entry.oxidationStates);
  }

  protected open(entry: Species | null): void {
    this.dialog
      .open(SpeciesDialog, { data: { teamId: this.teamId(), species: entry }, width: '620px', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved: Species | undefined) => {
        if (saved) {
          this.notifier.success(entry ? `Species “${saved.name}” saved.` : `Species “${saved.name}” added to the catalogue.`);
          this.species.reload();
        }
      });
  }
}
