import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { TeamSummary } from '@tallus/contracts';

import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { notBlank } from '../../core/validators';
import { TeamStore } from '../team-store';

/** Asks for a team's name and creates the team; closes with the new team. */
@Component({
  selector: 'tl-new-team-dialog',
  imports: [
    MatButtonModule,
    MatDialogModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    ReactiveFormsModule,
  ],
  templateUrl: './new-team-dialog.html',
  styleUrl: './new-team-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewTeamDialog {
  private readonly teamStore = inject(TeamStore);
  private readonly dialogRef = inject<MatDialogRef<NewTeamDialog, TeamSummary>>(MatDialogRef);

  protected readonly form = inject(NonNullableFormBuilder).group({
    name: ['', [Validators.required, Validators.maxLength(120), notBlank]],
  });
  protected readonly isSaving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly describe = describeValidationErrors;

  protected create(): void {
    if (this.form.invalid || this.isSaving()) {
      this.form.markAllAsTouched();
      return;
    }
    this.isSaving.set(true);
    this.formError.set(null);
    this.teamStore.create(this.form.getRawValue().name.trim()).subscribe({
      next: (team) => this.dialogRef.close(team),
      error: (error: unknown) => {
        this.isSaving.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem)) {
          this.formError.set(describeProblem(problem));
        }
      },
    });
  }
}
