import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import type { WaterAnalysis } from '@tallus/contracts';

import { FigurePipe } from '../../chem-view/figure/figure';
import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { CsvImportDialog, type CsvImportDialogData } from '../../site-data/csv-import-dialog/csv-import-dialog';
import { saveBlob } from '../../site-data/save-file';
import { hasRoleAtLeast } from '../../teams/roles';
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
  private readonly dialog = inject(MatDialog);
  private readonly notifier = inject(Notifier);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();

  protected readonly analyses = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.api.list(teamId) });
  protected readonly canWrite = computed(() => {
    const team = this.teamStore.currentTeam();
    return team ? hasRoleAtLeast(team.role, 'editor') : false;
  });
  protected readonly loadError = computed(() => {
    const error = this.analyses.error();
    return error ? describeProblem(toProblem(error)) : null;
  });
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
    const data: CsvImportDialogData = {
      title: 'Upload water analyses',
      layout: 'One row per sample: sample, site, date (YYYY-MM-DD), temperature_c, ph, notes, then one column per solute with its unit, e.g. “Ca (mg/L)”, “alkalinity (mg/L as CaCO3)”. Write values below detection as <0.01.',
      things: 'water analyses',
      preview: (file) => this.api.preview(this.teamId(), file),
      save: (file, skipInvalid) => this.api.import(this.teamId(), file, skipInvalid),
      downloadTemplate: () => this.download('template'),
    };
    this.dialog
      .open(CsvImportDialog, { data, width: '760px' })
      .afterClosed()
      .subscribe((count: number | undefined) => {
        if (count === undefined) return;
        this.notifier.success(`${count} water analyses saved.`);
        this.analyses.reload();
      });
  }

  protected download(kind: 'export' | 'template'): void {
    const call = kind === 'export' ? this.api.exportCsv(this.teamId()) : this.api.templateCsv(this.teamId());
    call.subscribe({
      next: (blob) => saveBlob(blob, kind === 'export' ? 'water-analyses.csv' : 'water-analyses-template.csv'),
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }
}
