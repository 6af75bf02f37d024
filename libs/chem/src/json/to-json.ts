/**
 * Plain JSON forms of results (rationals as strings such as "15/4"), the shapes the command
 * line prints and the API can send as they are.
 */
import type { BalanceResult } from '../balance/balance-result';
import type { CheckResult } from '../check/check-equation';
import type { CombineResult } from '../combine/combine-reactions';
import { molarMass } from '../convert/molar-mass';
import type { ChemIssue } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Formula } from '../formula/formula';
import { parseFormula } from '../formula/parse-formula';
import type { Rational } from '../rational/rational';

/** JSON of a balance. */
export interface BalanceJson {
  readonly status: BalanceResult['status'];
  readonly freedom: number;
  readonly terms: readonly { formula: string; side: 'left' | 'right'; coefficient: string | null }[];
  readonly equation: string | null;
  readonly warnings: readonly ChemWarning[];
  readonly missing?: readonly string[];
  readonly balances?: readonly string[];
  readonly error?: ChemIssue;
}

/** JSON of a check. */
export interface CheckJson {
  readonly status: CheckResult['status'];
  readonly residuals: Record<string, string>;
  readonly electrons: Record<string, string>;
  readonly electronsTransferred: string | null;
  readonly o2Demand: string | null;
  readonly protonBudget: {
    reference: string;
    perMole: string;
    perKg: number | null;
    perTonneRock: number | null;
    caco3KgPerTonne: number | null;
  } | null;
  readonly warnings: readonly ChemWarning[];
  readonly error?: ChemIssue;
}

/** JSON of a molar mass. */
export interface MassJson {
  readonly formula: string;
  readonly molarMass: number;
  readonly composition: Record<string, string>;
  readonly charge: string;
}

/** JSON of a net reaction. */
export interface CombineJson {
  readonly status: CombineResult['status'];
  readonly multipliers: readonly (string | null)[];
  readonly equation: string | null;
  readonly terms: readonly { formula: string; side: 'left' | 'right'; coefficient: string }[];
  readonly freedom: number;
  readonly warnings: readonly ChemWarning[];
  readonly error?: CombineResult['error'];
}

function record(map: ReadonlyMap<string, Rational>): Record<string, string> {
  return Object.fromEntries([...map].map(([key, value]) => [key, value.toString()]));
}

/**
 * @example balanceToJson(balanceEquation('H2 + O2 -> H2O')).terms[0].coefficient; // "2"
 */
export function balanceToJson(result: BalanceResult): BalanceJson {
  const terms = result.terms.map((term) => ({
    formula: term.formula,
    side: term.side,
    coefficient: term.coefficient?.toString() ?? null,
  }));
  return { ...result, terms } as BalanceJson;
}

/**
 * @example checkToJson(checkEquation('2 H2 + O2 -> 2 H2O')).residuals; // { H: "0", O: "0", charge: "0" }
 */
export function checkToJson(result: CheckResult): CheckJson {
  const budget = result.protonBudget;
  return {
    status: result.status,
    residuals: record(result.residuals),
    electrons: result.electrons === null ? {} : record(result.electrons.byElement),
    electronsTransferred: result.electrons?.transferred.toString() ?? null,
    o2Demand: result.electrons?.o2Demand.toString() ?? null,
    protonBudget: budget === null ? null : { ...budget, perMole: budget.perMole.toString() },
    warnings: result.warnings,
    ...(result.error === undefined ? {} : { error: result.error }),
  };
}

/**
 * @example massToJson('CaCO3').molarMass; // 100.086
 * @throws ChemError FORMULA_* codes.
 */
export function massToJson(formula: Formula | string): MassJson {
  const parsed = typeof formula === 'string' ? parseFormula(formula) : formula;
  return {
    formula: parsed.text,
    molarMass: molarMass(parsed),
    composition: record(parsed.composition),
    charge: parsed.charge.toString(),
  };
}

/**
 * @example combineToJson(result).multipliers; // ["1", "1/4"]
 */
export function combineToJson(result: CombineResult): CombineJson {
  return {
    ...result,
    multipliers: result.multipliers.map((value) => value?.toString() ?? null),
    terms: result.terms.map((term) => ({ ...term, coefficient: term.coefficient.toString() })),
  };
}
