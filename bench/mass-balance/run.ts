/**
 * Mass-balance benchmark: all minimal models of 12 candidate phases under 8 constraints
 * (Σ C(12, k), k ≤ 8, ≈ 3,800 subsets at most), solved exactly. Target: under 100 ms each.
 * Run with `npm run bench:mass-balance`. Prints a summary and one JSON line.
 */
import { performance } from 'node:perf_hooks';
import { solveMassBalance, type MassBalanceInput } from '../../libs/chem/src/index';

const PHASES = [
  'NaCl', 'KCl', 'CaCO3', 'CaMg(CO3)2', 'CaSO4·2H2O', 'CO2(g)', 'CaF2', 'MgSO4·7H2O', 'Na2SO4', 'MgCO3', 'K2SO4', 'NaF',
].map((formula) => ({ name: formula, formula }));

const INPUT: MassBalanceInput = {
  initial: { Na: '0.4', K: '0.05', Cl: '0.3', Ca: '0.9', Mg: '0.2', HCO3: '1.8', SO4: '0.3', F: '0.01' },
  final: { Na: '1.6', K: '0.35', Cl: '1.4', Ca: '2.9', Mg: '0.9', HCO3: '4.9', SO4: '1.7', F: '0.21' },
  phases: PHASES,
  constraints: ['Na', 'K', 'Cl', 'Ca', 'Mg', 'C', 'S', 'F'],
};

const WARM_UP = 5;
const RUNS = 50;

function percentile(sorted: readonly number[], fraction: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil(fraction * sorted.length) - 1)];
}

let models = 0;
for (let run = 0; run < WARM_UP; run += 1) models = solveMassBalance(INPUT).models.length;
const times: number[] = [];
for (let run = 0; run < RUNS; run += 1) {
  const start = performance.now();
  const result = solveMassBalance(INPUT);
  times.push(performance.now() - start);
  if (result.status !== 'exact') throw new Error(`expected exact models, got ${result.status}`);
}
const sorted = [...times].sort((a, b) => a - b);
const mean = times.reduce((sum, time) => sum + time, 0) / times.length;
const p99 = percentile(sorted, 0.99);
console.log(`mass balance, 12 phases × 8 constraints: ${models} minimal models; mean ${mean.toFixed(2)} ms, p99 ${p99.toFixed(2)} ms over ${RUNS} runs (target < 100 ms)`);
console.log(JSON.stringify({ bench: 'mass-balance', phases: 12, constraints: 8, models, runs: RUNS, meanMs: Number(mean.toFixed(3)), p99Ms: Number(p99.toFixed(3)), targetMs: 100 }));
