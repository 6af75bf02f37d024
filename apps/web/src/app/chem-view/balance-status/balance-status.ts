import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';

/** Every balance status of DESIGN.md §2, plus `empty` for a reaction with no text yet. */
export type BalanceStatusName = 'balanced' | 'unbalanced' | 'open' | 'impossible' | 'invalid' | 'empty';

/** How a balance status appears: an icon and a word, never colour alone, and what it means. */
export interface BalanceStatusView {
  label: string;
  icon: string;
  tone: 'success' | 'warning' | 'danger' | 'info';
  meaning: string;
}

/** The screen view of each balance status. */
export const BALANCE_STATUS_VIEWS: Readonly<Record<BalanceStatusName, BalanceStatusView>> = {
  balanced: { label: 'balanced', icon: 'check_circle', tone: 'success', meaning: 'Every element and the charge balance.' },
  unbalanced: { label: 'unbalanced', icon: 'error', tone: 'warning', meaning: 'Some element or the charge does not balance with these coefficients.' },
  open: { label: 'open', icon: 'call_split', tone: 'info', meaning: 'More than one independent balance exists: pin some coefficients.' },
  impossible: { label: 'impossible', icon: 'block', tone: 'danger', meaning: 'No coefficients balance these species: a species is missing or wrong.' },
  invalid: { label: 'invalid', icon: 'report', tone: 'danger', meaning: 'The text does not read as an equation.' },
  empty: { label: 'not written', icon: 'edit', tone: 'info', meaning: 'Write the equation to check it.' },
};

/**
 * The view of a status name from the API or libs/chem; an unknown one reads as `invalid`.
 *
 * @param status a balance status
 */
export function balanceStatusView(status: string): BalanceStatusView {
  return BALANCE_STATUS_VIEWS[status as BalanceStatusName] ?? BALANCE_STATUS_VIEWS.invalid;
}

/** A balance status as an icon and a word, with its meaning as a tooltip. */
@Component({
  selector: 'tl-balance-status',
  imports: [MatIconModule, MatTooltipModule],
  template: `<span
    class="tl-status"
    [class]="'tl-status tl-status-' + view().tone"
    [matTooltip]="view().meaning"
    ><mat-icon aria-hidden="true">{{ view().icon }}</mat-icon>{{ view().label }}</span
  >`,
  changeDetection: ChangeDetectionStrategy.OnPush,
  host: { class: 'tl-balance-status', '[attr.data-status]': 'status()' },
})
export class BalanceStatus {
  /** The status name. */
  readonly status = input.required<string>();

  protected readonly view = computed(() => balanceStatusView(this.status()));
}
