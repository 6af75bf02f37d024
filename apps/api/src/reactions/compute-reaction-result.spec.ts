import { describe, expect, it } from 'vitest';
import { computeReactionResult } from './compute-reaction-result';

const compute = (equation: string, reference: string | null = null) => computeReactionResult({ equation, reference, oxidationStates: {} });

describe('computeReactionResult', () => {
  it('When pyrite oxidation to Fe(OH)3 is written without coefficients, then it is balanced per mole of FeS2 with 4 H+ (Itasca Denver report to Colorado DRMS, eq. 3.1)', () => {
    const result = compute('FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+');

    expect(result).toMatchObject({ status: 'balanced', mode: 'balance', freedom: 1, error: null });
    expect(result.balancedEquation).toBe('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
    expect(result.protonBudget?.perMole).toBe('4');
    expect(result.electrons?.o2Demand).toBe('15/4');
  });

  it('When pyrite oxidation to Fe2+ is written with coefficients, then it is checked as written: +2 H+, S gives up 14 e- (Reitner & Thiel 2011, Encyclopedia of Geobiology)', () => {
    const result = compute('FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+');

    expect(result).toMatchObject({ status: 'balanced', mode: 'check', missing: [] });
    expect(result.residuals).toMatchObject({ Fe: '0', S: '0', O: '0', H: '0', charge: '0' });
    expect(result.electrons?.byElement).toMatchObject({ S: '14' });
    expect(result.protonBudget?.perMole).toBe('2');
  });

  it('When albite to kaolinite is checked with its reference albite, then 1 H+ is used per mole of albite (Harrison (ed.) 2007, eq. 3.21)', () => {
    const result = compute('2 NaAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 Na+ + 4 H4SiO4', 'NaAlSi3O8');

    expect(result.status).toBe('balanced');
    expect(result.protonBudget).toMatchObject({ reference: 'NaAlSi3O8', perMole: '-1' });
  });

  it('When coefficients are written and do not balance, then the status is unbalanced and the rows off are named', () => {
    const result = compute('CaCO3 + 1 H+ -> 1 Ca^2+ + 1 CO2 + 1 H2O');

    expect(result.status).toBe('unbalanced');
    expect(result.missing.sort()).toEqual(['H', 'charge']);
  });

  it.each([
    ['FeS2 + O2 -> Fe^2+ + SO4^2- + H+ + Fe^3+ + H2O', 'open'],
    ['NaCl -> KCl', 'impossible'],
  ])('When %s is balanced, then the status is %s', (equation, status) => {
    expect(compute(equation).status).toBe(status);
  });

  it('When the text does not parse, then the status is invalid with the code, span and field, and nothing throws', () => {
    const result = compute('CaCO3 + H+ -> Ca^2+ + Xx');

    expect(result.status).toBe('invalid');
    expect(result.error).toMatchObject({ code: 'FORMULA_UNKNOWN_ELEMENT', field: 'equation', span: { start: 22, end: 24 } });
  });

  it('When the reference is not in the equation, then the status is invalid at the reference', () => {
    const result = compute('CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O', 'FeS2');

    expect(result.status).toBe('invalid');
    expect(result.error).toMatchObject({ code: 'BUDGET_UNKNOWN_REFERENCE', field: 'reference' });
  });
});
