import { formatOxidationStates, parseOxidationStates } from './oxidation-states-text';

describe('parseOxidationStates', () => {
  it.each([
    ['Fe 2, S -1', { states: { Fe: '2', S: '-1' } }],
    ['Fe: 8/3', { states: { Fe: '8/3' } }],
    ['As=-1; S -1; Fe +2', { states: { As: '-1', S: '-1', Fe: '2' } }],
    ['  ', { states: null }],
  ])('reads %s', (text, expected) => {
    expect(parseOxidationStates(text)).toEqual(expected);
  });

  it('refuses an entry without a state, naming it', () => {
    const result = parseOxidationStates('Fe 2, sulfur');
    expect('error' in result && result.error).toContain('sulfur');
  });

  it('writes states back as the field shows them', () => {
    expect(formatOxidationStates({ Fe: '2', S: '-1' })).toBe('Fe 2, S -1');
    expect(formatOxidationStates(null)).toBe('');
  });
});
