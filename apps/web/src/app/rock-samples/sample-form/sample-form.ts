import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { AbstractControl, FormArray, FormControl, FormGroup, ReactiveFormsModule, ValidationErrors, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { ABA_MINERALS, OXIDES } from '@tallus/chem';
import type { CreateRockSampleRequest, RockSample } from '@tallus/contracts';

import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { RockSamplesApi } from '../rock-samples-api';

/** What the dialog is opened with: the team, and the sample to change (none: a new sample). */
export interface SampleFormData {
  teamId: string;
  sample?: RockSample;
}

type PercentRow = FormGroup<{ name: FormControl<string>; formula: FormControl<string>; weightPercent: FormControl<number | null> }>;

const percent = [Validators.min(0), Validators.max(100)];

/** The interval must not end above where it starts. */
function intervalInOrder(group: AbstractControl): ValidationErrors | null {
  const from = group.get('depthFromM')?.value as number | null;
  const to = group.get('depthToM')?.value as number | null;
  return from !== null && to !== null && to < from ? { intervalReversed: true } : null;
}

/**
 * Adds one rock sample by hand, or corrects one: interval, lithology, sulfur forms, measured NP,
 * paste pH, mineral modes and oxide composition. The server recomputes its ABA and CO2 figures
 * on save, as for a CSV row. Closes with the saved sample.
 */
@Component({
  selector: 'tl-sample-form',
  imports: [MatButtonModule, MatDialogModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, ReactiveFormsModule],
  templateUrl: './sample-form.html',
  styleUrl: './sample-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SampleForm {
  private readonly api = inject(RockSamplesApi);
  private readonly dialogRef = inject<MatDialogRef<SampleForm, RockSample>>(MatDialogRef);
  protected readonly data = inject<SampleFormData>(MAT_DIALOG_DATA);

  protected readonly abaMinerals = ABA_MINERALS;
  protected readonly oxideKeys = OXIDES.map((oxide) => oxide.key);
  protected readonly describe = describeValidationErrors;
  protected readonly isSaving = signal(false);
  protected readonly formError = signal<string | null>(null);

  protected readonly form = new FormGroup(
    {
      name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(160)] }),
      site: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(200)] }),
      depthFromM: new FormControl<number | null>(null, [Validators.min(0), Validators.max(10_000)]),
      depthToM: new FormControl<number | null>(null, [Validators.min(0), Validators.max(10_000)]),
      lithology: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(200)] }),
      totalSulfurPercent: new FormControl<number | null>(null, percent),
      sulfideSulfurPercent: new FormControl<number | null>(null, percent),
      sulfateSulfurPercent: new FormControl<number | null>(null, percent),
      neutralisationPotential: new FormControl<number | null>(null, [Validators.min(0), Validators.max(2_000)]),
      pastePh: new FormControl<number | null>(null, [Validators.min(0), Validators.max(14)]),
      notes: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(4_000)] }),
      modes: new FormArray<PercentRow>([]),
      oxides: new FormArray<PercentRow>([]),
    },
    { validators: intervalInOrder },
  );

  constructor() {
    const sample = this.data.sample;
    if (!sample) return;
    const { modes: _modes, oxides: _oxides, ...fields } = sample;
    this.form.patchValue(fields);
    for (const mode of sample.modes) this.form.controls.modes.push(row(mode.mineral, mode.formula ?? '', mode.weightPercent));
    for (const [key, value] of Object.entries(sample.oxides ?? {})) this.form.controls.oxides.push(row(key, '', value));
  }

  protected addMode(): void {
    this.form.controls.modes.push(row('', '', null));
  }

  protected addOxide(): void {
    this.form.controls.oxides.push(row('', '', null));
  }

  protected save(): void {
    if (this.form.invalid || this.isSaving()) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const body: CreateRockSampleRequest = {
      ...value,
      name: value.name.trim(),
      modes: value.modes.map((mode) => ({ mineral: mode.name.trim(), formula: mode.formula.trim() || null, weightPercent: mode.weightPercent ?? 0 })),
      oxides: value.oxides.length === 0 ? null : Object.fromEntries(value.oxides.map((oxide) => [oxide.name.trim(), oxide.weightPercent ?? 0])),
    };
    const existing = this.data.sample;
    const request = existing ? this.api.update(existing.id, { ...body, version: existing.version }) : this.api.create(this.data.teamId, body);
    this.isSaving.set(true);
    this.formError.set(null);
    request.subscribe({
      next: (saved) => this.dialogRef.close(saved),
      error: (error: unknown) => {
        this.isSaving.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem)) this.formError.set(describeProblem(problem));
      },
    });
  }
}

function row(name: string, formula: string, weightPercent: number | null): PercentRow {
  return new FormGroup({
    name: new FormControl(name, { nonNullable: true, validators: [Validators.required, Validators.maxLength(80)] }),
    formula: new FormControl(formula, { nonNullable: true, validators: [Validators.maxLength(200)] }),
    weightPercent: new FormControl<number | null>(weightPercent, [Validators.required, ...percent]),
  });
}
