import type { NetReaction, Reaction } from '@tallus/contracts';

import { protonBars, rationalValue } from './proton-chart-data';

function reaction(name: string, status: Reaction['result']['status'], perMole: string | null): Reaction {
  return {
    name,
    result: { status, protonBudget: perMole === null ? null : { reference: 'FeS2', perMole, perKg: null, perTonneRock: null, caco3KgPerTonne: null } },
  } as Reaction;
}

describe('protonBars', () => {
  it('plots balanced reactions and combined net reactions, and counts the ones left out', () => {
    const net = { name: 'Pyrite to ferric hydroxide', result: { protonBudget: { reference: 'FeS2', perMole: '4', perKg: null, perTonneRock: null, caco3KgPerTonne: null } } } as NetReaction;
    const { bars, skipped } = protonBars([reaction('R15', 'balanced', '2'), reaction('Calcite', 'balanced', '-2'), reaction('Draft', 'open', null)], [net]);
    expect(bars.map((bar) => [bar.label, bar.value, bar.isNet])).toEqual([
      ['R15', 2, false],
      ['Calcite', -2, false],
      ['Net: Pyrite to ferric hydroxide', 4, true],
    ]);
    expect(skipped).toBe(1);
  });
});

describe('rationalValue', () => {
  it.each([['-15/4', -3.75], ['2', 2], ['0.5', 0.5], ['x', 0]])('reads %s', (text, value) => {
    expect(rationalValue(text)).toBe(value);
  });
});
