import { checkReaction } from './check-reaction';

// Published reactions: /work/shared/reference/check-values.md §2.
describe('checkReaction', () => {
  it('finds a K-feldspar → kaolinite reaction with wrong coefficients unbalanced, with its residuals', () => {
    const view = checkReaction({ equation: 'KAlSi3O8 + 2 H+ + H2O -> Al2Si2O5(OH)4 + K+ + 2 H4SiO4' });
    expect(view.status).toBe('unbalanced');
    expect(view.mode).toBe('check');
    const residuals = Object.fromEntries(view.residuals.map((row) => [row.label, row.value]));
    expect(residuals).toEqual({ K: '0', Al: '-1', Si: '-1', O: '-8', H: '-8', charge: '1' });
  });

  it('gives the proton budget of R3 (Hiscock 2005, Table 3.14): −1 mol H+ per mol K-feldspar', () => {
    const view = checkReaction({
      equation: '2 KAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 K+ + 4 H4SiO4',
      rockWeightPercent: 10,
    });
    expect(view.status).toBe('balanced');
    expect(view.proton?.perMole).toBe('-1');
    expect(view.proton?.perKg).toBeCloseTo(-1000 / 278.327, 3);
    expect(view.proton?.caco3KgPerTonne).toBeCloseTo(((-1000 / 278.327) * 100 * 100.086) / 2 / 1000, 2);
  });

  it('gives the electron budget of complete pyrite oxidation (R16, Itasca eq. 3.1): 15 e-, 15/4 O2, +4 H+', () => {
    const view = checkReaction({ equation: 'FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+' });
    expect(view.status).toBe('balanced');
    expect(view.electrons?.transferred).toBe('15');
    expect(view.electrons?.o2Demand).toBe('15/4');
    expect(view.proton?.perMole).toBe('4');
  });

  it('balances a reaction written without coefficients, as the server does on save', () => {
    const view = checkReaction({ equation: 'FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', reference: 'FeS2' });
    expect(view).toMatchObject({ status: 'balanced', mode: 'balance' });
    expect(view.balancedEquation).toBe('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
  });

  it('says open when several balances exist, and impossible when none does', () => {
    expect(checkReaction({ equation: 'FeS2 + O2 + H2O + Fe^3+ -> Fe^2+ + SO4^2- + H+' }).status).toBe('open');
    expect(checkReaction({ equation: 'CaCO3 -> MgO' })).toMatchObject({ status: 'impossible' });
  });

  it('reports text that does not parse as invalid, with the code and span of the culprit', () => {
    const view = checkReaction({ equation: 'Ca2+ + CO3^2- -> CaCO3' });
    expect(view.status).toBe('invalid');
    expect(view.error).toMatchObject({ code: 'FORMULA_AMBIGUOUS_CHARGE', span: { start: 0, end: 4 } });
  });

  it('returns the empty check for blank text', () => {
    expect(checkReaction({ equation: '   ' }).status).toBe('empty');
  });

  it('checks a 12-species reaction well within a frame', () => {
    // R3 + R1 + R5 + R13 of the reference values, summed: 12 species.
    const equation =
      '2 KAlSi3O8 + 2 NaAlSi3O8 + CaAl2Si2O8 + Mg2SiO4 + 10 H+ + 19 H2O -> 3 Al2Si2O5(OH)4 + 2 K+ + 2 Na+ + Ca^2+ + 9 H4SiO4 + 2 Mg^2+';
    expect(checkReaction({ equation }).status).toBe('balanced');
    const started = performance.now();
    for (let run = 0; run < 20; run++) checkReaction({ equation });
    // Generous bound for a shared test machine; bench/web measures the real figure.
    expect((performance.now() - started) / 20).toBeLessThan(50);
  });
});
