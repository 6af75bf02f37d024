import { ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';

import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { ReactionSetsApi } from '../../reaction-sets/reaction-sets-api';
import { fileNameOf, saveBlob } from '../../site-data/save-file';
import { ReportsApi } from '../reports-api';

/** PDF reports for a client or regulator: one per reaction set and one per site. */
@Component({
  selector: 'tl-reports-page',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink],
  templateUrl: './reports-page.html',
  styles: `.list { font: var(--mat-sys-body-medium); } .list th, .list td { padding: 5px 10px; vertical-align: middle; } .hint { color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReportsPage {
  private readonly api = inject(ReportsApi);
  private readonly setsApi = inject(ReactionSetsApi);
  private readonly notifier = inject(Notifier);

  readonly teamId = input.required<string>();

  protected readonly sites = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.api.sites(teamId) });
  protected readonly sets = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.setsApi.listSets(teamId) });
  /** What is being prepared: `site:<name>` or `set:<id>`. */
  protected readonly busy = signal<string | null>(null);

  protected siteReport(site: string): void {
    this.fetch(`site:${site}`, this.api.siteReport(this.teamId(), site), `site-report-${fileNameOf(site || 'all-sites', 'all-sites')}.pdf`);
  }

  protected setReport(id: string, name: string): void {
    this.fetch(`set:${id}`, this.api.reactionSetReport(id), `${fileNameOf(name, 'reaction-set')}-report.pdf`);
  }

  private fetch(key: string, call: ReturnType<ReportsApi['siteReport']>, fileName: string): void {
    this.busy.set(key);
    call.subscribe({
      next: (blob) => {
        this.busy.set(null);
        saveBlob(blob, fileName);
      },
      error: (error: unknown) => {
        this.busy.set(null);
        this.notifier.problem(toProblem(error));
      },
    });
  }
}
