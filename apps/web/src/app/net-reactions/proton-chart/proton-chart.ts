import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { BarController, BarElement, CategoryScale, ChartConfiguration, Legend, LinearScale, Tooltip } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';

import { Fraction } from '../../chem-view/fraction/fraction';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { ReactionSetStore } from '../../reaction-sets/reaction-set-store';
import { protonBars } from './proton-chart-data';

const ACID = '#a23e2a';
const BASE = '#4f6b4f';
const NET = '#934b14';

/**
 * The proton budget of a set as a bar chart: acid produced (+) and consumed (−) by each reaction
 * and by each net reaction, per mole of its reference species; the same figures in a table.
 */
@Component({
  selector: 'tl-proton-chart',
  imports: [BaseChartDirective, Fraction, FormulaText, MatIconModule],
  providers: [provideCharts({ registerables: [BarController, BarElement, CategoryScale, LinearScale, Tooltip, Legend] })],
  templateUrl: './proton-chart.html',
  styleUrl: './proton-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProtonChart {
  private readonly store = inject(ReactionSetStore);

  protected readonly data = computed(() => protonBars(this.store.reactions(), this.store.set()?.netReactions ?? []));
  protected readonly chart = computed<ChartConfiguration<'bar'>['data']>(() => {
    const bars = this.data().bars;
    return {
      labels: bars.map((bar) => bar.label),
      datasets: [
        {
          label: 'mol H⁺ per mol reference species',
          data: bars.map((bar) => bar.value),
          backgroundColor: bars.map((bar) => (bar.isNet ? NET : bar.value >= 0 ? ACID : BASE)),
          borderColor: bars.map((bar) => (bar.isNet ? '#5c2d0b' : 'transparent')),
          borderWidth: bars.map((bar) => (bar.isNet ? 2 : 0)),
        },
      ],
    };
  });
  protected readonly options: ChartConfiguration<'bar'>['options'] = {
    indexAxis: 'y',
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    plugins: { legend: { display: false }, tooltip: { callbacks: { label: (item) => `${Number(item.raw).toFixed(3)} mol H⁺ per mol` } } },
    scales: {
      x: {
        title: { display: true, text: 'Proton budget (mol H⁺ per mol reference species): − consumed, + produced' },
        grid: { color: '#e6dccb' },
      },
      y: { title: { display: true, text: 'Reaction' }, grid: { display: false } },
    },
  };
  protected readonly height = computed(() => `${Math.max(220, 56 + this.data().bars.length * 34)}px`);
}
