import { ChangeDetectionStrategy, Component, effect, inject, input, output, signal, untracked } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { TeamSettings } from '@tallus/contracts';

import { describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { TeamSettingsApi } from '../../site-data/team-settings-api';

/** The team's ABA and charge-balance settings with the defaults and their published sources; owners change them. */
@Component({
  selector: 'tl-band-settings',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './band-settings.html',
  styleUrl: './band-settings.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BandSettings {
  private readonly api = inject(TeamSettingsApi);
  private readonly notifier = inject(Notifier);

  readonly teamId = input.required<string>();
  readonly settings = input.required<TeamSettings>();
  /** Whether the user may change them (owners). */
  readonly canEdit = input(false);
  /** Emits the saved settings. */
  readonly saved = output<TeamSettings>();

  protected readonly isEditing = signal(false);
  protected readonly form = new FormGroup({
    acidGenerating: new FormControl<number | null>(null, [Validators.required, Validators.min(0.01)]),
    nonAcidGenerating: new FormControl<number | null>(null, [Validators.required, Validators.min(0.01)]),
    source: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    apSulfurBasis: new FormControl<'sulfide' | 'total'>('sulfide', { nonNullable: true }),
    carbonatePathway: new FormControl<'co2' | 'bicarbonate'>('co2', { nonNullable: true }),
    cbeThresholdPercent: new FormControl<number | null>(null, [Validators.required, Validators.min(0.1)]),
    cbeConvention: new FormControl<'standard' | 'half-sum'>('standard', { nonNullable: true }),
  });

  constructor() {
    effect(() => {
      const settings = this.settings();
      untracked(() => this.fill(settings));
    });
  }

  protected errorOf(control: FormControl<unknown>): string {
    return describeValidationErrors(control.errors);
  }

  protected useDefaults(): void {
    const defaults = this.settings().defaults;
    this.form.patchValue({ ...defaults.nprBands, apSulfurBasis: defaults.apSulfurBasis, carbonatePathway: defaults.carbonatePathway, cbeThresholdPercent: defaults.cbeThresholdPercent, cbeConvention: defaults.cbeConvention });
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    this.api
      .update(this.teamId(), {
        version: this.settings().version,
        nprBands: { acidGenerating: value.acidGenerating ?? 1, nonAcidGenerating: value.nonAcidGenerating ?? 3, source: value.source },
        apSulfurBasis: value.apSulfurBasis,
        carbonatePathway: value.carbonatePathway,
        cbeThresholdPercent: value.cbeThresholdPercent ?? 5,
        cbeConvention: value.cbeConvention,
      })
      .subscribe({
        next: (saved) => {
          this.isEditing.set(false);
          this.notifier.success('Team settings saved: every sample is classified with them now.');
          this.saved.emit(saved);
        },
        error: (error: unknown) => {
          const problem = toProblem(error);
          if (!showProblemAtFields(this.form, problem)) this.notifier.problem(problem);
        },
      });
  }

  private fill(settings: TeamSettings): void {
    this.form.patchValue({ ...settings.nprBands, apSulfurBasis: settings.apSulfurBasis, carbonatePathway: settings.carbonatePathway, cbeThresholdPercent: settings.cbeThresholdPercent, cbeConvention: settings.cbeConvention });
  }
}
