import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import { MatTableModule } from '@angular/material/table';
import { MatTooltipModule } from '@angular/material/tooltip';
import { RouterLink } from '@angular/router';
import type { ReactionSetSummary } from '@tallus/contracts';

import { reviewStateView } from '../review-state';

/** A compact table of reaction sets: name, site, review state, reactions by balance status, last change. */
@Component({
  selector: 'tl-set-table',
  imports: [DatePipe, MatIconModule, MatTableModule, MatTooltipModule, RouterLink],
  templateUrl: './set-table.html',
  styleUrl: './set-table.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SetTable {
  /** The sets to list. */
  readonly sets = input.required<ReactionSetSummary[]>();
  /** The team the sets belong to, for links. */
  readonly teamId = input.required<string>();
  /** Accessible name of the table. */
  readonly label = input('Reaction sets');

  protected readonly columns = ['name', 'site', 'state', 'balanced', 'unbalanced', 'open', 'invalid', 'changed'];
  protected readonly stateView = reviewStateView;
}
