import { DiffableReaction, diffReactions } from './diff-reactions';

const reaction = (id: string, name: string, equation: string): DiffableReaction => ({
  id,
  name,
  kind: 'oxidation',
  equation,
  reference: null,
  citation: '',
  notes: '',
});

describe('diffReactions', () => {
  it('marks added, removed, changed and unchanged reactions, in the newer order', () => {
    const before = [reaction('a', 'Pyrite by O2', 'FeS2 + O2 -> x'), reaction('b', 'Calcite', 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O'), reaction('c', 'Gone', 'A -> B')];
    const after = [reaction('b', 'Calcite', 'CaCO3 + 2 H+ -> Ca^2+ + CO2 + H2O'), reaction('a', 'Pyrite by O2', 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+'), reaction('d', 'New', 'C -> D')];
    const rows = diffReactions(before, after);
    expect(rows.map((row) => [row.name, row.change, row.fields])).toEqual([
      ['Calcite', 'unchanged', []],
      ['Pyrite by O2', 'changed', ['equation']],
      ['New', 'added', []],
      ['Gone', 'removed', []],
    ]);
  });

  it('matches by name when the ids differ (a copied set)', () => {
    const rows = diffReactions([reaction('x', 'Calcite', 'A -> B')], [reaction('y', 'Calcite', 'A -> B')]);
    expect(rows[0].change).toBe('unchanged');
  });
});
