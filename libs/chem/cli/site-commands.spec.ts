// Sources: Droop (1987, Min. Mag. 51, 431) for Fe3+ from stoichiometry (magnetite Fe3O4 recovered from FeO total);
// CO2 per tonne computed from stoichiometry with IUPAC 2021 weights (forsterite 1.2512 t/t, shared/reference/check-values.md);
// the mass-balance case is synthetic (calcite + CO2 → Ca2+ + 2 HCO3-, a standard textbook reaction).
import { describe, expect, it } from 'vitest';
import { run, type CliIo } from './run';

function capture(argv: string[], files: Record<string, string> = {}): { code: number; json: Record<string, unknown>; out: string } {
  let out = '';
  const io: CliIo = {
    stdout: (text) => (out += text),
    stderr: (text) => (out += text),
    readFile: (path) => {
      const text = files[path];
      if (text === undefined) throw new Error(`no such file: ${path}`);
      return text;
    },
  };
  const code = run(argv, io);
  return { code, out, json: argv.includes('--json') && out.startsWith('{') ? (JSON.parse(out) as Record<string, unknown>) : {} };
}

const CALCITE_MODEL = JSON.stringify({
  initial: { Ca: '0.5', HCO3: '1' },
  final: { Ca: '1.5', HCO3: '3' },
  phases: [
    { name: 'calcite', formula: 'CaCO3', rule: 'dissolve' },
    { name: 'CO2', formula: 'CO2(g)', rule: 'dissolve' },
  ],
  constraints: ['Ca', 'C'],
});

describe('site commands of the command line', () => {
  it('solves a mass balance to JSON and exits 0 for an exact valid model', () => {
    const { code, json } = capture(['mass-balance', 'model.json', '--json'], { 'model.json': CALCITE_MODEL });
    expect([code, json.status, json.models]).toEqual([0, 'exact', [{ phases: ['calcite', 'CO2'], transfers: { calcite: '1', CO2: '1' }, valid: true }]]);
  });

  it.each([
    [CALCITE_MODEL.replace('"dissolve"', '"precipitate"'), 'exact'],
    [CALCITE_MODEL.replace('"constraints":["Ca","C"]', '"constraints":["Ca","C","Qq"]'), 'invalid'],
  ])('exits 1 when no model is valid or the input is bad (%#: %s)', (text, status) => {
    const { code, json } = capture(['mass-balance', 'model.json', '--json'], { 'model.json': text });
    expect([code, json.status]).toEqual([1, status]);
  });

  it('recalculates oxides with Droop and prints apfu, ferric iron and a formula', () => {
    const { code, json } = capture(['oxides', 'a.json', '--json'], { 'a.json': JSON.stringify({ oxides: { FeOT: 100 }, oxygens: 4, ferric: 'droop', cations: 3 }) });
    expect([code, json.apfu, json.oxygens, json.total, json.formula]).toEqual([0, { Fe: 3 }, 4, 3, 'Fe3O4']);
    expect(json.ferricIron).toMatchObject({ method: 'droop', ferric: 2, ferrous: 1 });
  });

  it('prints an invalid oxide analysis with its code and exits 1', () => {
    const { code, json } = capture(['oxides', 'a.json', '--json'], { 'a.json': JSON.stringify({ oxides: { XO: 1 }, oxygens: 4 }) });
    expect([code, json.status, (json.error as { code: string }).code]).toEqual([1, 'invalid', 'OXIDES_UNKNOWN_OXIDE']);
  });

  it.each([
    ['Mg2SiO4', 1.2512, 0.6256],
    ['CaSiO3', 0.7577, 0.3789],
  ])('co2 %s gives %d and %d t CO2/t', (formula, bicarbonate, carbonate) => {
    const { code, json } = capture(['co2', formula, '--json']);
    expect([code, json.bicarbonate, json.carbonate]).toEqual([0, expect.closeTo(bicarbonate, 4), expect.closeTo(carbonate, 4)]);
  });

  it('prints text without --json', () => {
    expect(capture(['co2', 'Mg2SiO4']).out).toBe('Mg2SiO4: 1.2512 t CO2/t (bicarbonate), 0.6256 t CO2/t (carbonate)\n');
    expect(capture(['mass-balance', 'm.json'], { 'm.json': CALCITE_MODEL }).out).toBe('exact: 1 model(s)\n  valid   calcite 1, CO2 1\n');
  });
});
