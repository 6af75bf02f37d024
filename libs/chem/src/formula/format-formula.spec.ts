import { describe, expect, it } from 'vitest';
import { formatFormula, formulaParts } from './format-formula';
import { parseFormula } from './parse-formula';
import { speciesKey } from './species-key';

describe('formatFormula', () => {
  it.each([
    ['H₂O', 'H2O'],
    ['Ca²⁺', 'Ca^2+'],
    ['Ca+2', 'Ca^2+'],
    ['SO₄²⁻', 'SO4^2-'],
    ['HCO3-', 'HCO3-'],
    ['Hg2^+', 'Hg2^+'],
    ['CaSO4*2H2O(s)', 'CaSO4·2H2O(s)'],
    ['CaSO4.0.5H2O', 'CaSO4·0.5H2O'],
    ['(Mg0.9,Fe0.1)2SiO4', '(Mg0.9,Fe0.1)2SiO4'],
    ['Al2.30Si3.5O10', 'Al2.3Si3.5O10'],
    ['H1', 'H'],
    ['e-', 'e-'],
  ])('writes %s as %s', (text, canonical) => {
    expect(formatFormula(parseFormula(text))).toBe(canonical);
  });

  it.each(['Al2Si2O5(OH)4', 'Ca^2+', 'CaSO4·2H2O', 'Hg2^+', 'Fe5HO8·4H2O', 'Na0.62Ca0.38Al1.38Si2.62O8', 'CO2(g)'])(
    'reads its canonical text %s back to the same species',
    (text) => {
      const formula = parseFormula(text);
      const again = parseFormula(formatFormula(formula));
      expect([speciesKey(again), again.phase]).toEqual([speciesKey(formula), formula.phase]);
    },
  );
});

describe('formulaParts', () => {
  it.each([
    ['SO4^2-', [['text', 'SO'], ['subscript', '4'], ['superscript', '2-']]],
    ['Fe(OH)3(s)', [['text', 'Fe(OH)'], ['subscript', '3'], ['text', '(s)']]],
    ['CaSO4·2H2O', [['text', 'CaSO'], ['subscript', '4'], ['text', '·2H'], ['subscript', '2'], ['text', 'O']]],
    ['e-', [['text', 'e'], ['superscript', '-']]],
  ])('splits %s into runs', (text, expected) => {
    expect(formulaParts(parseFormula(text)).map((part) => [part.kind, part.text])).toEqual(expected);
  });
});
