import type { WaterAnalysis } from '@tallus/contracts';

import { createModelForm, elementsOf, modelRequestOf, phaseGroup } from './model-form';

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
});
