import { formulaParts, parseEquation, type FormulaPart } from '@tallus/chem';

/** One term of a rendered equation. */
export interface TermView {
  /** The coefficient as text (`15/4`, `2`, `0.69`), or null when it is 1 or not written. */
  coefficient: string | null;
  /** The formula as runs of text, subscripts and the charge superscript. */
  parts: FormulaPart[];
  /** Plain text of the term, for tracking and screen readers. */
  text: string;
}

/** An equation ready to render, or the raw text when it does not parse. */
export type EquationView =
  | { isParsed: true; left: TermView[]; arrow: string; right: TermView[] }
  | { isParsed: false; text: string };

const ARROWS: Readonly<Record<string, string>> = { '->': '→', '→': '→', '=': '=', '<=>': '⇌', '⇌': '⇌' };

/**
 * Parses an equation for display: real subscripts and charges from libs/chem's `formulaParts`,
 * coefficients as written (decimals stay decimals, fractions become fractions), the arrow the
 * user chose. Text that does not parse is returned as is.
 *
 * @param text equation text, e.g. `FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+`
 */
export function equationParts(text: string): EquationView {
  let equation;
  try {
    equation = parseEquation(text);
  } catch {
    return { isParsed: false, text };
  }
  const views = equation.terms.map((term) => {
    const written = text.slice(term.span.start, term.span.end).trim();
    return { side: term.side, view: termView(term.coefficient?.toString() ?? null, written, term.formula) };
  });
  const lastLeft = equation.terms.filter((term) => term.side === 'left').at(-1);
  const firstRight = equation.terms.find((term) => term.side === 'right');
  const arrowText = lastLeft && firstRight ? text.slice(lastLeft.span.end, firstRight.span.start).trim() : '->';
  return {
    isParsed: true,
    left: views.filter((entry) => entry.side === 'left').map((entry) => entry.view),
    arrow: ARROWS[arrowText] ?? '→',
    right: views.filter((entry) => entry.side === 'right').map((entry) => entry.view),
  };
}

function termView(exact: string | null, written: string, formula: Parameters<typeof formulaParts>[0]): TermView {
  return { coefficient: coefficientText(exact, written), parts: formulaParts(formula), text: written };
}

/** A decimal written by the user stays a decimal; everything else shows as the exact fraction. */
function coefficientText(exact: string | null, written: string): string | null {
  if (exact === null || exact === '1') {
    return null;
  }
  const decimal = /^\s*(\d*\.\d+)/.exec(written);
  return decimal ? decimal[1] : exact;
}
