/**
 * Atomic weights of the elements hydrogen to uranium.
 *
 * Source: T. Prohaska et al. (2022), "Standard atomic weights of the elements 2021 (IUPAC
 * Technical Report)", Pure Appl. Chem. 94(5), 573–600, doi:10.1515/pac-2019-0603, Table 1,
 * abridged values (five significant figures or fewer). For the 14 elements whose standard
 * atomic weight is an interval (H, Li, B, C, N, O, Mg, Si, S, Cl, Ar, Br, Tl, Pb) the abridged
 * value is used, e.g. H 1.0080, S 32.06, Pb 207.2.
 *
 * Elements without a standard atomic weight (no stable isotope and no characteristic terrestrial
 * composition: Tc, Pm, Po, At, Rn, Fr, Ra, Ac) carry the mass number of their longest-lived
 * isotope, as periodic tables conventionally print in brackets; `isMassNumber` marks them.
 * Values are kept as decimal text so that molar masses are exact sums of these abridged values.
 */
import { Rational } from '../rational/rational';

/** One element of the table. */
export interface ElementData {
  readonly symbol: string;
  /** Atomic number Z. */
  readonly number: number;
  /** Abridged standard atomic weight in g/mol, exact as printed. */
  readonly atomicWeight: Rational;
  /** Whether the weight is the mass number of the longest-lived isotope (no standard weight). */
  readonly isMassNumber: boolean;
}

// [symbol, abridged atomic weight]; the position in the list is Z - 1.
const TABLE: readonly (readonly [string, string])[] = [
  ['H', '1.0080'], ['He', '4.0026'], ['Li', '6.94'], ['Be', '9.0122'], ['B', '10.81'],
  ['C', '12.011'], ['N', '14.007'], ['O', '15.999'], ['F', '18.998'], ['Ne', '20.180'],
  ['Na', '22.990'], ['Mg', '24.305'], ['Al', '26.982'], ['Si', '28.085'], ['P', '30.974'],
  ['S', '32.06'], ['Cl', '35.45'], ['Ar', '39.95'], ['K', '39.098'], ['Ca', '40.078'],
  ['Sc', '44.956'], ['Ti', '47.867'], ['V', '50.942'], ['Cr', '51.996'], ['Mn', '54.938'],
  ['Fe', '55.845'], ['Co', '58.933'], ['Ni', '58.693'], ['Cu', '63.546'], ['Zn', '65.38'],
  ['Ga', '69.723'], ['Ge', '72.630'], ['As', '74.922'], ['Se', '78.971'], ['Br', '79.904'],
  ['Kr', '83.798'], ['Rb', '85.468'], ['Sr', '87.62'], ['Y', '88.906'], ['Zr', '91.224'],
  ['Nb', '92.906'], ['Mo', '95.95'], ['Tc', '97'], ['Ru', '101.07'], ['Rh', '102.91'],
  ['Pd', '106.42'], ['Ag', '107.87'], ['Cd', '112.41'], ['In', '114.82'], ['Sn', '118.71'],
  ['Sb', '121.76'], ['Te', '127.60'], ['I', '126.90'], ['Xe', '131.29'], ['Cs', '132.91'],
  ['Ba', '137.33'], ['La', '138.91'], ['Ce', '140.12'], ['Pr', '140.91'], ['Nd', '144.24'],
  ['Pm', '145'], ['Sm', '150.36'], ['Eu', '151.96'], ['Gd', '157.25'], ['Tb', '158.93'],
  ['Dy', '162.50'], ['Ho', '164.93'], ['Er', '167.26'], ['Tm', '168.93'], ['Yb', '173.05'],
  ['Lu', '174.97'], ['Hf', '178.49'], ['Ta', '180.95'], ['W', '183.84'], ['Re', '186.21'],
  ['Os', '190.23'], ['Ir', '192.22'], ['Pt', '195.08'], ['Au', '196.97'], ['Hg', '200.59'],
  ['Tl', '204.38'], ['Pb', '207.2'], ['Bi', '208.98'], ['Po', '209'], ['At', '210'],
  ['Rn', '222'], ['Fr', '223'], ['Ra', '226'], ['Ac', '227'], ['Th', '232.04'],
  ['Pa', '231.04'], ['U', '238.03'],
];

const MASS_NUMBER_ONLY = new Set(['Tc', 'Pm', 'Po', 'At', 'Rn', 'Fr', 'Ra', 'Ac']);

const ELEMENTS: ReadonlyMap<string, ElementData> = new Map(
  TABLE.map(([symbol, weight], index) => [
    symbol,
    {
      symbol,
      number: index + 1,
      atomicWeight: Rational.parse(weight),
      isMassNumber: MASS_NUMBER_ONLY.has(symbol),
    },
  ]),
);

/**
 * The element with this symbol, or `undefined` (symbols are case-sensitive; Z ≤ 92 only).
 * @example findElement('Fe')?.atomicWeight.toDecimalString(); // "55.845"
 */
export function findElement(symbol: string): ElementData | undefined {
  return ELEMENTS.get(symbol);
}

/**
 * Every element from H (Z = 1) to U (Z = 92), in order of atomic number.
 * @example listElements().length; // 92
 */
export function listElements(): readonly ElementData[] {
  return [...ELEMENTS.values()];
}
