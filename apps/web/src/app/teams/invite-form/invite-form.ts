import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import type { Role } from '@tallus/contracts';

import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { MembersStore } from '../members/members-store';
import { ROLE_VIEWS } from '../roles';

/** Problems that concern the invited address as a whole. */
const FIELDS_BY_CODE = { INVITATION_ALREADY_MEMBER: 'email', CONFLICT: 'email' } as const;

/** Owners invite a colleague by e-mail with a role; the API sends the invitation e-mail. */
@Component({
  selector: 'tl-invite-form',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule, ReactiveFormsModule],
  templateUrl: './invite-form.html',
  styleUrl: './invite-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InviteForm {
  private readonly store = inject(MembersStore);
  private readonly notifier = inject(Notifier);

  /** The team to invite into. */
  readonly teamId = input.required<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    role: ['editor' as Role, [Validators.required]],
  });
  protected readonly isSending = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly roles = ROLE_VIEWS;
  protected readonly describe = describeValidationErrors;

  protected invite(formDirective: FormGroupDirective): void {
    if (this.form.invalid || this.isSending()) {
      this.form.markAllAsTouched();
      return;
    }
    this.isSending.set(true);
    this.formError.set(null);
    const { email, role } = this.form.getRawValue();
    this.store.invite(this.teamId(), { email: email.trim(), role }).subscribe({
      next: (invitation) => {
        this.isSending.set(false);
        this.notifier.success(`Invitation sent to ${invitation.email}.`);
        // Resetting through the directive also clears "submitted", so no field turns red.
        formDirective.resetForm({ email: '', role });
      },
      error: (error: unknown) => {
        this.isSending.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem, FIELDS_BY_CODE)) {
          this.formError.set(describeProblem(problem));
        }
      },
    });
  }
}
