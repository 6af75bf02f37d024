// Sources: the pyrite reactions are Itasca Denver report to Colorado DRMS eq. 3.1 (4 H+ per FeS2) and Reitner & Thiel
// 2011 (to Fe2+); the other systems are textbook statuses (open, impossible) checked by their definition.
import { describe, expect, it } from 'vitest';
import { balanceEquation } from './balance-equation';

function coefficients(text: string, options = {}): [string, string, string | null][] {
  return balanceEquation(text, options).terms.map((term) => [term.formula, term.side, term.coefficient?.toString() ?? null]);
}

describe('balanceEquation', () => {
  it.each([
    ['H2 + O2 -> H2O', 'balanced', 1],
    ['2 H2 + O2 -> 2 H2O', 'balanced', 1],
    ['2 H2 + 2 O2 -> 2 H2O', 'unbalanced', 0],
    ['H2 + O2 -> H2O + H2O2', 'open', 2],
    ['NaCl -> Na+', 'impossible', 0],
    ['H2 + O2 ->', 'invalid', 0],
    ['Fe^2+ -> Fe^3+ + e-', 'balanced', 1],
  ])('%s is %s with freedom %i', (text, status, freedom) => {
    const result = balanceEquation(text);
    expect([result.status, result.freedom]).toEqual([status, freedom]);
  });

  it('keeps written coefficients and solves the rest', () => {
    expect(coefficients('FeS2 + O2 + 7/2 H2O -> Fe(OH)3 + SO4^2- + H+')).toEqual([
      ['FeS2', 'left', '1'],
      ['O2', 'left', '15/4'],
      ['H2O', 'left', '7/2'],
      ['Fe(OH)3', 'right', '1'],
      ['SO4^2-', 'right', '2'],
      ['H+', 'right', '4'],
    ]);
  });

  it('accepts pins that close an open system', () => {
    const result = balanceEquation('H2 + O2 -> H2O + H2O2', { pins: { H2O2: 1, H2O: '2' } });
    expect([result.status, result.equation]).toEqual(['balanced', '3 H2 + 2 O2 -> 2 H2O + H2O2']);
  });

  it('reports what a single pin fixes in an open system', () => {
    const result = balanceEquation('H2 + O2 -> H2O + H2O2 + H2O3', { pins: { H2O: 2 } });
    expect([result.status, result.freedom, result.terms.map((term) => term.coefficient?.toString() ?? null)]).toEqual([
      'open',
      3,
      [null, null, '2', null, null],
    ]);
  });

  it('treats a pin of zero as leaving the species out, not as fixing the scale', () => {
    const result = balanceEquation('H2 + O2 -> H2O + H2O2', { pins: { H2O2: 0 } });
    expect([result.status, result.equation]).toEqual(['balanced', '2 H2 + O2 -> 2 H2O']);
  });

  it('lists the independent balances of an open system', () => {
    expect(balanceEquation('H2 + O2 -> H2O + H2O2').balances).toEqual(['2 H2 + O2 -> 2 H2O', 'H2 + O2 -> H2O2']);
  });

  it('moves a species written on the wrong side, with a warning', () => {
    const result = balanceEquation('CaCO3 + H+ + Ca^2+ -> HCO3-');
    expect([result.equation, result.warnings.map((warning) => [warning.code, warning.species])]).toEqual([
      'CaCO3 + H+ -> Ca^2+ + HCO3-',
      [['BALANCE_SPECIES_MOVED', 'Ca^2+']],
    ]);
  });

  it('reports a species that takes no part', () => {
    const result = balanceEquation('H2O -> H2 + O2 + NaCl');
    expect([result.equation, result.terms[3].coefficient?.toString(), result.warnings[0].code]).toEqual([
      '2 H2O -> 2 H2 + O2',
      '0',
      'BALANCE_SPECIES_UNUSED',
    ]);
  });

  it.each([
    ['NaCl -> Na+', ['Cl', 'charge']],
    ['H2 + NaCl -> H2O', ['Na', 'Cl', 'O']],
    ['CaCO3 + H+ -> Ca^2+ + CO2', ['H']],
    ['Fe2O3 -> FeO', ['Fe', 'O']],
  ])('names what cannot balance in %s', (text, missing) => {
    expect(balanceEquation(text).missing).toEqual(missing);
  });

  it('says when pins conflict', () => {
    const result = balanceEquation('2 H2 + 2 O2 -> H2O');
    expect([result.status, result.warnings[0].code]).toEqual(['impossible', 'BALANCE_PINS_CONFLICT']);
  });

  it('scales an open normalisation target that takes no part with a warning', () => {
    const result = balanceEquation('H2O -> H2 + O2 + NaCl', { normalizeTo: 'NaCl' });
    expect(result.warnings.map((warning) => warning.code)).toContain('BALANCE_NORMALIZE_IGNORED');
  });

  it.each([
    ['H2 + O2 -> H2O', { normalizeTo: 'CO2' }, 'BALANCE_UNKNOWN_SPECIES', 0, 3],
    ['H2 + O2 -> H2O', { pins: { H2: '-1' } }, 'BALANCE_BAD_PIN', 0, 2],
    ['H2 + O2 -> H2O', { pins: { H2: 'x' } }, 'BALANCE_BAD_PIN', 0, 1],
    ['H2 + O2 -> H2O', { normalizeTo: '(Mg,Fe)O' }, 'FORMULA_MIXED_SITE', 0, 7],
    ['H2 + O2 H2O', {}, 'EQUATION_NO_ARROW', 0, 11],
    ['H2 -> O2 -> H2O', {}, 'EQUATION_SEVERAL_ARROWS', 9, 11],
    ['H2 + O2 -> ', {}, 'EQUATION_EMPTY_SIDE', 10, 11],
    ['H2 + + O2 -> H2O', {}, 'EQUATION_EMPTY_TERM', 4, 5],
    ['0 H2 + O2 -> H2O', {}, 'EQUATION_BAD_COEFFICIENT', 0, 1],
    ['H2 + 3/ O2 -> H2O', {}, 'EQUATION_BAD_COEFFICIENT', 5, 7],
    ['H2 + -2 O2 -> H2O', {}, 'EQUATION_BAD_COEFFICIENT', 5, 7],
    ['H2 + O2 -> 2 Hq2O', {}, 'FORMULA_UNKNOWN_ELEMENT', 13, 15],
    ['Mg2SiO4 + H+ -> Mg2+ + H4SiO4', {}, 'FORMULA_AMBIGUOUS_CHARGE', 16, 20],
  ])('gives %j with options %o status invalid with %s at %i–%i', (text, options, code, start, end) => {
    const result = balanceEquation(text, options);
    expect([result.status, result.error?.code, result.error?.span]).toEqual(['invalid', code, { start, end }]);
  });
});
