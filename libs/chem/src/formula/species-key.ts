/**
 * Species identity: two formulas are the same species when their exact composition and charge
 * agree, whatever their grouping or notation (`Fe(OH)3` = `FeO3H3`, `Ca²⁺` = `Ca^2+`).
 * Phase tags are ignored here; where one problem holds the same composition with two different
 * written tags (CO2(g) and CO2(aq)), callers use {@link phasedSpeciesKey} to keep them apart.
 */
import type { Formula } from './formula';

/**
 * A string that is equal for formulas of the same composition and charge.
 * @example speciesKey(parseFormula('Fe(OH)3')) === speciesKey(parseFormula('FeH3O3')); // true
 */
export function speciesKey(formula: Formula): string {
  if (formula.isElectron) return 'e-';
  const elements = [...formula.composition.entries()]
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([symbol, count]) => `${symbol}${count.toString()}`)
    .join(' ');
  return `${elements}|${formula.charge.toString()}`;
}

/**
 * {@link speciesKey} plus the phase tag (`''` when none was written).
 * @example phasedSpeciesKey(parseFormula('CO2(g)')); // "C1 O2|0|g"
 */
export function phasedSpeciesKey(formula: Formula): string {
  return `${speciesKey(formula)}|${formula.phase ?? ''}`;
}

/**
 * Whether two formulas name the same species: same composition and charge, and same phase when
 * both carry a tag.
 * @example isSameSpecies(parseFormula('CO2'), parseFormula('CO2(g)')); // true
 */
export function isSameSpecies(a: Formula, b: Formula): boolean {
  if (speciesKey(a) !== speciesKey(b)) return false;
  return a.phase === null || b.phase === null || a.phase === b.phase;
}
