/**
 * Exact rational numbers on BigInt, immutable and normalised at construction:
 * the fraction is reduced and the sign sits on the numerator.
 */

/** Greatest common divisor of two BigInts, always ≥ 0. */
export function gcdBig(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) {
    const t = x % y;
    x = y;
    y = t;
  }
  return x;
}

/** Least common multiple of two BigInts, always ≥ 0 (0 when either is 0). */
export function lcmBig(a: bigint, b: bigint): bigint {
  if (a === 0n || b === 0n) return 0n;
  const product = (a / gcdBig(a, b)) * b;
  return product < 0n ? -product : product;
}

const RATIONAL_PATTERN = /^([+-]?)(\d+)(?:\.(\d+))?(?:\/(\d+))?$/;

/**
 * An exact fraction `num/den` with `den > 0` and `gcd(num, den) = 1`.
 * `JSON.stringify` writes it as its string form (`"15/4"`, `"-2"`, `"0"`).
 *
 * @example
 * Rational.parse('0.35').toString(); // "7/20"
 * Rational.of(15, 4).add(Rational.ONE).toString(); // "19/4"
 */
export class Rational {
  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);

  readonly num: bigint;
  readonly den: bigint;

  private constructor(num: bigint, den: bigint) {
    this.num = num;
    this.den = den;
  }

  /**
   * Builds `num/den` and normalises it.
   * @throws Error when `den` is zero or a number is not an integer (a programming error).
   */
  static of(num: bigint | number, den: bigint | number = 1n): Rational {
    const n = toBigInt(num);
    const d = toBigInt(den);
    if (d === 0n) throw new Error('Rational denominator is zero');
    if (n === 0n) return Rational.ZERO;
    const g = gcdBig(n, d);
    const sign = d < 0n ? -1n : 1n;
    return new Rational((sign * n) / g, (sign * d) / g);
  }

  /**
   * Reads `"7"`, `"-2"`, `"0.35"`, `"15/4"` or `"1.5/2"` exactly; returns `null` when the text is
   * not such a number or the denominator is zero.
   * @example Rational.tryParse('0.35')?.toString(); // "7/20"
   */
  static tryParse(text: string): Rational | null {
    const match = RATIONAL_PATTERN.exec(text.trim());
    if (!match) return null;
    const [, sign, whole, fraction = '', divisor] = match;
    const scale = 10n ** BigInt(fraction.length);
    let num = BigInt(whole + fraction);
    if (sign === '-') num = -num;
    const den = divisor === undefined ? 1n : BigInt(divisor);
    if (den === 0n) return null;
    return Rational.of(num, scale * den);
  }

  /**
   * Like {@link Rational.tryParse} but throws a plain Error for text that is not a number
   * (for trusted input such as tables in the source).
   */
  static parse(text: string): Rational {
    const value = Rational.tryParse(text);
    if (value === null) throw new Error(`Not a rational number: ${text}`);
    return value;
  }

  /**
   * Converts an integer or a finite decimal number (via its shortest decimal text).
   * @throws Error for a number that is not finite or only has an exponent form (`1e-7`).
   */
  static fromNumber(value: number): Rational {
    const read = Rational.tryFrom(value);
    if (read === null) throw new Error(`Not a finite number with an exact decimal form: ${value}`);
    return read;
  }

  /**
   * Reads a value as a caller gives it: a Rational as is, an integer or a finite decimal number
   * exactly (via its shortest decimal text), text as {@link Rational.tryParse} reads it. Returns
   * `null` otherwise (`"abc"`, `NaN`, `1e-7`), so that each caller raises its own error.
   * @example Rational.tryFrom(0.35)?.toString(); // "7/20"
   */
  static tryFrom(value: Rational | number | string): Rational | null {
    if (value instanceof Rational) return value;
    if (typeof value !== 'number') return Rational.tryParse(String(value));
    if (!Number.isFinite(value)) return null;
    if (Number.isInteger(value)) return Rational.of(BigInt(value));
    const text = value.toString();
    return text.includes('e') ? null : Rational.tryParse(text);
  }

  add(other: Rational): Rational {
    if (this.den === other.den) return Rational.of(this.num + other.num, this.den);
    return Rational.of(this.num * other.den + other.num * this.den, this.den * other.den);
  }

  sub(other: Rational): Rational {
    return this.add(other.neg());
  }

  mul(other: Rational): Rational {
    return Rational.of(this.num * other.num, this.den * other.den);
  }

  /** @throws Error when dividing by zero. */
  div(other: Rational): Rational {
    if (other.num === 0n) throw new Error('Division by zero');
    return Rational.of(this.num * other.den, this.den * other.num);
  }

  neg(): Rational {
    return this.num === 0n ? this : new Rational(-this.num, this.den);
  }

  abs(): Rational {
    return this.num < 0n ? this.neg() : this;
  }

  /** -1, 0 or 1. */
  sign(): number {
    return this.num === 0n ? 0 : this.num < 0n ? -1 : 1;
  }

  /** Whether the value is zero. */
  isZero(): boolean {
    return this.num === 0n;
  }

  /** Whether the value is a whole number. */
  isInteger(): boolean {
    return this.den === 1n;
  }

  equals(other: Rational): boolean {
    return this.num === other.num && this.den === other.den;
  }

  /** Negative, zero or positive as `this` is below, equal to or above `other`. */
  compare(other: Rational): number {
    const diff = this.num * other.den - other.num * this.den;
    return diff === 0n ? 0 : diff < 0n ? -1 : 1;
  }

  /** Nearest double; exact for small values. */
  toNumber(): number {
    return Number(this.num) / Number(this.den);
  }

  /** `"15/4"`, `"-2"`, `"0"`. */
  toString(): string {
    return this.den === 1n ? this.num.toString() : `${this.num}/${this.den}`;
  }

  toJSON(): string {
    return this.toString();
  }

  /**
   * The exact decimal text (`"0.35"`) when the denominator has no prime factor but 2 and 5,
   * otherwise `null`.
   */
  toDecimalString(): string | null {
    let rest = this.den;
    let twos = 0;
    let fives = 0;
    while (rest % 2n === 0n) {
      rest /= 2n;
      twos += 1;
    }
    while (rest % 5n === 0n) {
      rest /= 5n;
      fives += 1;
    }
    if (rest !== 1n) return null;
    const digits = Math.max(twos, fives);
    const scaled = (this.num * 10n ** BigInt(digits)) / this.den;
    return formatScaled(scaled, digits);
  }
}

function formatScaled(scaled: bigint, digits: number): string {
  const negative = scaled < 0n;
  const text = (negative ? -scaled : scaled).toString().padStart(digits + 1, '0');
  const whole = text.slice(0, text.length - digits);
  const fraction = text.slice(text.length - digits).replace(/0+$/, '');
  return `${negative ? '-' : ''}${whole}${fraction ? `.${fraction}` : ''}`;
}

function toBigInt(value: bigint | number): bigint {
  if (typeof value === 'bigint') return value;
  if (!Number.isSafeInteger(value)) throw new Error(`Not a safe integer: ${value}`);
  return BigInt(value);
}
