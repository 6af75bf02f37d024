/**
 * Warnings: results that stand but that the user should read about.
 */
import type { ChemErrorCode, Span } from './chem-error';

/** Every code a {@link ChemWarning} can carry (besides a ChemError code passed on as a warning). */
export const CHEM_WARNING_CODES = [
  'BALANCE_SPECIES_MOVED',
  'BALANCE_SPECIES_UNUSED',
  'BALANCE_PINS_CONFLICT',
  'BALANCE_NORMALIZE_IGNORED',
  'COMBINE_REACTION_UNBALANCED',
] as const;

/** A code from {@link CHEM_WARNING_CODES}. */
export type ChemWarningCode = (typeof CHEM_WARNING_CODES)[number];

/** A warning: code, English message, and the species or text it is about. */
export interface ChemWarning {
  readonly code: ChemWarningCode | ChemErrorCode;
  readonly message: string;
  /** The species as written, when the warning is about one. */
  readonly species?: string;
  /** Where in the caller's text, when known. */
  readonly span?: Span;
}
