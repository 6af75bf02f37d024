import { describe, expect, it } from 'vitest';
import { molarMass } from '../convert/molar-mass';
import { isChemError } from '../errors/chem-error';
import { acidBaseAccounting, type AbaInput } from './acid-base-accounting';
import { mineralAcidBase, mineralFactor } from './mineral-acid-base';

describe('acidBaseAccounting', () => {
  it.each([
    [1, 20, 31.25, 20 - 31.25, 0.64, 'potentially-acid-generating'],
    [1, 62.5, 31.25, 31.25, 2, 'uncertain'],
    [0.5, 100, 15.625, 84.375, 6.4, 'non-acid-generating'],
    [0, 5, 0, 5, null, 'non-acid-generating'],
  ])('S %d %%, NP %d: AP %d, NNP %d, NPR %s, %s', (sulfur, np, ap, nnp, npr, classification) => {
    const result = acidBaseAccounting({ sulfideSulfurPercent: sulfur, neutralisationPotential: np });
    expect([result.acidPotential, result.netNeutralisationPotential, result.neutralisationPotentialRatio, result.classification]).toEqual([
      ap,
      nnp,
      npr === null ? null : expect.closeTo(npr, 12),
      classification,
    ]);
  });

  it('warns when AP comes from total sulfur, and when AP is 0', () => {
    expect(acidBaseAccounting({ totalSulfurPercent: 1, neutralisationPotential: 1 }).notes.map((note) => note.code)).toEqual(['TOTAL_SULFUR', 'SCREENING_ONLY']);
    expect(acidBaseAccounting({ sulfideSulfurPercent: 0, neutralisationPotential: 1 }).notes.map((note) => note.code)).toEqual(['NO_ACID_POTENTIAL', 'SCREENING_ONLY']);
  });

  it('uses caller bands and the 62.5 factor', () => {
    const result = acidBaseAccounting({ sulfideSulfurPercent: 1, neutralisationPotential: 125, apFactor: 62.5, bands: { acidGenerating: 1, nonAcidGenerating: 2 } });
    expect([result.acidPotential, result.classification, result.bands.source]).toEqual([62.5, 'uncertain', 'set by the caller']);
  });

  it.each([
    [{ neutralisationPotential: 1 }, 'sulfideSulfurPercent'],
    [{ sulfideSulfurPercent: 120, neutralisationPotential: 1 }, 'sulfideSulfurPercent'],
    [{ sulfideSulfurPercent: 1, neutralisationPotential: -1 }, 'neutralisationPotential'],
    [{ sulfideSulfurPercent: 1, neutralisationPotential: 1, bands: { acidGenerating: 3, nonAcidGenerating: 1 } }, 'bands'],
  ] as [AbaInput, string][])('refuses %o with ABA_BAD_INPUT at %s', (input, field) => {
    try {
      acidBaseAccounting(input);
      expect.unreachable();
    } catch (error) {
      expect(isChemError(error) ? [error.code, error.details.field] : error).toEqual(['ABA_BAD_INPUT', field]);
    }
  });
});

describe('mineral AP and NP from balanced reactions (computed from IUPAC 2021 weights)', () => {
  it('gives pyrite the 31.25 factor times its sulfur fraction (2 × 32.06 / 119.965), to the 100/32 rounding', () => {
    const sulfurFraction = (2 * 32.06) / 119.965;
    const factor = mineralFactor('pyrite').kgCaco3PerTonnePerPercent;
    expect(factor).toBeCloseTo((10 * molarMass('CaCO3') * sulfurFraction) / 32.06, 10); // 31.22 × %S exactly
    expect(Math.abs(factor / (31.25 * sulfurFraction) - 1)).toBeLessThan(0.002); // 31.25 = 100/32 rounds
    expect(mineralFactor('pyrite', { pathway: 'bicarbonate' }).kgCaco3PerTonnePerPercent).toBeCloseTo(2 * factor, 10);
  });

  it.each([
    ['calcite', 'co2', -10, '-2'],
    ['calcite', 'bicarbonate', -10, '-1'],
    ['dolomite', 'co2', -10.855, '-4'], // check-values §3b: 10.86
    ['siderite', 'co2', 0, '0'], // R23: net 0 once Fe oxidises
    ['siderite', 'bicarbonate', 8.639, '1'], // net acid with HCO3- as end point
    ['pyrrhotite', 'co2', 11.386, '2'], // R28, FeS
    ['chalcopyrite', 'co2', 5.454, '2'], // R27
  ] as const)('%s (%s end point): %d kg CaCO3/t per wt%%, %s H+ per mole', (mineral, pathway, factor, protons) => {
    const result = mineralFactor(mineral, { pathway });
    expect([result.kgCaco3PerTonnePerPercent, result.protonsPerMole.toString()]).toEqual([expect.closeTo(factor, 3), protons]);
  });

  it('shows the apparent NP of siderite (8.64, check-values §3b) and cautions', () => {
    const result = mineralAcidBase({ siderite: 1, calcite: 1, pyrite: 1 });
    expect([result.neutralisationPotential, result.apparentNeutralisationPotential, result.acidPotential]).toEqual([
      expect.closeTo(10, 10),
      expect.closeTo(18.639, 3),
      expect.closeTo(16.686, 3),
    ]);
    expect([result.classification, result.cautions.length]).toEqual(['potentially-acid-generating', 1]);
  });

  it('reads pyrrhotite Fe(1-x)S with x', () => {
    expect(mineralFactor('pyrrhotite', { pyrrhotiteX: 0.125 }).equation).toBe('Fe0.875S + 69/32 O2 + 37/16 H2O -> 7/8 Fe(OH)3 + SO4^2- + 2 H+');
  });

  it.each([
    [() => mineralFactor('galena'), 'ABA_UNKNOWN_MINERAL'],
    [() => mineralFactor('pyrrhotite', { pyrrhotiteX: 0.5 }), 'ABA_BAD_INPUT'],
    [() => mineralAcidBase({ calcite: 101 }), 'ABA_BAD_INPUT'],
  ])('refuses %#: %s', (action, code) => {
    try {
      action();
      expect.unreachable();
    } catch (error) {
      expect(isChemError(error) ? error.code : error).toBe(code);
    }
  });
});
