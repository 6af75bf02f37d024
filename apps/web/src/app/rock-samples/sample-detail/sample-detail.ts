import { ChangeDetectionStrategy, Component, computed, input, linkedSignal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import { ABA_MINERALS, isChemError, mineralAcidBase, SIDERITE_CAUTION, type CarbonatePathway } from '@tallus/chem';
import type { RockSample } from '@tallus/contracts';

import { EquationView } from '../../chem-view/equation-view/equation-view';
import { FigurePipe } from '../../chem-view/figure/figure';
import { ScreeningCaution } from '../../site-data/screening-caution/screening-caution';
import { abaClassView } from '../aba-class-view';

/**
 * One rock sample's mineralogical AP and NP, recomputed in the browser (libs/chem) under the
 * carbonate pathway the user chooses, with the siderite caution; and its CO2 uptake potential.
 */
@Component({
  selector: 'tl-sample-detail',
  imports: [EquationView, FigurePipe, MatButtonToggleModule, MatIconModule, ScreeningCaution],
  templateUrl: './sample-detail.html',
  styleUrl: './sample-detail.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SampleDetail {
  readonly sample = input.required<RockSample>();
  /** The team's default pathway. */
  readonly defaultPathway = input<CarbonatePathway>('co2');

  protected readonly pathway = linkedSignal(() => this.sample().mineralAba?.pathway ?? this.defaultPathway());
  /** Modes of minerals with a built-in ABA reaction. */
  protected readonly abaModes = computed(() =>
    Object.fromEntries(this.sample().modes.filter((mode) => (ABA_MINERALS as readonly string[]).includes(mode.mineral.toLowerCase())).map((mode) => [mode.mineral.toLowerCase(), mode.weightPercent])),
  );
  protected readonly mineralAba = computed(() => {
    const modes = this.abaModes();
    if (Object.keys(modes).length === 0) return null;
    try {
      return mineralAcidBase(modes, { pathway: this.pathway() });
    } catch (error) {
      if (!isChemError(error)) throw error;
      return null;
    }
  });
  protected readonly classView = computed(() => {
    const aba = this.mineralAba();
    return aba ? abaClassView(aba.classification) : null;
  });
  protected readonly hasIronCarbonate = computed(() => 'siderite' in this.abaModes() || 'ankerite' in this.abaModes());
  protected readonly sideriteCaution = SIDERITE_CAUTION;
}
