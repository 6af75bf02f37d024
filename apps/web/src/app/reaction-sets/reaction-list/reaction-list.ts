import { CdkDrag, CdkDragDrop, CdkDragHandle, CdkDropList } from '@angular/cdk/drag-drop';
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { Reaction } from '@tallus/contracts';

import { BalanceStatus } from '../../chem-view/balance-status/balance-status';
import { EquationView } from '../../chem-view/equation-view/equation-view';
import { Fraction } from '../../chem-view/fraction/fraction';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { reactionKindLabel } from '../reaction-editor/reaction-kinds';

/** A move in the list: from one place to another (0-based). */
export interface ReactionMove {
  from: number;
  to: number;
}

/**
 * The ordered reactions of a set: place, name, kind, rendered equation, stored balance status
 * and proton budget. Reorder by dragging the handle, or with the move buttons from the keyboard.
 */
@Component({
  selector: 'tl-reaction-list',
  imports: [BalanceStatus, CdkDrag, CdkDragHandle, CdkDropList, EquationView, Fraction, FormulaText, MatButtonModule, MatIconModule, MatTooltipModule],
  templateUrl: './reaction-list.html',
  styleUrl: './reaction-list.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReactionList {
  /** The reactions in set order. */
  readonly reactions = input.required<Reaction[]>();
  /** Whether the user may reorder and open reactions for editing. */
  readonly isEditable = input(false);
  /** Id of the reaction open in the editor. */
  readonly openId = input<string | null>(null);
  /** The user opened a reaction. */
  readonly opened = output<Reaction>();
  /** The user moved a reaction. */
  readonly moved = output<ReactionMove>();

  protected readonly kindLabel = reactionKindLabel;

  protected drop(event: CdkDragDrop<Reaction[]>): void {
    if (event.previousIndex !== event.currentIndex) this.moved.emit({ from: event.previousIndex, to: event.currentIndex });
  }
}
