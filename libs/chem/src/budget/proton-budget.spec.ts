import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { parseEquation } from '../equation/parse-equation';
import { protonBudget } from './proton-budget';

describe('protonBudget', () => {
  it.each([
    // Itasca report eq. 3.1: "4 moles of acidity per mole pyrite" (confirmed)
    ['FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+', undefined, '4'],
    // R15, Reitner & Thiel 2011 (confirmed): +2
    ['FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+', undefined, '2'],
    // R17 (confirmed): +16
    ['FeS2 + 14 Fe^3+ + 8 H2O -> 15 Fe^2+ + 2 SO4^2- + 16 H+', undefined, '16'],
    // R20, Andrews et al. eq. 5.16 (confirmed): +8 per reaction, 2 per Fe
    ['4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+', 'Fe^2+', '2'],
    // R1, Harrison eq. 3.21 (confirmed): −2 per reaction, −1 per albite
    ['2 NaAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 Na+ + 4 H4SiO4', undefined, '-1'],
    // R21c (computed): −2 per calcite
    ['CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O', undefined, '-2'],
    // OH- counts as −H+
    ['Fe^3+ + 3 OH- -> Fe(OH)3', undefined, '3'],
    // R13b (confirmed): no H+ at all
    ['Mg2SiO4 + 4 CO2 + 4 H2O -> 2 Mg^2+ + 4 HCO3- + H4SiO4', undefined, '0'],
  ])('%s gives %s mol H+ per mol of the reference', (text, reference, perMole) => {
    expect(protonBudget(parseEquation(text), { reference }).perMole.toString()).toBe(perMole);
  });

  it('gives per kg, per tonne of rock and kg CaCO3/t (1 wt% pyrite: 16.7 kg CaCO3/t, check-values.md §3a, computed)', () => {
    const budget = protonBudget(parseEquation('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+'), {
      rockWeightPercent: 1,
    });
    expect(budget.perKg).toBeCloseTo(33.3431, 4);
    expect(budget.perTonneRock).toBeCloseTo(333.431, 3);
    expect(budget.caco3KgPerTonne).toBeCloseTo(16.69, 2);
  });

  it('gives calcite 10 kg CaCO3 eq/t of neutralising capacity per wt% (check-values.md §3b, computed)', () => {
    const budget = protonBudget(parseEquation('CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O'), { rockWeightPercent: 1 });
    expect(budget.caco3KgPerTonne).toBeCloseTo(-10, 6);
  });

  it.each([
    [{ reference: 'CO2' }, 'BUDGET_UNKNOWN_REFERENCE', 0, 3],
    [{ rockWeightPercent: 120 }, 'BUDGET_BAD_AMOUNT', 0, 3],
  ])('refuses %o with %s', (options, code, start, end) => {
    try {
      protonBudget(parseEquation('CaCO3 + 2 H+ -> Ca^2+ + H2CO3'), options);
      throw new Error('expected a ChemError');
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.span] : error).toEqual([code, { start, end }]);
    }
  });
});
