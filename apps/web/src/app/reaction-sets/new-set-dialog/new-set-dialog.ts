import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import type { ReactionSetDetail } from '@tallus/contracts';

import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { notBlank } from '../../core/validators';
import { ReactionSetsApi } from '../reaction-sets-api';

/** Creates an empty draft reaction set in a team; closes with the new set. */
@Component({
  selector: 'tl-new-set-dialog',
  imports: [MatButtonModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatProgressBarModule, ReactiveFormsModule],
  template: `
    <h2 mat-dialog-title>New reaction set</h2>
    <form [formGroup]="form" (ngSubmit)="create()">
      <mat-dialog-content class="fields">
        <p class="lede">An ordered collection of reactions for one site or purpose. It starts as a draft.</p>
        <mat-form-field>
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" cdkFocusInitial autocomplete="off" />
          <mat-error>{{ describe(form.controls.name.errors) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Site or purpose</mat-label>
          <input matInput formControlName="site" autocomplete="off" />
          <mat-hint>e.g. waste-rock dump, basalt trial plot</mat-hint>
          <mat-error>{{ describe(form.controls.site.errors) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Description</mat-label>
          <textarea matInput formControlName="description" rows="3"></textarea>
        </mat-form-field>
        @if (error(); as message) {
          <p class="tl-banner tl-banner-danger" role="alert">{{ message }}</p>
        }
        @if (isSaving()) {<mat-progress-bar mode="indeterminate" aria-label="Creating the reaction set" />}
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="isSaving()">Create set</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `.fields { display: flex; flex-direction: column; gap: 8px; min-width: min(420px, 80vw); } .lede { margin: 0 0 8px; color: var(--mat-sys-on-surface-variant); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NewSetDialog {
  private readonly api = inject(ReactionSetsApi);
  private readonly dialogRef = inject<MatDialogRef<NewSetDialog, ReactionSetDetail>>(MatDialogRef);
  private readonly data = inject<{ teamId: string }>(MAT_DIALOG_DATA);

  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, notBlank, Validators.maxLength(200)] }),
    site: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(200)] }),
    description: new FormControl('', { nonNullable: true }),
  });
  protected readonly isSaving = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly describe = describeValidationErrors;

  protected create(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.isSaving.set(true);
    this.error.set(null);
    const value = this.form.getRawValue();
    this.api.createSet(this.data.teamId, { name: value.name.trim(), site: value.site.trim(), description: value.description }).subscribe({
      next: (set) => this.dialogRef.close(set),
      error: (error: unknown) => {
        this.isSaving.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem)) this.error.set(describeProblem(problem));
      },
    });
  }
}
