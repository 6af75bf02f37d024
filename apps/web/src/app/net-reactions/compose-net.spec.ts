import { composeNet, speciesOf } from './compose-net';

// R15 (Reitner & Thiel 2011) + 1/4 × R20 (Andrews et al. eq. 5.16) = R16 (Itasca eq. 3.1).
const pyriteToFerrous = { id: 'r15', equation: 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+', multiplier: '' };
const ferrousOxidation = { id: 'r20', equation: '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+', multiplier: '' };

describe('composeNet', () => {
  it('cancels Fe2+ with exact multipliers 1 and 1/4 and gives 4 mol H+ per mol pyrite', () => {
    const net = composeNet([pyriteToFerrous, ferrousOxidation], ['Fe^2+']);
    expect(net.status).toBe('combined');
    expect(net.multipliers).toEqual(['1', '1/4']);
    expect(net.equation).toBe('FeS2 + 15/4 O2 + 7/2 H2O -> 2 SO4^2- + 4 H+ + Fe(OH)3');
    expect(net.check?.proton?.perMole).toBe('4');
  });

  it('says when several combinations cancel the species', () => {
    expect(composeNet([pyriteToFerrous, ferrousOxidation], []).status).toBe('several');
  });

  it('is empty until reactions are picked', () => {
    expect(composeNet([], ['Fe^2+']).status).toBe('empty');
  });
});

describe('speciesOf', () => {
  it('lists each species once in canonical text, however it was written', () => {
    expect(speciesOf(['Fe²⁺ + H+ -> Fe^3+ + e-', '4 Fe^2+ + O2 -> 4 Fe^3+ + 2 O^2-', 'not an equation'])).toEqual([
      'Fe^2+',
      'H+',
      'Fe^3+',
      'e-',
      'O2',
      'O^2-',
    ]);
  });
});
