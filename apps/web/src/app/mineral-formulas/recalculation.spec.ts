// Sources: the recalculation steps follow Brady & Perkins (SERC Carleton, mineral formula recalculation); the An38
// plagioclase is Garrels & Mackenzie's (recalled from memory) and its oxide wt% are computed back from the ideal
// formula with IUPAC 2021 weights; the Colgate olivine is a published worked example (recalled from memory).
import { oxideWeightPercents } from '@tallus/chem';

import { recalculate } from './recalculation';

describe('recalculate', () => {
  it('turns an An38 plagioclase analysis into its formula, An content and weathering reaction (Brady & Perkins; computed)', () => {
    const view = recalculate({ oxides: oxideWeightPercents('Na0.62Ca0.38Al1.38Si2.62O8'), group: 'feldspar', oxygens: null, isDroop: false });
    if (view.status !== 'done') throw new Error(view.status);
    expect(view.formula).toBe('Na0.62Ca0.38Al1.38Si2.62O8');
    expect(view.rows.map((row) => row.element)).toEqual(['Si', 'Al', 'Ca', 'Na']);
    expect(view.endMembers.find((row) => row.key === 'An')?.percent).toBeCloseTo(38, 9);
    expect(view.weathering.equation).toBe('Na0.62Ca0.38Al1.38Si2.62O8 + 69/50 H+ + 317/100 H2O -> 69/100 Al2Si2O5(OH)4 + 31/50 Na+ + 19/50 Ca^2+ + 31/25 H4SiO4');
    expect(view.co2?.bicarbonate).toBeGreaterThan(0);
  });

  it('recalculates the Colgate olivine on 4 O to (Mg1.14Fe0.87Mn0.01)Si0.99O4 with its forsterite content', () => {
    const view = recalculate({ oxides: { SiO2: 34.96, FeO: 36.77, MnO: 0.52, MgO: 27.04 }, group: 'olivine', oxygens: null, isDroop: false });
    if (view.status !== 'done') throw new Error(view.status);
    expect(view.result.total).toBeCloseTo(3.011, 3);
    expect(view.endMembers.find((row) => row.key === 'Fo')?.percent).toBeCloseTo(56.7, 1);
  });

  it('asks for a basis when there is no group, and names the bad oxide', () => {
    expect(recalculate({ oxides: { SiO2: 50 }, group: '', oxygens: null, isDroop: false })).toMatchObject({ status: 'invalid', field: 'oxygens' });
    expect(recalculate({ oxides: { SiO2: 150 }, group: 'olivine', oxygens: null, isDroop: false })).toMatchObject({ status: 'invalid', field: 'oxides.SiO2' });
    expect(recalculate({ oxides: { SiO2: null }, group: 'olivine', oxygens: null, isDroop: false })).toEqual({ status: 'empty' });
  });

  it('warns that Droop (1987) does not apply to micas', () => {
    const view = recalculate({ oxides: { SiO2: 36, Al2O3: 15, FeOT: 20, MgO: 10, K2O: 9, TiO2: 3 }, group: 'mica', oxygens: null, isDroop: true });
    if (view.status !== 'done') throw new Error(view.status);
    expect(view.result.warnings.map((warning) => warning.code)).toContain('DROOP_NOT_APPLICABLE');
  });
});
