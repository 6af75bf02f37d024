import { Matrix, solve } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { impliedReaction } from './implied-reaction';
import { solveMassBalance, type MassBalanceInput } from './solve-mass-balance';

function transfersOf(input: MassBalanceInput): Record<string, string>[] {
  return solveMassBalance(input).models.map((model) => Object.fromEntries(Object.entries(model.transfers).map(([name, value]) => [name, value.toString()])));
}

// Garrels & Mackenzie (1967), Sierra Nevada ephemeral springs minus snow, mmol/kg. Spring and
// snow compositions recalled from memory (check-values.md §5a, from memory); the balance-sheet
// arithmetic there is computed: 177 µmol plagioclase, 7.3 biotite, 12.7 K-feldspar, ≈132 kaolinite.
const SNOW = { Na: '0.024', Ca: '0.010', Mg: '0.007', K: '0.008', HCO3: '0.018', SiO2: '0.003' };
const SPRING = { Na: '0.134', Ca: '0.078', Mg: '0.029', K: '0.028', HCO3: '0.328', SiO2: '0.273' };
const GM_PHASES = [
  { name: 'plagioclase', formula: 'Na0.62Ca0.38Al1.38Si2.62O8', rule: 'dissolve' },
  { name: 'biotite', formula: 'KMg3AlSi3O10(OH)2', rule: 'dissolve' },
  { name: 'K-feldspar', formula: 'KAlSi3O8', rule: 'dissolve' },
  { name: 'kaolinite', formula: 'Al2Si2O5(OH)4', rule: 'precipitate' },
  { name: 'CO2', formula: 'CO2(g)', rule: 'dissolve' },
] as const;

describe('solveMassBalance', () => {
  it('reproduces the Garrels & Mackenzie balance sheet exactly (Na, Mg, K, Al, C)', () => {
    const input = { initial: SNOW, final: SPRING, phases: GM_PHASES, constraints: ['Na', 'Mg', 'K', 'Al', 'C'] };
    const result = solveMassBalance(input);
    expect([result.status, result.models.length, result.models[0].valid]).toEqual(['exact', 1, true]);
    expect(transfersOf(input)[0]).toEqual({
      plagioclase: '11/62', // 0.110/0.62 = 177 µmol
      biotite: '11/1500', // 7.3 µmol
      'K-feldspar': '19/1500', // 12.7 µmol
      kaolinite: '-821/6200', // 132 µmol precipitated
      CO2: '31/100',
    });
  });

  it('needs Ca/Na exchange to fit Ca as well, else gives the least-squares models', () => {
    const constraints = ['Na', 'Ca', 'Mg', 'K', 'Al', 'C'];
    const withoutExchange = solveMassBalance({ initial: SNOW, final: SPRING, phases: GM_PHASES, constraints });
    expect([withoutExchange.status, withoutExchange.models.length]).toEqual(['least-squares', 1]);
    expect(Math.abs(withoutExchange.models[0].residuals?.Ca ?? 0)).toBeGreaterThan(0);
    const exchange = { name: 'exchange', equation: 'Ca^2+ + 2 NaX -> CaX2 + 2 Na+' };
    const input = { initial: SNOW, final: SPRING, phases: [...GM_PHASES, exchange], constraints };
    expect(transfersOf(input)[0]).toEqual({
      plagioclase: '41/230',
      biotite: '11/1500',
      'K-feldspar': '19/1500',
      kaolinite: '-133/1000',
      CO2: '31/100',
      exchange: '-3/11500',
    });
    expect(impliedReaction(input, solveMassBalance(input).models[0]).equation).toBe(
      '41/230 Na0.62Ca0.38Al1.38Si2.62O8 + 11/1500 KMg3AlSi3O10(OH)2 + 19/1500 KAlSi3O8 + 31/100 CO2(g) + 3/11500 CaX2 + 64567/69000 H2O' +
        ' -> 133/1000 Al2Si2O5(OH)4 + 3/5750 NaX + 11/100 Na+ + 17/250 Ca^2+ + 11/500 Mg^2+ + 1/50 K+ + 31/100 HCO3- + 1501/5750 H4SiO4',
    );
  });

  it('balances electrons: pyrite oxidised by O2 with goethite precipitating (hand-derived)', () => {
    // Δu of the water = 0.2 × 2 (Fe2+) + 2 × 6 (SO4) = 12.4 = 4 × O2 + 3 × goethite (−0.8) + 0 × pyrite.
    const input = {
      initial: { SO4: '0.5' },
      final: { Fe: '0.2', SO4: '2.5' },
      phases: [
        { name: 'pyrite', formula: 'FeS2', rule: 'dissolve' },
        { name: 'O2', formula: 'O2(g)', rule: 'dissolve' },
        { name: 'goethite', formula: 'FeOOH', rule: 'precipitate' },
      ],
      constraints: ['Fe', 'S', 'electrons'],
    } as const;
    expect(transfersOf(input)).toEqual([{ pyrite: '1', O2: '37/10', goethite: '-4/5' }]);
  });

  it('lists every minimal model and no model with a redundant phase', () => {
    const input = {
      initial: {},
      final: { Na: 1, K: 1, Cl: 2 },
      phases: [
        { name: 'halite', formula: 'NaCl' },
        { name: 'sylvite', formula: 'KCl' },
        { name: 'mixed salt', formula: 'NaKCl2' },
        { name: 'calcite', formula: 'CaCO3' },
      ],
      constraints: ['Na', 'K', 'Cl'],
    };
    expect(solveMassBalance(input).models.map((model) => model.phases)).toEqual([['mixed salt'], ['halite', 'sylvite']]);
  });

  it.each([
    ['dissolve', '1', true],
    ['precipitate', '1', false],
    ['either', '1', true],
  ] as const)('marks calcite with rule %s and transfer %s valid: %s', (rule, transfer, valid) => {
    const result = solveMassBalance({ initial: {}, final: { Ca: 1, DIC: 1 }, phases: [{ name: 'calcite', formula: 'CaCO3', rule }], constraints: ['Ca', 'C'] });
    expect([result.status, result.models[0].transfers.calcite.toString(), result.models[0].valid]).toEqual(['exact', transfer, valid]);
  });

  it('counts DIC instead of bicarbonate carbon when both are given, and keeps below-detection values at 0 with a note', () => {
    const result = solveMassBalance({
      initial: { Ca: '<0.01', DIC: 0.5, HCO3: 0.4 },
      final: { Ca: 1, DIC: 1.5, HCO3: 2.4 },
      phases: [{ name: 'calcite', formula: 'CaCO3' }],
      constraints: ['Ca', 'C'],
    });
    expect([result.status, result.change.C.toString(), result.notes]).toEqual(['exact', '1', ['initial: below detection, counted 0: Ca']]);
  });

  it('agrees with the least-squares solution of ml-matrix on an overdetermined system', () => {
    const input = {
      initial: { Ca: 1, Mg: 0.5, HCO3: 3, SO4: 0.2 },
      final: { Ca: 2.1, Mg: 1.45, HCO3: 6.2, SO4: 0.5 },
      phases: [
        { name: 'calcite', formula: 'CaCO3' },
        { name: 'dolomite', formula: 'CaMg(CO3)2' },
        { name: 'gypsum', formula: 'CaSO4·2H2O' },
      ],
      constraints: ['Ca', 'Mg', 'C', 'S'],
    };
    const result = solveMassBalance(input);
    const a = new Matrix([[1, 1, 1], [0, 1, 0], [1, 2, 0], [0, 0, 1]]);
    const b = Matrix.columnVector([1.1, 0.95, 3.2, 0.3]);
    const reference = solve(a, b).to1DArray();
    const model = result.models[0];
    expect(result.status).toBe('least-squares');
    expect(['calcite', 'dolomite', 'gypsum'].map((name) => model.transfers[name].toNumber())).toEqual(reference.map((value) => expect.closeTo(value, 10)));
    const residual = b.sub(a.mmul(Matrix.columnVector(reference))).to1DArray();
    expect(['Ca', 'Mg', 'C', 'S'].map((constraint) => model.residuals?.[constraint])).toEqual(residual.map((value) => expect.closeTo(value, 10)));
  });

  it.each([
    [10, [0.7, 1.3], true],
    [50, [-0.5, 2.5], false],
  ])('with ±%d %% on Na, halite ranges over %o (robust: %s)', (percent, range, robust) => {
    const result = solveMassBalance({
      initial: { Na: 1, Cl: 1 },
      final: { Na: 2, Cl: 2 },
      phases: [{ name: 'halite', formula: 'NaCl', rule: 'dissolve' }],
      constraints: ['Na'],
      uncertainty: { Na: percent },
    });
    expect(result.models[0].ranges?.halite).toEqual(range.map((value) => expect.closeTo(value, 12)));
    expect(result.models[0].robust).toBe(robust);
  });

  it('gives status none when no phase touches the change', () => {
    const result = solveMassBalance({ initial: {}, final: { Na: 1 }, phases: [{ name: 'calcite', formula: 'CaCO3' }], constraints: ['Na'] });
    expect([result.status, result.models]).toEqual(['none', []]);
  });

  const CALCITE = { name: 'calcite', formula: 'CaCO3' };
  it.each([
    [{ phases: [], constraints: ['Ca'] }, 'MASS_BALANCE_NO_PHASES', 'phases'],
    [{ phases: [CALCITE], constraints: ['Qq'] }, 'MASS_BALANCE_BAD_CONSTRAINT', 'constraints.0'],
    [{ phases: [CALCITE], constraints: ['Ca', 'Ca'] }, 'MASS_BALANCE_BAD_CONSTRAINT', 'constraints.1'],
    [{ phases: [CALCITE], constraints: ['Ca'], final: { Cax: 1 } }, 'MASS_BALANCE_UNKNOWN_SOLUTE', 'final.Cax'],
    [{ phases: [CALCITE], constraints: ['Ca'], final: { Ca: '-1' } }, 'MASS_BALANCE_BAD_VALUE', 'final.Ca'],
    [{ phases: [CALCITE], constraints: ['Ca'], uncertainty: { Ca: -5 } }, 'MASS_BALANCE_BAD_VALUE', 'uncertainty.Ca'],
    [{ phases: [{ ...CALCITE, rule: 'melt' }], constraints: ['Ca'] }, 'MASS_BALANCE_BAD_RULE', 'phases.0.rule'],
    [{ phases: [CALCITE, CALCITE], constraints: ['Ca'] }, 'MASS_BALANCE_BAD_PHASE', 'phases.1.name'],
    [{ phases: [{ name: 'x' }], constraints: ['Ca'] }, 'MASS_BALANCE_BAD_PHASE', 'phases.0'],
    [{ phases: [{ name: 'x', equation: 'Ca^2+ + NaX -> CaX2 + Na+' }], constraints: ['Ca'] }, 'MASS_BALANCE_BAD_PHASE', 'phases.0'],
    [{ phases: [{ name: 'x', formula: '(Mg,Fe)2SiO4' }], constraints: ['Ca'] }, 'FORMULA_MIXED_SITE', 'phases.0.formula'],
  ])('gives invalid for %o with %s at %s', (partial, code, field) => {
    const result = solveMassBalance({ initial: {}, final: { Ca: 1 }, ...partial } as unknown as MassBalanceInput);
    expect([result.status, result.error?.code, result.error?.details.field]).toEqual(['invalid', code, field]);
  });
});
