import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';
import { oxidationStateLookup } from './electron-budget';
import { assignOxidationStates } from './oxidation-states';

function states(text: string, explicit?: Record<string, string>): Record<string, string> {
  const formula = parseFormula(text);
  const given = explicit === undefined ? oxidationStateLookup()(formula) : new Map(Object.entries(explicit).map(([k, v]) => [k, Rational.parse(v)]));
  return Object.fromEntries([...assignOxidationStates(formula, given)].map(([symbol, state]) => [symbol, state.toString()]));
}

describe('assignOxidationStates', () => {
  it.each([
    ['H2O', { H: '1', O: '-2' }],
    ['O2', { O: '0' }],
    ['Fe^3+', { Fe: '3' }],
    ['SO4^2-', { O: '-2', S: '6' }],
    ['HCO3-', { H: '1', O: '-2', C: '4' }],
    ['NH4+', { H: '1', N: '-3' }],
    ['Fe3O4', { O: '-2', Fe: '8/3' }],
    ['FeOOH', { H: '1', O: '-2', Fe: '3' }],
    ['KFe3AlSi3O10(OH)2', { K: '1', Al: '3', Si: '4', H: '1', O: '-2', Fe: '2' }],
    ['Mg1.8Fe0.2SiO4', { Mg: '2', Si: '4', O: '-2', Fe: '2' }],
    ['H2O2', { H: '1', O: '-1' }],
    ['NaH', { Na: '1', H: '-1' }],
    ['FeS2', { Fe: '2', S: '-1' }],
    ['CuFeS2', { Cu: '1', Fe: '3', S: '-2' }],
    ['FeAsS', { Fe: '2', As: '-1', S: '-1' }],
    ['Fe7S8', { S: '-2', Fe: '16/7' }],
    ['ZnS', { S: '-2', Zn: '2' }],
    ['S2O3^2-', { O: '-2', S: '2' }],
    ['Fe5HO8·4H2O', { H: '1', O: '-2', Fe: '3' }],
  ])('assigns %s', (text, expected) => {
    expect(states(text)).toEqual(expected);
  });

  it('takes explicit states first', () => {
    expect(states('FeS2', { Fe: '2', S: '-1' })).toEqual({ Fe: '2', S: '-1' });
  });

  it.each([
    ['FeMnO3', 'OXIDATION_UNDETERMINED'],
    ['MnFe2O4', 'OXIDATION_UNDETERMINED'],
    ['Cu2FeSnS4', 'OXIDATION_UNDETERMINED'],
  ])('refuses %s with %s', (text, code) => {
    try {
      assignOxidationStates(parseFormula(text), undefined, { start: 3, end: 9 });
      throw new Error('expected a ChemError');
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.span] : error).toEqual([code, { start: 3, end: 9 }]);
    }
  });

  it('refuses explicit states that do not add up to the charge', () => {
    const given = new Map([['Fe', Rational.of(3)], ['S', Rational.of(-1)]]);
    try {
      assignOxidationStates(parseFormula('FeS2'), given);
      throw new Error('expected a ChemError');
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.span] : error).toEqual(['OXIDATION_BAD_STATE', { start: 0, end: 4 }]);
    }
  });
});

describe('oxidationStateLookup', () => {
  it('builds the lookup of one map object once, and reads a different formula of the same species', () => {
    const map = { Fe3O4: { Fe: '8/3', O: -2 } };
    const lookup = oxidationStateLookup(map);
    expect(oxidationStateLookup(map)).toBe(lookup);
    expect(oxidationStateLookup({ ...map })).not.toBe(lookup);
    expect(lookup(parseFormula('O4Fe3'))?.get('Fe')?.toString()).toBe('8/3');
    expect(lookup(parseFormula('FeS2'))?.get('S')?.toString()).toBe('-1');
  });
});
