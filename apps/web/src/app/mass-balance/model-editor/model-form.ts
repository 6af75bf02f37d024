import { FormArray, FormControl, FormGroup, FormRecord, Validators } from '@angular/forms';
import { findSolute, parseFormula } from '@tallus/chem';
import type { CreateMassBalanceModelRequest, MassBalanceModel, PhaseRuleName, WaterAnalysis } from '@tallus/contracts';

/** Where a candidate phase's stoichiometry comes from. */
export type PhaseSource = 'species' | 'formula' | 'equation';

export type PhaseGroup = FormGroup<{
  name: FormControl<string>;
  source: FormControl<PhaseSource>;
  speciesId: FormControl<string>;
  text: FormControl<string>;
  rule: FormControl<PhaseRuleName>;
}>;

/** The form of a mass-balance model. */
export type ModelForm = FormGroup<{
  name: FormControl<string>;
  description: FormControl<string>;
  /** '' for pure water. */
  initialWaterId: FormControl<string>;
  finalWaterId: FormControl<string>;
  phases: FormArray<PhaseGroup>;
  constraints: FormControl<string[]>;
  /** The default uncertainty in %, for every solute without its own. */
  uncertaintyPercent: FormControl<number | null>;
  /** Per-solute uncertainty in %, by solute key; null: the default. */
  uncertaintyBySolute: FormRecord<FormControl<number | null>>;
}>;

/** A new model form. */
export function createModelForm(): ModelForm {
  return new FormGroup({
    name: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    description: new FormControl('', { nonNullable: true }),
    initialWaterId: new FormControl('', { nonNullable: true }),
    finalWaterId: new FormControl('', { nonNullable: true, validators: [Validators.required] }),
    phases: new FormArray<PhaseGroup>([]),
    constraints: new FormControl<string[]>([], { nonNullable: true }),
    uncertaintyPercent: new FormControl<number | null>(null),
    uncertaintyBySolute: new FormRecord<FormControl<number | null>>({}),
  });
}

/** A phase row. */
export function phaseGroup(phase: { name?: string; source?: PhaseSource; speciesId?: string; text?: string; rule?: PhaseRuleName } = {}): PhaseGroup {
  return new FormGroup({
    name: new FormControl(phase.name ?? '', { nonNullable: true, validators: [Validators.required] }),
    source: new FormControl<PhaseSource>(phase.source ?? 'species', { nonNullable: true }),
    speciesId: new FormControl(phase.speciesId ?? '', { nonNullable: true }),
    text: new FormControl(phase.text ?? '', { nonNullable: true }),
    rule: new FormControl<PhaseRuleName>(phase.rule ?? 'either', { nonNullable: true }),
  });
}

/**
 * The control of one solute's own uncertainty, added (quietly, enabled or disabled like the form) when missing.
 *
 * @param form the form
 * @param solute the solute key
 */
export function soluteControl(form: ModelForm, solute: string): FormControl<number | null> {
  const record = form.controls.uncertaintyBySolute;
  const existing = record.controls[solute];
  if (existing) return existing;
  const control = new FormControl<number | null>({ value: null, disabled: form.disabled });
  record.addControl(solute, control, { emitEvent: false });
  return control;
}

/**
 * The solutes the chosen waters report, in the order they report them.
 *
 * @param value the chosen waters' ids
 * @param waters the team's analyses
 */
export function solutesOf(value: { initialWaterId: string; finalWaterId: string }, waters: readonly WaterAnalysis[]): string[] {
  const used = waters.filter((water) => water.id === value.initialWaterId || water.id === value.finalWaterId);
  return [...new Set(used.flatMap((water) => Object.keys(water.solutes)))];
}

/**
 * The most common percentage of a map (the larger one on a tie), or null for an empty map.
 *
 * @param uncertainty percentages by solute key
 */
export function commonPercentOf(uncertainty: Readonly<Record<string, number>>): number | null {
  const counts = new Map<number, number>();
  for (const percent of Object.values(uncertainty)) counts.set(percent, (counts.get(percent) ?? 0) + 1);
  let best: number | null = null;
  for (const [percent, count] of counts) {
    const bestCount = best === null ? 0 : (counts.get(best) ?? 0);
    if (count > bestCount || (count === bestCount && best !== null && percent > best)) best = percent;
  }
  return best;
}

/**
 * Fills the form from a stored model: the most common uncertainty becomes the default, the others overrides.
 *
 * @param form the form
 * @param model the stored model
 * @param waters the team's analyses (a solute they report but the model leaves out gets 0, so that saving sends the same map)
 */
export function fillModelForm(form: ModelForm, model: MassBalanceModel, waters: readonly WaterAnalysis[]): void {
  form.controls.phases.clear({ emitEvent: false });
  for (const phase of model.phases) {
    const source: PhaseSource = phase.speciesId ? 'species' : phase.equation ? 'equation' : 'formula';
    form.controls.phases.push(phaseGroup({ name: phase.name, source, speciesId: phase.speciesId ?? '', text: phase.equation ?? phase.formula ?? '', rule: phase.rule }), { emitEvent: false });
  }
  const common = commonPercentOf(model.uncertainty);
  const overrides: Record<string, number | null> = {};
  for (const key of Object.keys(form.controls.uncertaintyBySolute.controls)) overrides[key] = null;
  if (common !== null && common > 0) {
    for (const key of solutesOf({ initialWaterId: model.initialWaterId ?? '', finalWaterId: model.finalWaterId }, waters)) if (!(key in model.uncertainty)) overrides[key] = 0;
  }
  for (const [key, percent] of Object.entries(model.uncertainty)) overrides[key] = percent === common ? null : percent;
  for (const key of Object.keys(overrides)) soluteControl(form, key);
  form.patchValue({
    name: model.name,
    description: model.description,
    initialWaterId: model.initialWaterId ?? '',
    finalWaterId: model.finalWaterId,
    constraints: [...model.constraints],
    uncertaintyPercent: common,
    uncertaintyBySolute: overrides,
  });
}

/**
 * The request body of the form: each solute of both waters gets its own uncertainty, else the default; only those above 0 are sent.
 *
 * @param value `form.getRawValue()`
 * @param waters the team's analyses (for the solutes the uncertainty applies to)
 */
export function modelRequestOf(value: ReturnType<ModelForm['getRawValue']>, waters: readonly WaterAnalysis[]): CreateMassBalanceModelRequest {
  const uncertainty: Record<string, number> = {};
  for (const key of solutesOf(value, waters)) {
    const percent = value.uncertaintyBySolute[key] ?? value.uncertaintyPercent ?? 0;
    if (percent > 0) uncertainty[key] = percent;
  }
  return {
    name: value.name.trim(),
    description: value.description,
    initialWaterId: value.initialWaterId || null,
    finalWaterId: value.finalWaterId,
    phases: value.phases.map((phase) => ({
      name: phase.name.trim(),
      rule: phase.rule,
      ...(phase.source === 'species' ? { speciesId: phase.speciesId } : phase.source === 'equation' ? { equation: phase.text.trim() } : { formula: phase.text.trim() }),
    })),
    constraints: value.constraints,
    uncertainty,
  };
}

/**
 * The elements the chosen waters report, which can serve as constraints (O and H left out: water supplies them).
 *
 * @param waters the initial and final water (either may be missing)
 */
export function elementsOf(waters: readonly (WaterAnalysis | undefined)[]): string[] {
  const elements = new Set<string>();
  for (const water of waters) {
    for (const key of Object.keys(water?.solutes ?? {})) {
      const solute = findSolute(key);
      if (!solute) continue;
      // Alkalinity and HCO3 stand for carbon.
      for (const element of parseFormula(solute.formula).composition.keys()) if (element !== 'O' && element !== 'H') elements.add(element);
    }
  }
  return [...elements].sort();
}
