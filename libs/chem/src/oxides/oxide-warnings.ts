/**
 * Warnings of the oxide recalculation, in words shared by API, client and report.
 */

/** A warning about a recalculated formula. */
export interface OxideWarning {
  readonly code: 'DROOP_NOT_APPLICABLE' | 'DROOP_NO_EXCESS' | 'DROOP_EXCEEDS_IRON' | 'TOTAL_OUT_OF_RANGE';
  readonly message: string;
}

/** Every oxide-recalculation warning. */
export const OXIDE_WARNINGS = {
  DROOP_NOT_APPLICABLE: {
    code: 'DROOP_NOT_APPLICABLE',
    message:
      'Droop (1987) does not apply to minerals with cation vacancies (micas, maghemite; amphiboles only with a fixed cation subset), with Si4+ = 4H+ substitution, with unanalysed elements or with more than one variable-valence element; the Fe3+ shown is not meaningful.',
  },
  DROOP_NO_EXCESS: {
    code: 'DROOP_NO_EXCESS',
    message: 'The cation total does not exceed the ideal number (S ≤ T): no Fe3+ can be estimated by Droop (1987); all Fe is shown as Fe2+.',
  },
  DROOP_EXCEEDS_IRON: {
    code: 'DROOP_EXCEEDS_IRON',
    message: 'The charge deficit asks for more Fe3+ than there is iron: the analysis or the chosen basis is probably wrong; Fe3+ is capped at total Fe.',
  },
  TOTAL_OUT_OF_RANGE: {
    code: 'TOTAL_OUT_OF_RANGE',
    message: 'The oxide total lies outside 98.5–101.5 wt%: check unanalysed constituents (H2O, CO2, Fe2O3 reported as FeO or the reverse) before trusting the formula.',
  },
} as const satisfies Record<string, OxideWarning>;
