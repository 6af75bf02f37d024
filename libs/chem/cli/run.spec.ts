// Sources of the checked reactions: complete pyrite oxidation, Itasca Denver report to Colorado DRMS eq. 3.1;
// pyrite oxidation to Fe2+, Reitner & Thiel 2011 (Encyclopedia of Geobiology); molar masses from the IUPAC 2021 abridged weights (Prohaska et al. 2022).
import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { run, type CliIo } from './run';

function capture(argv: string[], files: Record<string, string> = {}): { code: number; out: string; err: string } {
  let out = '';
  let err = '';
  const io: CliIo = {
    stdout: (text) => (out += text),
    stderr: (text) => (err += text),
    readFile: (path) => {
      const text = files[path];
      if (text === undefined) throw new Error(`no such file: ${path}`);
      return text;
    },
  };
  return { code: run(argv, io), out, err };
}

describe('chem command line', () => {
  it('balances to JSON with exact coefficients and exits 0', () => {
    const { code, out } = capture(['balance', 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', '--normalize', 'FeS2', '--json']);
    const json = JSON.parse(out);
    expect([code, json.status, json.freedom, json.terms[1], json.equation]).toEqual([
      0,
      'balanced',
      1,
      { formula: 'O2', side: 'left', coefficient: '15/4' },
      'FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+',
    ]);
  });

  it.each([
    [['balance', 'H2 + O2 -> H2O + H2O2', '--json'], 'open', 1],
    [['balance', 'H2 + O2 -> H2O + H2O2', '--pin', 'H2O2=1', '--pin', 'H2O=2', '--json'], 'balanced', 0],
    [['balance', 'NaCl -> Na+', '--json'], 'impossible', 1],
    [['balance', '(Mg,Fe)2SiO4 + H+ -> Mg^2+', '--json'], 'invalid', 1],
    [['check', '2 H2 + 2 O2 -> 2 H2O', '--json'], 'unbalanced', 1],
    [['check', 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+', '--json'], 'balanced', 0],
  ])('%j prints status %s and exits %i', (argv, status, exitCode) => {
    const { code, out } = capture(argv);
    expect([JSON.parse(out).status, code]).toEqual([status, exitCode]);
  });

  it('reports an invalid equation with code and span', () => {
    const json = JSON.parse(capture(['balance', '(Mg,Fe)2SiO4 + H+ -> Mg^2+', '--json']).out);
    expect([json.error.code, json.error.span]).toEqual(['FORMULA_MIXED_SITE', { start: 0, end: 7 }]);
  });

  it('checks with residuals, electrons and the proton budget', () => {
    const json = JSON.parse(capture(['check', 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+', '--json']).out);
    expect([json.residuals.charge, json.electrons, json.protonBudget.reference, json.protonBudget.perMole]).toEqual([
      '0',
      { S: '14', O: '-14' },
      'FeS2',
      '2',
    ]);
  });

  it('gives the molar mass and composition', () => {
    const { code, out } = capture(['mass', 'CaSO4·2H2O', '--json']);
    expect([code, JSON.parse(out)]).toEqual([
      0,
      { formula: 'CaSO4·2H2O', molarMass: 172.164, composition: { Ca: '1', S: '1', O: '6', H: '4' }, charge: '0' },
    ]);
  });

  it('combines reactions from a file', () => {
    const file = JSON.stringify({
      reactions: [{ equation: 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+' }, { equation: '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+' }],
      cancel: ['Fe^2+'],
    });
    const { code, out } = capture(['combine', 'net.json', '--json'], { 'net.json': file });
    expect([code, JSON.parse(out).multipliers]).toEqual([0, ['1', '1/4']]);
  });

  it('prints a short human-readable line without --json', () => {
    expect(capture(['balance', 'H2 + O2 -> H2O']).out).toBe('balanced: 2 H2 + O2 -> 2 H2O\n');
  });

  it.each([[['frobnicate', 'x']], [['balance']], [['combine', 'missing.json']]])('exits 2 with usage for %j', (argv) => {
    const { code, err } = capture(argv);
    expect([code, err.includes('Usage')]).toEqual([2, true]);
  });

  it('is wired to npm run chem (one real process)', () => {
    const root = fileURLToPath(new URL('../../..', import.meta.url));
    const out = execFileSync('npx', ['tsx', 'libs/chem/cli/main.ts', 'mass', 'CaCO3', '--json'], { cwd: root, encoding: 'utf8' });
    expect(JSON.parse(out).molarMass).toBe(100.086);
  }, 30_000);
});
