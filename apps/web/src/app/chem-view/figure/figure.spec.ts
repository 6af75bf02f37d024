// Source: none needed: these check number formatting only (fixed decimals, true minus sign), no chemistry.
import { formatFigure } from './figure';

describe('formatFigure', () => {
  it.each([
    [-3.5928961, 3, '−3.593'],
    [16.6912, 2, '16.69'],
    [1234.5, 1, '1,234.5'],
    [0, 2, '0.00'],
    [null, 2, '–'],
  ])('writes %s with %i decimals as %s', (value, decimals, expected) => {
    expect(formatFigure(value, decimals)).toBe(expected);
  });
});
