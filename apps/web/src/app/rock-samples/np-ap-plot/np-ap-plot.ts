import { ChangeDetectionStrategy, Component, computed, input, signal } from '@angular/core';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { ChartConfiguration, Legend, LinearScale, LineController, LineElement, LogarithmicScale, PointElement, ScatterController, Tooltip } from 'chart.js';
import { BaseChartDirective, provideCharts } from 'ng2-charts';

import { ABA_CLASS_VIEWS, abaClassView } from '../aba-class-view';
import { bandLines, LOG_FLOOR, onLogAxis, type NpApPoint } from './np-ap-points';

const BAND_COLOURS = ['#a23e2a', '#4f6b4f'];

/**
 * Neutralisation potential against acid potential (kg CaCO3/t) with the team's NPR band lines,
 * each sample coloured and shaped by its class; linear or logarithmic axes.
 */
@Component({
  selector: 'tl-np-ap-plot',
  imports: [BaseChartDirective, MatButtonToggleModule],
  providers: [provideCharts({ registerables: [ScatterController, LineController, PointElement, LineElement, LinearScale, LogarithmicScale, Tooltip, Legend] })],
  template: `<div class="bar">
      <mat-button-toggle-group [value]="scale()" (change)="scale.set($event.value)" aria-label="Axes" hideSingleSelectionIndicator>
        <mat-button-toggle value="linear">Linear axes</mat-button-toggle>
        <mat-button-toggle value="log">Logarithmic axes</mat-button-toggle>
      </mat-button-toggle-group>
      @if (scale() === 'log') {<span class="hint">Values below {{ floor }} kg CaCO₃/t sit on the axis at {{ floor }}.</span>}
    </div>
    <div class="canvas-box"><canvas baseChart type="scatter" [data]="chart()" [options]="options()" role="img" [attr.aria-label]="label()"></canvas></div>`,
  styles: `
    .bar { display: flex; align-items: center; gap: 12px; margin-bottom: 8px; }
    .hint { font: var(--mat-sys-body-small); color: var(--mat-sys-on-surface-variant); }
    .canvas-box { position: relative; height: 380px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NpApPlot {
  readonly points = input.required<readonly NpApPoint[]>();
  readonly bands = input.required<{ acidGenerating: number; nonAcidGenerating: number }>();

  protected readonly scale = signal<'linear' | 'log'>('linear');
  protected readonly floor = LOG_FLOOR;
  protected readonly label = computed(
    () => `Neutralisation potential against acid potential, kg CaCO3 per tonne, ${this.points().length} samples, with lines NPR = ${this.bands().acidGenerating} and NPR = ${this.bands().nonAcidGenerating}`,
  );
  protected readonly chart = computed<ChartConfiguration<'scatter'>['data']>(() => {
    const isLog = this.scale() === 'log';
    const points = this.points();
    const place = (value: number): number => (isLog ? onLogAxis(value) : value);
    const classes = Object.entries(ABA_CLASS_VIEWS).map(([key, view]) => ({
      type: 'scatter' as const,
      label: view.label,
      data: points.filter((point) => point.classification === key).map((point) => ({ x: place(point.ap), y: place(point.np), name: point.name })),
      backgroundColor: view.colour,
      borderColor: view.colour,
      pointStyle: key === 'potentially-acid-generating' ? ('triangle' as const) : key === 'uncertain' ? ('rectRot' as const) : ('circle' as const),
      pointRadius: 6,
    }));
    const lines = bandLines(this.bands(), points, isLog).map((line, index) => ({
      type: 'line' as const,
      label: line.label,
      data: line.points,
      borderColor: BAND_COLOURS[index] ?? '#4f6577',
      borderDash: [6, 4],
      borderWidth: 1.5,
      pointRadius: 0,
      showLine: true,
    }));
    return { datasets: [...classes, ...lines] } as ChartConfiguration<'scatter'>['data'];
  });
  protected readonly options = computed<ChartConfiguration<'scatter'>['options']>(() => {
    const type = this.scale() === 'log' ? 'logarithmic' : 'linear';
    const min = this.scale() === 'log' ? LOG_FLOOR : 0;
    return {
      responsive: true,
      maintainAspectRatio: false,
      animation: false,
      plugins: {
        legend: { position: 'bottom', labels: { usePointStyle: true } },
        tooltip: {
          callbacks: {
            label: (item) => {
              const raw = item.raw as { x: number; y: number; name?: string };
              return raw.name ? `${raw.name}: AP ${raw.x.toFixed(1)}, NP ${raw.y.toFixed(1)} kg CaCO₃/t (${abaClassView(String(item.dataset.label)).label})` : String(item.dataset.label);
            },
          },
        },
      },
      scales: {
        x: { type, min, title: { display: true, text: 'Acid potential, AP (kg CaCO₃/t)' }, grid: { color: '#e6dccb' } },
        y: { type, min, title: { display: true, text: 'Neutralisation potential, NP (kg CaCO₃/t)' }, grid: { color: '#e6dccb' } },
      },
    };
  });
}
