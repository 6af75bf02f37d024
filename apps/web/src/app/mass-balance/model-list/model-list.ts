import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { RouterLink } from '@angular/router';
import type { MassBalanceModel } from '@tallus/contracts';

import { errorText } from '../../core/error-messages';
import { TeamStore } from '../../teams/team-store';
import { MassBalanceApi } from '../mass-balance-api';

/** The team's mass-balance models with how each solved. */
@Component({
  selector: 'tl-model-list',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink],
  templateUrl: './model-list.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
  styles: `.bar { margin-bottom: 12px; } .list { font: var(--mat-sys-body-medium); } .list th, .list td { padding: 5px 10px; } .hint { color: var(--mat-sys-on-surface-variant); }`,
})
export class ModelList {
  private readonly api = inject(MassBalanceApi);
  private readonly teamStore = inject(TeamStore);

  readonly teamId = input.required<string>();

  protected readonly models = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.api.list(teamId) });
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly loadError = computed(() => errorText(this.models.error()));

  protected summary(model: MassBalanceModel): { label: string; icon: string; tone: string } {
    const valid = model.result.models.filter((entry) => entry.valid).length;
    switch (model.result.status) {
      case 'exact':
        return valid > 0 ? { label: `${valid} valid model(s)`, icon: 'check_circle', tone: 'success' } : { label: 'only rule-breaking models', icon: 'do_not_disturb_on', tone: 'warning' };
      case 'least-squares':
        return { label: 'least-squares fit', icon: 'rule', tone: 'warning' };
      case 'none':
        return { label: 'no model', icon: 'block', tone: 'danger' };
      default:
        return { label: 'cannot solve', icon: 'report', tone: 'danger' };
    }
  }
}
