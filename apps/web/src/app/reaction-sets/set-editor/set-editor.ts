import { ChangeDetectionStrategy, Component, DestroyRef, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTabsModule } from '@angular/material/tabs';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import type { Reaction } from '@tallus/contracts';

import { describeProblem } from '../../core/error-messages';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { NetComposer } from '../../net-reactions/net-composer/net-composer';
import { ProtonChart } from '../../net-reactions/proton-chart/proton-chart';
import { ReviewPanel } from '../../review/review-panel/review-panel';
import { fileNameOf, saveBlob } from '../../site-data/save-file';
import { TeamStore } from '../../teams/team-store';
import { ReactionEditor } from '../reaction-editor/reaction-editor';
import { ReactionList, ReactionMove } from '../reaction-list/reaction-list';
import { ReactionSetStore } from '../reaction-set-store';
import { ReactionSetsApi } from '../reaction-sets-api';
import { reviewStateView } from '../review-state';

const TABS = ['reactions', 'net', 'chart', 'review'] as const;

/** One reaction set: its reactions (write, check, balance, reorder), net reactions, proton budget chart and review. */
@Component({
  selector: 'tl-set-editor',
  imports: [
    MatButtonModule,
    MatIconModule,
    MatMenuModule,
    MatProgressBarModule,
    MatTabsModule,
    MatTooltipModule,
    NetComposer,
    ProtonChart,
    ReactionEditor,
    ReactionList,
    ReviewPanel,
    RouterLink,
  ],
  providers: [ReactionSetStore],
  templateUrl: './set-editor.html',
  styleUrl: './set-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SetEditor {
  private readonly store = inject(ReactionSetStore);
  private readonly api = inject(ReactionSetsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);
  private readonly destroyRef = inject(DestroyRef);

  /** The team's id (route parameter). */
  readonly teamId = input.required<string>();
  /** The set's id (route parameter). */
  readonly setId = input.required<string>();
  /** The tab to open (query parameter `tab`). */
  readonly tab = input<string | undefined>(undefined);

  protected readonly set = this.store.set;
  protected readonly reactions = this.store.reactions;
  protected readonly isBusy = this.store.isBusy;
  protected readonly loadError = signal<string | null>(null);
  /** Id of the reaction open in the editor; `new` for one being added. */
  protected readonly openId = signal<string | null>(null);
  protected readonly canWrite = this.teamStore.canWrite;
  protected readonly isEditable = computed(() => this.canWrite() && this.store.isEditable());
  protected readonly openReaction = computed(() => this.reactions().find((reaction) => reaction.id === this.openId()) ?? null);
  protected readonly stateView = computed(() => {
    const set = this.set();
    return set ? reviewStateView(set.reviewState) : null;
  });
  protected readonly tabIndex = computed(() => Math.max(0, TABS.indexOf((this.tab() ?? 'reactions') as (typeof TABS)[number])));

  constructor() {
    effect(() => {
      const setId = this.setId();
      untracked(() => this.load(setId));
    });
    effect(() => {
      const teamId = this.teamId();
      untracked(() =>
        this.store
          .loadOxidationStates(teamId)
          .pipe(takeUntilDestroyed(this.destroyRef))
          .subscribe({
            error: () => this.notifier.warning('The species catalogue did not load: checks in this page use the oxidation-state rules only until you reload. Saved results are unaffected.'),
          }),
      );
    });
  }

  protected load(setId: string): void {
    this.loadError.set(null);
    this.store
      .load(setId)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe({ error: (error: unknown) => this.loadError.set(describeProblem(toProblem(error))) });
  }

  protected reload(): void {
    this.load(this.setId());
  }

  protected toggle(reaction: Reaction): void {
    this.openId.update((id) => (id === reaction.id ? null : reaction.id));
  }

  protected onSaved(reaction: Reaction, isNew: boolean): void {
    this.notifier.success(isNew ? `Reaction “${reaction.name}” added.` : `Reaction “${reaction.name}” saved.`);
    this.openId.set(isNew ? null : reaction.id);
  }

  protected move(move: ReactionMove): void {
    this.store.move(move.from, move.to).subscribe({
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  protected selectTab(index: number): void {
    void this.router.navigate([], { queryParams: { tab: TABS[index] }, queryParamsHandling: 'merge', replaceUrl: true });
  }

  protected download(format: 'json' | 'csv'): void {
    const set = this.set();
    if (!set) return;
    this.api.export(set.id, format).subscribe({
      next: (blob) => saveBlob(blob, `${fileNameOf(set.name, 'reaction-set')}.${format}`),
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }
}
