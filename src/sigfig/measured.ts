/**
 * A measured number: an exact decimal value carrying the precision it was
 * measured to, as the position of its last significant digit. Exact numbers
 * (counts, defined factors) have no last significant digit and never limit.
 *
 * Rules (OpenStax Chemistry 2e §1.5): products and quotients keep the fewest
 * significant figures; sums and differences keep the fewest decimal places.
 * Values are never rounded inside a calculation; see round.ts for the one
 * rounding at the end.
 */
import { Decimal } from '../exact/decimal.js';

export interface Measured {
  /** The value, kept in full (guard digits included). */
  value: Decimal;
  /**
   * Power of ten of the last significant digit: -3 for 18.015, 2 for 1300
   * (trailing zeros without a decimal point are not significant), 0 for '250.'.
   * null for exact numbers.
   */
  lsd: number | null;
}

/**
 * An exact number: it never limits precision.
 *
 * @example
 * exact(2).lsd // null
 */
export function exact(value: string | number | Decimal): Measured {
  return { value: new Decimal(value), lsd: null };
}

/**
 * Power of ten of the most significant digit (0 for 0).
 *
 * @example
 * msd(new Decimal('0.00340')) // -3
 */
export function msd(value: Decimal): number {
  if (value.isZero()) return 0;
  return value.abs().e;
}

/**
 * Significant figures of a measured number (Infinity for exact numbers).
 *
 * @example
 * sigFigsOf({ value: new Decimal('18.015'), lsd: -3 }) // 5
 */
export function sigFigsOf(m: Measured): number {
  if (m.lsd === null) return Infinity;
  if (m.value.isZero()) return Math.max(1, -m.lsd); // '0.00' has its decimals as precision
  return Math.max(1, msd(m.value) - m.lsd + 1);
}

/** Last-significant-digit position for a value kept to n significant figures. */
export function lsdForSigFigs(value: Decimal, n: number): number {
  return msd(value) - n + 1;
}

/**
 * Product: the result keeps the fewest significant figures of the measured factors.
 *
 * @example
 * times(read('1.008'), exact(2)) // 2.016, 4 significant figures
 */
export function times(a: Measured, b: Measured): Measured {
  return byFigures(a.value.times(b.value), a, b);
}

/**
 * Quotient: the result keeps the fewest significant figures. Throws RangeError on division by zero.
 *
 * @example
 * dividedBy(read('8.80'), read('2.0')) // 4.4, 2 significant figures
 */
export function dividedBy(a: Measured, b: Measured): Measured {
  if (b.value.isZero()) throw new RangeError('division by zero');
  return byFigures(a.value.div(b.value), a, b);
}

function byFigures(value: Decimal, a: Measured, b: Measured): Measured {
  const n = Math.min(sigFigsOf(a), sigFigsOf(b));
  return { value, lsd: n === Infinity ? null : lsdForSigFigs(value, n) };
}

/**
 * Sum: the result keeps the fewest decimal places (the highest last-digit position).
 *
 * @example
 * plus(read('2.016'), read('15.999')) // 18.015, last digit at 10^-3
 */
export function plus(a: Measured, b: Measured): Measured {
  return { value: a.value.plus(b.value), lsd: maxLsd(a.lsd, b.lsd) };
}

/**
 * Difference: as for sums.
 *
 * @example
 * minus(read('10.0'), read('2.25')) // 7.75, last digit at 10^-1
 */
export function minus(a: Measured, b: Measured): Measured {
  return { value: a.value.minus(b.value), lsd: maxLsd(a.lsd, b.lsd) };
}

function maxLsd(a: number | null, b: number | null): number | null {
  if (a === null) return b;
  if (b === null) return a;
  return Math.max(a, b);
}

/**
 * Sum of many measured numbers.
 *
 * @example
 * sumMeasured([read('1.0'), read('2.25')]) // 3.25, last digit at 10^-1
 */
export function sumMeasured(items: Measured[]): Measured {
  let acc: Measured = exact(0);
  for (const m of items) acc = plus(acc, m);
  return acc;
}
