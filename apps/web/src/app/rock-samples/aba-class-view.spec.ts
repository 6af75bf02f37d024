import { acidBaseAccounting } from '@tallus/chem';

import { abaClassView } from './aba-class-view';

describe('abaClassView', () => {
  it.each([
    // AP = 31.25 × 1 % S = 31.25; NPR = 20 / 31.25 = 0.64 (Sobek et al. 1978; bands after Price 2009).
    [1, 20, 'potentially acid generating', 'dangerous'],
    [1, 62.5, 'uncertain', 'help'],
    [0.1, 40, 'non-acid generating', 'check_circle'],
  ])('classes %s %% sulfide S with NP %s as %s, with an icon', (sulfur, np, label, icon) => {
    const view = abaClassView(acidBaseAccounting({ sulfideSulfurPercent: sulfur, neutralisationPotential: np }).classification);
    expect([view.label, view.icon]).toEqual([label, icon]);
  });
});
