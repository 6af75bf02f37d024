import { describe, expect, it } from 'vitest';
import { combineReactions } from './combine-reactions';

const PYRITE_TO_FE2 = 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+';
const FE2_TO_FE_OH_3 = '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+';
const CALCITE = 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O';

describe('combineReactions', () => {
  it('cancels Fe2+ between R15 and R20 to give R16 (Itasca eq. 3.1)', () => {
    const result = combineReactions({ reactions: [{ equation: PYRITE_TO_FE2 }, { equation: FE2_TO_FE_OH_3 }], cancel: ['Fe^2+'] });
    expect([result.status, result.multipliers.map(String), result.equation]).toEqual([
      'combined',
      ['1', '1/4'],
      'FeS2 + 15/4 O2 + 7/2 H2O -> 2 SO4^2- + 4 H+ + Fe(OH)3',
    ]);
  });

  it('neutralises pyrite acid with calcite to give R26 (computed)', () => {
    const result = combineReactions({
      reactions: [{ equation: PYRITE_TO_FE2 }, { equation: FE2_TO_FE_OH_3 }, { equation: CALCITE }],
      cancel: ['Fe2+'.replace('2+', '^2+'), 'H+'],
    });
    expect([result.status, result.multipliers.map(String), result.equation]).toEqual([
      'combined',
      ['1', '1/4', '2'],
      'FeS2 + 15/4 O2 + 3/2 H2O + 2 CaCO3 -> 2 SO4^2- + Fe(OH)3 + 2 Ca^2+ + 2 CO2',
    ]);
  });

  it('says when several combinations cancel the species', () => {
    const result = combineReactions({
      reactions: [{ equation: PYRITE_TO_FE2, multiplier: 1 }, { equation: FE2_TO_FE_OH_3 }, { equation: '2 H+ -> H2' }],
      cancel: ['Na+'.replace('Na+', 'O2')],
    });
    expect([result.status, result.freedom]).toEqual(['several', 2]);
  });

  it('says when no combination cancels the species', () => {
    const result = combineReactions({ reactions: [{ equation: PYRITE_TO_FE2 }, { equation: CALCITE }], cancel: ['SO4^2-'] });
    expect(result.status).toBe('none');
  });

  it.each([
    [{ reactions: [], cancel: [] }, 'COMBINE_NO_REACTIONS', 0, 0],
    [{ reactions: [{ equation: PYRITE_TO_FE2 }], cancel: ['NaCl'] }, 'COMBINE_UNKNOWN_SPECIES', 0, 4],
    [{ reactions: [{ equation: PYRITE_TO_FE2, multiplier: 'x' }], cancel: ['H+'] }, 'COMBINE_BAD_MULTIPLIER', 0, 1],
    [{ reactions: [{ equation: 'FeS2 ->' }], cancel: ['H+'] }, 'EQUATION_EMPTY_SIDE', 7, 7],
  ])('gives invalid for %o with %s', (input, code, start, end) => {
    const result = combineReactions(input);
    expect([result.status, result.error?.code, result.error?.span]).toEqual(['invalid', code, { start, end }]);
  });

  it('keeps CO2(g) and CO2(aq) apart only when both are tagged', () => {
    const result = combineReactions({
      reactions: [{ equation: 'CO2(g) -> CO2(aq)' }, { equation: 'CO2(aq) + H2O -> H+ + HCO3-' }],
      cancel: ['CO2(aq)'],
    });
    expect([result.status, result.equation]).toEqual(['combined', 'CO2(g) + H2O -> H+ + HCO3-']);
  });
});
