import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import { debounceTime, map, startWith } from 'rxjs';

import { BalanceStatus } from '../../chem-view/balance-status/balance-status';
import { EquationView } from '../../chem-view/equation-view/equation-view';
import { FigurePipe } from '../../chem-view/figure/figure';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { ReactionSetsApi } from '../../reaction-sets/reaction-sets-api';
import { ScreeningCaution } from '../../site-data/screening-caution/screening-caution';
import { saveBlob } from '../../site-data/save-file';
import { TeamStore } from '../../teams/team-store';
import { readPastedOxides, type PasteProblem } from '../oxide-paste';
import { createOxideForm, EXAMPLES, GROUP_OPTIONS, MAIN_OXIDES, MORE_OXIDES, oxideInputOf } from '../oxide-form/oxide-form';
import { MineralFormulasApi } from '../mineral-formulas-api';
import { recalculate } from '../recalculation';

/**
 * Mineral formulas from oxide analyses, computed in the browser as the user types: apfu on an
 * oxygen basis, Fe3+ after Droop (1987) on request, end members, warnings; the result saved as a
 * species of the team or its weathering reaction added to a draft reaction set.
 */
@Component({
  selector: 'tl-formula-page',
  imports: [
    BalanceStatus,
    EquationView,
    FigurePipe,
    FormulaText,
    MatButtonModule,
    MatCheckboxModule,
    MatExpansionModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    MatTooltipModule,
    ReactiveFormsModule,
    RouterLink,
    ScreeningCaution,
  ],
  templateUrl: './formula-page.html',
  styleUrl: './formula-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FormulaPage {
  private readonly api = inject(MineralFormulasApi);
  private readonly setsApi = inject(ReactionSetsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  protected readonly form = createOxideForm();
  protected readonly mainOxides = MAIN_OXIDES;
  protected readonly moreOxides = MORE_OXIDES;
  protected readonly groups = GROUP_OPTIONS;
  protected readonly examples = EXAMPLES;
  protected readonly pasteProblems = signal<PasteProblem[]>([]);
  protected readonly source = signal('');
  protected readonly isSaving = signal(false);
  protected readonly targetSetId = signal<string | null>(null);

  private readonly value = toSignal(this.form.valueChanges.pipe(debounceTime(80), startWith(null), map(() => this.form.getRawValue())), {
    initialValue: this.form.getRawValue(),
  });
  protected readonly view = computed(() => recalculate(oxideInputOf(this.value())));
  protected readonly basisHint = computed(() => {
    const group = this.groups.find((entry) => entry.key === this.value().group);
    return group ? `Default for the group: ${group.oxygens} O` : 'No group: give the oxygens';
  });
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly saved = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) => this.api.list(teamId),
  });
  protected readonly draftSets = rxResource({
    params: () => (this.canWrite() ? this.teamId() : undefined),
    stream: ({ params: teamId }) => this.setsApi.listSets(teamId, 'draft'),
  });

  protected load(example: (typeof EXAMPLES)[number]): void {
    this.form.controls.oxides.reset();
    this.form.patchValue({ name: example.name, group: example.group, oxygens: null, isDroop: false, oxides: example.oxides });
    this.source.set(example.source);
    this.pasteProblems.set([]);
  }

  protected readPaste(text: string): void {
    const pasted = readPastedOxides(text);
    this.pasteProblems.set(pasted.problems);
    if (Object.keys(pasted.oxides).length === 0) return;
    this.form.controls.oxides.reset();
    this.form.controls.oxides.patchValue(pasted.oxides);
    this.source.set('pasted analysis');
  }

  protected clear(): void {
    this.form.controls.oxides.reset();
    this.form.controls.name.reset();
    this.source.set('');
  }

  protected save(): void {
    const view = this.view();
    if (view.status !== 'done') return;
    const value = this.form.getRawValue();
    const name = value.name.trim() || `Mineral ${view.formula}`;
    const setId = this.targetSetId();
    const target = this.draftSets.value()?.find((set) => set.id === setId);
    const group = value.group || undefined;
    this.isSaving.set(true);
    this.api
      .save(this.teamId(), {
        name,
        sampleName: this.source(),
        notes: this.analysisNote(),
        decimals: 2,
        analysis: {
          oxides: Object.fromEntries(Object.entries(value.oxides).filter((entry): entry is [string, number] => typeof entry[1] === 'number' && entry[1] !== 0)),
          oxygens: view.result.oxygens,
          ...(group ? { group } : {}),
          ...(value.isDroop ? { ferric: 'droop' as const } : {}),
        },
        products: { aluminium: value.aluminium, iron: value.iron },
        reactionSetId: setId,
        ...(setId ? { reactionName: `${name} weathering` } : {}),
      })
      .subscribe({
        next: (saved) => {
          this.isSaving.set(false);
          const into = saved.reaction && target ? `, its weathering reaction added to “${target.name}”` : '';
          this.notifier.success(`Species “${saved.species.name}” added to the catalogue${into}.`);
          this.saved.reload();
        },
        error: (error: unknown) => {
          this.isSaving.set(false);
          this.notifier.problem(toProblem(error));
        },
      });
  }

  protected download(): void {
    this.api.exportCsv(this.teamId()).subscribe({
      next: (blob) => saveBlob(blob, 'mineral-formulas.csv'),
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  protected endMemberText(members: Readonly<Record<string, number>> | undefined): string {
    if (!members) return '–';
    const parts = (['An', 'Fo', 'mgNumber'] as const).filter((key) => members[key] !== undefined).map((key) => `${key === 'mgNumber' ? 'Mg#' : key} ${(members[key] * 100).toFixed(1)}`);
    return parts.join(' · ') || '–';
  }

  private analysisNote(): string {
    const oxides = Object.entries(this.form.getRawValue().oxides).filter(([, wt]) => typeof wt === 'number' && wt !== 0);
    return `Oxide analysis (wt%): ${oxides.map(([key, wt]) => `${key} ${wt}`).join(', ')}`;
  }
}
