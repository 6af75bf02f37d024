import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { BarController, BarElement, CategoryScale, ChartConfiguration, LinearScale, Tooltip } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';

import type { TransferBar } from './transfer-bars';

const DISSOLVED = '#934b14';
const PRECIPITATED = '#4f6577';
const BROKEN = '#a23e2a';

/** The mole transfers of one mass-balance model as horizontal bars, in mmol per kg of water. */
@Component({
  selector: 'tl-transfers-chart',
  imports: [BaseChartDirective],
  providers: [provideCharts({ registerables: [BarController, BarElement, CategoryScale, LinearScale, Tooltip] })],
  template: `<p class="legend"><span class="key dissolved"></span>dissolved (+) <span class="key precipitated"></span>precipitated or taken up (−) <span class="key broken"></span>breaks its dissolve/precipitate rule</p>
    <div class="canvas-box" [style.height]="height()">
      <canvas baseChart type="bar" [data]="chart()" [options]="options" role="img" [attr.aria-label]="label()"></canvas>
    </div>`,
  styles: `
    .legend { display: flex; flex-wrap: wrap; align-items: center; gap: 4px 12px; margin: 0 0 4px; font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .key { display: inline-block; width: 12px; height: 12px; margin-right: -8px; border-radius: 2px; vertical-align: middle; }
    .dissolved { background: ${DISSOLVED}; } .precipitated { background: ${PRECIPITATED}; } .broken { background: ${BROKEN}; }
    .canvas-box { position: relative; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TransfersChart {
  /** The selected model's bars. */
  readonly bars = input.required<readonly TransferBar[]>();

  protected readonly chart = computed<ChartConfiguration<'bar'>['data']>(() => {
    const bars = this.bars();
    return {
      labels: bars.map((bar) => `${bar.phase} (${bar.rule})`),
      datasets: [
        {
          label: 'mmol per kg of water',
          data: bars.map((bar) => bar.value),
          backgroundColor: bars.map((bar) => (bar.breaksRule ? BROKEN : bar.value >= 0 ? DISSOLVED : PRECIPITATED)),
        },
      ],
    };
  });
  protected readonly height = computed(() => `${Math.max(160, 60 + this.bars().length * 36)}px`);
  protected readonly label = computed(() => `Mole transfers, mmol per kg of water: ${this.bars().map((bar) => `${bar.phase} ${bar.exact}`).join(', ')}`);
  protected readonly options: ChartConfiguration<'bar'>['options'] = {
    indexAxis: 'y',
    responsive: true,
    maintainAspectRatio: false,
    animation: false,
    plugins: { legend: { display: false }, tooltip: { callbacks: { label: (item) => `${Number(item.raw).toFixed(4)} mmol/kg` } } },
    scales: {
      x: { title: { display: true, text: 'Mole transfer (mmol per kg of water): + dissolved, − precipitated' }, grid: { color: '#e6dccb' } },
      y: { grid: { display: false } },
    },
  };
}
