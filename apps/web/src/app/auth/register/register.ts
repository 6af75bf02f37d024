import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { Router, RouterLink } from '@angular/router';

import { safeReturnUrl } from '../../core/auth-guard';
import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { notBlank } from '../../core/validators';
import { AuthFrame } from '../auth-frame/auth-frame';
import { PasswordField } from '../password-field/password-field';
import { AuthStore } from '../auth-store';

/** The shortest password the API accepts. */
export const MIN_PASSWORD_LENGTH = 10;

/** Problem codes that concern one field of registration as a whole. */
const FIELDS_BY_CODE = { AUTH_EMAIL_TAKEN: 'email' } as const;

/** Account creation: display name, e-mail, password. */
@Component({
  selector: 'tl-register',
  imports: [
    AuthFrame,
    MatButtonModule,
    MatFormFieldModule,
    MatInputModule,
    MatProgressBarModule,
    PasswordField,
    ReactiveFormsModule,
    RouterLink,
  ],
  templateUrl: './register.html',
  styleUrl: '../auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Register {
  private readonly authStore = inject(AuthStore);
  private readonly router = inject(Router);

  /** Where to go after creating the account (query parameter), e.g. an invitation. */
  readonly returnUrl = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    displayName: ['', [Validators.required, Validators.maxLength(100), notBlank]],
    email: ['', [Validators.required, Validators.email]],
    password: ['', [Validators.required, Validators.minLength(MIN_PASSWORD_LENGTH)]],
  });
  protected readonly isSubmitting = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly isForInvitation = computed(() =>
    safeReturnUrl(this.returnUrl()).startsWith('/invitations/accept'),
  );
  protected readonly minPasswordLength = MIN_PASSWORD_LENGTH;
  protected readonly describe = describeValidationErrors;

  protected register(): void {
    if (this.form.invalid || this.isSubmitting()) {
      this.form.markAllAsTouched();
      return;
    }
    this.isSubmitting.set(true);
    this.formError.set(null);
    const { displayName, email, password } = this.form.getRawValue();
    this.authStore.register({ displayName: displayName.trim(), email: email.trim(), password }).subscribe({
      next: () => void this.router.navigateByUrl(safeReturnUrl(this.returnUrl())),
      error: (error: unknown) => {
        this.isSubmitting.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem, FIELDS_BY_CODE)) {
          this.formError.set(describeProblem(problem));
        }
      },
    });
  }
}
