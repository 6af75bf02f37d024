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
import { AuthFrame } from '../auth-frame/auth-frame';
import { PasswordField } from '../password-field/password-field';
import { AuthStore } from '../auth-store';

/** Sign-in with e-mail and password. */
@Component({
  selector: 'tl-sign-in',
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
  templateUrl: './sign-in.html',
  styleUrl: '../auth-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignIn {
  private readonly authStore = inject(AuthStore);
  private readonly router = inject(Router);

  /** Where to go after signing in (query parameter). */
  readonly returnUrl = input<string>();
  /** Set when the previous session ended (query parameter). */
  readonly expired = input<string>();

  protected readonly form = inject(NonNullableFormBuilder).group({
    email: ['', [Validators.required, Validators.email]],
    password: ['', [Validators.required]],
  });
  protected readonly isSubmitting = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly isForInvitation = computed(() =>
    safeReturnUrl(this.returnUrl()).startsWith('/invitations/accept'),
  );
  protected readonly describe = describeValidationErrors;

  protected signIn(): void {
    if (this.form.invalid || this.isSubmitting()) {
      this.form.markAllAsTouched();
      return;
    }
    this.isSubmitting.set(true);
    this.formError.set(null);
    this.authStore.signIn(this.form.getRawValue()).subscribe({
      next: () => void this.router.navigateByUrl(safeReturnUrl(this.returnUrl())),
      error: (error: unknown) => {
        this.isSubmitting.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem)) {
          this.formError.set(describeProblem(problem));
        }
      },
    });
  }
}
