import { NgTemplateOutlet } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { Fraction } from '../fraction/fraction';
import { equationParts } from './equation-parts';

/**
 * A reaction as a chemist writes it on paper: real subscripts, superscript charges, stacked
 * fractions and a proper arrow. Text that does not parse yet is shown as typed.
 */
@Component({
  selector: 'tl-equation-view',
  imports: [Fraction, NgTemplateOutlet],
  templateUrl: './equation-view.html',
  styleUrl: './equation-view.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'tl-equation', '[class.is-compact]': 'isCompact()' },
})
export class EquationView {
  /** The equation text. */
  readonly equation = input.required<string>();
  /** Whether to keep the line low (slashed fractions), for tables and lists. */
  readonly isCompact = input(false);

  protected readonly view = computed(() => equationParts(this.equation()));
}
