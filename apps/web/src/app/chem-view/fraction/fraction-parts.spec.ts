// Source: none needed: these check how exact rationals are split for display (sign, numerator, denominator), no chemistry.
import { fractionParts } from './fraction-parts';

describe('fractionParts', () => {
  it.each([
    ['15/4', { isNegative: false, whole: '', numerator: '15', denominator: '4', text: '15/4' }],
    ['-7/2', { isNegative: true, whole: '', numerator: '7', denominator: '2', text: '-7/2' }],
    ['-2', { isNegative: true, whole: '2', numerator: '', denominator: '', text: '-2' }],
    ['0.69', { isNegative: false, whole: '0.69', numerator: '', denominator: '', text: '0.69' }],
  ])('splits %s', (text, expected) => {
    expect(fractionParts(text)).toEqual(expected);
  });
});
