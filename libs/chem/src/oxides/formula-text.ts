/**
 * From apfu to formula text libs/chem parses, back from a formula to oxide weight percents, and
 * the weathering reactions of such formulas.
 */
import { balanceEquation } from '../balance/balance-equation';
import type { BalanceResult } from '../balance/balance-result';
import { molarMassExact } from '../convert/molar-mass';
import { ChemError } from '../errors/chem-error';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';
import { OXIDES } from './oxide-table';

/** Element order of generated formulas: large cations, octahedral, tetrahedral, then anions. */
const ORDER = ['K', 'Na', 'Ca', 'Ba', 'Sr', 'Li', 'Mg', 'Fe', 'Mn', 'Ni', 'Zn', 'Cr', 'V', 'Ti', 'Al', 'P', 'Si', 'C', 'S', 'H'];

function fixed(value: number, decimals: number): string {
  return value.toFixed(decimals).replace(/\.?0+$/, '');
}

/**
 * Formula text from apfu, rounded to `decimals` (default 2), elements left out when they round to
 * 0, oxygens last (`oxygens` minus half the F and Cl, which follow).
 * @example formulaText({ Na: 0.62, Ca: 0.38, Al: 1.38, Si: 2.62 }, { oxygens: 8 }); // "Na0.62Ca0.38Al1.38Si2.62O8"
 */
export function formulaText(apfu: Readonly<Record<string, number>>, options: { oxygens: number; decimals?: number }): string {
  const decimals = options.decimals ?? 2;
  const known = [...ORDER, ...Object.keys(apfu).filter((element) => !ORDER.includes(element) && element !== 'F' && element !== 'Cl')];
  const parts = known.map((element) => [element, fixed(apfu[element] ?? 0, decimals)] as const).filter(([, text]) => text !== '' && text !== '0' && text !== '-0');
  const halogens = (apfu.F ?? 0) + (apfu.Cl ?? 0);
  const oxygen = fixed(options.oxygens - halogens / 2, decimals);
  const anions = (['F', 'Cl'] as const).map((element) => [element, fixed(apfu[element] ?? 0, decimals)] as const).filter(([, text]) => text !== '0' && text !== '');
  return [...parts, ['O', oxygen] as const, ...anions].map(([element, text]) => (text === '1' ? element : `${element}${text}`)).join('');
}

function oxideFor(element: string, isFerric: boolean): (typeof OXIDES)[number] | undefined {
  if (element === 'Fe') return OXIDES.find((entry) => entry.key === (isFerric ? 'Fe2O3' : 'FeO'));
  return OXIDES.find((entry) => entry.element === element && entry.iron === undefined);
}

/**
 * Oxide weight percents (summing to 100) of a formula; `ferric` apfu of its Fe go to Fe2O3.
 * The inverse of {@link recalculateFormula}, for synthetic checks and teaching.
 * @throws ChemError FORMULA_* codes
 * @example oxideWeightPercents('Fe3O4').FeO; // 100 (all iron reported as FeO)
 */
export function oxideWeightPercents(formula: string, options: { ferric?: number } = {}): Record<string, number> {
  const grams: Record<string, number> = {};
  for (const [element, count] of parseFormula(formula).composition) {
    if (element === 'O') continue;
    const parts: [boolean, number][] = element === 'Fe' ? [[false, count.toNumber() - (options.ferric ?? 0)], [true, options.ferric ?? 0]] : [[false, count.toNumber()]];
    for (const [isFerric, atoms] of parts) {
      const entry = oxideFor(element, isFerric);
      if (entry === undefined || atoms === 0) continue;
      grams[entry.key] = (grams[entry.key] ?? 0) + (atoms / entry.atoms) * molarMassExact(entry.formula).toNumber();
    }
  }
  const total = Object.values(grams).reduce((sum, value) => sum + value, 0);
  return Object.fromEntries(Object.entries(grams).map(([key, value]) => [key, (value / total) * 100]));
}

/** Products of {@link weatheringEquation}. */
export interface WeatheringProducts {
  /** Where Al goes: kaolinite (default) or gibbsite. */
  readonly aluminium?: 'kaolinite' | 'gibbsite';
  /** Where Fe goes: goethite FeOOH (default, with O2), Fe(OH)3 (with O2) or Fe2+ in solution. */
  readonly iron?: 'goethite' | 'Fe(OH)3' | 'Fe2+';
}

const CATIONS: Readonly<Record<string, string>> = {
  Na: 'Na+', K: 'K+', Li: 'Li+', Ca: 'Ca^2+', Mg: 'Mg^2+', Mn: 'Mn^2+', Sr: 'Sr^2+', Ba: 'Ba^2+', Ni: 'Ni^2+', Zn: 'Zn^2+',
};

/**
 * The weathering reaction of a mineral by H+ and H2O to dissolved cations, H4SiO4 and secondary
 * phases (kaolinite or gibbsite for Al, goethite/Fe(OH)3 with O2 or Fe2+ for Fe, TiO2 for Ti),
 * balanced by libs/chem per mole of mineral.
 * @example weatheringEquation('Na0.62Ca0.38Al1.38Si2.62O8').equation;
 * // "Na0.62Ca0.38Al1.38Si2.62O8 + 69/50 H+ + 317/100 H2O -> 69/100 Al2Si2O5(OH)4 + 31/50 Na+ + 19/50 Ca^2+ + 31/25 H4SiO4" (order as generated)
 */
export function weatheringEquation(formula: string, products: WeatheringProducts = {}): BalanceResult {
  const elements = [...parseFormula(formula).composition.keys()];
  const iron = products.iron ?? 'goethite';
  const left = [formula, 'H+', 'H2O'];
  const right: string[] = [];
  if (elements.includes('Al')) right.push(products.aluminium === 'gibbsite' ? 'Al(OH)3' : 'Al2Si2O5(OH)4');
  if (elements.includes('Fe')) {
    right.push(iron === 'Fe2+' ? 'Fe^2+' : iron === 'Fe(OH)3' ? 'Fe(OH)3' : 'FeOOH');
    if (iron !== 'Fe2+') left.push('O2');
  }
  if (elements.includes('Ti')) right.push('TiO2');
  for (const element of elements) if (CATIONS[element] !== undefined) right.push(CATIONS[element]);
  if (elements.includes('Si')) right.push('H4SiO4');
  return balanceEquation(`${left.join(' + ')} -> ${right.join(' + ')}`, { normalizeTo: formula });
}

/**
 * Plagioclase of anorthite fraction `anorthite` (0–1, an exact decimal), Na(1−x)Ca(x)Al(1+x)Si(3−x)O8,
 * weathered to kaolinite.
 * @throws ChemError OXIDES_BAD_VALUE outside 0–1 or not a decimal
 * @example plagioclaseWeatheringEquation('0.38').equation; // "Na0.62Ca0.38Al1.38Si2.62O8 + 69/50 H+ + …"
 */
export function plagioclaseWeatheringEquation(anorthite: string | number): BalanceResult {
  const text = String(anorthite);
  const x = Rational.tryParse(text);
  if (x === null || x.sign() < 0 || x.compare(Rational.ONE) > 0) {
    throw new ChemError('OXIDES_BAD_VALUE', 'The anorthite fraction is a decimal from 0 to 1.', { start: 0, end: text.length }, { field: 'anorthite' });
  }
  const part = (value: Rational): string => value.toDecimalString() ?? '0';
  const sodium = Rational.ONE.sub(x);
  const formula = `${sodium.isZero() ? '' : `Na${part(sodium)}`}${x.isZero() ? '' : `Ca${part(x)}`}Al${part(Rational.ONE.add(x))}Si${part(Rational.of(3).sub(x))}O8`;
  return weatheringEquation(formula.replace(/([A-Z][a-z]?)1(?![\d.])/g, '$1'));
}
