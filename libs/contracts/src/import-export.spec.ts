import { describe, expect, it } from 'vitest';
import { rationalTextSchema } from './chem-results';
import { reactionSetFileSchema } from './import-export';
import { statusCountsSchema } from './reaction-sets';

describe('reaction-set file schema', () => {
  it('When a minimal file is parsed, then the defaults fill description, site, citations and lists', () => {
    const file = reactionSetFileSchema.parse({
      format: 'tallus.reaction-set',
      version: 1,
      set: { name: 'Pyrite' },
      reactions: [{ name: 'R15', kind: 'oxidation', equation: 'FeS2 + O2 + H2O -> Fe^2+ + SO4^2- + H+' }],
    });

    expect(file.set).toEqual({ name: 'Pyrite', description: '', site: '' });
    expect(file.reactions[0]).toMatchObject({ reference: null, citation: '', notes: '' });
    expect(file.netReactions).toEqual([]);
    expect(file.species).toEqual([]);
  });

  it('When a file has several faults, then every one is reported at its path', () => {
    const result = reactionSetFileSchema.safeParse({
      format: 'tallus.reaction-set',
      version: 2,
      set: { name: '' },
      reactions: [{ name: 'x', kind: 'melting', equation: 'A -> B' }],
      netReactions: [{ name: 'n', reactions: [{ index: 0, name: 'x' }], cancel: [] }],
    });

    const paths = result.error?.issues.map((issue) => issue.path.join('.')).sort();
    expect(paths).toEqual(['netReactions.0.reactions.0', 'reactions.0.kind', 'set.name', 'version']);
  });
});

describe('rationalTextSchema', () => {
  it.each([
    ['2', true],
    ['-1', true],
    ['15/4', true],
    ['0.35', true],
    ['1/0', false],
    ['two', false],
    ['', false],
  ])('When %s is parsed, then it is accepted: %s', (text, isAccepted) => {
    expect(rationalTextSchema.safeParse(text).success).toBe(isAccepted);
  });
});

describe('statusCountsSchema', () => {
  it('When a count of every balance status is given, then it parses, and without one it fails', () => {
    const counts = { balanced: 3, unbalanced: 1, open: 0, impossible: 0, invalid: 2 };

    expect(statusCountsSchema.parse(counts)).toEqual(counts);
    expect(statusCountsSchema.safeParse({ balanced: 3 }).success).toBe(false);
  });
});
