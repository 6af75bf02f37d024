import { describe, expect, it } from 'vitest';
import { checkEquation } from './check-equation';

function residuals(text: string): Record<string, string> {
  return Object.fromEntries([...checkEquation(text).residuals].map(([label, value]) => [label, value.toString()]));
}

describe('checkEquation', () => {
  it('finds the published R16 balanced (Itasca eq. 3.1, confirmed)', () => {
    const result = checkEquation('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    expect(result.status).toBe('balanced');
    expect(Object.fromEntries([...(result.electrons?.byElement ?? [])].map(([k, v]) => [k, v.toString()]))).toEqual({
      Fe: '1',
      S: '14',
      O: '-15',
    });
    expect([result.electrons?.transferred.toString(), result.electrons?.o2Demand.toString()]).toEqual(['15', '15/4']);
  });

  // Negative cases seen in public web text (check-values.md §2, confirmed; imbalance computed)
  it.each([
    ['2 KAlSi3O8 + 2 H2O -> Al2Si2O5(OH)4 + 4 SiO2 + 2 K+', { K: '0', Al: '0', Si: '0', O: '1', H: '0', charge: '-2' }],
    ['KAlSi3O8 + 2 H2CO3 -> Al2Si2O5(OH)4 + K+ + 2 HCO3-', { K: '0', Al: '-1', Si: '1', O: '-1', H: '-2', C: '0', charge: '1' }],
  ])('flags %s as unbalanced', (text, expected) => {
    expect(checkEquation(text).status).toBe('unbalanced');
    expect(residuals(text)).toEqual(expected);
  });

  it('gives the electron budget of pyrite oxidation by ferric iron (R17)', () => {
    const result = checkEquation('FeS2 + 14 Fe^3+ + 8 H2O -> 15 Fe^2+ + 2 SO4^2- + 16 H+');
    expect(Object.fromEntries([...(result.electrons?.byElement ?? [])].map(([k, v]) => [k, v.toString()]))).toEqual({
      Fe: '-14',
      S: '14',
    });
  });

  it('uses explicit oxidation states from the options', () => {
    const result = checkEquation('3 Fe2SiO4 + O2 -> 2 Fe3O4 + 3 SiO2', { oxidationStates: { Fe3O4: { Fe: '8/3', O: -2 } } });
    expect(result.electrons?.byElement.get('Fe')?.toString()).toBe('4');
  });

  it.each([['abc'], ['1e-7'], [1e-7]])('warns OXIDATION_BAD_STATE, not a plain Error, for the explicit state %j', (state) => {
    const equation = 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+';
    const result = checkEquation(equation, { oxidationStates: { FeS2: { Fe: state } } });
    expect([result.status, result.electrons, result.warnings[0].code, result.warnings[0].span]).toEqual([
      'balanced',
      null,
      'OXIDATION_BAD_STATE',
      { start: 0, end: String(state).length },
    ]);
  });

  it('warns when an oxidation state cannot be decided, and still checks the balance', () => {
    const result = checkEquation('MnFe2O4 + 8 H+ -> Mn^2+ + 2 Fe^3+ + 4 H2O');
    expect([result.status, result.electrons, result.warnings[0].code, result.warnings[0].span]).toEqual([
      'balanced',
      null,
      'OXIDATION_UNDETERMINED',
      { start: 0, end: 7 },
    ]);
  });

  it.each([
    ['FeS2 -> O2 = Fe', 'EQUATION_SEVERAL_ARROWS', 11, 12],
    ['FeS2 + (Fe,Mg)S2 -> Fe', 'FORMULA_MIXED_SITE', 7, 14],
  ])('gives %j status invalid with %s', (text, code, start, end) => {
    const result = checkEquation(text);
    expect([result.status, result.error?.code, result.error?.span]).toEqual(['invalid', code, { start, end }]);
  });
});
