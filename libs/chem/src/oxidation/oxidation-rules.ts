/**
 * The usual rules for oxidation states, in order of priority, and the built-in states of
 * well-known minerals where the rules cannot decide.
 */
import { Rational } from '../rational/rational';

/** Element → fixed state, highest priority first; O and H come last so they are relaxed first. */
export const RULES: readonly (readonly [string, number])[] = [
  ['F', -1],
  ['Li', 1], ['Na', 1], ['K', 1], ['Rb', 1], ['Cs', 1], ['Fr', 1],
  ['Be', 2], ['Mg', 2], ['Ca', 2], ['Sr', 2], ['Ba', 2], ['Ra', 2],
  ['Al', 3],
  ['Si', 4],
  ['H', 1],
  ['O', -2],
];

/** Elements that count as the cation of a sulfide (metals and the semimetals As, Sb, Bi, Te). */
export const SULFIDE_CATIONS: ReadonlySet<string> = new Set([
  'Ti', 'V', 'Cr', 'Mn', 'Fe', 'Co', 'Ni', 'Cu', 'Zn', 'Ga', 'Ge', 'As', 'Mo', 'Ru', 'Rh', 'Pd',
  'Ag', 'Cd', 'In', 'Sn', 'Sb', 'Te', 'W', 'Re', 'Os', 'Ir', 'Pt', 'Au', 'Hg', 'Tl', 'Pb', 'Bi',
]);

/**
 * Built-in states of minerals whose rules cannot decide, keyed by species key. Conventions:
 * - pyrite/marcasite FeS2: Fe +2 with the disulfide S2²⁻ (S −1);
 * - arsenopyrite FeAsS: Fe +2, As −1, S −1 (the AsS²⁻ pair, by analogy with pyrite);
 * - chalcopyrite CuFeS2: Cu +1, Fe +3, S −2 (the assignment favoured by spectroscopy; the
 *   alternative Cu +2, Fe +2 gives the same total electrons on full oxidation).
 * Other monometallic sulfides (FeS, Fe7S8, ZnS, PbS, MoS2 …) follow the sulfide rule S −2;
 * magnetite Fe3O4 needs no entry: O −2 leaves Fe the average state 8/3.
 */
export const BUILT_IN_STATES: ReadonlyMap<string, ReadonlyMap<string, Rational>> = new Map([
  ['Fe1 S2|0', new Map([['Fe', Rational.of(2)], ['S', Rational.of(-1)]])],
  ['As1 Fe1 S1|0', new Map([['Fe', Rational.of(2)], ['As', Rational.of(-1)], ['S', Rational.of(-1)]])],
  ['Cu1 Fe1 S2|0', new Map([['Cu', Rational.of(1)], ['Fe', Rational.of(3)], ['S', Rational.of(-2)]])],
]);
