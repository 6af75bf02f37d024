/**
 * Balancing benchmark: exact (BigInt) balancing of realistic reactions against a floating-point
 * baseline, an SVD null space (ml-matrix) of the same matrices, in one run.
 * Run with `npm run bench:chem`. Prints a table and one JSON line.
 */
import { Matrix, SVD } from 'ml-matrix';
import { performance } from 'node:perf_hooks';
import { balanceEquation, buildSpeciesMatrix, integerNullSpace, parseEquation } from '../../libs/chem/src/index';

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

/** 40 species of 12 elements (H O C Na K Ca Mg Al Si Fe S Cl) plus charge. */
const LARGE_SYSTEM = [
  'NaAlSi3O8', 'KAlSi3O8', 'CaAl2Si2O8', 'Mg2SiO4', 'Fe2SiO4', 'KMg3AlSi3O10(OH)2', 'CaCO3',
  'CaMg(CO3)2', 'FeS2', 'FeCO3', 'NaCl', 'KCl', 'CaSO4·2H2O', 'MgCO3', 'SiO2', 'H2O', 'O2', 'CO2',
  'H+', 'Fe^2+',
].join(' + ') + ' -> ' + [
  'Al2Si2O5(OH)4', 'Al(OH)3', 'KAl3Si3O10(OH)2', 'FeOOH', 'Fe(OH)3', 'Fe2O3', 'Na+', 'K+', 'Ca^2+',
  'Mg^2+', 'H4SiO4', 'HCO3-', 'SO4^2-', 'Cl-', 'Fe^3+', 'CO3^2-', 'OH-', 'H2S', 'CaCl2', 'MgCl2',
].join(' + ');

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

const large = parseEquation(LARGE_SYSTEM);
const largeMatrix = buildSpeciesMatrix(large.terms);
const largeOpen = measure(200, [() => void balanceEquation(LARGE_SYSTEM)]);
const largeCore = measure(200, [() => void integerNullSpace(largeMatrix.rows, large.terms.length)]);
const largeFloat = measure(200, [() => void floatNullSpace(largeMatrix.rows, large.terms.length)]);
const largeResult = balanceEquation(LARGE_SYSTEM);
// Pin 26 species to zero (left out): the 14 that remain have exactly one balance.
const zeroPins = Object.fromEntries(large.terms.slice(0, 26).map((term) => [term.formula.text, 0]));
const pinnedResult = balanceEquation(LARGE_SYSTEM, { pins: zeroPins });
const largePinned = measure(200, [() => void balanceEquation(LARGE_SYSTEM, { pins: zeroPins })]);

const row = (name: string, value: Stats): string =>
  `${name.padEnd(46)} ${value.perSecond.toFixed(0).padStart(10)} ${value.meanMs.toFixed(4).padStart(10)} ${value.p99Ms.toFixed(4).padStart(10)}`;
console.log(`${REACTIONS.length} reactions × ${ROUNDS} rounds; Node ${process.version}`);
console.log(`${'measurement'.padEnd(46)} ${'per s'.padStart(10)} ${'mean ms'.padStart(10)} ${'p99 ms'.padStart(10)}`);
console.log(row('exact balanceEquation (parse → canonical text)', endToEnd));
console.log(row('exact null space only (BigInt RREF)', exactCore));
console.log(row('float null space (ml-matrix SVD)', float));
console.log(`ratio exact null space / float: ${(float.perSecond / exactCore.perSecond).toFixed(2)}×; exact end-to-end / float: ${(float.perSecond / endToEnd.perSecond).toFixed(2)}×`);
console.log(`40 species × ${largeMatrix.labels.length - 1} elements + charge:`);
console.log(row(`  balanceEquation, ${largeResult.status} (freedom ${largeResult.freedom})`, largeOpen));
console.log(row(`  balanceEquation, 26 pinned to 0: ${pinnedResult.status}`, largePinned));
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
