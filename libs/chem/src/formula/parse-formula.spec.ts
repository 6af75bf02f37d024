import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { parseFormula } from './parse-formula';

function composition(text: string): Record<string, string> {
  const formula = parseFormula(text);
  return Object.fromEntries([...formula.composition].map(([symbol, count]) => [symbol, count.toString()]));
}

function errorOf(run: () => unknown): { code: string; span: { start: number; end: number } } {
  try {
    run();
  } catch (error) {
    if (isChemError(error)) return { code: error.code, span: error.span };
    throw error;
  }
  throw new Error('expected a ChemError');
}

describe('parseFormula', () => {
  it.each([
    ['H2O', { H: '2', O: '1' }],
    ['H₂O', { H: '2', O: '1' }],
    ['Al2Si2O5(OH)4', { Al: '2', Si: '2', O: '9', H: '4' }],
    ['KAl2(AlSi3O10)(OH)2', { K: '1', Al: '3', Si: '3', O: '12', H: '2' }],
    ['Ca[Mg(CO3)2]', { Ca: '1', Mg: '1', C: '2', O: '6' }],
    ['CaSO4·2H2O', { Ca: '1', S: '1', O: '6', H: '4' }],
    ['CaSO4*2H2O', { Ca: '1', S: '1', O: '6', H: '4' }],
    ['CaSO4.2H2O', { Ca: '1', S: '1', O: '6', H: '4' }],
    ['CaSO4.0.5H2O', { Ca: '1', S: '1', O: '9/2', H: '1' }],
    ['Fe5HO8.4H2O', { Fe: '5', H: '9', O: '12' }],
    ['Na0.62Ca0.38Al1.38Si2.62O8', { Na: '31/50', Ca: '19/50', Al: '69/50', Si: '131/50', O: '8' }],
    ['Mg1.8Fe0.2SiO4', { Mg: '9/5', Fe: '1/5', Si: '1', O: '4' }],
    ['(Mg0.9,Fe0.1)2SiO4', { Mg: '9/5', Fe: '1/5', Si: '1', O: '4' }],
    ['K0.6Mg0.25Al2.30Si3.5O10(OH)2', { K: '3/5', Mg: '1/4', Al: '23/10', Si: '7/2', O: '12', H: '2' }],
  ])('reads %s', (text, expected) => {
    expect(composition(text)).toEqual(expected);
  });

  it.each([
    ['Ca^2+', '2'],
    ['Ca²⁺', '2'],
    ['Ca+2', '2'],
    ['SO4^2-', '-2'],
    ['SO₄²⁻', '-2'],
    ['HCO3-', '-1'],
    ['NH4+', '1'],
    ['Fe^3+', '3'],
    ['Fe+++', '3'],
    ['H+', '1'],
    ['OH⁻', '-1'],
    ['Hg2^2+', '2'],
    ['e-', '-1'],
    ['CO2(g)', '0'],
  ])('reads the charge of %s as %s', (text, charge) => {
    expect(parseFormula(text).charge.toString()).toBe(charge);
  });

  it.each([
    ['CO2(g)', 'g'],
    ['Ca^2+(aq)', 'aq'],
    ['H2O(l)', 'l'],
    ['CaCO3(s)', 's'],
    ['CaCO3', null],
  ])('reads the phase of %s', (text, phase) => {
    expect(parseFormula(text).phase).toBe(phase);
  });

  it('reads the electron', () => {
    const electron = parseFormula('e-');
    expect([electron.isElectron, electron.composition.size]).toEqual([true, 0]);
  });

  it.each([
    ['', 'FORMULA_EMPTY', 0, 0],
    ['   ', 'FORMULA_EMPTY', 0, 3],
    ['(Mg,Fe)2SiO4', 'FORMULA_MIXED_SITE', 0, 7],
    ['Mg(Mg,Fe)SiO4', 'FORMULA_MIXED_SITE', 2, 9],
    ['(Mg0.9,Fe)2SiO4', 'FORMULA_MIXED_SITE', 0, 10],
    ['Xx2O', 'FORMULA_UNKNOWN_ELEMENT', 0, 2],
    ['CaPu', 'FORMULA_UNKNOWN_ELEMENT', 2, 4],
    ['Al2(SO4', 'FORMULA_UNBALANCED_PAREN', 3, 7],
    ['Al2(SO4]3', 'FORMULA_UNBALANCED_PAREN', 3, 7],
    ['co2', 'FORMULA_UNEXPECTED_TOKEN', 0, 1],
    ['H2O)', 'FORMULA_UNEXPECTED_TOKEN', 3, 4],
    ['()', 'FORMULA_UNEXPECTED_TOKEN', 1, 2],
    ['H0', 'FORMULA_BAD_SUBSCRIPT', 1, 2],
    ['Ca^', 'FORMULA_BAD_CHARGE', 2, 3],
    ['Ca^2', 'FORMULA_BAD_CHARGE', 2, 4],
    ['Ca2+', 'FORMULA_AMBIGUOUS_CHARGE', 0, 4],
    ['Fe3+', 'FORMULA_AMBIGUOUS_CHARGE', 0, 4],
    ['H2O(x)', 'FORMULA_UNKNOWN_PHASE', 3, 6],
    ['H2O·', 'FORMULA_UNEXPECTED_TOKEN', 4, 4],
  ])('refuses %j with %s at %i–%i', (text, code, start, end) => {
    expect(errorOf(() => parseFormula(text))).toEqual({ code, span: { start, end } });
  });
});
