import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

import { checkFormula } from '../formula-field/formula-check';

/** A formula with real subscripts and charge; text that does not parse is shown as it is. */
@Component({
  selector: 'tl-formula-text',
  template: `@let current = check();
    @if (current.isValid) {
      @for (part of current.parts; track $index) {
        @switch (part.kind) {
          @case ('subscript') {<sub>{{ part.text }}</sub>}
          @case ('superscript') {<sup>{{ part.text }}</sup>}
          @default {<span>{{ part.text }}</span>}
        }
      }
    } @else {<span>{{ formula() }}</span>}`,
  styles: `sub, sup { font-size: 0.72em; line-height: 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { '[attr.aria-label]': 'formula()' },
})
export class FormulaText {
  /** The formula text. */
  readonly formula = input.required<string>();

  protected readonly check = computed(() => checkFormula(this.formula()));
}
