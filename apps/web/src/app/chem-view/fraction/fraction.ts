import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { fractionParts } from './fraction-parts';

/**
 * An exact number: integers and decimals as they are, fractions stacked (numerator over
 * denominator) in tabular figures, or slashed (¹⁵⁄₄) where a line must stay low, e.g. in tables.
 * Screen readers hear the plain text `15/4`.
 */
@Component({
  selector: 'tl-fraction',
  template: `
    <span class="tl-visually-hidden">{{ parts().text }}</span>
    <span class="shown" aria-hidden="true">@if (parts().isNegative) {<span class="sign">−</span>}@if (parts().denominator) {@if (isSlashed()) {<sup class="num">{{ parts().numerator }}</sup><span class="slash">⁄</span><sub class="den">{{ parts().denominator }}</sub>} @else {<span class="stack"><span class="num">{{ parts().numerator }}</span><span class="den">{{ parts().denominator }}</span></span>}} @else {<span>{{ parts().whole }}</span>}</span>
  `,
  styleUrl: './fraction.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'tl-fraction' },
})
export class Fraction {
  /** The exact number as text (`15/4`, `-2`, `0.5`). */
  readonly value = input.required<string>();
  /** Whether to write the fraction on one line (¹⁵⁄₄) instead of stacked. */
  readonly isSlashed = input(false);

  protected readonly parts = computed(() => fractionParts(this.value()));
}
