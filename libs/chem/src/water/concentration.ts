/**
 * Concentration values and units of water analyses. Water work is measurement: values are
 * numbers (doubles); molar masses come exactly from the IUPAC 2021 abridged weights.
 */
import { CACO3_MOLAR_MASS, molarMassExact } from '../convert/molar-mass';
import { ChemError } from '../errors/chem-error';
import { type Solute } from './solutes';

/**
 * Units a solute concentration may be given in. `µg/L` is how laboratories report trace metals
 * (Fe, Mn, Al, Zn); `umol/L` and `ug/L` are accepted for `µmol/L` and `µg/L`.
 */
export const CONCENTRATION_UNITS = ['mg/L', 'µg/L', 'ug/L', 'mmol/L', 'µmol/L', 'umol/L', 'meq/L', 'mg/L as CaCO3', 'mg/L as HCO3'] as const;

/** A unit from {@link CONCENTRATION_UNITS}. */
export type ConcentrationUnit = (typeof CONCENTRATION_UNITS)[number];

/** Spellings of {@link CONCENTRATION_UNITS} kept for typing without a µ key; forms offer only the µ forms. */
export const ASCII_UNIT_ALIASES: readonly ConcentrationUnit[] = ['ug/L', 'umol/L'];

/** A parsed concentration: below detection it keeps the limit, never a zero. */
export interface Concentration {
  /** The measured value; for a value below detection, the detection limit. */
  readonly value: number;
  /** Whether the value was reported below the detection limit (`<0.01`). */
  readonly belowDetection: boolean;
  /** The detection limit when below detection, else `null`. */
  readonly detectionLimit: number | null;
}

const NUMBER_PATTERN = /^\s*(<)?\s*([+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*$/;

/**
 * Reads a reported concentration: a number, `"12.5"`, or a value below detection `"<0.01"`.
 * @param field the field path named in the error's details
 * @throws ChemError WATER_BAD_VALUE for text that is not a non-negative number (span over the text)
 * @example parseConcentration('<0.01'); // { value: 0.01, belowDetection: true, detectionLimit: 0.01 }
 */
export function parseConcentration(input: string | number, field = 'value'): Concentration {
  if (typeof input === 'number') {
    if (Number.isFinite(input) && input >= 0) return { value: input, belowDetection: false, detectionLimit: null };
    throw badValue(String(input), field);
  }
  const match = NUMBER_PATTERN.exec(input);
  if (match === null) throw badValue(input, field);
  const value = Number(match[2]);
  if (!Number.isFinite(value)) throw badValue(input, field);
  const below = match[1] === '<';
  return { value, belowDetection: below, detectionLimit: below ? value : null };
}

function badValue(text: string, field: string): ChemError {
  return new ChemError('WATER_BAD_VALUE', `"${text}" is not a concentration: give a non-negative number or "<limit".`, { start: 0, end: text.length }, {
    field,
  });
}

/**
 * Whether `unit` is one of {@link CONCENTRATION_UNITS}.
 * @example isConcentrationUnit('meq/L'); // true
 */
export function isConcentrationUnit(unit: string): unit is ConcentrationUnit {
  return (CONCENTRATION_UNITS as readonly string[]).includes(unit);
}

/** mg CaCO3 per meq: M(CaCO3)/2 = 50.043 (Standard Methods 2320). */
export const CACO3_MG_PER_MEQ = CACO3_MOLAR_MASS.toNumber() / 2;

function badUnit(unit: string, solute: Solute, field: string, reason: string): ChemError {
  return new ChemError('WATER_BAD_UNIT', `${reason} (${solute.key} in "${unit}").`, { start: 0, end: unit.length }, { field, unit });
}

/**
 * Converts a concentration of `solute` to mmol/L (mmol of the solute's formula: mmol C for DIC).
 * meq/L needs a charged solute; `mg/L as CaCO3` and `mg/L as HCO3` are for alkalinity only.
 * @param field the field path named in the error's details
 * @throws ChemError WATER_BAD_UNIT (span over the unit)
 * @example toMillimolesPerLitre(findSolute('Ca')!, 40.078, 'mg/L'); // 1
 */
export function toMillimolesPerLitre(solute: Solute, value: number, unit: string, field = 'unit'): number {
  if (!isConcentrationUnit(unit)) throw badUnit(unit, solute, field, `Unknown unit; use one of ${CONCENTRATION_UNITS.join(', ')}`);
  const isAlkalinityUnit = unit === 'mg/L as CaCO3' || unit === 'mg/L as HCO3';
  if (isAlkalinityUnit && solute.key !== 'alkalinity') throw badUnit(unit, solute, field, 'Only alkalinity is reported "as CaCO3" or "as HCO3"');
  switch (unit) {
    case 'mg/L':
      return value / molarMassExact(solute.formula).toNumber();
    case 'µg/L':
    case 'ug/L':
      return value / 1000 / molarMassExact(solute.formula).toNumber();
    case 'mmol/L':
      return value;
    case 'µmol/L':
    case 'umol/L':
      return value / 1000;
    case 'meq/L':
      if (solute.charge === 0) throw badUnit(unit, solute, field, 'A neutral solute has no equivalents');
      return value / Math.abs(solute.charge);
    case 'mg/L as CaCO3':
      return value / CACO3_MG_PER_MEQ;
    case 'mg/L as HCO3':
      return value / molarMassExact('HCO3-').toNumber();
  }
}

/**
 * Converts a concentration of `solute` to meq/L (|charge| × mmol/L; 0 for neutral solutes).
 * @throws ChemError WATER_BAD_UNIT
 * @example toMilliequivalentsPerLitre(findSolute('alkalinity')!, 100.086, 'mg/L as CaCO3'); // 2
 */
export function toMilliequivalentsPerLitre(solute: Solute, value: number, unit: string, field = 'unit'): number {
  return toMillimolesPerLitre(solute, value, unit, field) * Math.abs(solute.charge);
}
