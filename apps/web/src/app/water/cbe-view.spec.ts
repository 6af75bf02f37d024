// Source of the ±5 % threshold: common practice of laboratory QA (Marshall Miller & Assoc.; shared/reference/practice.md);
// the checks are about how a CBE is labelled, the CBE itself is computed by libs/chem.
import { chargeBalance } from '@tallus/chem';

import { cbeView } from './cbe-view';

describe('cbeView', () => {
  it('flags an analysis beyond the threshold with an icon and a word, and says which side is in excess', () => {
    const view = cbeView({ cbePercent: 7.2, threshold: 5, flagged: true });
    expect([view.icon, view.label, view.tone]).toEqual(['flag', 'over ±5 %', 'danger']);
    expect(view.meaning).toContain('cations exceed anions');
  });

  it('reads a balanced analysis as within the threshold', () => {
    expect(cbeView({ cbePercent: -1.4, threshold: 2.5, flagged: false }).label).toBe('within ±2.5 %');
  });

  it('says when no CBE can be computed', () => {
    expect(cbeView({ cbePercent: null, threshold: 5, flagged: false }).label).toBe('no CBE');
  });

  it('agrees with the engine on a seawater-like water that balances (meq/L by hand: Na 10, Cl 10)', () => {
    const balance = chargeBalance({ solutes: { Na: { value: 10, unit: 'meq/L' }, Cl: { value: 10, unit: 'meq/L' } } });
    expect(cbeView(balance).label).toBe('within ±5 %');
  });
});
