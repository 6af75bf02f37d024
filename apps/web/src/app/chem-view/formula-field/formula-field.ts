import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, ReactiveFormsModule } from '@angular/forms';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { ChemIssue } from '@tallus/chem';
import { debounceTime, map, startWith, switchMap } from 'rxjs';

import { describeChemIssue, describeValidationErrors } from '../../core/error-messages';
import { splitBySpan } from '../../core/split-by-span';
import { checkFormula } from './formula-check';

/**
 * A species formula field: the formula rendered with real sub- and superscripts and its molar
 * mass as you type; a formula that does not read says why and underlines where.
 * Give it a control with {@link formulaValidator}.
 */
@Component({
  selector: 'tl-formula-field',
  imports: [DecimalPipe, MatFormFieldModule, MatInputModule, ReactiveFormsModule],
  templateUrl: './formula-field.html',
  styleUrl: './formula-field.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FormulaField {
  /** The form control of the formula text. */
  readonly control = input.required<FormControl<string>>();
  /** The field's label. */
  readonly label = input('Formula');

  private readonly text = toSignal(
    toObservable(this.control).pipe(
      switchMap((control) => control.valueChanges.pipe(startWith(control.value), debounceTime(60))),
    ),
    { initialValue: '' },
  );

  /** The control's errors, followed as its status changes (validators and server problems alike). */
  private readonly errors = toSignal(
    toObservable(this.control).pipe(
      switchMap((control) => control.statusChanges.pipe(startWith(control.status), map(() => control.errors))),
    ),
    { initialValue: null },
  );

  protected readonly check = computed(() => checkFormula(this.text() ?? ''));
  protected readonly errorText = computed(() => {
    const errors = this.errors();
    const issue = errors?.['formula'] as ChemIssue | undefined;
    return issue ? describeChemIssue(issue) : describeValidationErrors(errors);
  });
  protected readonly errorPlace = computed(() => {
    const check = this.check();
    return !check.isValid && check.error ? splitBySpan(this.text() ?? '', check.error.span) : null;
  });
}
