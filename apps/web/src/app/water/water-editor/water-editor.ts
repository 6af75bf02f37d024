import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { FormArray, FormControl, FormGroup, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { MatTooltipModule } from '@angular/material/tooltip';
import { Router, RouterLink } from '@angular/router';
import { ASCII_UNIT_ALIASES, CONCENTRATION_UNITS, SOLUTES } from '@tallus/chem';
import type { WaterAnalysis } from '@tallus/contracts';
import { debounceTime, map, startWith } from 'rxjs';

import { FigurePipe } from '../../chem-view/figure/figure';
import { describeValidationErrors, errorText } from '../../core/error-messages';
import { showProblemAtFields } from '../../core/form-problems';
import { Notifier } from '../../core/notifier';
import { toProblem } from '../../core/problem';
import { TeamSettingsApi } from '../../site-data/team-settings-api';
import { TeamStore } from '../../teams/team-store';
import { CBE_NOTE_WORDS, cbeView } from '../cbe-view';
import { WaterApi } from '../water-api';
import { liveBalance } from './live-balance';

type SoluteGroup = FormGroup<{ key: FormControl<string>; value: FormControl<string>; unit: FormControl<string> }>;

/** Solutes a new analysis starts with: the major ions of most laboratory reports. */
const STARTER_SOLUTES = ['Ca', 'Mg', 'Na', 'K', 'Fe', 'alkalinity', 'SO4', 'Cl'];

/** One water analysis: its sample data and solutes with units, with the charge balance computed as you type. */
@Component({
  selector: 'tl-water-editor',
  imports: [FigurePipe, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatProgressBarModule, MatSelectModule, MatTooltipModule, ReactiveFormsModule, RouterLink],
  templateUrl: './water-editor.html',
  styleUrl: './water-editor.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaterEditor {
  private readonly api = inject(WaterApi);
  private readonly settingsApi = inject(TeamSettingsApi);
  private readonly teamStore = inject(TeamStore);
  private readonly notifier = inject(Notifier);
  private readonly router = inject(Router);

  readonly teamId = input.required<string>();
  /** The analysis id, or `new`. */
  readonly analysisId = input.required<string>();

  protected readonly solutes = SOLUTES;
  protected readonly units = CONCENTRATION_UNITS.filter((unit) => !ASCII_UNIT_ALIASES.includes(unit));
  protected readonly noteWords = CBE_NOTE_WORDS;
  protected readonly form = new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    site: new FormControl('', { nonNullable: true }),
    sampledOn: new FormControl('', { nonNullable: true }),
    temperatureC: new FormControl<number | null>(null),
    pH: new FormControl<number | null>(null),
    notes: new FormControl('', { nonNullable: true }),
    solutes: new FormArray<SoluteGroup>([]),
  });
  protected readonly isSaving = signal(false);
  protected readonly isNew = computed(() => this.analysisId() === 'new');
  protected readonly analysis = rxResource({
    params: () => (this.isNew() ? undefined : this.analysisId()),
    stream: ({ params: id }) => this.api.get(id),
  });
  protected readonly settings = rxResource({ params: () => this.teamId(), stream: ({ params: teamId }) => this.settingsApi.get(teamId) });
  protected readonly canWrite = this.teamStore.canWrite;
  private readonly value = toSignal(this.form.valueChanges.pipe(debounceTime(80), startWith(null), map(() => this.form.getRawValue())), { initialValue: this.form.getRawValue() });
  protected readonly live = computed(() => {
    const settings = this.settings.value();
    const value = this.value();
    return liveBalance(value.solutes, { pH: value.pH, threshold: settings?.cbeThresholdPercent ?? 5, convention: settings?.cbeConvention ?? 'standard' });
  });
  protected readonly flag = computed(() => {
    const balance = this.live().balance;
    return balance ? cbeView(balance) : null;
  });
  protected readonly loadError = computed(() => errorText(this.analysis.error()));

  constructor() {
    effect(() => {
      const analysis = this.analysis.value();
      const isNew = this.isNew();
      untracked(() => (analysis ? this.fill(analysis) : isNew ? this.fillStarter() : undefined));
    });
    effect(() => (this.canWrite() ? this.form.enable({ emitEvent: false }) : this.form.disable({ emitEvent: false })));
  }

  protected get soluteRows(): FormArray<SoluteGroup> {
    return this.form.controls.solutes;
  }

  protected addSolute(key = ''): void {
    const solute = SOLUTES.find((entry) => entry.key === key);
    this.soluteRows.push(soluteGroup(key, '', solute?.isCarbonateAlkalinity ? 'mg/L as CaCO3' : 'mg/L'));
  }

  protected removeSolute(index: number): void {
    this.soluteRows.removeAt(index);
  }

  protected errorOf(control: FormControl<unknown>): string {
    return describeValidationErrors(control.errors);
  }

  protected save(): void {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const solutes = Object.fromEntries(value.solutes.filter((row) => row.key && row.value.trim()).map((row) => [row.key, { value: row.value.trim(), unit: row.unit }]));
    const body = { name: value.name, site: value.site, sampledOn: value.sampledOn || null, temperatureC: value.temperatureC, pH: value.pH, notes: value.notes, solutes };
    const existing = this.analysis.value();
    const call = existing ? this.api.update(existing.id, { ...body, version: existing.version }) : this.api.create(this.teamId(), body);
    this.isSaving.set(true);
    call.subscribe({
      next: (saved) => {
        this.isSaving.set(false);
        this.notifier.success(`Water analysis “${saved.name}” saved.`);
        if (existing) this.analysis.set(saved);
        else void this.router.navigate(['/teams', this.teamId(), 'water-analyses', saved.id]);
      },
      error: (error: unknown) => {
        this.isSaving.set(false);
        const problem = toProblem(error);
        if (!showProblemAtFields(this.form, problem, { WATER_ANALYSIS_DUPLICATE: 'name' })) this.notifier.problem(problem);
      },
    });
  }

  protected remove(): void {
    const existing = this.analysis.value();
    if (!existing || !confirm(`Delete the water analysis “${existing.name}”?`)) return;
    this.api.delete(existing.id, existing.version).subscribe({
      next: () => {
        this.notifier.success(`Water analysis “${existing.name}” deleted.`);
        void this.router.navigate(['/teams', this.teamId(), 'water-analyses']);
      },
      error: (error: unknown) => this.notifier.problem(toProblem(error)),
    });
  }

  private fill(analysis: WaterAnalysis): void {
    this.soluteRows.clear({ emitEvent: false });
    for (const [key, entry] of Object.entries(analysis.solutes)) this.soluteRows.push(soluteGroup(key, entry.value, entry.unit), { emitEvent: false });
    this.form.patchValue({ name: analysis.name, site: analysis.site, sampledOn: analysis.sampledOn ?? '', temperatureC: analysis.temperatureC, pH: analysis.pH, notes: analysis.notes });
  }

  private fillStarter(): void {
    if (this.soluteRows.length > 0) return;
    for (const key of STARTER_SOLUTES) this.addSolute(key);
  }
}

function soluteGroup(key: string, value: string, unit: string): SoluteGroup {
  return new FormGroup({
    key: new FormControl(key, { nonNullable: true }),
    value: new FormControl(value, { nonNullable: true }),
    unit: new FormControl(unit, { nonNullable: true }),
  });
}

