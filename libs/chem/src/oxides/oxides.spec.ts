import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { formulaText, oxideWeightPercents, plagioclaseWeatheringEquation, weatheringEquation } from './formula-text';
import { FEO_TO_FE2O3 } from './oxide-table';
import { recalculateFormula, type OxideAnalysis } from './recalculate-formula';

describe('recalculateFormula against published worked examples', () => {
  it('olivine on 4 O (Colgate course page, check-values §6): (Mg1.14Fe0.87Mn0.01)Si0.99O4', () => {
    const result = recalculateFormula({ oxides: { SiO2: 34.96, FeO: 36.77, MnO: 0.52, MgO: 27.04 }, group: 'olivine' });
    expect(result.apfu).toEqual({ Si: expect.closeTo(0.989, 3), Fe: expect.closeTo(0.87, 3), Mn: expect.closeTo(0.012, 3), Mg: expect.closeTo(1.14, 3) });
    expect(result.total).toBeCloseTo(3.011, 3);
  });

  it('garnet on 12 O (Perkins exercise, check-values §6): Fe1.5Mg1.5Al2Si3O12', () => {
    const result = recalculateFormula({ oxides: { FeO: 23.9253, MgO: 13.4217, Al2O3: 22.6359, SiO2: 40.017 }, group: 'garnet' });
    expect(result.apfu).toEqual({ Fe: expect.closeTo(1.5, 3), Mg: expect.closeTo(1.5, 3), Al: expect.closeTo(2, 3), Si: expect.closeTo(3, 3) });
    expect(formulaText(result.apfu, { oxygens: 12, decimals: 2 })).toBe('Mg1.5Fe1.5Al2Si3O12');
  });
});

describe('recalculateFormula round trips of ideal formulas (computed)', () => {
  it.each([
    ['An38 plagioclase', 'Na0.62Ca0.38Al1.38Si2.62O8', 'feldspar', { Na: 0.62, Ca: 0.38, Al: 1.38, Si: 2.62 }],
    ['Fo90 olivine', 'Mg1.8Fe0.2SiO4', 'olivine', { Mg: 1.8, Fe: 0.2, Si: 1 }],
    ['diopside', 'CaMgSi2O6', 'pyroxene', { Ca: 1, Mg: 1, Si: 2 }],
    ['microcline', 'KAlSi3O8', 'feldspar', { K: 1, Al: 1, Si: 3 }],
  ])('%s %s recovers its apfu to 1e-9', (_name, formula, group, apfu) => {
    const result = recalculateFormula({ oxides: oxideWeightPercents(formula), group });
    for (const [element, value] of Object.entries(apfu)) expect(result.apfu[element]).toBeCloseTo(value, 9);
  });

  it('gives An, Fo and the Mg number', () => {
    expect(recalculateFormula({ oxides: oxideWeightPercents('Na0.62Ca0.38Al1.38Si2.62O8'), group: 'feldspar' }).endMembers?.An).toBeCloseTo(0.38, 12);
    const olivine = recalculateFormula({ oxides: oxideWeightPercents('Mg1.8Fe0.2SiO4'), group: 'olivine' }).endMembers;
    expect([olivine?.Fo, olivine?.mgNumber]).toEqual([expect.closeTo(0.9, 12), expect.closeTo(0.9, 12)]);
  });

  it.each([
    // Droop (1987) check from check-values §6: magnetite as FeO gives Fe3+ 2, Fe2+ 1 on 4 O, T = 3.
    ['magnetite Fe3O4 from FeOT', { FeOT: 100 }, 'spinel', 2, 1],
    ['magnetite Fe3O4 from Fe2O3T', { Fe2O3T: 100 }, 'spinel', 2, 1],
    ['aegirine NaFe3+Si2O6 from FeOT', 'NaFeSi2O6:1', 'pyroxene', 1, 0],
    ['andradite Ca3Fe3+2Si3O12 from FeOT', 'Ca3Fe2Si3O12:2', 'garnet', 2, 0],
    ['Fe3+-free hedenbergite: no excess', 'CaFeSi2O6:0', 'pyroxene', 0, 1],
  ])('Droop: %s gives Fe3+ %d and Fe2+ %d', (_name, source, group, ferric, ferrous) => {
    let oxides: Record<string, number>;
    if (typeof source === 'string') {
      const [formula, fe3] = source.split(':');
      const ideal = oxideWeightPercents(formula, { ferric: Number(fe3) });
      const { Fe2O3 = 0, FeO = 0, ...rest } = ideal;
      oxides = { ...rest, FeOT: FeO + Fe2O3 / FEO_TO_FE2O3 };
    } else oxides = source;
    const result = recalculateFormula({ oxides, group, ferric: 'droop' });
    expect([result.ferricIron?.ferric, result.ferricIron?.ferrous]).toEqual([expect.closeTo(ferric, 9), expect.closeTo(ferrous, 9)]);
  });

  it.each([
    [{ oxides: { FeOT: 30, SiO2: 40, Al2O3: 15, K2O: 10, MgO: 5 }, group: 'mica', ferric: 'droop', cations: 16 }, 'DROOP_NOT_APPLICABLE'],
    [{ oxides: { FeOT: 29.5, MgO: 30, SiO2: 40 }, oxygens: 4, ferric: 'droop', cations: 3 }, 'DROOP_NO_EXCESS'],
    [{ oxides: { SiO2: 50 }, oxygens: 2 }, 'TOTAL_OUT_OF_RANGE'],
  ] as [OxideAnalysis, string][])('warns %#: %s', (analysis, code) => {
    expect(recalculateFormula(analysis).warnings.map((warning) => warning.code)).toContain(code);
  });

  it.each([
    [{ oxides: { XO: 1 }, oxygens: 4 }, 'OXIDES_UNKNOWN_OXIDE', 'oxides.XO'],
    [{ oxides: { SiO2: -1 }, oxygens: 4 }, 'OXIDES_BAD_VALUE', 'oxides.SiO2'],
    [{ oxides: { FeOT: 10, FeO: 5 }, oxygens: 4 }, 'OXIDES_BAD_VALUE', 'oxides.FeOT'],
    [{ oxides: { SiO2: 40 } }, 'OXIDES_BAD_BASIS', 'oxygens'],
    [{ oxides: { SiO2: 40 }, oxygens: 4, ferric: 'droop' }, 'OXIDES_BAD_BASIS', 'cations'],
    [{ oxides: { SiO2: 40 }, group: 'clay' }, 'OXIDES_UNKNOWN_GROUP', 'group'],
  ] as [OxideAnalysis, string, string][])('refuses %o with %s', (analysis, code, field) => {
    try {
      recalculateFormula(analysis);
      expect.unreachable();
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.details.field] : error).toEqual([code, field]);
    }
  });
});

describe('weathering equations of recalculated formulas', () => {
  it('balances An38 plagioclase to kaolinite as R6b (check-values §2, computed)', () => {
    const result = plagioclaseWeatheringEquation('0.38');
    expect([result.status, result.equation]).toEqual([
      'balanced',
      'Na0.62Ca0.38Al1.38Si2.62O8 + 69/50 H+ + 317/100 H2O -> 69/100 Al2Si2O5(OH)4 + 31/50 Na+ + 19/50 Ca^2+ + 31/25 H4SiO4',
    ]);
  });

  it.each([
    ['1', 'CaAl2Si2O8 + 2 H+ + H2O -> Al2Si2O5(OH)4 + Ca^2+'],
    ['0', 'NaAlSi3O8 + H+ + 9/2 H2O -> 1/2 Al2Si2O5(OH)4 + Na+ + 2 H4SiO4'],
  ])('An %s gives the end-member reaction (R5, R1)', (anorthite, equation) => {
    expect(plagioclaseWeatheringEquation(anorthite).equation).toBe(equation);
  });

  it('oxidises the iron of Fo90 olivine to goethite with O2', () => {
    expect(weatheringEquation('Mg1.8Fe0.2SiO4').equation).toBe('Mg1.8Fe0.2SiO4 + 18/5 H+ + 3/10 H2O + 1/20 O2 -> 1/5 FeOOH + 9/5 Mg^2+ + H4SiO4');
  });
});
