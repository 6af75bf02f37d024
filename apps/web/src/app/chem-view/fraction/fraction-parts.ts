/** An exact number as the screen shows it: a whole part and, for a fraction, numerator over denominator. */
export interface FractionParts {
  /** Whether a minus sign goes in front. */
  isNegative: boolean;
  /** Digits of an integer or a decimal as written; empty for a pure fraction. */
  whole: string;
  numerator: string;
  denominator: string;
  /** The plain text, for screen readers and copying (`15/4`, `-2`, `0.69`). */
  text: string;
}

/**
 * Splits the text of an exact number (`"15/4"`, `"-2"`, `"0.69"`) into what a stacked or
 * slashed fraction needs. Decimals stay decimals: a geochemist who wrote 0.69 reads 0.69.
 *
 * @param text a rational as libs/chem prints it, or a decimal
 * @example fractionParts('-15/4'); // { isNegative: true, whole: '', numerator: '15', denominator: '4', text: '-15/4' }
 */
export function fractionParts(text: string): FractionParts {
  const trimmed = text.trim();
  const isNegative = trimmed.startsWith('-') || trimmed.startsWith('−');
  const body = isNegative ? trimmed.slice(1) : trimmed;
  const slash = body.indexOf('/');
  if (slash < 0) {
    return { isNegative, whole: body, numerator: '', denominator: '', text: trimmed };
  }
  return {
    isNegative,
    whole: '',
    numerator: body.slice(0, slash),
    denominator: body.slice(slash + 1),
    text: trimmed,
  };
}
