import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { BalanceStatus } from '../../chem-view/balance-status/balance-status';
import { EquationView } from '../../chem-view/equation-view/equation-view';
import { FigurePipe } from '../../chem-view/figure/figure';
import { Fraction } from '../../chem-view/fraction/fraction';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { describeChemIssue } from '../../core/error-messages';
import { splitBySpan } from '../../core/split-by-span';
import type { CheckView } from './check-reaction';

const OPTION_ERRORS = new Set(['BUDGET_UNKNOWN_REFERENCE', 'BALANCE_UNKNOWN_SPECIES', 'BUDGET_BAD_AMOUNT']);

/**
 * The check of one reaction: balance status (icon and word), residual of each element and of
 * the charge, electron budget, and proton budget per mole, per kg and per tonne of rock.
 */
@Component({
  selector: 'tl-reaction-check',
  imports: [BalanceStatus, EquationView, FigurePipe, Fraction, FormulaText, MatIconModule],
  templateUrl: './reaction-check.html',
  styleUrl: './reaction-check.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'tl-reaction-check', 'aria-live': 'polite' },
})
export class ReactionCheck {
  /** The check to show. */
  readonly check = input.required<CheckView>();
  /** The equation text the check's error span points into. */
  readonly equation = input('');
  /** Rock weight percent the per-tonne figures are for (shown in the header). */
  readonly rockWeightPercent = input<number | null>(null);

  protected readonly errorText = computed(() => {
    const error = this.check().error;
    return error ? describeChemIssue(error) : null;
  });
  protected readonly errorPlace = computed(() => {
    const error = this.check().error;
    // Errors of the reference option point into that option's text, not into the equation.
    return error && !OPTION_ERRORS.has(error.code) ? splitBySpan(this.equation(), error.span) : null;
  });
  protected readonly offRows = computed(() => this.check().residuals.filter((row) => !row.isZero).length);
}
