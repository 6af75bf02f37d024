import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, output, signal, untracked } from '@angular/core';
import { takeUntilDestroyed, toObservable, toSignal } from '@angular/core/rxjs-interop';
import { FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import type { Problem, Reaction, ReactionKind } from '@tallus/contracts';
import { combineLatest, map, startWith } from 'rxjs';

import { EquationView } from '../../chem-view/equation-view/equation-view';
import { describeProblem, describeValidationErrors } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { toProblem } from '../../core/problem';
import { BalancePanel } from '../../reactions/balance-panel/balance-panel';
import { EMPTY_CHECK } from '../../reactions/reaction-check/check-reaction';
import { liveCheck } from '../../reactions/reaction-check/live-check';
import { ReactionCheck } from '../../reactions/reaction-check/reaction-check';
import { ReactionSetStore } from '../reaction-set-store';
import { REACTION_KIND_LABELS } from './reaction-kinds';

/**
 * Writes one reaction: as the equation is typed, the check (status, residuals, electron and
 * proton budgets) runs in the browser; "balance" fills in exact coefficients; "save" sends it to
 * the server, which checks it again. A conflicting save offers to load the other version.
 */
@Component({
  selector: 'tl-reaction-editor',
  imports: [
    BalancePanel,
    EquationView,
    MatButtonModule,
    MatFormFieldModule,
    MatIconModule,
    MatInputModule,
    MatProgressBarModule,
    MatSelectModule,
    ReactionCheck,
    ReactiveFormsModule,
  ],
  templateUrl: './reaction-editor.html',
  styleUrl: './reaction-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReactionEditor {
  private readonly store = inject(ReactionSetStore);
  private readonly destroyRef = inject(DestroyRef);

  /** The reaction to edit; null for a new one. */
  readonly reaction = input<Reaction | null>(null);
  /** Whether the set takes edits now. */
  readonly isEditable = input(true);
  /** Emitted after a save, with the stored reaction. */
  readonly saved = output<Reaction>();
  /** Emitted when the user closes the editor without saving. */
  readonly closed = output<void>();

  protected readonly kinds = REACTION_KIND_LABELS;
  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required, Validators.maxLength(200)] }),
    kind: new FormControl<ReactionKind>('dissolution', { nonNullable: true }),
    equation: new FormControl('', { nonNullable: true, validators: [Validators.maxLength(2000)] }),
    reference: new FormControl('', { nonNullable: true }),
    citation: new FormControl('', { nonNullable: true }),
    notes: new FormControl('', { nonNullable: true }),
  });
  protected readonly rockPercent = new FormControl<number | null>(1, { validators: [Validators.min(0), Validators.max(100)] });
  protected readonly isSaving = signal(false);
  protected readonly error = signal<string | null>(null);
  /** Set after a 409 VERSION_CONFLICT: the user chooses what to do. */
  protected readonly conflict = signal<Problem | null>(null);
  protected readonly describe = describeValidationErrors;

  private readonly request = combineLatest([
    this.form.valueChanges.pipe(startWith(null), map(() => this.form.getRawValue())),
    this.rockPercent.valueChanges.pipe(startWith(this.rockPercent.value)),
    // The catalogue's explicit oxidation states arrive after the page opens; the check runs again with them.
    toObservable(this.store.oxidationStates),
  ]).pipe(
    map(([value, percent, oxidationStates]) => ({
      equation: value.equation,
      reference: value.reference || null,
      rockWeightPercent: typeof percent === 'number' && percent >= 0 && percent <= 100 ? percent : null,
      oxidationStates,
    })),
  );
  protected readonly check = toSignal(this.request.pipe(liveCheck()), { initialValue: EMPTY_CHECK });
  protected readonly equationText = toSignal(this.form.controls.equation.valueChanges, { initialValue: '' });
  protected readonly species = computed(() => [...new Set(this.check().species)]);

  constructor() {
    effect(() => {
      const reaction = this.reaction();
      untracked(() => this.fill(reaction));
    });
  }

  protected applyBalanced(equation: string): void {
    this.form.controls.equation.setValue(equation);
    this.form.controls.equation.markAsDirty();
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const body = { ...value, name: value.name.trim(), reference: value.reference.trim() || null };
    const reaction = this.reaction();
    const request = reaction ? this.store.saveReaction(reaction.id, { ...body, version: reaction.version }) : this.store.addReaction(body);
    this.isSaving.set(true);
    this.error.set(null);
    this.conflict.set(null);
    request.pipe(takeUntilDestroyed(this.destroyRef)).subscribe({
      next: (stored) => {
        this.isSaving.set(false);
        this.form.markAsPristine();
        if (stored) this.saved.emit(stored);
      },
      error: (error: unknown) => this.showSaveProblem(toProblem(error)),
    });
  }

  /** Loads the version someone else saved; the user's text is dropped, as they chose. */
  protected loadTheirs(): void {
    const setId = this.store.set()?.id;
    if (!setId) return;
    this.conflict.set(null);
    this.store.load(setId).subscribe({ error: (error: unknown) => this.error.set(describeProblem(toProblem(error))) });
  }

  /** Reloads the set to learn the new version, then saves the user's text over it. */
  protected saveMineOverTheirs(): void {
    const setId = this.store.set()?.id;
    const draft = this.form.getRawValue();
    if (!setId) return;
    this.conflict.set(null);
    this.store.load(setId).subscribe({
      next: () => {
        this.form.setValue(draft);
        this.save();
      },
      error: (error: unknown) => this.error.set(describeProblem(toProblem(error))),
    });
  }

  private showSaveProblem(problem: Problem): void {
    this.isSaving.set(false);
    if (problem.code === 'VERSION_CONFLICT') {
      this.conflict.set(problem);
      return;
    }
    if (!showProblemAtFields(this.form, problem)) this.error.set(describeProblem(problem));
  }

  private fill(reaction: Reaction | null): void {
    this.form.reset({
      name: reaction?.name ?? '',
      kind: reaction?.kind ?? 'dissolution',
      equation: reaction?.equation ?? '',
      reference: reaction?.reference ?? '',
      citation: reaction?.citation ?? '',
      notes: reaction?.notes ?? '',
    });
  }
}
