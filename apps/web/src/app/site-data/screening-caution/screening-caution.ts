import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

/** The sentence every screen repeats where an ABA class or a CO2 figure appears (DESIGN.md §5). */
export const SCREENING_SENTENCE =
  'Screening estimate: not a substitute for kinetic testing, site investigation, local regulation or a licensed professional’s judgement.';

/**
 * A caution beside figures that feed decisions about people or the environment (acid drainage
 * classes, CO2 uptake): the screening sentence, then the engine's own caution texts
 * (`ABA_NOTES`, `SIDERITE_CAUTION`, `CO2_CAUTIONS`), so screen, API and report say the same.
 */
@Component({
  selector: 'tl-screening-caution',
  imports: [MatIconModule],
  template: `<mat-icon aria-hidden="true">warning</mat-icon>
    <div>
      <p class="head"><strong>{{ title() }}</strong> {{ sentence }}</p>
      @if (notes().length > 0) {
        <ul>
          @for (note of notes(); track note) {<li>{{ note }}</li>}
        </ul>
      }
    </div>`,
  styles: `
    :host { display: flex; gap: 8px; align-items: flex-start; padding: 10px 12px; margin: 12px 0; border-radius: 8px;
      border-left: 4px solid var(--tl-warning); color: var(--tl-warning); background: var(--tl-warning-container); font: var(--mat-sys-body-small); }
    .head { margin: 0; }
    ul { margin: 4px 0 0; padding-left: 18px; }
    li { margin: 2px 0; }
    mat-icon { flex: none; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { role: 'note', class: 'tl-screening-caution', '[attr.aria-label]': 'title()' },
})
export class ScreeningCaution {
  /** A short heading, e.g. "Acid-base accounting". */
  readonly title = input('Screening estimate.');
  /** The engine's caution texts to list below the sentence. */
  readonly notes = input<readonly string[]>([]);

  protected readonly sentence = SCREENING_SENTENCE;
}
