import { balanceEquation, checkEquation, isChemError, parseEquation, type ChemIssue, type Equation, type OxidationStateMap } from '@tallus/chem';

/** What to check: the equation as typed and the budget options. */
export interface CheckRequest {
  equation: string;
  /** Species the budgets are per mole of; default the first left-hand species. */
  reference?: string | null;
  /** Weight percent of the reference species in the rock, for per-tonne figures. */
  rockWeightPercent?: number | null;
  oxidationStates?: OxidationStateMap;
}

/** One row of the residual table: left minus right of an element or of the charge. */
export interface ResidualRow {
  label: string;
  /** Exact value as text (`0`, `-2`, `1/2`). */
  value: string;
  isZero: boolean;
}

/** The check of one reaction, in plain values a template can show. */
export interface CheckView {
  status: 'balanced' | 'unbalanced' | 'open' | 'impossible' | 'invalid' | 'empty';
  /**
   * `check`: some coefficient was written, so the reaction is checked as written (a term without
   * one counts 1). `balance`: none was written, so it is balanced, as the server does on save.
   */
  mode: 'check' | 'balance';
  /** In `balance` mode: the balanced equation (when `balanced`), the balances (when `open`), what cannot balance (when `impossible`). */
  balancedEquation: string | null;
  balances: string[];
  missing: string[];
  /** The species as written, in order; empty when the text does not parse. */
  species: string[];
  residuals: ResidualRow[];
  electrons: {
    byElement: { element: string; value: string }[];
    transferred: string;
    o2Demand: string;
  } | null;
  proton: {
    reference: string;
    perMole: string;
    perKg: number | null;
    perTonneRock: number | null;
    caco3KgPerTonne: number | null;
  } | null;
  /** Why the text does not parse, where, and its code. */
  error: ChemIssue | null;
  /** Notes that did not stop the check (e.g. an oxidation state that cannot be decided). */
  warnings: { code: string; message: string }[];
}

/** The check of an empty field: nothing to say yet. */
export const EMPTY_CHECK: CheckView = {
  status: 'empty',
  mode: 'check',
  balancedEquation: null,
  balances: [],
  missing: [],
  species: [],
  residuals: [],
  electrons: null,
  proton: null,
  error: null,
  warnings: [],
};

/**
 * Checks a reaction in the browser with libs/chem: element and charge residuals, electron and
 * proton budgets. Never throws for bad input; bad text or options give `invalid` with the span.
 * Elements come in the order they first appear; charge last.
 *
 * @param request the equation and budget options
 * @example checkReaction({ equation: 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O' }).proton?.perMole; // "-2"
 */
export function checkReaction(request: CheckRequest): CheckView {
  const text = request.equation.trim();
  if (text === '') {
    return EMPTY_CHECK;
  }
  let equation;
  try {
    equation = parseEquation(request.equation);
  } catch (error) {
    if (!isChemError(error)) throw error;
    return { ...EMPTY_CHECK, status: 'invalid', error: error.toIssue() };
  }
  const species = equation.terms.map((term) => term.formula.text);
  if (equation.terms.every((term) => term.coefficient === null)) {
    return balanceThenCheck(equation, species, request);
  }
  return checkAsWritten(equation, species, request);
}

/**
 * No coefficient written: balance (to 1 mol of the reference when one is chosen), then check the
 * balanced equation for its budgets, as the server does on save.
 */
function balanceThenCheck(equation: Equation, species: string[], request: CheckRequest): CheckView {
  const balance = balanceEquation(equation, { normalizeTo: request.reference || undefined });
  if (balance.status !== 'balanced' || balance.equation === null) {
    return {
      ...EMPTY_CHECK,
      status: balance.status === 'unbalanced' ? 'invalid' : balance.status,
      mode: 'balance',
      species,
      balances: [...(balance.balances ?? [])],
      missing: [...(balance.missing ?? [])],
      error: balance.error ?? null,
    };
  }
  const checked = checkAsWritten(parseEquation(balance.equation), species, request);
  return { ...checked, mode: 'balance', balancedEquation: balance.equation };
}

function checkAsWritten(equation: Equation, species: string[], request: CheckRequest): CheckView {
  const result = checkEquation(equation, {
    reference: request.reference || undefined,
    rockWeightPercent: request.rockWeightPercent ?? undefined,
    oxidationStates: request.oxidationStates,
  });
  if (result.status === 'invalid') {
    return { ...EMPTY_CHECK, status: 'invalid', species, error: result.error ?? null };
  }
  return {
    ...EMPTY_CHECK,
    status: result.status,
    species,
    residuals: [...result.residuals].map(([label, value]) => ({ label, value: value.toString(), isZero: value.isZero() })),
    electrons: result.electrons && {
      byElement: [...result.electrons.byElement].map(([element, value]) => ({ element, value: value.toString() })),
      transferred: result.electrons.transferred.toString(),
      o2Demand: result.electrons.o2Demand.toString(),
    },
    proton: result.protonBudget && {
      reference: result.protonBudget.reference,
      perMole: result.protonBudget.perMole.toString(),
      perKg: result.protonBudget.perKg,
      perTonneRock: result.protonBudget.perTonneRock,
      caco3KgPerTonne: result.protonBudget.caco3KgPerTonne,
    },
    error: null,
    warnings: result.warnings.map((warning) => ({ code: warning.code, message: warning.message })),
  };
}
