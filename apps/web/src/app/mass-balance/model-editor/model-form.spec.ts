import type { MassBalanceModel, WaterAnalysis } from '@tallus/contracts';

import { commonPercentOf, createModelForm, elementsOf, fillModelForm, modelRequestOf, phaseGroup, soluteControl, solutesOf } from './model-form';

const water = (id: string, solutes: Record<string, string>) =>
  ({ id, solutes: Object.fromEntries(Object.entries(solutes).map(([key, value]) => [key, { value, unit: 'mmol/L' }])) }) as unknown as WaterAnalysis;

describe('model form', () => {
  const rain = water('00000000-0000-4000-8000-000000000001', { Na: '0.024', Ca: '0.010', HCO3: '0.018' });
  const spring = water('00000000-0000-4000-8000-000000000002', { Na: '0.134', Ca: '0.078', SiO2: '0.41', SO4: '<0.01' });

  it('offers the elements the waters report, carbon for bicarbonate, without O and H', () => {
    expect(elementsOf([rain, spring])).toEqual(['C', 'Ca', 'Na', 'S', 'Si']);
  });

  it('builds the request: pure water as null, one source per phase, the uncertainty on every solute of both waters', () => {
    const form = createModelForm();
    form.controls.phases.push(phaseGroup({ name: 'plagioclase', source: 'formula', text: 'Na0.62Ca0.38Al1.38Si2.62O8', rule: 'dissolve' }));
    form.controls.phases.push(phaseGroup({ name: 'calcite', source: 'species', speciesId: 'builtin:calcite' }));
    form.patchValue({ name: ' Spring ', finalWaterId: spring.id, constraints: ['Na', 'Ca'], uncertaintyPercent: 5 });
    const request = modelRequestOf(form.getRawValue(), [rain, spring]);
    expect(request).toEqual({
      name: 'Spring',
      description: '',
      initialWaterId: null,
      finalWaterId: spring.id,
      phases: [
        { name: 'plagioclase', rule: 'dissolve', formula: 'Na0.62Ca0.38Al1.38Si2.62O8' },
        { name: 'calcite', rule: 'either', speciesId: 'builtin:calcite' },
      ],
      constraints: ['Na', 'Ca'],
      uncertainty: { Na: 5, Ca: 5, SiO2: 5, SO4: 5 },
    });
  });

  describe('uncertainty per solute', () => {
    const both = { initialWaterId: rain.id, finalWaterId: spring.id };
    const stored = (uncertainty: Record<string, number>) =>
      ({ name: 'Spring', description: '', ...both, phases: [], constraints: ['Na'], uncertainty }) as unknown as MassBalanceModel;

    it('lists the solutes of both waters once, in their order', () => {
      expect(solutesOf(both, [rain, spring])).toEqual(['Na', 'Ca', 'HCO3', 'SiO2', 'SO4']);
    });

    it('gives every listed solute the default when none has its own', () => {
      const form = createModelForm();
      form.patchValue({ ...both, uncertaintyPercent: 5 });
      expect(modelRequestOf(form.getRawValue(), [rain, spring]).uncertainty).toEqual({ Na: 5, Ca: 5, HCO3: 5, SiO2: 5, SO4: 5 });
    });

    it('sends a solute its own percentage over the default, and leaves out those at 0', () => {
      const form = createModelForm();
      form.patchValue({ ...both, uncertaintyPercent: 5 });
      soluteControl(form, 'SiO2').setValue(20);
      soluteControl(form, 'SO4').setValue(0);
      expect(modelRequestOf(form.getRawValue(), [rain, spring]).uncertainty).toEqual({ Na: 5, Ca: 5, HCO3: 5, SiO2: 20 });
    });

    it('sends only the overrides when there is no default', () => {
      const form = createModelForm();
      form.patchValue(both);
      soluteControl(form, 'Ca').setValue(3);
      expect(modelRequestOf(form.getRawValue(), [rain, spring]).uncertainty).toEqual({ Ca: 3 });
    });

    it.each([
      [{}, null],
      [{ Na: 2 }, 2],
      [{ Na: 2, Ca: 5, SO4: 5 }, 5],
      [{ Na: 2, Ca: 5 }, 5],
    ])('takes the most common percentage of %o as the default', (uncertainty, expected) => {
      expect(commonPercentOf(uncertainty)).toBe(expected);
    });

    it.each([
      ['a mixed map', { Na: 5, Ca: 5, HCO3: 2.5, SiO2: 10, SO4: 5 }],
      ['a map missing a solute', { Na: 5, Ca: 5, SiO2: 10 }],
      ['a map with two values, one each', { Na: 3, Ca: 4 }],
      ['an empty map', {}],
    ])('sends the stored uncertainty back unchanged: %s', (_name, uncertainty) => {
      const form = createModelForm();
      fillModelForm(form, stored(uncertainty), [rain, spring]);
      expect(modelRequestOf(form.getRawValue(), [rain, spring]).uncertainty).toEqual(uncertainty);
    });

    it('restores the most common percentage as the default and the others as overrides', () => {
      const form = createModelForm();
      soluteControl(form, 'Na').setValue(50);
      fillModelForm(form, stored({ Na: 5, Ca: 5, HCO3: 2.5, SiO2: 10, SO4: 5 }), [rain, spring]);
      expect(form.controls.uncertaintyPercent.value).toBe(5);
      expect(form.getRawValue().uncertaintyBySolute).toEqual({ Na: null, Ca: null, HCO3: 2.5, SiO2: 10, SO4: null });
    });
  });
});
