import type { Species } from '@tallus/contracts';
import { describe, expect, it } from 'vitest';

import { toOxidationStateMap } from './oxidation-state-map';

const species = (formula: string, oxidationStates: Record<string, string> | null): Species =>
  ({ id: formula, formula, name: formula, phase: 'mineral', oxidationStates, notes: '', source: '', molarMass: '0', builtin: false }) as unknown as Species;

describe('toOxidationStateMap', () => {
  it('When the team gives a formula its own states, then they replace the built-in ones, as on the server', () => {
    // Pyrite Fe(II) with disulfide S(-I): formal states of the trade, common practice (no calculation involved).
    const map = toOxidationStateMap([species('FeS2', { Fe: '2', S: '-1' }), species('FeS', { Fe: '2', S: '-2' })], [species('FeS', { Fe: '20/9', S: '-2' })]);

    expect(map).toEqual({ FeS2: { Fe: '2', S: '-1' }, FeS: { Fe: '20/9', S: '-2' } });
  });

  it('When a species has no explicit states, then it is left to the rules', () => {
    expect(toOxidationStateMap([species('CaCO3', null)], [])).toEqual({});
  });
});
