/**
 * The nearest float to a Decimal without going through its text, where one float operation gives
 * it exactly: what a row of `calc --json` writes for each value.
 */
import type { Decimal } from '../exact/decimal.js';

/** Powers of ten that are exact floats (10^22 is the last). */
const POW10 = [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];
const SAFE = 2 ** 53;

/**
 * `x.toNumber()`, the same float, faster for a value of at most 15 or so significant digits whose
 * last digit is within 10^±22 of the units: its digits M are a whole number below 2^53 and
 * 10^k an exact float, so the one product M × 10^k (or quotient M / 10^-k) is the correctly
 * rounded float of the decimal, as reading its text is. Any other value (more digits, zero, not
 * finite) goes through `toNumber`.
 *
 * A Decimal holds its digits in `d`, in limbs of 7 digits aligned on powers of 10^7, with its
 * leading digit at 10^`e` (decimal.js's documented representation).
 *
 * @param x - a Decimal.
 * @returns the nearest float, as `x.toNumber()` gives it.
 * @example
 * decimalToNumber(new Decimal('366.33276')) // 366.33276
 * decimalToNumber(new Decimal('-0.00125'))  // -0.00125
 */
export function decimalToNumber(x: Decimal): number {
  const d = x.d as number[] | null;
  if (d === null || d.length > 3 || d[0] === 0) return x.toNumber();
  const n = d.length;
  const first = d[0];
  const firstDigits = first < 10 ? 1 : first < 100 ? 2 : first < 1000 ? 3 : first < 1e4 ? 4 : first < 1e5 ? 5 : first < 1e6 ? 6 : 7;
  // the last limb without its trailing zeros
  let last = d[n - 1];
  let zeros = 0;
  while (last % 10 === 0) {
    last /= 10;
    zeros++;
  }
  let m: number;
  if (n === 1) m = last;
  else {
    const head = n === 2 ? first : first * 1e7 + d[1];
    const scale = POW10[7 - zeros];
    if (head > SAFE / scale) return x.toNumber();
    m = head * scale + last;
  }
  if (m >= SAFE) return x.toNumber();
  // the value is m × 10^k: its leading digit at 10^e, its last kept digit k places from the units
  const digits = firstDigits + 7 * (n - 1) - zeros;
  const k = x.e - digits + 1;
  if (k > 22 || k < -22) return x.toNumber();
  const v = k >= 0 ? m * POW10[k] : m / POW10[-k];
  return x.s < 0 ? -v : v;
}
