import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';

import { EquationView } from '../../chem-view/equation-view/equation-view';
import { DiffableReaction, diffReactions } from './diff-reactions';

const CHANGE_VIEWS = {
  added: { icon: 'add_circle', label: 'added' },
  removed: { icon: 'remove_circle', label: 'removed' },
  changed: { icon: 'change_circle', label: 'changed' },
  unchanged: { icon: 'radio_button_unchecked', label: 'unchanged' },
} as const;

/** The difference between two versions of a set's reactions, reaction by reaction. */
@Component({
  selector: 'tl-revision-diff',
  imports: [EquationView, MatIconModule],
  templateUrl: './revision-diff.html',
  styleUrl: './revision-diff.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RevisionDiff {
  /** The older reactions. */
  readonly before = input.required<DiffableReaction[]>();
  /** The newer reactions. */
  readonly after = input.required<DiffableReaction[]>();

  protected readonly rows = computed(() => diffReactions(this.before(), this.after()));
  protected readonly changedCount = computed(() => this.rows().filter((row) => row.change !== 'unchanged').length);
  protected readonly views = CHANGE_VIEWS;
}
