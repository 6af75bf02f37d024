import { elements } from 'chemical-elements';
import { describe, expect, it } from 'vitest';
import { listElements } from '../elements/atomic-weights';
import { caco3KgPerTonne, molarMass, molarMassExact, molesPerKg, tonnesCo2PerTonne } from './molar-mass';

describe('molarMass', () => {
  // Published cross-checks from shared/reference/check-values.md §1b; tolerance 0.01 g/mol because
  // older tables used slightly different atomic weights (e.g. S 32.065 instead of 32.06).
  it.each([
    ['CaCO3', 100.09, 'scholars.direct mineral table (confirmed); 100.087 Robie & Hemingway 1995, recalled from memory'],
    ['CaMg(CO3)2', 184.4, 'Hindawi J. Thermodyn. 2012 dolomite paper (confirmed)'],
    ['FeCO3', 115.86, 'scholars.direct (confirmed)'],
    ['CaAl2Si2O8', 278.21, 'scholars.direct (confirmed)'],
    ['KAlSi3O8', 278.33, 'UMD microprobe lab worked example, 278.330 (confirmed)'],
    ['Fe2SiO4', 203.78, 'scholars.direct 203.79 (confirmed)'],
    ['Al2Si2O5(OH)4', 258.16, 'scholars.direct (confirmed)'],
    ['Fe2O3', 159.69, 'scholars.direct (confirmed)'],
    ['KAl3Si3O10(OH)2', 398.31, 'scholars.direct (confirmed)'],
    ['SiO2', 60.084, 'Perkins mineralogy exercise 60.0843 with legacy weights (confirmed)'],
    ['Al2O3', 101.961, 'Perkins mineralogy exercise 101.9613 (confirmed)'],
    ['LiAlSi2O6', 186.09, 'Perkins, spodumene (confirmed)'],
    ['NaAlSi3O8', 262.223, 'Robie & Hemingway 1995, recalled from memory'],
    ['Mg2SiO4', 140.693, 'Robie & Hemingway 1995, recalled from memory'],
  ])('%s is %d g/mol (%s)', (formula, published) => {
    expect(Math.abs(molarMass(formula) - published)).toBeLessThanOrEqual(0.01);
  });

  // Computed from the IUPAC 2021 abridged weights (check-values.md §1b, computed): exact to the digit.
  it.each([
    ['CaCO3', '100.086'],
    ['FeS2', '119.965'],
    ['CaSO4·2H2O', '172.164'],
    ['Na0.62Ca0.38Al1.38Si2.62O8', '268.2933'],
    ['Fe(OH)3', '106.866'],
    ['H2O', '18.015'],
  ])('%s is exactly %s g/mol from the abridged weights', (formula, expected) => {
    expect(molarMassExact(formula).toDecimalString()).toBe(expected);
  });

  // chemical-elements is an independent table (mean atomic masses from isotopic abundances,
  // not the abridged IUPAC values). They differ in the third decimal for interval elements
  // (Se: 78.971 vs 78.959; Pb 207.2 vs 207.217), so the tolerance is 0.02 g/mol. Elements
  // without a standard atomic weight (Tc, Pm, Po–Ac) are null there and skipped.
  it.each(listElements().map((element) => [element.symbol, element]))('%s agrees with chemical-elements', (_symbol, element) => {
    const reference = elements.find((entry) => entry.number === element.number);
    expect(reference?.symbol).toBe(element.symbol);
    if (reference?.mass === null || reference?.mass === undefined) {
      expect(element.isMassNumber).toBe(true);
      return;
    }
    expect(Math.abs(reference.mass - element.atomicWeight.toNumber())).toBeLessThanOrEqual(0.02);
  });

  it('lists all 92 elements from H to U', () => {
    expect(listElements().map((element) => element.number)).toEqual(Array.from({ length: 92 }, (_, index) => index + 1));
  });
});

describe('conversions', () => {
  it.each([
    // check-values.md §7 (computed): forsterite bicarbonate path 1.251 t CO2/t, carbonate path 0.626
    ['Mg2SiO4', 4, 1.251],
    ['Mg2SiO4', 2, 0.626],
    ['CaSiO3', 2, 0.758],
  ])('%s takes up %d mol CO2 per mol = %d t CO2/t', (formula, moles, expected) => {
    expect(tonnesCo2PerTonne(formula, moles)).toBeCloseTo(expected, 3);
  });

  it('gives 31.22 kg CaCO3/t for 1 wt% S as pyrite (check-values.md §3a, computed)', () => {
    const protons = (10_000 / 32.06) * 2; // 1 wt% S = 10 kg S/t, 2 H+ per S (4 per FeS2)
    expect(caco3KgPerTonne(protons)).toBeCloseTo(31.22, 2);
  });

  it('gives moles per kg', () => {
    expect(molesPerKg('CaCO3')).toBeCloseTo(9.99141, 5);
  });
});
