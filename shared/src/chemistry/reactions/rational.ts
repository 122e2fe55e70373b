/**
 * Exact fractions over BigInt: balancing an equation must not round, or a large coefficient
 * set would be judged balanced when it is off by one.
 */

/** A fraction in lowest terms with a positive denominator. */
export interface Fraction {
  readonly numerator: bigint;
  readonly denominator: bigint;
}

export const ZERO: Fraction = { numerator: 0n, denominator: 1n };
export const ONE: Fraction = { numerator: 1n, denominator: 1n };

function abs(value: bigint): bigint {
  return value < 0n ? -value : value;
}

/** Greatest common divisor of two integers (never negative; gcd(0, 0) is 0). */
export function gcd(a: bigint, b: bigint): bigint {
  let x = abs(a);
  let y = abs(b);
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

/** The fraction numerator/denominator in lowest terms. */
export function fraction(numerator: bigint, denominator = 1n): Fraction {
  if (denominator === 0n) throw new RangeError("A fraction cannot have a zero denominator.");
  if (denominator < 0n) {
    numerator = -numerator;
    denominator = -denominator;
  }
  const divisor = gcd(numerator, denominator) || 1n;
  return { numerator: numerator / divisor, denominator: denominator / divisor };
}

export function add(a: Fraction, b: Fraction): Fraction {
  return fraction(a.numerator * b.denominator + b.numerator * a.denominator, a.denominator * b.denominator);
}

export function subtract(a: Fraction, b: Fraction): Fraction {
  return add(a, negate(b));
}

export function multiply(a: Fraction, b: Fraction): Fraction {
  return fraction(a.numerator * b.numerator, a.denominator * b.denominator);
}

export function divide(a: Fraction, b: Fraction): Fraction {
  return fraction(a.numerator * b.denominator, a.denominator * b.numerator);
}

export function negate(a: Fraction): Fraction {
  return { numerator: -a.numerator, denominator: a.denominator };
}

export function isZero(a: Fraction): boolean {
  return a.numerator === 0n;
}

/** -1, 0 or 1. */
export function sign(a: Fraction): number {
  return a.numerator > 0n ? 1 : a.numerator < 0n ? -1 : 0;
}

/** "3", "-3/2". */
export function formatFraction(a: Fraction): string {
  return a.denominator === 1n ? String(a.numerator) : `${a.numerator}/${a.denominator}`;
}

/** Least common multiple of the denominators. */
function commonDenominator(values: readonly Fraction[]): bigint {
  let multiple = 1n;
  for (const value of values) multiple = (multiple * value.denominator) / (gcd(multiple, value.denominator) || 1n);
  return multiple;
}

/**
 * The smallest whole numbers in the same ratio as `values`, with the sign of the first non-zero
 * value made positive: [1/2, 1, 3/2] gives [1, 2, 3].
 */
export function smallestWholeRatio(values: readonly Fraction[]): bigint[] {
  const scale = commonDenominator(values);
  const whole = values.map((value) => (value.numerator * scale) / value.denominator);
  let divisor = 0n;
  for (const value of whole) divisor = gcd(divisor, value);
  if (divisor === 0n) return whole;
  const firstSign = whole.find((value) => value !== 0n)! < 0n ? -1n : 1n;
  return whole.map((value) => (value / divisor) * firstSign);
}
