/**
 * A measured number: an exact decimal value carrying the precision it was
 * measured to, as the position of its last significant digit. Exact numbers
 * (counts, defined factors) have no last significant digit and never limit.
 *
 * Rules (OpenStax Chemistry 2e §1.5): products and quotients keep the fewest
 * significant figures; sums and differences keep the fewest decimal places.
 * Values are never rounded inside a calculation; see round.ts for the one
 * rounding at the end.
 *
 * The figures always come from the rounded value. A product or quotient is
 * limited to a number of significant figures, so it carries that count
 * (`sigFigs`) and its last-digit position is taken from the value as it will
 * be rounded: 0.9996 × 1.00 keeps 3 figures and rounds to 1.00 (last digit at
 * 10⁻²), not 1.000. A sum keeps decimal places instead, so a carry in a sum
 * does not move its last digit: 9.96 + 0.05 = 10.01.
 */
import { Decimal } from '../exact/decimal.js';
import { pow10 } from './units.js';

export interface Measured {
  /** The value, kept in full (guard digits included). */
  value: Decimal;
  /**
   * Power of ten of the last significant digit: -3 for 18.015, 2 for 1300
   * (trailing zeros without a decimal point are not significant), 0 for '250.'.
   * null for exact numbers. For a value limited by significant figures this
   * is the position in the value as rounded to those figures (it moves up one
   * place when rounding carries into the next power of ten).
   */
  lsd: number | null;
  /**
   * Set when the precision is a number of significant figures (products,
   * quotients, powers): the figures to round to. Absent for numbers read from
   * text, sums and differences, whose precision is a decimal place.
   */
  sigFigs?: number;
}

/**
 * An exact number: it never limits precision.
 *
 * @param value - the number, as a number, a numeric string or a Decimal.
 * @returns the value with no precision limit (`lsd` null).
 * @throws PondusError: BAD_ARGUMENT when `value` is not a number, a Decimal or a string that reads as one.
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
  return value.e; // the exponent does not depend on the sign
}

/**
 * Significant figures of a measured number (Infinity for exact numbers),
 * counted on the value as it will be rounded: a value with its last digit at
 * 10⁻³ that rounds from 9.9996 to 10.000 has 5. A value that rounds to zero
 * counts as 1 here, so that arithmetic with it stays defined; the reported
 * figure says it has none (see displayMeasured).
 *
 * @param m - a measured number.
 * @returns the number of significant figures (at least 1), or Infinity for an exact number.
 * @throws PondusError: BAD_ARGUMENT when `m` is not a Measured.
 * @example
 * sigFigsOf({ value: new Decimal('18.015'), lsd: -3 }) // 5
 * sigFigsOf(times(readNumber('0.9996'), readNumber('1.00')))        // 3
 */
export function sigFigsOf(m: Measured): number {
  if (m.lsd === null) return Infinity;
  if (m.sigFigs !== undefined) return m.sigFigs;
  if (m.value.isZero()) return Math.max(1, -m.lsd); // '0.00' has its decimals as precision
  // no digit below the last significant one (a number as read): nothing to round, no carry
  if (m.value.e - m.value.sd() + 1 >= m.lsd) return Math.max(1, m.value.e - m.lsd + 1);
  // a value with digits below its last significant one: a molar mass, a sum; the same value comes
  // back line after line (a batch of one reagent), and a Decimal never changes, so the count is kept
  const known = ROUNDED_FIGURES.get(m.value);
  if (known !== undefined && known.lsd === m.lsd) return known.figures;
  const r = roundAt(m.value, m.lsd);
  const figures = r.isZero() ? Math.max(1, msd(m.value) - m.lsd + 1) : Math.max(1, msd(r) - m.lsd + 1);
  ROUNDED_FIGURES.set(m.value, { lsd: m.lsd, figures });
  return figures;
}

/** The figures of values that needed rounding to count them, by value (see sigFigsOf). */
const ROUNDED_FIGURES = new WeakMap<Decimal, { lsd: number; figures: number }>();

/**
 * Rounds so that the last digit kept is at 10^lsd, halves away from zero. Used
 * here only to find where the last digit of a rounded value falls: a carry
 * into the next power of ten happens only when every kept digit is 9, and
 * then half-to-even and half-up agree, so the position does not depend on
 * the rounding mode.
 */
function roundAt(value: Decimal, lsd: number): Decimal {
  if (lsd <= 0) return value.toDecimalPlaces(-lsd, Decimal.ROUND_HALF_UP);
  const f = pow10(lsd);
  return value.div(f).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).times(f);
}

/**
 * Last-significant-digit position for a value kept to n significant figures,
 * taken from the value as rounded to n figures: 0.9996 to 3 figures is 1.00,
 * last digit at 10⁻².
 *
 * @example
 * lsdForSigFigs(new Decimal('0.9996'), 3) // -2
 * lsdForSigFigs(new Decimal('0.9994'), 3) // -3
 */
export function lsdForSigFigs(value: Decimal, n: number): number {
  if (value.isZero()) return msd(value) - n + 1;
  // a value with no more than n significant digits is its own rounding
  if (value.sd() <= n) return value.e - n + 1;
  return msd(value.toSignificantDigits(n, Decimal.ROUND_HALF_UP)) - n + 1;
}

/**
 * A value limited to n significant figures (n = Infinity gives an exact number).
 *
 * @example
 * withSigFigs(new Decimal('0.9996'), 3).lsd // -2 (re-anchored: it rounds to 1.00)
 */
export function withSigFigs(value: Decimal, n: number): Measured {
  if (n === Infinity) return { value, lsd: null };
  return { value, lsd: lsdForSigFigs(value, n), sigFigs: n };
}

/**
 * Product: the result keeps the fewest significant figures of the measured factors.
 *
 * @param a - a measured number.
 * @param b - a measured number.
 * @returns the product, limited to the fewer significant figures of the two (an exact factor does not limit).
 * @throws PondusError: BAD_ARGUMENT when `a` or `b` is not a Measured.
 * @example
 * sigFigsOf(times(readNumber('1.008'), exact(2))) // 4
 */
export function times(a: Measured, b: Measured): Measured {
  return byFigures(a.value.times(b.value), a, b);
}

/**
 * Quotient: the result keeps the fewest significant figures. Throws RangeError on division by zero
 * (DIVISION_BY_ZERO through the public export).
 *
 * @param a - the dividend, a measured number.
 * @param b - the divisor, a measured number.
 * @returns the quotient, limited to the fewer significant figures of the two.
 * @throws PondusError: DIVISION_BY_ZERO when `b` is zero (the public export turns the RangeError into it); BAD_ARGUMENT when `a` or `b` is not a Measured.
 * @example
 * displayMeasured(dividedBy(readNumber('8.80'), readNumber('2.0'))).text // '4.4'
 */
export function dividedBy(a: Measured, b: Measured): Measured {
  if (b.value.isZero()) throw new RangeError('division by zero');
  return byFigures(a.value.div(b.value), a, b);
}

function byFigures(value: Decimal, a: Measured, b: Measured): Measured {
  return withSigFigs(value, Math.min(sigFigsOf(a), sigFigsOf(b)));
}

/**
 * Sum: the result keeps the fewest decimal places (the highest last-digit position).
 *
 * @param a - a measured number.
 * @param b - a measured number.
 * @returns the sum, to the coarser of the two last decimal places.
 * @throws PondusError: BAD_ARGUMENT when `a` or `b` is not a Measured.
 * @example
 * plus(readNumber('2.016'), readNumber('15.999')).lsd // -3
 */
export function plus(a: Measured, b: Measured): Measured {
  return { value: a.value.plus(b.value), lsd: maxLsd(a.lsd, b.lsd) };
}

/**
 * Difference: as for sums.
 *
 * @param a - the measured number to subtract from.
 * @param b - the measured number to subtract.
 * @returns the difference, to the coarser of the two last decimal places.
 * @throws PondusError: BAD_ARGUMENT when `a` or `b` is not a Measured.
 * @example
 * displayMeasured(minus(readNumber('10.0'), readNumber('2.25'))).text // '7.8'
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
 * @param items - the measured numbers to add.
 * @returns their sum, to the coarsest last decimal place among them (an exact 0 for none).
 * @throws PondusError: BAD_ARGUMENT when `items` is not an array of Measured.
 * @example
 * sumMeasured([readNumber('1.0'), readNumber('2.25')]).lsd // -1
 */
export function sumMeasured(items: Measured[]): Measured {
  let acc: Measured = exact(0);
  for (const m of items) acc = plus(acc, m);
  return acc;
}
