import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { AbstractControl, FormControl, FormGroup, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { Species, SpeciesPhase } from '@tallus/contracts';

import { FormulaField } from '../../chem-view/formula-field/formula-field';
import { formulaValidator } from '../../chem-view/formula-field/formula-check';
import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { notBlank } from '../../core/validators';
import { SpeciesApi } from '../species-api';
import { formatOxidationStates, parseOxidationStates } from './oxidation-states-text';

function oxidationStatesValidator(control: AbstractControl<string>): ValidationErrors | null {
  const result = parseOxidationStates(control.value ?? '');
  return 'error' in result ? { server: result.error } : null;
}

/** Adds a species to the team's catalogue or edits one, with live molar mass and formula errors at their place. */
@Component({
  selector: 'tl-species-dialog',
  imports: [FormulaField, MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './species-dialog.html',
  styleUrl: './species-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SpeciesDialog {
  private readonly api = inject(SpeciesApi);
  private readonly dialogRef = inject<MatDialogRef<SpeciesDialog, Species>>(MatDialogRef);
  protected readonly data = inject<{ teamId: string; species: Species | null }>(MAT_DIALOG_DATA);

  protected readonly phases: SpeciesPhase[] = ['mineral', 'aqueous', 'gas', 'liquid'];
  protected readonly form = new FormGroup({
    name: new FormControl(this.data.species?.name ?? '', { nonNullable: true, validators: [Validators.required, notBlank, Validators.maxLength(160)] }),
    formula: new FormControl(this.data.species?.formula ?? '', { nonNullable: true, validators: [Validators.required, formulaValidator] }),
    phase: new FormControl<SpeciesPhase>(this.data.species?.phase ?? 'mineral', { nonNullable: true }),
    oxidationStates: new FormControl(formatOxidationStates(this.data.species?.oxidationStates ?? null), {
      nonNullable: true,
      validators: [oxidationStatesValidator],
    }),
    source: new FormControl(this.data.species?.source ?? '', { nonNullable: true, validators: [Validators.maxLength(500)] }),
    notes: new FormControl(this.data.species?.notes ?? '', { nonNullable: true }),
  });
  protected readonly isSaving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly describe = describeValidationErrors;

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const parsed = parseOxidationStates(value.oxidationStates);
    const body = {
      name: value.name.trim(),
      formula: value.formula.trim(),
      phase: value.phase,
      oxidationStates: 'states' in parsed ? parsed.states : null,
      source: value.source.trim(),
      notes: value.notes,
    };
    const existing = this.data.species;
    const request = existing ? this.api.update(existing.id, { ...body, version: existing.version }) : this.api.create(this.data.teamId, body);
    this.isSaving.set(true);
    this.error.set(null);
    request.subscribe({
      next: (species) => this.dialogRef.close(species),
      error: (error: unknown) => {
        this.isSaving.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem, { SPECIES_DUPLICATE: 'formula' })) this.error.set(describeProblem(problem));
      },
    });
  }
}
