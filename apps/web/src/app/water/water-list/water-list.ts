import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import type { WaterAnalysis } from '@tallus/contracts';

import { FigurePipe } from '../../chem-view/figure/figure';
import { errorText } from '../../core/error-messages';
import { CsvTransfer, type CsvRecordsKind } from '../../site-data/csv-transfer';
import { TeamStore } from '../../teams/team-store';
import { CBE_NOTE_WORDS, cbeView } from '../cbe-view';
import { WaterApi } from '../water-api';

/** The team's water analyses with their charge balance error, flag and notes; CSV upload, download and template. */
@Component({
  selector: 'tl-water-list',
  imports: [FigurePipe, MatButtonModule, MatIconModule, MatProgressBarModule, MatTooltipModule, RouterLink],
  templateUrl: './water-list.html',
  styleUrl: './water-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaterList {
  private readonly api = inject(WaterApi);
  private readonly teamStore = inject(TeamStore);
  private readonly csv = inject(CsvTransfer);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  private readonly csvKind: CsvRecordsKind = {
    api: this.api,
    title: 'Upload water analyses',
    layout: 'One row per sample: sample, site, date (YYYY-MM-DD), temperature_c, ph, notes, then one column per solute with its unit, e.g. “Ca (mg/L)”, “alkalinity (mg/L as CaCO3)”. Write values below detection as <0.01.',
    things: 'water analyses',
    fileNames: { export: 'water-analyses.csv', template: 'water-analyses-template.csv' },
  };

  protected readonly analyses = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.api.list(teamId) });
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly loadError = computed(() => errorText(this.analyses.error()));
  /** Threshold and convention the server applied (the team's settings). */
  protected readonly rule = computed(() => {
    const first = this.analyses.value()?.[0]?.chargeBalance;
    return first ? { threshold: first.threshold, convention: first.convention === 'half-sum' ? 'half-sum denominator (DVWK 128/92)' : '(Σcations − Σanions)/(Σcations + Σanions) × 100' } : null;
  });
  protected readonly flaggedCount = computed(() => (this.analyses.value() ?? []).filter((analysis) => analysis.chargeBalance.flagged).length);
  protected readonly noteWords = CBE_NOTE_WORDS;

  protected view(analysis: WaterAnalysis) {
    return cbeView(analysis.chargeBalance);
  }

  protected upload(): void {
    this.csv.upload(this.csvKind, this.teamId(), () => this.analyses.reload());
  }

  protected download(which: 'export' | 'template'): void {
    this.csv.download(this.csvKind, this.teamId(), which);
  }
}
