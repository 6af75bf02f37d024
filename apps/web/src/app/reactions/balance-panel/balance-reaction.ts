import { balanceEquation, formatEquation, isChemError, parseEquation, type ChemIssue } from '@tallus/chem';

/** What to balance: the equation as typed, the species to scale to, and pinned coefficients. */
export interface BalanceRequest {
  equation: string;
  /** Formula as written in the equation; the result then has 1 mole of it. */
  normalizeTo?: string | null;
  /** Fixed coefficients by formula (`"15/4"`, `"2"`, `"0.5"`); blank entries are ignored. */
  pins?: Readonly<Record<string, string>>;
}

/** The outcome of the balance action, for the screen. */
export interface BalanceOutcome {
  status: 'balanced' | 'unbalanced' | 'open' | 'impossible' | 'invalid';
  /** The balanced equation text (status `balanced`). */
  equation: string | null;
  /** For `open`: how many independent balances, and one equation per balance. */
  freedom: number;
  balances: string[];
  /** For `impossible`: the elements or `charge` that cannot balance. */
  missing: string[];
  warnings: string[];
  error: ChemIssue | null;
}

/**
 * Balances a reaction with exact coefficients in the browser. Coefficients already written are
 * replaced (only `pins` are kept), so "balance" can repair a reaction that does not balance.
 *
 * @param request the equation, the species to normalise to and the pins
 * @example balanceReaction({ equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', normalizeTo: 'FeS2' }).equation;
 * // "FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+"
 */
export function balanceReaction(request: BalanceRequest): BalanceOutcome {
  let stripped: string;
  try {
    const parsed = parseEquation(request.equation);
    stripped = formatEquation(parsed.terms.map((term) => ({ ...term, coefficient: null })));
  } catch (error) {
    if (!isChemError(error)) throw error;
    return { ...emptyOutcome('invalid'), error: error.toIssue() };
  }
  const pins = Object.fromEntries(Object.entries(request.pins ?? {}).filter(([, value]) => value.trim() !== ''));
  const result = balanceEquation(stripped, {
    normalizeTo: request.normalizeTo || undefined,
    pins: Object.keys(pins).length > 0 ? pins : undefined,
  });
  return {
    status: result.status,
    equation: result.status === 'balanced' ? result.equation : null,
    freedom: result.freedom,
    balances: [...(result.balances ?? [])],
    missing: [...(result.missing ?? [])],
    warnings: result.warnings.map((warning) => warning.message),
    error: result.error ?? null,
  };
}

function emptyOutcome(status: BalanceOutcome['status']): BalanceOutcome {
  return { status, equation: null, freedom: 0, balances: [], missing: [], warnings: [], error: null };
}
