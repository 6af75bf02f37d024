import { describe, expect, it } from 'vitest';
import { isChemError } from '../errors/chem-error';
import { mineralCo2Uptake, oxideCo2Potential, rockCo2Uptake } from './co2-uptake';

describe('mineralCo2Uptake (check-values §7, computed from IUPAC 2021 weights)', () => {
  it.each([
    ['Mg2SiO4', (4 * 44.009) / 140.691, (2 * 44.009) / 140.691, '4', '2'], // forsterite 1.2512 / 0.6256
    ['CaSiO3', (2 * 44.009) / 116.16, 44.009 / 116.16, '2', '1'], // wollastonite 0.7577 / 0.3789
    ['Mg3Si2O5(OH)4', 0.953, 0.476, '6', '3'], // serpentine
    ['CaCO3', 44.009 / 100.086, 0, '1', '0'], // aglime: one CO2 from the air
    ['NaAlSi3O8', 44.009 / 262.219, 22.0045 / 262.219, '1', '1/2'],
  ])('%s: bicarbonate %d t/t, carbonate %d t/t', (formula, bicarbonate, carbonate, molBicarbonate, molCarbonate) => {
    const result = mineralCo2Uptake(formula);
    expect([result.bicarbonate, result.carbonate]).toEqual([expect.closeTo(bicarbonate, 3), expect.closeTo(carbonate, 3)]);
    expect([result.molCo2PerMole.bicarbonate.toString(), result.molCo2PerMole.carbonate.toString()]).toEqual([molBicarbonate, molCarbonate]);
  });

  it('counts only Mg in Fo92 olivine (Fe oxidises): 1.111 t/t (check-values §7)', () => {
    const result = mineralCo2Uptake('(Mg0.92Fe0.08)2SiO4');
    expect(result.bicarbonate).toBeCloseTo(1.111, 3);
    expect(result.cautions.length).toBe(2);
  });

  it('sums a rock from its modes', () => {
    expect(rockCo2Uptake({ Mg2SiO4: 50, SiO2: 50 }).bicarbonate).toBeCloseTo((0.5 * 4 * 44.009) / 140.691, 10);
  });
});

describe('oxideCo2Potential (Steinour-type formula after Renforth 2019, recalled from memory)', () => {
  it.each([
    [{ CaO: 10 }, 78.48, 156.96],
    // check-values §7 worked test rock: Ca + Mg 165.8 kg/t, with Na and K 191.8 kg/t.
    [{ CaO: 10, MgO: 8 }, 165.8, 331.67],
    [{ CaO: 10, MgO: 8, Na2O: 3, K2O: 1 }, 191.8, 383.6],
    // 10 wt% CaO, 4.4009 wt% CO2 (0.1 mol carbonate per 100 g): 0.0783 mol left in the carbonate form.
    [{ CaO: 10, CO2: 4.4009 }, 34.47, 112.95],
  ])('%o gives %d kg/t (carbonate) and %d kg/t (bicarbonate)', (oxides, carbonate, bicarbonate) => {
    const result = oxideCo2Potential(oxides);
    expect(result.carbonateKgPerTonne).toBeCloseTo(carbonate, 1);
    expect(result.bicarbonateKgPerTonne).toBeCloseTo(bicarbonate, 1);
  });

  it('refuses a bad weight percent with CO2_BAD_INPUT', () => {
    try {
      oxideCo2Potential({ CaO: -1 });
      expect.unreachable();
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.details.field] : error).toEqual(['CO2_BAD_INPUT', 'oxides.CaO']);
    }
  });
});
