import { FormArray, FormControl, FormGroup, Validators } from '@angular/forms';
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
  uncertaintyPercent: FormControl<number | null>;
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
 * Fills the form from a stored model.
 *
 * @param form the form
 * @param model the stored model
 */
export function fillModelForm(form: ModelForm, model: MassBalanceModel): void {
  form.controls.phases.clear({ emitEvent: false });
  for (const phase of model.phases) {
    const source: PhaseSource = phase.speciesId ? 'species' : phase.equation ? 'equation' : 'formula';
    form.controls.phases.push(phaseGroup({ name: phase.name, source, speciesId: phase.speciesId ?? '', text: phase.equation ?? phase.formula ?? '', rule: phase.rule }), { emitEvent: false });
  }
  const percents = Object.values(model.uncertainty);
  form.patchValue({
    name: model.name,
    description: model.description,
    initialWaterId: model.initialWaterId ?? '',
    finalWaterId: model.finalWaterId,
    constraints: [...model.constraints],
    uncertaintyPercent: percents.length > 0 ? Math.max(...percents) : null,
  });
}

/**
 * The request body of the form: one uncertainty percentage applied to every solute of both waters.
 *
 * @param value `form.getRawValue()`
 * @param waters the team's analyses (for the solutes the uncertainty applies to)
 */
export function modelRequestOf(value: ReturnType<ModelForm['getRawValue']>, waters: readonly WaterAnalysis[]): CreateMassBalanceModelRequest {
  const used = waters.filter((water) => water.id === value.initialWaterId || water.id === value.finalWaterId);
  const solutes = [...new Set(used.flatMap((water) => Object.keys(water.solutes)))];
  const percent = value.uncertaintyPercent ?? 0;
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
    uncertainty: percent > 0 ? Object.fromEntries(solutes.map((key) => [key, percent])) : {},
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
