import { balanceReaction } from './balance-reaction';

describe('balanceReaction', () => {
  it('fills in the published coefficients of K-feldspar → kaolinite (R3, Hiscock 2005 Table 3.14)', () => {
    const outcome = balanceReaction({ equation: 'KAlSi3O8 + 2 H+ + H2O -> Al2Si2O5(OH)4 + K+ + 2 H4SiO4' });
    expect(outcome.status).toBe('balanced');
    expect(outcome.equation).toBe('2 KAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 K+ + 4 H4SiO4');
  });

  it('normalises to one mole of a chosen species (R16, Itasca eq. 3.1)', () => {
    const outcome = balanceReaction({ equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', normalizeTo: 'FeS2' });
    expect(outcome.equation).toBe('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
  });

  it('lists the balances of an open reaction, and pins settle it (R15, Reitner & Thiel 2011)', () => {
    const equation = 'FeS2 + O2 + H2O + Fe^3+ -> Fe^2+ + SO4^2- + H+';
    const open = balanceReaction({ equation });
    expect(open.status).toBe('open');
    expect(open.freedom).toBe(2);
    expect(open.balances).toHaveLength(2);
    const pinned = balanceReaction({ equation, pins: { 'Fe^3+': '0', FeS2: '1', H2O: ' ' } });
    expect(pinned.equation).toBe('FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+');
  });

  it('names what cannot balance, and where text does not parse', () => {
    expect(balanceReaction({ equation: 'CaCO3 -> MgO' })).toMatchObject({ status: 'impossible' });
    expect(balanceReaction({ equation: 'CaCO3 + -> CaO' })).toMatchObject({ status: 'invalid', error: { code: 'EQUATION_EMPTY_TERM' } });
  });
});
