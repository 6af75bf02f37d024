import type { RockSample } from '@tallus/contracts';

import { bandLines, npApPoints, onLogAxis } from './np-ap-points';

describe('NP-vs-AP plot data', () => {
  const sample = (name: string, aba: object | null) => ({ name, aba }) as unknown as RockSample;

  it('plots samples with an ABA result and marks AP from total sulfur', () => {
    const points = npApPoints([
      sample('KF-WR-01', { acidPotential: 62.5, neutralisationPotential: 20, classification: 'potentially-acid-generating', sulfurBasis: 'sulfide' }),
      sample('KF-WR-02', null),
      sample('KF-WR-03', { acidPotential: 3.125, neutralisationPotential: 40, classification: 'non-acid-generating', sulfurBasis: 'total' }),
    ]);
    expect(points.map((point) => [point.name, point.isTotalSulfur])).toEqual([['KF-WR-01', false], ['KF-WR-03', true]]);
  });

  it('draws NP = 1 × AP and NP = 3 × AP across the range, from the floor on log axes', () => {
    const points = npApPoints([sample('a', { acidPotential: 62.5, neutralisationPotential: 20, classification: 'uncertain', sulfurBasis: 'sulfide' })]);
    const lines = bandLines({ acidGenerating: 1, nonAcidGenerating: 3 }, points, true);
    expect(lines.map((line) => line.label)).toEqual(['NPR = 1', 'NPR = 3']);
    expect(lines[1].points).toEqual([{ x: 0.1, y: expect.closeTo(0.3, 12) }, { x: 80, y: 240 }]);
    expect(onLogAxis(0)).toBe(0.1);
  });
});
