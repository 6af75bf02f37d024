/**
 * Properties of balancing and parsing on generated input.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ChemError } from '../errors/chem-error';
import { parseEquation } from '../equation/parse-equation';
import { formatEquation } from '../equation/format-equation';
import { parseFormula } from '../formula/parse-formula';
import { speciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';
import { balanceEquation } from './balance-equation';
import { buildSpeciesMatrix } from './species-matrix';

const SYMBOLS = ['H', 'O', 'C', 'Na', 'K', 'Ca', 'Mg', 'Al', 'Si', 'Fe', 'S', 'Cl'];

const formulaText = fc
  .tuple(
    fc.array(fc.tuple(fc.constantFrom(...SYMBOLS), fc.integer({ min: 1, max: 4 })), { minLength: 1, maxLength: 3 }),
    fc.constantFrom('', '+', '-', '^2+', '^2-', '^3+'),
  )
  .map(([parts, charge]) => {
    const body = parts.map(([symbol, count]) => (count === 1 ? symbol : `${symbol}${count}`)).join('');
    return parts.length === 1 && parts[0][1] > 1 && (charge === '+' || charge === '-') ? `${body}^${charge}` : `${body}${charge}`;
  });

const equationText = fc
  .tuple(fc.array(formulaText, { minLength: 1, maxLength: 4 }), fc.array(formulaText, { minLength: 1, maxLength: 4 }))
  .map(([left, right]) => `${left.join(' + ')} -> ${right.join(' + ')}`);

const coefficient = fc
  .tuple(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1, max: 12 }))
  .map(([num, den]) => Rational.of(num, den));

describe('balancing properties', () => {
  it('a balanced result satisfies the matrix equation exactly', () => {
    fc.assert(
      fc.property(equationText, (text) => {
        const result = balanceEquation(text);
        if (result.status !== 'balanced') return;
        const equation = parseEquation(text);
        const matrix = buildSpeciesMatrix(equation.terms);
        const values = result.terms.map((term, index) => {
          const value = term.coefficient ?? Rational.ZERO;
          return term.side === equation.terms[index].side ? value : value.neg();
        });
        for (const row of matrix.exactRows) {
          const sum = row.reduce((total, entry, index) => total.add(entry.mul(values[index])), Rational.ZERO);
          expect(sum.toString()).toBe('0');
        }
      }),
      { numRuns: 500 },
    );
  });

  it('canonical equation text reads back to the same species, sides and coefficients', () => {
    const terms = fc.array(fc.tuple(formulaText, coefficient, fc.constantFrom('left' as const, 'right' as const)), {
      minLength: 1,
      maxLength: 6,
    });
    fc.assert(
      fc.property(terms, formulaText, formulaText, (entries, extraLeft, extraRight) => {
        const all = [...entries, [extraLeft, Rational.ONE, 'left'] as const, [extraRight, Rational.of(2), 'right'] as const];
        const original = all.map(([text, value, side]) => ({ formula: parseFormula(text), coefficient: value, side }));
        const ordered = [...original.filter((term) => term.side === 'left'), ...original.filter((term) => term.side === 'right')];
        const again = parseEquation(formatEquation(ordered)).terms;
        const describe = (list: typeof again | typeof ordered): string[] =>
          list.map((term) => `${term.side} ${(term.coefficient ?? Rational.ONE).toString()} ${speciesKey(term.formula)}`);
        expect(describe(again)).toEqual(describe(ordered));
      }),
      { numRuns: 500 },
    );
  });

  it('a balanced result reads back from its canonical text as balanced', () => {
    fc.assert(
      fc.property(equationText, (text) => {
        const result = balanceEquation(text);
        if (result.status !== 'balanced' || result.equation === null) return;
        expect(balanceEquation(result.equation).status).toBe('balanced');
      }),
      { numRuns: 300 },
    );
  });
});

const CHEMISTRY_ALPHABET = [
  ...'HCONaKSiAlFeMgCaSClPbUxyzq0123456789()[],.·*^+-−=<>/ ₀₁₂₃⁰¹²³⁺⁻→⇌½e(aq)(s)(g)',
];
const chemistryString = fc.array(fc.constantFrom(...CHEMISTRY_ALPHABET), { maxLength: 40 }).map((chars) => chars.join(''));
const fuzz = fc.oneof(chemistryString, fc.string({ unit: 'binary', maxLength: 40 }), equationText.map((text) => text.replace(/ /g, '')));

function throwsOnlyChemError(run: () => unknown): void {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(ChemError);
  }
}

describe('fuzzing', () => {
  it('10,000 random strings: parsers give a result or a ChemError with a span inside the text; balancing never throws', () => {
    fc.assert(
      fc.property(fuzz, (text) => {
        throwsOnlyChemError(() => parseFormula(text));
        throwsOnlyChemError(() => parseEquation(text));
        const result = balanceEquation(text);
        if (result.error !== undefined) {
          expect(result.error.span.start).toBeGreaterThanOrEqual(0);
          expect(result.error.span.end).toBeLessThanOrEqual(text.length);
          expect(result.error.span.start).toBeLessThanOrEqual(result.error.span.end);
        }
      }),
      { numRuns: 10_000 },
    );
  });
});
