import { ChangeDetectionStrategy, Component, computed, input, linkedSignal } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { MassBalanceModel, PhaseRuleName } from '@tallus/contracts';

import { EquationView } from '../../chem-view/equation-view/equation-view';
import { FigurePipe } from '../../chem-view/figure/figure';
import { Fraction } from '../../chem-view/fraction/fraction';
import { transferBars } from '../transfers-chart/transfer-bars';
import { TransfersChart } from '../transfers-chart/transfers-chart';

/** How a solver status appears. */
const STATUS_VIEWS = {
  exact: { label: 'exact models', icon: 'check_circle', tone: 'success', meaning: 'These phase sets explain the change in every constraint exactly.' },
  'least-squares': { label: 'least-squares fit', icon: 'rule', tone: 'warning', meaning: 'No set of the candidate phases explains the change exactly; the models come closest, with the residuals shown.' },
  none: { label: 'no model', icon: 'block', tone: 'danger', meaning: 'No candidate phase explains any part of the change: add phases or check the waters.' },
  invalid: { label: 'cannot solve', icon: 'report', tone: 'danger', meaning: 'The model could not be solved as defined.' },
} as const;

/**
 * The solutions of a mass-balance model: every minimal model with its exact mole transfers, validity
 * and robustness; the selected model's transfers as a chart and the net reaction it implies.
 */
@Component({
  selector: 'tl-model-results',
  imports: [EquationView, FigurePipe, Fraction, MatIconModule, MatTooltipModule, TransfersChart],
  templateUrl: './model-results.html',
  styleUrl: './model-results.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ModelResults {
  /** The model with its stored result. */
  readonly model = input.required<MassBalanceModel>();

  protected readonly result = computed(() => this.model().result);
  protected readonly statusView = computed(() => STATUS_VIEWS[this.result().status]);
  /** Every candidate phase, for the transfer columns. */
  protected readonly phaseNames = computed(() => this.model().phases.map((phase) => phase.name));
  protected readonly rules = computed(() => Object.fromEntries(this.model().phases.map((phase) => [phase.name, phase.rule])) as Record<string, PhaseRuleName>);
  protected readonly hasUncertainty = computed(() => Object.values(this.model().uncertainty).some((value) => value > 0));
  protected readonly selected = linkedSignal<number>(() => (this.result().models.length > 0 ? 0 : -1));
  protected readonly selectedModel = computed(() => this.result().models[this.selected()] ?? null);
  protected readonly bars = computed(() => {
    const model = this.selectedModel();
    return model ? transferBars(model, this.rules()) : [];
  });
  protected readonly changes = computed(() => Object.entries(this.result().change));
  protected readonly validCount = computed(() => this.result().models.filter((model) => model.valid).length);

  protected select(index: number): void {
    this.selected.set(index);
  }

  protected residualText(residuals: Readonly<Record<string, number>> | undefined): string {
    if (!residuals) return '';
    return Object.entries(residuals).filter(([, value]) => Math.abs(value) > 1e-12).map(([key, value]) => `${key} ${value.toPrecision(3).replace('-', '−')}`).join(', ');
  }
}
