/**
 * The square root of a Decimal, correctly rounded to the working precision (50 digits, half to
 * even), as Decimal's own `sqrt` gives it, but by one integer square root on BigInt: a handful of
 * integer divisions instead of Newton steps in decimal arithmetic. The uncertainty of every `±`
 * result takes one.
 */
import { Decimal } from './decimal.js';

/**
 * The square root of a non-negative Decimal, to the working precision.
 *
 * @param x - a finite Decimal, zero or more.
 * @returns √x rounded half to even to `Decimal.precision` significant digits (the value of `x.sqrt()`).
 * @example
 * sqrtDecimal(new Decimal('0.0049')).toString() // '0.07'
 * sqrtDecimal(new Decimal(2)).toString()        // '1.4142135623730950488016887242096980785696718753769'
 */
export function sqrtDecimal(x: Decimal): Decimal {
  const precision = Decimal.precision;
  if (!x.isFinite() || x.isNegative() || x.isZero() || Decimal.rounding !== Decimal.ROUND_HALF_EVEN || precision > 100) return x.sqrt();
  // x = digits × 10^q, with digits a whole number
  const text = x.toExponential();
  const e = text.indexOf('e');
  const digits = text.charCodeAt(1) === 46 ? text[0] + text.slice(2, e) : text.slice(0, e);
  // (a Decimal made from a long text keeps all its digits: past a few hundred, the float start
  // below would overflow, and Decimal's own root is taken)
  if (digits.length > 250) return x.sqrt();
  const q = Number(text.slice(e + 1)) - (digits.length - 1);
  // scale to a whole number N of at least 2 × (precision + 1) digits, by an even power of ten overall
  let t = Math.max(0, 2 * (precision + 1) - digits.length);
  if ((q - t) % 2 !== 0) t++;
  const n = BigInt(digits + '0'.repeat(t));
  const root = isqrt(n);
  const exact = root * root === n;
  // round the root (precision + 1 digits or more) to `precision` digits, half to even; an inexact
  // root is never a tie: the digits below the last one kept are then more than they show
  const rootText = root.toString();
  const drop = rootText.length - precision;
  const unit = 10n ** BigInt(drop);
  let kept = root / unit;
  const rest = root % unit;
  const half = unit / 2n;
  if (rest > half || (rest === half && (!exact || (kept & 1n) === 1n))) kept += 1n;
  return new Decimal(`${kept}e${drop + (q - t) / 2}`);
}

/** The integer square root ⌊√n⌋ of a positive BigInt below 10^300, by Newton's method from above. */
function isqrt(n: bigint): bigint {
  // a start at or above the root: the float root is good to about 2^-52
  let x = BigInt(Math.ceil(Math.sqrt(Number(n)) * (1 + 2 ** -40))) + 1n;
  let y = (x + n / x) >> 1n;
  while (y < x) {
    x = y;
    y = (x + n / x) >> 1n;
  }
  return x;
}
