import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressSpinnerModule } from '@angular/material/progress-spinner';

import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { fileNameOf, saveBlob } from '../../site-data/save-file';
import { ReportsApi } from '../reports-api';

/** Downloads the site report PDF, for one site or every record of the team, with progress while the server renders it. */
@Component({
  selector: 'tl-report-button',
  imports: [MatButtonModule, MatIconModule, MatMenuModule, MatProgressSpinnerModule],
  template: `<button mat-stroked-button type="button" [matMenuTriggerFor]="menu" [disabled]="isBusy()">
      @if (isBusy()) {<mat-spinner diameter="16" aria-label="Preparing the report" />} @else {<mat-icon>picture_as_pdf</mat-icon>}
      {{ isBusy() ? 'Preparing report…' : 'Site report PDF' }}
    </button>
    <mat-menu #menu="matMenu">
      @for (site of sites(); track site) {<button mat-menu-item type="button" (click)="download(site)">{{ site }}</button>}
      <button mat-menu-item type="button" (click)="download('')">Every site of the team</button>
    </mat-menu>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReportButton {
  private readonly api = inject(ReportsApi);
  private readonly notifier = inject(Notifier);

  readonly teamId = input.required<string>();
  /** The sites to offer. */
  readonly sites = input<readonly string[]>([]);

  protected readonly isBusy = signal(false);

  protected download(site: string): void {
    this.isBusy.set(true);
    this.api.siteReport(this.teamId(), site).subscribe({
      next: (blob) => {
        this.isBusy.set(false);
        saveBlob(blob, `site-report-${fileNameOf(site || 'all-sites', 'all-sites')}.pdf`);
      },
      error: (error: unknown) => {
        this.isBusy.set(false);
        this.notifier.problem(toProblem(error));
      },
    });
  }
}
