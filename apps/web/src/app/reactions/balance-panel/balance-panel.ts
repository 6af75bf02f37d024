import { ChangeDetectionStrategy, Component, computed, effect, input, output, signal, untracked } from '@angular/core';
import { FormControl, FormRecord, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';

import { BalanceStatus } from '../../chem-view/balance-status/balance-status';
import { EquationView } from '../../chem-view/equation-view/equation-view';
import { describeChemIssue } from '../../core/error-messages';
import { BalanceOutcome, balanceReaction } from './balance-reaction';

/**
 * The balance action: exact coefficients for the species as written, scaled to one mole of a
 * chosen species, with pinned coefficients for open reactions. Emits the balanced equation.
 */
@Component({
  selector: 'tl-balance-panel',
  imports: [
    BalanceStatus,
    EquationView,
    MatButtonModule,
    MatExpansionModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatSelectModule,
    ReactiveFormsModule,
  ],
  templateUrl: './balance-panel.html',
  styleUrl: './balance-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BalancePanel {
  /** The equation as typed. */
  readonly equation = input.required<string>();
  /** Its species as written, in order (from the live check). */
  readonly species = input<string[]>([]);
  /** Whether the user may change the reaction. */
  readonly isDisabled = input(false);
  /** The balanced equation, to put into the equation field. */
  readonly balanced = output<string>();

  protected readonly normalizeTo = new FormControl('', { nonNullable: true });
  protected readonly pins = new FormRecord<FormControl<string>>({});
  protected readonly outcome = signal<BalanceOutcome | null>(null);
  protected readonly pinCount = signal(0);

  protected readonly uniqueSpecies = computed(() => [...new Set(this.species())]);
  protected readonly errorText = computed(() => {
    const error = this.outcome()?.error;
    return error ? describeChemIssue(error) : null;
  });

  constructor() {
    effect(() => {
      const species = this.uniqueSpecies();
      untracked(() => this.syncPins(species));
    });
  }

  protected balance(): void {
    const pins: Record<string, string> = {};
    for (const [formula, control] of Object.entries(this.pins.controls)) {
      pins[formula] = control.value;
    }
    const outcome = balanceReaction({ equation: this.equation(), normalizeTo: this.normalizeTo.value, pins });
    this.outcome.set(outcome);
    if (outcome.status === 'balanced' && outcome.equation) {
      this.balanced.emit(outcome.equation);
    }
  }

  protected clearPins(): void {
    this.pins.reset();
    this.pinCount.set(0);
  }

  protected countPins(): void {
    this.pinCount.set(Object.values(this.pins.controls).filter((control) => control.value.trim() !== '').length);
  }

  /** Keeps one pin field per species, keeping what was typed for species still present. */
  private syncPins(species: string[]): void {
    for (const formula of Object.keys(this.pins.controls)) {
      if (!species.includes(formula)) this.pins.removeControl(formula);
    }
    for (const formula of species) {
      if (!this.pins.contains(formula)) this.pins.addControl(formula, new FormControl('', { nonNullable: true }));
    }
    if (this.normalizeTo.value && !species.includes(this.normalizeTo.value)) this.normalizeTo.setValue('');
    this.countPins();
  }
}
