import { splitBySpan } from './split-by-span';

describe('splitBySpan', () => {
  it.each([
    ['CaX3', { start: 2, end: 3 }, { before: 'Ca', marked: 'X', after: '3' }],
    ['(Mg,Fe)2SiO4', { start: 0, end: 7 }, { before: '', marked: '(Mg,Fe)', after: '2SiO4' }],
    ['Ca(OH', { start: 5, end: 5 }, { before: 'Ca(OH', marked: ' ', after: '' }],
    ['H2O', { start: 2, end: 99 }, { before: 'H2', marked: 'O', after: '' }],
    ['H2O', { start: -4, end: 1 }, { before: '', marked: 'H', after: '2O' }],
  ])('cuts %s around %o', (text, span, expected) => {
    expect(splitBySpan(text, span)).toEqual(expected);
  });
});
