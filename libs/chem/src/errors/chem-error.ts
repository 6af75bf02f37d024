/**
 * The one error type libs/chem throws for bad input. Broken invariants throw plain `Error`.
 */

/** Every code a {@link ChemError} can carry, grouped by the area that detects it. */
export const CHEM_ERROR_CODES = [
  // formula text
  'FORMULA_EMPTY',
  'FORMULA_UNEXPECTED_TOKEN',
  'FORMULA_UNKNOWN_ELEMENT',
  'FORMULA_UNBALANCED_PAREN',
  'FORMULA_MIXED_SITE',
  'FORMULA_BAD_SUBSCRIPT',
  'FORMULA_BAD_CHARGE',
  'FORMULA_AMBIGUOUS_CHARGE',
  'FORMULA_UNKNOWN_PHASE',
  // equation text
  'EQUATION_EMPTY',
  'EQUATION_NO_ARROW',
  'EQUATION_SEVERAL_ARROWS',
  'EQUATION_EMPTY_SIDE',
  'EQUATION_EMPTY_TERM',
  'EQUATION_BAD_COEFFICIENT',
  // balancing options
  'BALANCE_UNKNOWN_SPECIES',
  'BALANCE_BAD_PIN',
  // oxidation states
  'OXIDATION_UNDETERMINED',
  'OXIDATION_BAD_STATE',
  // budgets and conversions
  'BUDGET_UNKNOWN_REFERENCE',
  'BUDGET_BAD_AMOUNT',
  // net reactions
  'COMBINE_NO_REACTIONS',
  'COMBINE_UNKNOWN_SPECIES',
  'COMBINE_BAD_MULTIPLIER',
  // water analyses
  'WATER_UNKNOWN_SOLUTE',
  'WATER_BAD_UNIT',
  'WATER_BAD_VALUE',
  'WATER_DUPLICATE_SOLUTE',
  // inverse mass balance
  'MASS_BALANCE_NO_PHASES',
  'MASS_BALANCE_UNKNOWN_SOLUTE',
  'MASS_BALANCE_BAD_VALUE',
  'MASS_BALANCE_BAD_PHASE',
  'MASS_BALANCE_BAD_RULE',
  'MASS_BALANCE_BAD_CONSTRAINT',
  // oxide recalculation
  'OXIDES_UNKNOWN_OXIDE',
  'OXIDES_BAD_VALUE',
  'OXIDES_BAD_BASIS',
  'OXIDES_UNKNOWN_GROUP',
  // acid-base accounting and CO2 uptake
  'ABA_BAD_INPUT',
  'ABA_UNKNOWN_MINERAL',
  'CO2_BAD_INPUT',
] as const;

/** A code from {@link CHEM_ERROR_CODES}. */
export type ChemErrorCode = (typeof CHEM_ERROR_CODES)[number];

/** Characters `[start, end)` (0-based, end-exclusive) in the caller's string. */
export interface Span {
  readonly start: number;
  readonly end: number;
}

/** Small typed facts about an error, for callers that build their own message. */
export type ChemErrorDetails = Readonly<Record<string, string | number | readonly string[]>>;

/** The JSON form of a ChemError, as the API and CLI send it. */
export interface ChemIssue {
  readonly code: ChemErrorCode;
  readonly message: string;
  readonly span: Span;
}

/**
 * Bad chemistry input: a code, an English message, and where in the caller's text.
 *
 * @example
 * try { parseFormula('(Mg,Fe)2SiO4'); }
 * catch (error) { if (isChemError(error)) console.log(error.code, error.span); }
 * // FORMULA_MIXED_SITE { start: 0, end: 7 }
 */
export class ChemError extends Error {
  readonly code: ChemErrorCode;
  readonly span: Span;
  readonly details: ChemErrorDetails;

  constructor(code: ChemErrorCode, message: string, span: Span, details: ChemErrorDetails = {}) {
    super(message);
    this.name = 'ChemError';
    this.code = code;
    this.span = span;
    this.details = details;
  }

  /** The error moved by `offset` characters, for text embedded in a longer string. */
  shifted(offset: number): ChemError {
    const span = { start: this.span.start + offset, end: this.span.end + offset };
    return new ChemError(this.code, this.message, span, this.details);
  }

  /** `{code, message, span}` for JSON results. */
  toIssue(): ChemIssue {
    return { code: this.code, message: this.message, span: this.span };
  }
}

/** Whether `value` is a {@link ChemError}. */
export function isChemError(value: unknown): value is ChemError {
  return value instanceof ChemError;
}
