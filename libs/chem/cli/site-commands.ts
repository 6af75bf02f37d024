/**
 * Command-line commands for site data: inverse mass balance, oxide recalculation, CO2 uptake.
 */
import {
  formulaText,
  isChemError,
  mineralCo2Uptake,
  recalculateFormula,
  solveMassBalance,
  type MassBalanceInput,
  type MassBalanceResult,
  type OxideAnalysis,
} from '../src/index';

/** Where a command prints. */
export interface CommandOutput {
  readonly stdout: (text: string) => void;
}

function print(output: CommandOutput, isJson: boolean, json: unknown, text: string): void {
  output.stdout(isJson ? `${JSON.stringify(json)}\n` : `${text}\n`);
}

function invalid(output: CommandOutput, isJson: boolean, error: unknown): number {
  if (!isChemError(error)) throw error;
  const issue = { ...error.toIssue(), details: error.details };
  print(output, isJson, { status: 'invalid', error: issue }, `invalid: ${error.code}${error.details.field ? ` at ${String(error.details.field)}` : ''}: ${error.message}`);
  return 1;
}

function describeMassBalance(result: MassBalanceResult): string {
  if (result.error !== undefined) return `invalid: ${result.error.code} at ${String(result.error.details.field ?? '')}: ${result.error.message}`;
  const lines = [`${result.status}: ${result.models.length} model(s)`];
  for (const model of result.models) {
    const transfers = model.phases.map((name) => `${name} ${model.transfers[name].toString()}`).join(', ');
    lines.push(`  ${model.valid ? 'valid  ' : 'invalid'} ${transfers}${model.robust === undefined ? '' : model.robust ? ' (robust)' : ' (not robust)'}`);
  }
  return lines.join('\n');
}

/**
 * `mass-balance <file.json>`: exit 0 when the status is exact and a model is valid, else 1.
 * @example runMassBalance(output, '{"initial":{},"final":{"Ca":1},...}', true); // 0
 */
export function runMassBalance(output: CommandOutput, fileText: string, isJson: boolean): number {
  const result = solveMassBalance(JSON.parse(fileText) as MassBalanceInput);
  const json = {
    status: result.status,
    constraints: result.constraints,
    change: result.change,
    models: result.models,
    notes: result.notes,
    ...(result.error === undefined ? {} : { error: result.error }),
  };
  print(output, isJson, json, describeMassBalance(result));
  return result.status === 'exact' && result.models.some((model) => model.valid) ? 0 : 1;
}

/**
 * `oxides <file.json>` with `{oxides, oxygens, group?, ferric?, cations?}`: exit 0, 1 for bad input.
 * @example runOxides(output, '{"oxides":{"FeO":100},"oxygens":4,"ferric":"droop","cations":3}', true); // 0
 */
export function runOxides(output: CommandOutput, fileText: string, isJson: boolean): number {
  try {
    const input = JSON.parse(fileText) as OxideAnalysis;
    const result = recalculateFormula(input);
    const formula = formulaText(result.apfu, { oxygens: result.oxygens, decimals: 3 });
    const text = [`${formula} (apfu on ${result.oxygens} O; total ${result.total.toFixed(3)})`, ...result.warnings.map((warning) => `warning: ${warning.message}`)].join('\n');
    print(output, isJson, { ...result, formula }, text);
    return 0;
  } catch (error) {
    return invalid(output, isJson, error);
  }
}

/**
 * `co2 "<formula>"`: t CO2 per t by the bicarbonate and carbonate end points.
 * @example runCo2(output, 'Mg2SiO4', true); // prints {"bicarbonate":1.2512…,"carbonate":0.6256…}
 */
export function runCo2(output: CommandOutput, formula: string, isJson: boolean): number {
  try {
    const result = mineralCo2Uptake(formula);
    const json = { formula: result.formula, bicarbonate: result.bicarbonate, carbonate: result.carbonate, molCo2PerMole: result.molCo2PerMole, cautions: result.cautions };
    print(output, isJson, json, `${result.formula}: ${result.bicarbonate.toFixed(4)} t CO2/t (bicarbonate), ${result.carbonate.toFixed(4)} t CO2/t (carbonate)`);
    return 0;
  } catch (error) {
    return invalid(output, isJson, error);
  }
}
