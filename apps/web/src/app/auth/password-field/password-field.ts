import { ChangeDetectionStrategy, Component, input, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';

import { describeValidationErrors } from '../../core/error-messages';

/** A password field whose typed characters can be shown and hidden again, with its error and hint. */
@Component({
  selector: 'tl-password-field',
  imports: [MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, ReactiveFormsModule],
  templateUrl: './password-field.html',
  styles: ':host { display: contents; }',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PasswordField {
  /** The form's password control. */
  readonly control = input.required<FormControl<string>>();
  /** `current-password` to sign in, `new-password` to choose one, so password managers do the right thing. */
  readonly autocomplete = input.required<'current-password' | 'new-password'>();
  /** A line under the field, e.g. the minimum length. */
  readonly hint = input<string>('');

  protected readonly isVisible = signal(false);
  protected readonly describe = describeValidationErrors;
}
