import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { ABA_NOTES } from '@tallus/chem';
import type { RockSample } from '@tallus/contracts';

import { FigurePipe } from '../../chem-view/figure/figure';
import { errorText } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { ReportButton } from '../../reports/report-button/report-button';
import { CsvTransfer, type CsvRecordsKind } from '../../site-data/csv-transfer';
import { ScreeningCaution } from '../../site-data/screening-caution/screening-caution';
import { TeamSettingsApi } from '../../site-data/team-settings-api';
import { TeamStore } from '../../teams/team-store';
import { abaClassView } from '../aba-class-view';
import { BandSettings } from '../band-settings/band-settings';
import { NpApPlot } from '../np-ap-plot/np-ap-plot';
import { npApPoints } from '../np-ap-plot/np-ap-points';
import { RockSamplesApi } from '../rock-samples-api';
import { SampleDetail } from '../sample-detail/sample-detail';
import { SampleForm, type SampleFormData } from '../sample-form/sample-form';

/** Short words for the per-sample flags. */
const FLAG_WORDS: Readonly<Partial<Record<string, string>>> = {
  ACID_PASTE_PH: 'paste pH below 4',
  INTERVAL_REVERSED: 'depths reversed',
  SULFUR_FORMS_EXCEED_TOTAL: 'S forms exceed total S',
};

/** Rock samples with acid-base accounting, the NP-vs-AP plot, CO2 uptake and the team's bands. */
@Component({
  selector: 'tl-rock-samples-page',
  imports: [BandSettings, FigurePipe, MatButtonModule, MatIconModule, MatProgressBarModule, MatTooltipModule, NpApPlot, ReportButton, SampleDetail, ScreeningCaution],
  templateUrl: './rock-samples-page.html',
  styleUrl: './rock-samples-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RockSamplesPage {
  private readonly api = inject(RockSamplesApi);
  private readonly settingsApi = inject(TeamSettingsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly csv = inject(CsvTransfer);
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  readonly teamId = input.required<string>();

  private readonly csvKind: CsvRecordsKind = {
    api: this.api,
    title: 'Upload rock samples',
    layout: 'One row per sample: sample, site, depth_from_m, depth_to_m, lithology, total_s_pct, sulfide_s_pct, sulfate_s_pct, np_kg_caco3_t, paste_ph, notes; optional mode:<mineral> and oxide:<oxide> columns in wt%.',
    things: 'rock samples',
    fileNames: { export: 'rock-samples-aba.csv', template: 'rock-samples-template.csv' },
  };

  protected readonly samples = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.api.list(teamId) });
  protected readonly settings = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.settingsApi.get(teamId) });
  protected readonly selectedId = signal<string | null>(null);
  protected readonly selected = computed(() => this.samples.value()?.find((sample) => sample.id === this.selectedId()) ?? null);
  protected readonly points = computed(() => npApPoints(this.samples.value() ?? []));
  protected readonly bands = computed(() => this.settings.value()?.nprBands ?? { acidGenerating: 1, nonAcidGenerating: 3 });
  protected readonly sites = computed(() => [...new Set((this.samples.value() ?? []).map((sample) => sample.site).filter((site) => site !== ''))]);
  protected readonly totalSulfurCount = computed(() => (this.samples.value() ?? []).filter((sample) => sample.aba?.sulfurBasis === 'total').length);
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly isOwner = this.teamStore.isOwner;
  protected readonly loadError = computed(() => errorText(this.samples.error()));
  protected readonly abaNotes = [ABA_NOTES.SCREENING_ONLY];
  protected readonly flagWords = FLAG_WORDS;

  protected classOf(sample: RockSample) {
    return sample.aba ? abaClassView(sample.aba.classification) : null;
  }

  protected toggle(sample: RockSample): void {
    this.selectedId.set(this.selectedId() === sample.id ? null : sample.id);
  }

  /** Opens the sample form: empty to add a sample, filled to correct one. */
  protected openForm(sample?: RockSample): void {
    const data: SampleFormData = { teamId: this.teamId(), sample };
    this.dialog
      .open<SampleForm, SampleFormData, RockSample>(SampleForm, { data, maxWidth: '860px' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.notifier.success(sample ? `Rock sample “${saved.name}” saved.` : `Rock sample “${saved.name}” added.`);
        this.selectedId.set(saved.id);
        this.samples.reload();
      });
  }

  protected remove(sample: RockSample): void {
    if (!confirm(`Delete the rock sample “${sample.name}”? Its ABA and CO₂ figures go with it.`)) return;
    this.api.delete(sample.id, sample.version).subscribe({
      next: () => {
        this.notifier.success(`Rock sample “${sample.name}” deleted.`);
        this.selectedId.set(null);
        this.samples.reload();
      },
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  protected upload(): void {
    this.csv.upload(this.csvKind, this.teamId(), () => this.samples.reload());
  }

  protected download(which: 'export' | 'template'): void {
    this.csv.download(this.csvKind, this.teamId(), which);
  }


  protected settingsSaved(): void {
    this.settings.reload();
    this.samples.reload();
  }
}
