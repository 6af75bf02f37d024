import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { matrixRank } from '../balance/null-space';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';
import { solveMassBalance } from './solve-mass-balance';

// Each constrained element sits in one solute, so a forward water is easy to write down.
const SOLUTE_OF: Record<string, string> = { Na: 'Na', K: 'K', Cl: 'Cl', Ca: 'Ca', Mg: 'Mg', C: 'HCO3', S: 'SO4', F: 'F' };
const CONSTRAINTS = Object.keys(SOLUTE_OF);
const POOL = ['NaCl', 'KCl', 'CaCO3', 'CaMg(CO3)2', 'CaSO4·2H2O', 'CO2(g)', 'CaF2', 'MgSO4·7H2O', 'Na2SO4', 'MgCO3', 'K2SO4', 'NaF'];

function column(formula: string): Rational[] {
  const composition = parseFormula(formula).composition;
  return CONSTRAINTS.map((element) => composition.get(element) ?? Rational.ZERO);
}

function isIndependent(formulas: readonly string[]): boolean {
  const rows = CONSTRAINTS.map((_, row) => formulas.map((formula) => {
    const value = column(formula)[row];
    return value.num;
  }));
  return matrixRank(rows, formulas.length) === formulas.length;
}

describe('mass balance properties', () => {
  it('recovers random transfers of random independent phases exactly (forward, then inverse)', () => {
    const arbitrary = fc
      .subarray(POOL, { minLength: 1, maxLength: 6 })
      .chain((formulas) => fc.tuple(fc.constant(formulas), fc.array(fc.integer({ min: -300, max: 300 }).filter((n) => n !== 0), { minLength: formulas.length, maxLength: formulas.length })));
    fc.assert(
      fc.property(arbitrary, ([formulas, hundredths]) => {
        fc.pre(isIndependent(formulas));
        const transfers = hundredths.map((value) => Rational.of(value, 100));
        const initial: Record<string, string> = {};
        const final: Record<string, string> = {};
        CONSTRAINTS.forEach((element, row) => {
          const delta = formulas.reduce((sum, formula, index) => sum.add(column(formula)[row].mul(transfers[index])), Rational.ZERO);
          initial[SOLUTE_OF[element]] = '50';
          final[SOLUTE_OF[element]] = Rational.of(50).add(delta).toDecimalString() ?? '';
        });
        const phases = formulas.map((formula) => ({ name: formula, formula }));
        const result = solveMassBalance({ initial, final, phases, constraints: CONSTRAINTS });
        const expected = Object.fromEntries(formulas.map((formula, index) => [formula, transfers[index].toString()]));
        const models = result.models.map((model) => Object.fromEntries(Object.entries(model.transfers).map(([name, value]) => [name, value.toString()])));
        expect(result.status).toBe('exact');
        expect(models).toContainEqual(expected);
      }),
      { numRuns: 150 },
    );
  });

  it('only reports minimal models: dropping any phase of a model never fits', () => {
    const phases = POOL.map((formula) => ({ name: formula, formula }));
    const final = { Na: '1.2', K: '0.3', Cl: '1.1', Ca: '2', Mg: '0.7', HCO3: '3.1', SO4: '1.4', F: '0.2' };
    const result = solveMassBalance({ initial: {}, final, phases, constraints: CONSTRAINTS });
    expect(result.models.length).toBeGreaterThan(1);
    for (const model of result.models) {
      expect(Object.values(model.transfers).every((value) => !value.isZero())).toBe(true);
      for (const dropped of model.phases) {
        const fewer = phases.filter((phase) => model.phases.includes(phase.name) && phase.name !== dropped);
        if (fewer.length === 0) continue;
        expect(solveMassBalance({ initial: {}, final, phases: fewer, constraints: CONSTRAINTS }).status).not.toBe('exact');
      }
    }
  });
});
