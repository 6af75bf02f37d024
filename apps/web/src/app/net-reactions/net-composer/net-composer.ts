import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, input, signal } from '@angular/core';
import { FormControl, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatChipsModule } from '@angular/material/chips';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatTooltipModule } from '@angular/material/tooltip';
import type { NetReaction, Reaction } from '@tallus/contracts';

import { EquationView } from '../../chem-view/equation-view/equation-view';
import { Fraction } from '../../chem-view/fraction/fraction';
import { FormulaText } from '../../chem-view/formula-text/formula-text';
import { describeChemIssue } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { ReactionSetStore } from '../../reaction-sets/reaction-set-store';
import { composeNet, speciesOf } from '../compose-net';

/** How a net reaction's status appears: icon and word. */
const NET_STATUS_VIEWS: Readonly<Record<string, { label: string; icon: string; tone: string; meaning: string }>> = {
  combined: { label: 'combined', icon: 'check_circle', tone: 'success', meaning: 'One set of multipliers cancels the chosen species.' },
  none: { label: 'no combination', icon: 'block', tone: 'danger', meaning: 'No multipliers cancel every chosen species. Pick other reactions or fewer species.' },
  several: { label: 'several combinations', icon: 'call_split', tone: 'info', meaning: 'More than one combination cancels them. Cancel more species or fix a multiplier.' },
  invalid: { label: 'invalid', icon: 'report', tone: 'danger', meaning: 'A reaction or species does not read.' },
  empty: { label: 'nothing picked', icon: 'checklist', tone: 'info', meaning: 'Pick reactions of the set.' },
};

/**
 * Composes a net reaction from reactions of the set: pick reactions and the species to cancel,
 * see the exact multipliers, the combined reaction and its proton budget at once, save it. A saved
 * net reaction can be opened here again, changed and saved over (with the version it was read at).
 */
@Component({
  selector: 'tl-net-composer',
  imports: [EquationView, Fraction, FormulaText, MatButtonModule, MatCheckboxModule, MatChipsModule, MatFormFieldModule, MatIconModule, MatInputModule, MatTooltipModule, ReactiveFormsModule],
  templateUrl: './net-composer.html',
  styleUrl: './net-composer.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NetComposer {
  private readonly store = inject(ReactionSetStore);
  private readonly notifier = inject(Notifier);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);

  /** Whether the user may save net reactions. */
  readonly isEditable = input(false);

  protected readonly reactions = this.store.reactions;
  protected readonly netReactions = computed(() => this.store.set()?.netReactions ?? []);
  protected readonly pickedIds = signal<string[]>([]);
  protected readonly fixed = signal<Partial<Record<string, string>>>({});
  protected readonly cancel = signal<string[]>([]);
  protected readonly name = new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(200)] });
  protected readonly isSaving = signal(false);
  /** The saved net reaction open in the composer, if one is being changed. */
  protected readonly editing = signal<NetReaction | null>(null);

  protected readonly picked = computed(() => {
    const ids = this.pickedIds();
    return this.reactions()
      .filter((reaction) => ids.includes(reaction.id))
      .map((reaction) => ({ id: reaction.id, name: reaction.name, equation: textOf(reaction), multiplier: this.fixed()[reaction.id] ?? '' }));
  });
  protected readonly species = computed(() => speciesOf(this.picked().map((reaction) => reaction.equation)));
  protected readonly net = computed(() =>
    composeNet(this.picked(), this.cancel().filter((formula) => this.species().includes(formula)), this.store.oxidationStates()),
  );
  protected readonly statusView = computed(() => NET_STATUS_VIEWS[this.net().status]);
  protected readonly errorText = computed(() => {
    const error = this.net().error;
    return error ? describeChemIssue(error) : null;
  });

  protected togglePick(reaction: Reaction, isPicked: boolean): void {
    this.pickedIds.update((ids) => (isPicked ? [...ids, reaction.id] : ids.filter((id) => id !== reaction.id)));
  }

  protected setMultiplier(reactionId: string, value: string): void {
    this.fixed.update((fixed) => ({ ...fixed, [reactionId]: value }));
  }

  protected setCancel(formulas: string[]): void {
    this.cancel.set(formulas);
  }

  protected reactionName(index: number): string {
    return this.picked()[index]?.name ?? '';
  }

  /** Opens a saved net reaction in the composer: its reactions, fixed multipliers, cancelled species and name. */
  protected edit(netReaction: NetReaction): void {
    this.editing.set(netReaction);
    this.pickedIds.set(netReaction.reactions.map((member) => member.reactionId));
    this.fixed.set(Object.fromEntries(netReaction.reactions.filter((member) => member.multiplier).map((member) => [member.reactionId, member.multiplier ?? ''])));
    this.cancel.set([...netReaction.cancel]);
    this.name.setValue(netReaction.name);
    this.host.nativeElement.scrollIntoView?.({ behavior: 'smooth', block: 'start' });
  }

  /** Leaves the composer empty, dropping unsaved changes to an opened net reaction. */
  protected clear(): void {
    this.editing.set(null);
    this.pickedIds.set([]);
    this.fixed.set({});
    this.cancel.set([]);
    this.name.reset();
  }

  protected save(): void {
    if (this.name.invalid || this.net().status !== 'combined') {
      this.name.markAsTouched();
      return;
    }
    this.isSaving.set(true);
    const body = {
      name: this.name.value.trim(),
      reactions: this.picked().map((reaction) => ({ reactionId: reaction.id, multiplier: reaction.multiplier.trim() || null })),
      cancel: this.cancel().filter((formula) => this.species().includes(formula)),
    };
    const editing = this.editing();
    const request = editing ? this.store.saveNetReaction(editing, body) : this.store.addNetReaction(body);
    request.subscribe({
      next: (saved) => {
        this.isSaving.set(false);
        const name = saved?.name ?? body.name;
        this.notifier.success(editing ? `Net reaction “${name}” saved.` : `Net reaction “${name}” saved to the set.`);
        if (editing) this.clear();
        else this.name.reset();
      },
      error: (error: unknown) => {
        this.isSaving.set(false);
        this.notifier.problem(toProblem(error));
      },
    });
  }

  protected remove(netReaction: NetReaction): void {
    this.store.deleteNetReaction(netReaction).subscribe({
      next: () => {
        if (this.editing()?.id === netReaction.id) this.clear();
        this.notifier.success(`Net reaction “${netReaction.name}” deleted.`);
      },
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  protected statusOf(status: string) {
    return NET_STATUS_VIEWS[status] ?? NET_STATUS_VIEWS['invalid'];
  }

}

function textOf(reaction: Reaction): string {
  return reaction.result.balancedEquation ?? reaction.equation;
}
