import {
  balanceEquation,
  checkEquation,
  checkToJson,
  formatEquation,
  isChemError,
  parseEquation,
  type ChemError,
  type Equation,
  type OxidationStateMap,
} from '@tallus/chem';
import type { ReactionResult } from '@tallus/contracts';

/** What a reaction's results depend on. */
export interface ReactionInput {
  equation: string;
  /** Species the budgets are normalised to; null: the first left-hand species. */
  reference: string | null;
  /** Explicit oxidation states of the team's and the built-in catalogue. */
  oxidationStates: OxidationStateMap;
}

const NOTHING = { balancedEquation: null, freedom: null, missing: [], balances: [], residuals: {}, electrons: null, protonBudget: null, warnings: [] };

/**
 * Computes what the server stores for a reaction on every save, with libs/chem:
 * - some coefficient is written → `checkEquation` as written, a term without one counting 1,
 *   as chemists write (`balanced` / `unbalanced`);
 * - no coefficient is written → `balanceEquation` (scaled to 1 mol of the reference, or of
 *   the first left-hand species), and when `balanced`, `checkEquation` of the balanced text;
 *   `open` and `impossible` keep the freedom, the basis balances and the missing elements;
 * - text or reference that does not parse → `invalid` with the error, its span and field.
 * Never throws for bad text: a user's reaction is always saved.
 *
 * @example computeReactionResult({ equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', reference: null, oxidationStates: {} })
 *   // status 'balanced', balancedEquation 'FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+', protonBudget.perMole '4'
 */
export function computeReactionResult(input: ReactionInput): ReactionResult {
  let equation: Equation;
  try {
    equation = parseEquation(input.equation);
  } catch (error) {
    if (isChemError(error)) return invalid(error, 'equation');
    throw error;
  }
  const isWritten = equation.terms.some((term) => term.coefficient !== null);
  return isWritten ? checkWritten(equation, input) : balanceAndCheck(equation, input);
}

function checkWritten(equation: Equation, input: ReactionInput): ReactionResult {
  const check = checkToJson(checkEquation(equation, { reference: input.reference ?? undefined, oxidationStates: input.oxidationStates }));
  if (check.error) return { ...invalidOf(check.error, 'reference'), mode: 'check' };
  const isBalanced = check.status === 'balanced';
  return {
    ...NOTHING,
    status: isBalanced ? 'balanced' : 'unbalanced',
    mode: 'check',
    balancedEquation: isBalanced ? formatEquation(equation.terms) : null,
    missing: Object.entries(check.residuals).filter(([, value]) => value !== '0').map(([label]) => label),
    ...budgets(check),
    error: null,
  };
}

function balanceAndCheck(equation: Equation, input: ReactionInput): ReactionResult {
  const normalizeTo = input.reference ?? equation.terms.find((term) => term.side === 'left')?.formula.text;
  const balance = balanceEquation(equation, { normalizeTo });
  if (balance.error) return { ...invalidOf(balance.error, input.reference ? 'reference' : 'equation'), mode: 'balance' };
  const outline = { mode: 'balance' as const, freedom: balance.freedom, missing: [...(balance.missing ?? [])], balances: [...(balance.balances ?? [])] };
  if (balance.status !== 'balanced' || balance.equation === null) {
    return { ...NOTHING, ...outline, status: balance.status, warnings: [...balance.warnings], error: null };
  }
  const check = checkToJson(checkEquation(balance.equation, { reference: input.reference ?? undefined, oxidationStates: input.oxidationStates }));
  if (check.error) return { ...invalidOf(check.error, 'reference'), mode: 'balance' };
  return {
    ...NOTHING,
    ...outline,
    status: 'balanced',
    balancedEquation: balance.equation,
    ...budgets(check),
    warnings: [...balance.warnings, ...check.warnings],
    error: null,
  };
}

function budgets(check: ReturnType<typeof checkToJson>): Pick<ReactionResult, 'residuals' | 'electrons' | 'protonBudget' | 'warnings'> {
  return {
    residuals: check.residuals,
    electrons:
      check.electronsTransferred === null || check.o2Demand === null
        ? null
        : { byElement: check.electrons, transferred: check.electronsTransferred, o2Demand: check.o2Demand },
    protonBudget: check.protonBudget,
    warnings: [...check.warnings],
  };
}

function invalid(error: ChemError, field: 'equation' | 'reference'): ReactionResult {
  return { ...invalidOf(error.toIssue(), field), mode: 'check' };
}

function invalidOf(issue: { code: string; message: string; span: { start: number; end: number } }, field: 'equation' | 'reference'): Omit<ReactionResult, 'mode'> {
  return { ...NOTHING, status: 'invalid', error: { code: issue.code, message: issue.message, span: { start: issue.span.start, end: issue.span.end }, field } };
}
