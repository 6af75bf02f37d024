/**
 * Balancing benchmark: exact (BigInt) balancing of realistic reactions against a floating-point
 * baseline, an SVD null space (ml-matrix) of the same matrices, in one run.
 * Run with `npm run bench:chem`. Prints a table and one JSON line.
 */
import { Matrix, SVD } from 'ml-matrix';
import { performance } from 'node:perf_hooks';
import {
  balanceEquation, buildSpeciesMatrix, integerNullSpace, matrixRank, parseEquation, parseFormula, Rational, speciesKey,
} from '../../libs/chem/src/index';

const REACTIONS: readonly string[] = [
  'NaAlSi3O8 + H+ + H2O -> Al2Si2O5(OH)4 + Na+ + H4SiO4',
  'NaAlSi3O8 + H+ + H2O -> Al(OH)3 + Na+ + H4SiO4',
  'KAlSi3O8 + H+ + H2O -> Al2Si2O5(OH)4 + K+ + H4SiO4',
  'KAlSi3O8 + H+ -> KAl2(AlSi3O10)(OH)2 + SiO2 + K+',
  'KAlSi3O8 + H+ + H2O -> KAl3Si3O10(OH)2 + K+ + H4SiO4',
  'CaAl2Si2O8 + H+ + H2O -> Al2Si2O5(OH)4 + Ca^2+',
  'Na0.5Ca0.5Al1.5Si2.5O8 + H+ + H2O -> Al2Si2O5(OH)4 + Na+ + Ca^2+ + H4SiO4',
  'Na0.62Ca0.38Al1.38Si2.62O8 + H+ + H2O -> Al2Si2O5(OH)4 + Na+ + Ca^2+ + H4SiO4',
  'KMg3AlSi3O10(OH)2 + H+ + H2O -> Al2Si2O5(OH)4 + K+ + Mg^2+ + H4SiO4',
  'KFe3AlSi3O10(OH)2 + H+ + O2 + H2O -> Al2Si2O5(OH)4 + K+ + FeOOH + H4SiO4',
  'K0.6Mg0.25Al2.30Si3.5O10(OH)2 + H+ + H2O -> Al2Si2O5(OH)4 + K+ + Mg^2+ + H4SiO4',
  'Mg2SiO4 + CO2 + H2O -> Mg^2+ + HCO3- + H4SiO4',
  'Mg1.8Fe0.2SiO4 + H+ + O2 + H2O -> Mg^2+ + FeOOH + H4SiO4',
  'Fe2SiO4 + O2 + H2O -> FeOOH + H4SiO4',
  'Fe2SiO4 + H2O -> Fe3O4 + SiO2 + H2',
  'FeS2 + O2 + H2O -> Fe^2+ + SO4^2- + H+',
  'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+',
  'FeS2 + Fe^3+ + H2O -> Fe^2+ + SO4^2- + H+',
  'Fe^2+ + O2 + H2O -> Fe(OH)3 + H+',
  'CaCO3 + CO2 + H2O -> Ca^2+ + HCO3-',
  'CaMg(CO3)2 + CO2 + H2O -> Ca^2+ + Mg^2+ + HCO3-',
  'FeCO3 + O2 + H2O -> Fe(OH)3 + CO2',
  'CuFeS2 + O2 + H2O -> Cu^2+ + Fe(OH)3 + SO4^2- + H+',
  'FeS2 + O2 + CaCO3 + H2O -> Fe(OH)3 + SO4^2- + Ca^2+ + CO2',
];

/** Extra reactions so that the site-scale system below reaches 40 species of 12 elements. */
const EXTRA_REACTIONS: readonly string[] = [
  'NaCl -> Na+ + Cl-',
  'CaSO4·2H2O -> Ca^2+ + SO4^2- + H2O',
  'MgCO3 + H+ -> Mg^2+ + HCO3-',
];

/**
 * A balanced 40-species, 12-element system: the sum of every reaction above (each balanced, with
 * multipliers 1, 2, 3, ...), so that one known balance exists. All species but a set of 13 whose
 * columns are independent are pinned to their known coefficients, which leaves exactly one balance:
 * the engine must find the 13 unknown coefficients exactly.
 */
function buildLargeSystem(): { text: string; pins: Record<string, string>; species: number } {
  const net = new Map<string, { formula: string; coefficient: Rational }>();
  // Chalcopyrite would add copper, a 13th element.
  [...REACTIONS.filter((text) => !text.includes('Cu')), ...EXTRA_REACTIONS].forEach((text, index) => {
    const result = balanceEquation(text);
    if (result.status !== 'balanced') throw new Error(`not balanced: ${text}`);
    for (const term of result.terms) {
      const key = speciesKey(parseFormula(term.formula));
      const signed = (term.coefficient ?? Rational.ZERO).mul(Rational.of(index + 1)).mul(Rational.of(term.side === 'left' ? -1 : 1));
      const previous = net.get(key);
      net.set(key, { formula: previous?.formula ?? term.formula, coefficient: (previous?.coefficient ?? Rational.ZERO).add(signed) });
    }
  });
  const entries = [...net.values()].filter((entry) => !entry.coefficient.isZero());
  const left = entries.filter((entry) => entry.coefficient.sign() < 0);
  const right = entries.filter((entry) => entry.coefficient.sign() > 0);
  const ordered = [...left, ...right];
  const text = `${left.map((entry) => entry.formula).join(' + ')} -> ${right.map((entry) => entry.formula).join(' + ')}`;
  const matrix = buildSpeciesMatrix(parseEquation(text).terms);
  const free: number[] = [];
  ordered.forEach((_entry, column) => {
    const candidate = [...free, column];
    const sub = matrix.rows.map((row) => candidate.map((index) => row[index]));
    if (matrixRank(sub, candidate.length) === candidate.length) free.push(column);
  });
  const pins = Object.fromEntries(
    ordered.flatMap((entry, column) => (free.includes(column) ? [] : [[entry.formula, entry.coefficient.abs().toString()]])),
  );
  return { text, pins, species: ordered.length };
}

function floatNullSpace(rows: readonly (readonly bigint[])[], columns: number): number {
  const padded = new Matrix(Math.max(rows.length, columns), columns);
  rows.forEach((row, index) => row.forEach((value, column) => padded.set(index, column, Number(value))));
  const svd = new SVD(padded, { autoTranspose: true });
  const tolerance = 1e-9 * Math.max(1, svd.diagonal[0] ?? 0);
  const free = svd.diagonal.flatMap((value, index) => (value <= tolerance ? [index] : []));
  const basis = svd.rightSingularVectors.subMatrixColumn(free);
  return basis.columns;
}

function timeEach(count: number, work: () => void): number[] {
  const times: number[] = [];
  for (let index = 0; index < count; index += 1) {
    const start = performance.now();
    work();
    times.push(performance.now() - start);
  }
  return times;
}

interface Stats {
  readonly perSecond: number;
  readonly p99Ms: number;
  readonly meanMs: number;
}

function stats(times: number[]): Stats {
  const sorted = [...times].sort((a, b) => a - b);
  const total = sorted.reduce((sum, value) => sum + value, 0);
  return { perSecond: (sorted.length / total) * 1000, p99Ms: sorted[Math.floor(sorted.length * 0.99)], meanMs: total / sorted.length };
}

function measure(rounds: number, tasks: readonly (() => void)[]): Stats {
  for (let index = 0; index < 200; index += 1) tasks.forEach((task) => task()); // warm-up
  const times: number[] = [];
  for (let round = 0; round < rounds; round += 1) for (const task of tasks) times.push(...timeEach(1, task));
  return stats(times);
}

const matrices = REACTIONS.map((text) => {
  const terms = parseEquation(text).terms;
  return { text, rows: buildSpeciesMatrix(terms).rows, columns: terms.length };
});
for (const { text } of matrices) {
  if (balanceEquation(text).status !== 'balanced') throw new Error(`not balanced: ${text}`);
}

const ROUNDS = 2000;
const endToEnd = measure(ROUNDS, REACTIONS.map((text) => () => void balanceEquation(text)));
const exactCore = measure(ROUNDS, matrices.map(({ rows, columns }) => () => void integerNullSpace(rows, columns)));
const float = measure(ROUNDS, matrices.map(({ rows, columns }) => () => void floatNullSpace(rows, columns)));

const LARGE = buildLargeSystem();
const large = parseEquation(LARGE.text);
const largeMatrix = buildSpeciesMatrix(large.terms);
const largeOpen = measure(500, [() => void balanceEquation(LARGE.text)]);
const largeCore = measure(500, [() => void integerNullSpace(largeMatrix.rows, large.terms.length)]);
const largeFloat = measure(500, [() => void floatNullSpace(largeMatrix.rows, large.terms.length)]);
const largeResult = balanceEquation(LARGE.text);
const pinnedResult = balanceEquation(LARGE.text, { pins: LARGE.pins });
if (pinnedResult.status !== 'balanced') throw new Error(`the 40-species system did not balance: ${pinnedResult.status}`);
const largePinned = measure(500, [() => void balanceEquation(LARGE.text, { pins: LARGE.pins })]);
const pinnedCount = Object.keys(LARGE.pins).length;

const row = (name: string, value: Stats): string =>
  `${name.padEnd(46)} ${value.perSecond.toFixed(0).padStart(10)} ${value.meanMs.toFixed(4).padStart(10)} ${value.p99Ms.toFixed(4).padStart(10)}`;
console.log(`${REACTIONS.length} reactions × ${ROUNDS} rounds; Node ${process.version}`);
console.log(`${'measurement'.padEnd(46)} ${'per s'.padStart(10)} ${'mean ms'.padStart(10)} ${'p99 ms'.padStart(10)}`);
console.log(row('exact balanceEquation (parse → canonical text)', endToEnd));
console.log(row('exact null space only (BigInt RREF)', exactCore));
console.log(row('float null space (ml-matrix SVD)', float));
console.log(`ratio exact null space / float: ${(float.perSecond / exactCore.perSecond).toFixed(2)}×; exact end-to-end / float: ${(float.perSecond / endToEnd.perSecond).toFixed(2)}×`);
console.log(`${LARGE.species} species × ${largeMatrix.labels.length - 1} elements + charge:`);
console.log(row(`  balanceEquation, ${largeResult.status} (freedom ${largeResult.freedom})`, largeOpen));
console.log(row(`  balanceEquation, ${pinnedCount} pinned: ${pinnedResult.status}`, largePinned));
console.log(row('  exact null space only', largeCore));
console.log(row('  float null space (SVD)', largeFloat));
console.log(
  JSON.stringify({
    reactions: REACTIONS.length,
    rounds: ROUNDS,
    endToEnd,
    exactNullSpace: exactCore,
    floatNullSpace: float,
    ratioNullSpace: float.perSecond / exactCore.perSecond,
    ratioEndToEnd: float.perSecond / endToEnd.perSecond,
    large: { species: large.terms.length, elements: largeMatrix.labels.length - 1, open: largeOpen, pinned: largePinned, status: pinnedResult.status, nullSpace: largeCore, float: largeFloat },
  }),
);
