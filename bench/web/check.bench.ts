/**
 * Typing benchmark of the web client: what runs in the browser after a pause in typing — the
 * check of the reaction (residuals, electron and proton budgets) and the rendered equation — for
 * a 12-species reaction. Target: well under one 60 Hz frame (16 ms), so typing never blocks.
 * Run with `npm run bench:web`. Prints a table and one JSON line; exits 1 when the target is missed.
 */
import { performance } from 'node:perf_hooks';

import { equationParts } from '../../apps/web/src/app/chem-view/equation-view/equation-parts';
import { balanceReaction } from '../../apps/web/src/app/reactions/balance-panel/balance-reaction';
import { checkReaction } from '../../apps/web/src/app/reactions/reaction-check/check-reaction';

const FRAME_MS = 16;
const RUNS = 400;

/** R3 + R1 + R5 + R13 of /work/shared/reference/check-values.md §2, summed: 12 species, 7 elements and charge. */
const TWELVE_SPECIES =
  '2 KAlSi3O8 + 2 NaAlSi3O8 + CaAl2Si2O8 + Mg2SiO4 + 10 H+ + 19 H2O -> 3 Al2Si2O5(OH)4 + 2 K+ + 2 Na+ + Ca^2+ + 9 H4SiO4 + 2 Mg^2+';
/** The same species without coefficients, pinned to a unique balance: what the balance action does. */
const PINS = { KAlSi3O8: '2', NaAlSi3O8: '2', CaAl2Si2O8: '1', Mg2SiO4: '1' };

interface Timing {
  name: string;
  medianMs: number;
  p95Ms: number;
  maxMs: number;
}

function time(name: string, work: () => unknown): Timing {
  for (let run = 0; run < 50; run++) work();
  const samples: number[] = [];
  for (let run = 0; run < RUNS; run++) {
    const started = performance.now();
    work();
    samples.push(performance.now() - started);
  }
  samples.sort((a, b) => a - b);
  const at = (fraction: number) => samples[Math.min(samples.length - 1, Math.floor(fraction * samples.length))];
  return { name, medianMs: at(0.5), p95Ms: at(0.95), maxMs: samples[samples.length - 1] };
}

const stripped = TWELVE_SPECIES.replace(/(^|[>+]\s*)\d+\s+/g, '$1');
if (checkReaction({ equation: TWELVE_SPECIES }).status !== 'balanced') throw new Error('The benchmark reaction must balance');
if (balanceReaction({ equation: stripped, pins: PINS }).status !== 'balanced') throw new Error('The pinned reaction must balance');

const timings = [
  time('check (12 species, budgets at 5 wt%)', () => checkReaction({ equation: TWELVE_SPECIES, rockWeightPercent: 5 })),
  time('render (12 species)', () => equationParts(TWELVE_SPECIES)),
  time('check + render, one pause in typing', () => {
    checkReaction({ equation: TWELVE_SPECIES, rockWeightPercent: 5 });
    equationParts(TWELVE_SPECIES);
  }),
  time('balance action (12 species, 4 pins)', () => balanceReaction({ equation: stripped, pins: PINS })),
];

const width = Math.max(...timings.map((timing) => timing.name.length));
console.log(`${'task'.padEnd(width)}  median ms  p95 ms  max ms`);
for (const timing of timings) {
  console.log(
    `${timing.name.padEnd(width)}  ${timing.medianMs.toFixed(3).padStart(9)}  ${timing.p95Ms.toFixed(3).padStart(6)}  ${timing.maxMs.toFixed(2).padStart(6)}`,
  );
}
const typing = timings[2];
const isMet = typing.p95Ms < FRAME_MS;
console.log(`target: check + render p95 < ${FRAME_MS} ms: ${isMet ? 'met' : 'MISSED'}`);
console.log(JSON.stringify({ bench: 'web-check', runs: RUNS, frameMs: FRAME_MS, isMet, timings }));
process.exitCode = isMet ? 0 : 1;
