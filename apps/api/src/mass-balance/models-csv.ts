import { MASS_BALANCE_MODELS_CSV_COLUMNS, type MassBalanceModel } from '@tallus/contracts';
import { writeCsv } from '../site-data/csv-table';

function residualText(residuals: Record<string, number> | undefined): string {
  return residuals ? Object.entries(residuals).map(([key, value]) => `${key}=${value.toPrecision(4)}`).join(' ') : '';
}

/** The table of models of one mass-balance model: one row per model, one `transfer:<phase>` column per candidate (mmol/kg, exact). */
export function solutionsCsv(model: MassBalanceModel): string {
  const phases = model.phases.map((phase) => phase.name);
  const rows = model.result.models.map((solution, index) => [
    index + 1,
    solution.phases.join(' + '),
    solution.valid,
    solution.robust ?? null,
    solution.impliedReaction.equation,
    residualText(solution.residuals),
    ...phases.map((name) => solution.transfers[name] ?? null),
  ]);
  return writeCsv([...MASS_BALANCE_MODELS_CSV_COLUMNS, ...phases.map((name) => `transfer:${name}`)], rows);
}

/**
 * Every model of a team: definition, status and the first (best) solution. The
 * water names are those stored with the result ('pure water' for none): a
 * rename of a water solves its models again, so they are current.
 */
export function modelListCsv(models: readonly MassBalanceModel[]): string {
  const header = ['name', 'initial_water', 'final_water', 'phases', 'constraints', 'uncertainty_percent', 'status', 'model_count', 'valid_model_count', 'first_model_transfers_mmol_kg', 'first_model_implied_reaction'];
  const rows = models.map((model) => {
    const first = model.result.models[0];
    return [
      model.name,
      model.result.initial.name,
      model.result.final.name,
      model.phases.map((phase) => `${phase.name} [${phase.equation ?? phase.formula ?? ''}; ${phase.rule}]`).join(' | '),
      model.constraints.join(' '),
      Object.entries(model.uncertainty).map(([key, value]) => `${key}=${value}`).join(' '),
      model.result.status,
      model.result.models.length,
      model.result.models.filter((solution) => solution.valid).length,
      first ? Object.entries(first.transfers).map(([name, value]) => `${name}=${value}`).join(' ') : '',
      first?.impliedReaction.equation ?? '',
    ];
  });
  return writeCsv(header, rows);
}
