import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import type { MassBalanceModel } from '@tallus/contracts';
import { forkJoin, map, startWith } from 'rxjs';

import { describeValidationErrors, errorText } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { fileNameOf, saveBlob } from '../../site-data/save-file';
import { SpeciesApi } from '../../species/species-api';
import { TeamStore } from '../../teams/team-store';
import { WaterApi } from '../../water/water-api';
import { MassBalanceApi } from '../mass-balance-api';
import { ModelResults } from '../model-results/model-results';
import { createModelForm, elementsOf, fillModelForm, modelRequestOf, phaseGroup, soluteControl, solutesOf } from './model-form';

/** A mass-balance model: waters, candidate phases with their rules, constraints and uncertainty; saved and solved on the server. */
@Component({
  selector: 'tl-model-editor',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule, MatTooltipModule, ModelResults, ReactiveFormsModule, RouterLink],
  templateUrl: './model-editor.html',
  styleUrl: './model-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ModelEditor {
  private readonly api = inject(MassBalanceApi);
  private readonly waterApi = inject(WaterApi);
  private readonly speciesApi = inject(SpeciesApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  readonly teamId = input.required<string>();
  /** The model id, or `new`. */
  readonly modelId = input.required<string>();

  protected readonly form = createModelForm();
  protected readonly isBusy = signal<'saving' | 'solving' | null>(null);
  protected readonly constraintError = signal<string | null>(null);
  protected readonly isNew = computed(() => this.modelId() === 'new');
  protected readonly model = rxResource({ params: () => (this.isNew() ? undefined : this.modelId()), stream: ({ params: id }) => this.api.get(id) });
  protected readonly waters = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.waterApi.list(teamId) });
  protected readonly species = rxResource({
    params: () => this.teamId(),
    stream: ({ params: teamId }) => forkJoin([this.speciesApi.listTeamSpecies(teamId), this.speciesApi.listBuiltin()]).pipe(map(([own, builtin]) => [...own, ...builtin])),
  });
  protected readonly canWrite = this.teamStore.canWrite;
  private readonly value = toSignal(this.form.valueChanges.pipe(startWith(null), map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  protected readonly elements = computed(() => {
    const value = this.value();
    const waters = this.waters.value() ?? [];
    const found = elementsOf([waters.find((water) => water.id === value.initialWaterId), waters.find((water) => water.id === value.finalWaterId)]);
    return [...new Set([...found, ...value.constraints.filter((entry) => entry !== 'charge' && entry !== 'electrons')])].sort();
  });
  /** A row per solute of the chosen waters, for its own uncertainty. */
  protected readonly soluteRows = computed(() =>
    // The controls are added quietly (no valueChanges), so creating them here writes no signal.
    solutesOf(this.value(), this.waters.value() ?? []).map((solute) => ({ solute, control: soluteControl(this.form, solute) })),
  );
  protected readonly loadError = computed(() => errorText(this.model.error() ?? this.waters.error()));

  constructor() {
    effect(() => {
      const model = this.model.value();
      // Filled again once the waters arrive: their solutes decide which overrides keep the stored map as it is.
      const waters = this.waters.value() ?? [];
      untracked(() => (model ? fillModelForm(this.form, model, waters) : this.isNew() && this.form.controls.phases.length === 0 ? this.addPhase() : undefined));
    });
    effect(() => (this.canWrite() ? this.form.enable({ emitEvent: false }) : this.form.disable({ emitEvent: false })));
  }

  protected get phases() {
    return this.form.controls.phases;
  }

  protected addPhase(): void {
    this.phases.push(phaseGroup());
  }

  protected removePhase(index: number): void {
    this.phases.removeAt(index);
  }

  /** Names a phase after its species when the user has not named it. */
  protected pickSpecies(index: number, speciesId: string): void {
    const row = this.phases.at(index);
    const species = this.species.value()?.find((entry) => entry.id === speciesId);
    if (species && !row.controls.name.value) row.controls.name.setValue(species.name);
  }

  protected isConstraint(name: string): boolean {
    return this.value().constraints.includes(name);
  }

  protected toggleConstraint(name: string, isChecked: boolean): void {
    const current = this.form.controls.constraints.value.filter((entry) => entry !== name);
    this.form.controls.constraints.setValue(isChecked ? [...current, name] : current);
  }

  protected errorOf(errors: Parameters<typeof describeValidationErrors>[0]): string {
    return describeValidationErrors(errors);
  }

  protected save(): void {
    if (this.form.invalid || this.value().constraints.length === 0) {
      this.form.markAllAsTouched();
      this.constraintError.set(this.value().constraints.length === 0 ? 'Tick at least one constraint: an element whose change the phases must explain.' : null);
      return;
    }
    this.constraintError.set(null);
    const body = modelRequestOf(this.form.getRawValue(), this.waters.value() ?? []);
    const existing = this.model.value();
    this.isBusy.set('saving');
    const call = existing ? this.api.update(existing.id, { ...body, version: existing.version }) : this.api.create(this.teamId(), body);
    call.subscribe({
      next: (saved) => this.afterSave(saved, existing === undefined),
      error: (error: unknown) => this.fail(error),
    });
  }

  protected solve(): void {
    const existing = this.model.value();
    if (!existing) return;
    this.isBusy.set('solving');
    this.api.solve(existing.id).subscribe({ next: (saved) => this.afterSave(saved, false), error: (error: unknown) => this.fail(error) });
  }

  protected download(): void {
    const existing = this.model.value();
    if (!existing) return;
    this.api.modelsCsv(existing.id).subscribe({
      next: (blob) => saveBlob(blob, `${fileNameOf(existing.name, 'mass-balance')}-models.csv`),
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  private afterSave(saved: MassBalanceModel, isCreated: boolean): void {
    this.isBusy.set(null);
    this.notifier.success(`Model “${saved.name}” saved and solved: ${saved.result.models.length} model(s).`);
    if (isCreated) void this.router.navigate(['/teams', this.teamId(), 'mass-balance', saved.id]);
    else this.model.set(saved);
  }

  private fail(error: unknown): void {
    this.isBusy.set(null);
    const problem = toProblem(error);
    // The API names a phase's `formula` or `equation`; the form keeps both in one `text` field.
    const issues = problem.issues?.map((issue) => ({ ...issue, path: issue.path.map((part) => (part === 'formula' || part === 'equation' ? 'text' : part)) }));
    if (!showProblemAtFields(this.form, { ...problem, ...(issues ? { issues } : {}) })) this.notifier.problem(problem);
  }
}
