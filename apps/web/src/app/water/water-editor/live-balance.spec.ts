// Sources: molar masses from the IUPAC 2021 abridged weights (Prohaska et al. 2022); alkalinity as CaCO3 at
// 50.04 mg per meq (Standard Methods 2320); CBE = (Σcat − Σan)/(Σcat + Σan) × 100 (Marshall Miller & Assoc.).
import { liveBalance } from './live-balance';

describe('liveBalance', () => {
  const options = { pH: 7.2, threshold: 5, convention: 'standard' as const };

  it('converts mg/L through molar masses and balances a calcium bicarbonate water (Standard Methods 2320: 50.04 mg CaCO3 per meq)', () => {
    const live = liveBalance(
      [
        { key: 'Ca', value: '40.078', unit: 'mg/L' },
        { key: 'alkalinity', value: '100.086', unit: 'mg/L as CaCO3' },
      ],
      options,
    );
    expect(live.rows.map((row) => [row?.key, row?.mmolPerL, row?.meqPerL])).toEqual([
      ['Ca', expect.closeTo(1, 6), expect.closeTo(2, 6)],
      ['alkalinity', expect.closeTo(2, 3), expect.closeTo(2, 3)],
    ]);
    expect(live.balance?.cbePercent).toBeCloseTo(0, 2);
    expect(live.balance?.flagged).toBe(false);
  });

  it('keeps a value below detection as a limit and counts it 0, never as a measured zero', () => {
    const live = liveBalance(
      [
        { key: 'Na', value: '23', unit: 'mg/L' },
        { key: 'K', value: '<0.01', unit: 'mg/L' },
        { key: 'Cl', value: '35.45', unit: 'mg/L' },
      ],
      options,
    );
    expect(live.rows[1]).toMatchObject({ isBelowDetection: true, error: null });
    expect(live.balance?.notes.map((note) => note.code)).toContain('BELOW_DETECTION');
  });

  it('keeps one entry per typed row, empty rows included, so each row shows its own conversion', () => {
    const live = liveBalance([{ key: 'Mg', value: '', unit: 'mg/L' }, { key: 'Na', value: '<0.5', unit: 'mg/L' }], options);
    expect(live.rows[0]).toBeNull();
    expect(live.rows[1]).toMatchObject({ key: 'Na', isBelowDetection: true });
  });

  it('flags an imbalance beyond the threshold and says what is wrong with an unreadable row', () => {
    const live = liveBalance(
      [
        { key: 'Ca', value: '80', unit: 'mg/L' },
        { key: 'Cl', value: '35', unit: 'mg/L' },
        { key: 'SO4', value: 'n.d.', unit: 'mg/L' },
      ],
      options,
    );
    expect(live.balance?.flagged).toBe(true);
    expect(live.rows[2]?.error).toBeTruthy();
  });
});
