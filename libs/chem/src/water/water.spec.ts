import { unit } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { chargeBalance, type WaterAnalysis } from './charge-balance';
import { molarMassExact } from '../convert/molar-mass';
import { parseConcentration, toMilliequivalentsPerLitre, toMillimolesPerLitre } from './concentration';
import { findSolute, requireSolute } from './solutes';

function codeOf(action: () => unknown): [string, unknown, unknown] {
  try {
    action();
  } catch (error) {
    if (isChemError(error)) return [error.code, error.span, error.details.field];
    throw error;
  }
  return ['none', null, null];
}

describe('parseConcentration', () => {
  it.each([
    ['<0.01', { value: 0.01, belowDetection: true, detectionLimit: 0.01 }],
    ['< 5', { value: 5, belowDetection: true, detectionLimit: 5 }],
    ['12.5', { value: 12.5, belowDetection: false, detectionLimit: null }],
    [0, { value: 0, belowDetection: false, detectionLimit: null }],
    ['.5', { value: 0.5, belowDetection: false, detectionLimit: null }],
  ])('reads %o', (input, expected) => {
    expect(parseConcentration(input)).toEqual(expected);
  });

  it.each([['-1'], ['abc'], ['<'], [''], [-2], [Number.NaN]])('refuses %o with WATER_BAD_VALUE', (input) => {
    expect(codeOf(() => parseConcentration(input, 'solutes.Ca.value'))[0]).toBe('WATER_BAD_VALUE');
  });
});

describe('unit conversions against the IUPAC 2021 abridged molar masses (computed)', () => {
  it.each([
    ['Ca', 40.078, 'mg/L', 1, 2],
    ['SO4', 96.056, 'mg/L', 1, 2],
    ['HCO3', 61.016, 'mg/L', 1, 1],
    ['alkalinity', 100.086, 'mg/L as CaCO3', 2, 2],
    ['alkalinity', 61.016, 'mg/L as HCO3', 1, 1],
    ['alkalinity', 2, 'meq/L', 2, 2],
    ['SiO2', 60.083, 'mg/L', 1, 0],
    ['Si', 28.085, 'mg/L', 1, 0],
    ['DIC', 12.011, 'mg/L', 1, 0],
    ['Na', 250, 'µmol/L', 0.25, 0.25],
    ['Fe', 55.845, 'µg/L', 0.001, 0.002],
    ['Mn', 54.938, 'ug/L', 0.001, 0.002],
    ['Mg', 3, 'meq/L', 1.5, 3],
    ['Al', 26.982, 'mg/L', 1, 3],
  ])('%s %d %s is %d mmol/L and %d meq/L', (key, value, unit, mmol, meq) => {
    const solute = requireSolute(key, key);
    expect(toMillimolesPerLitre(solute, value, unit)).toBeCloseTo(mmol, 12);
    expect(toMilliequivalentsPerLitre(solute, value, unit)).toBeCloseTo(meq, 12);
  });

  it.each([
    ['Fe', 55.845, 'µg/L', 'ug / L'],
    ['Ca', 40.078, 'mg/L', 'mg / L'],
    ['Na', 250, 'µmol/L', 'umol / L'],
    ['Zn', 7.5, 'ug/L', 'ug / L'],
  ])('%s %d %s: the plain unit arithmetic agrees with mathjs 15 unit system (a general-purpose reference library)', (key, value, tallusUnit, mathjsUnit) => {
    const solute = requireSolute(key, key);
    const molarMass = unit(molarMassExact(solute.formula).toNumber(), 'g / mol');
    const given = unit(value, mathjsUnit);
    // mathjs divides a mass concentration by the molar mass; an amount concentration is converted as it is.
    const reference = given.equalBase(unit('mg / L')) ? given.divide(molarMass) : given;
    if (typeof reference === 'number') throw new Error('mathjs lost the unit');
    expect(toMillimolesPerLitre(solute, value, tallusUnit)).toBeCloseTo(reference.toNumber('mmol / L'), 12);
  });

  it('uses 50.043 mg CaCO3 per meq (M(CaCO3)/2, Standard Methods 2320)', () => {
    expect(toMilliequivalentsPerLitre(findSolute('alkalinity')!, 50.043, 'mg/L as CaCO3')).toBeCloseTo(1, 12);
  });

  it.each([
    ['SiO2', 'meq/L'],
    ['Ca', 'mg/L as CaCO3'],
    ['Ca', 'ppm'],
  ])('refuses %s in %s with WATER_BAD_UNIT', (key, unit) => {
    expect(codeOf(() => toMillimolesPerLitre(requireSolute(key, key), 1, unit, `solutes.${key}.unit`))).toEqual([
      'WATER_BAD_UNIT',
      { start: 0, end: unit.length },
      `solutes.${key}.unit`,
    ]);
  });

  it('refuses an unknown solute with WATER_UNKNOWN_SOLUTE naming the field', () => {
    expect(codeOf(() => requireSolute('Cax', 'solutes.Cax'))).toEqual(['WATER_UNKNOWN_SOLUTE', { start: 0, end: 3 }, 'solutes.Cax']);
  });
});

function mmol(values: Record<string, number | string>): WaterAnalysis {
  return { solutes: Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: 'mmol/L' }])) };
}

// chim.lu exercise (check-values.md §4, inputs confirmed; sums computed): Σ+ 1.498, Σ− 1.464 meq/L.
const CHIM_LU = mmol({ Ca: 0.259, Mg: 0.25, Na: 0.34, K: 0.14, Cl: 0.21, NO3: 0.064, SO4: 0.07, HCO3: 1.05 });

describe('chargeBalance', () => {
  it('reproduces the chim.lu worked example: CBE +1.15 % (standard), +2.30 % (half-sum)', () => {
    const standard = chargeBalance(CHIM_LU);
    const halfSum = chargeBalance(CHIM_LU, { convention: 'half-sum' });
    expect([standard.cationsMeq, standard.anionsMeq, standard.flagged, standard.threshold]).toEqual([
      expect.closeTo(1.498, 12),
      expect.closeTo(1.464, 12),
      false,
      5,
    ]);
    expect(standard.cbePercent).toBeCloseTo((0.034 / 2.962) * 100, 10);
    expect(halfSum.cbePercent).toBeCloseTo((0.034 / 1.481) * 100, 10);
    expect(halfSum.threshold).toBe(5); // DVWK: both sums ≤ 2 meq/L
  });

  it('balances mean seawater within 0.5 % (major ions in mg/kg used as mg/L; composition recalled from memory, Millero et al. 2008 reference seawater, S = 35)', () => {
    const units = (values: Record<string, number>): WaterAnalysis => ({
      solutes: Object.fromEntries(Object.entries(values).map(([key, value]) => [key, { value, unit: 'mg/L' }])),
    });
    const seawater = units({ Na: 10781, Mg: 1284, Ca: 412, K: 399, Sr: 7.9, Cl: 19353, SO4: 2712, HCO3: 142, Br: 67, F: 1.3 });
    const result = chargeBalance(seawater);
    expect(Math.abs(result.cbePercent ?? 99)).toBeLessThan(0.5);
    expect(result.cationsMeq).toBeGreaterThan(600);
  });

  it('flags a synthetic exact 5.26 % imbalance (Na 1, Cl 0.9 mmol/L: 0.1/1.9)', () => {
    const result = chargeBalance(mmol({ Na: 1, Cl: 0.9 }));
    expect([result.cbePercent, result.flagged]).toEqual([expect.closeTo(100 / 19, 12), true]);
  });

  it('adds H+ from pH below 4.5 and notes low pH', () => {
    const result = chargeBalance({ ...mmol({ Na: 1, SO4: 1, Fe: 0.45 }), pH: 3 });
    expect(result.protonsMeq).toBeCloseTo(1, 12);
    expect(result.cationsMeq).toBeCloseTo(2.9, 12);
    expect(result.notes.map((note) => note.code)).toEqual(['LOW_PH']);
    expect(chargeBalance({ ...mmol({ Na: 1 }), pH: 3 }, { protons: 'never' }).protonsMeq).toBe(0);
    expect(chargeBalance({ ...mmol({ Na: 1 }), pH: 7 }).protonsMeq).toBe(0);
  });

  it('notes dilute waters and values below detection, counting them 0 and keeping SiO2 out', () => {
    const result = chargeBalance(mmol({ Na: 0.2, Cl: 0.2, K: '<0.01', SiO2: 0.3 }));
    expect([result.cbePercent, result.contributions]).toEqual([0, { Na: 0.2, Cl: -0.2, K: 0 }]);
    expect(result.notes.map((note) => note.code)).toEqual(['DILUTE', 'BELOW_DETECTION']);
  });

  it('uses the DVWK 2 % threshold for half-sum when the sums exceed 2 meq/L', () => {
    const result = chargeBalance(mmol({ Na: 3.06, Cl: 3 }), { convention: 'half-sum' });
    expect([result.threshold, result.flagged]).toEqual([2, false]);
    expect(chargeBalance(mmol({ Na: 3.1, Cl: 3 }), { convention: 'half-sum' }).flagged).toBe(true);
  });

  it.each([
    [{ solutes: { HCO3: { value: 1, unit: 'mmol/L' }, alkalinity: { value: 1, unit: 'meq/L' } } }, 'WATER_DUPLICATE_SOLUTE', 'solutes.alkalinity'],
    [{ solutes: { Ca: { value: 'x', unit: 'mg/L' } } }, 'WATER_BAD_VALUE', 'solutes.Ca.value'],
    [{ solutes: { Ca: { value: 1, unit: 'ppm' } } }, 'WATER_BAD_UNIT', 'solutes.Ca.unit'],
    [{ solutes: { Qq: { value: 1, unit: 'mg/L' } } }, 'WATER_UNKNOWN_SOLUTE', 'solutes.Qq'],
  ])('refuses %o with %s', (analysis, code, field) => {
    const [actual, , actualField] = codeOf(() => chargeBalance(analysis));
    expect([actual, actualField]).toEqual([code, field]);
  });
});
