// Source: the transfers below are an invented solver result; the checks are about charting them faithfully
// (exact text kept, rule breaks marked), not about chemistry.
import type { MassBalanceSolution } from '@tallus/contracts';

import { transferBars } from './transfer-bars';

describe('transferBars', () => {
  it('keeps the exact transfers beside their values and marks a rule broken', () => {
    const model = {
      phases: ['plagioclase', 'kaolinite', 'calcite'],
      transfers: { plagioclase: '11/50', kaolinite: '-3/20', calcite: '-1/100' },
      transfersDecimal: { plagioclase: 0.22, kaolinite: -0.15, calcite: -0.01 },
      valid: false,
      ranges: { plagioclase: [0.2, 0.24], kaolinite: [-0.16, -0.14], calcite: [-0.02, 0.001] },
      impliedReaction: { status: 'balanced', equation: null },
    } as unknown as MassBalanceSolution;
    const bars = transferBars(model, { plagioclase: 'dissolve', kaolinite: 'precipitate', calcite: 'dissolve' });
    expect(bars.map((bar) => [bar.phase, bar.exact, bar.value, bar.breaksRule])).toEqual([
      ['plagioclase', '11/50', 0.22, false],
      ['kaolinite', '-3/20', -0.15, false],
      ['calcite', '-1/100', -0.01, true],
    ]);
    expect(bars[2].range).toEqual([-0.02, 0.001]);
  });
});
