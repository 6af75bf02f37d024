import fc from 'fast-check';
import Fraction from 'fraction.js';
import { describe, expect, it } from 'vitest';
import { Rational } from './rational';

describe('Rational', () => {
  it.each([
    ['7', '7'],
    ['-2', '-2'],
    ['0.35', '7/20'],
    ['15/4', '15/4'],
    ['6/4', '3/2'],
    ['1.38', '69/50'],
    ['0', '0'],
    ['-0.5', '-1/2'],
  ])('reads %s exactly as %s', (text, expected) => {
    expect(Rational.parse(text).toString()).toBe(expected);
  });

  it.each(['', 'abc', '1/0', '1.', '.5', '1e3'])('refuses %j', (text) => {
    expect(Rational.tryParse(text)).toBeNull();
  });

  it.each([
    [Rational.of(15, 4), '15/4'],
    [0.35, '7/20'],
    [-3, '-3'],
    [' 15/4 ', '15/4'],
    ['abc', null],
    ['1e-7', null],
    [1e-7, null],
    [Number.NaN, null],
    [Number.POSITIVE_INFINITY, null],
  ])('reads the caller value %j with tryFrom as %s, or null', (value, expected) => {
    expect(Rational.tryFrom(value)?.toString() ?? null).toBe(expected);
  });

  it.each([
    ['7/20', '0.35'],
    ['69/50', '1.38'],
    ['-1/8', '-0.125'],
    ['3', '3'],
    ['1/3', null],
  ])('writes %s as the decimal %s', (text, expected) => {
    expect(Rational.parse(text).toDecimalString()).toBe(expected);
  });

  it('normalises sign and gcd at construction', () => {
    const value = Rational.of(6n, -4n);
    expect([value.num, value.den]).toEqual([-3n, 2n]);
  });

  it('serialises to JSON as its string form', () => {
    expect(JSON.stringify({ x: Rational.of(15, 4) })).toBe('{"x":"15/4"}');
  });

  it('agrees with fraction.js on +, −, ×, ÷ and comparison (independent implementation)', () => {
    const part = fc.tuple(fc.integer({ min: -10_000, max: 10_000 }), fc.integer({ min: 1, max: 10_000 }));
    fc.assert(
      fc.property(part, part, ([an, ad], [bn, bd]) => {
        const a = Rational.of(an, ad);
        const b = Rational.of(bn, bd);
        const fa = new Fraction(an, ad);
        const fb = new Fraction(bn, bd);
        expect(a.add(b).toString()).toBe(fa.add(fb).toFraction());
        expect(a.sub(b).toString()).toBe(fa.sub(fb).toFraction());
        expect(a.mul(b).toString()).toBe(fa.mul(fb).toFraction());
        if (bn !== 0) expect(a.div(b).toString()).toBe(fa.div(fb).toFraction());
        expect(a.compare(b)).toBe(fa.compare(fb));
      }),
    );
  });
});
