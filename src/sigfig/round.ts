/**
 * Rounding done once, at the end, on decimal digits: half-to-even by default
 * (ASTM E29; ISO 80000-1 Annex B, rule A), half-up on request.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { msd, type Measured } from './measured.js';
import { pow10 } from './units.js';

export type RoundingMode = 'half-even' | 'half-up';

type Rounding = NonNullable<Parameters<Decimal['toDecimalPlaces']>[1]>;

function mode(m: RoundingMode): Rounding {
  if (m !== 'half-up' && m !== 'half-even') throw fail({ code: 'BAD_OPTION', message: `rounding must be 'half-even' or 'half-up', not ${describe(m)}` });
  return m === 'half-up' ? (Decimal.ROUND_HALF_UP as Rounding) : (Decimal.ROUND_HALF_EVEN as Rounding);
}

/** Most significant figures a rounding may ask for. */
const MAX_PLACES = 1000;
/** Farthest power of ten a last digit may sit at. */
const MAX_POSITION = 10_000;

function describe(x: unknown): string {
  if (Decimal.isDecimal(x)) return String(x);
  if (typeof x === 'string') return `'${x.length > 20 ? `${x.slice(0, 20)}…` : x}'`;
  if (typeof x === 'number' || typeof x === 'boolean' || x === null || x === undefined) return String(x);
  return `a value of type ${Array.isArray(x) ? 'array' : typeof x}`;
}

/** The value to round: a finite Decimal (a finite number or a numeric string is taken as its decimal). */
function decimalOf(value: unknown): Decimal {
  let d: Decimal | null = null;
  if (Decimal.isDecimal(value)) d = value as Decimal;
  else if (typeof value === 'number' && Number.isFinite(value)) d = new Decimal(value);
  else if (typeof value === 'string' && /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d{1,4})?\s*$/.test(value)) d = new Decimal(value.trim());
  if (d === null || !d.isFinite()) throw fail({ code: 'BAD_NUMBER', message: `the value to round must be a finite number, not ${describe(value)}` });
  return d;
}

function wholeIn(n: unknown, min: number, max: number, what: string): number {
  if (typeof n !== 'number' || !Number.isInteger(n) || n < min || n > max) {
    throw fail({ code: 'BAD_OPTION', message: `${what} must be a whole number from ${min.toLocaleString('en-US')} to ${max.toLocaleString('en-US')}, not ${describe(n)}` });
  }
  return n;
}

/**
 * Rounds to a number of significant figures.
 *
 * @param value - the Decimal to round.
 * @param n - the significant figures to keep, a whole number from 1 to 1000.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the rounded Decimal (zero stays zero).
 * @throws PondusError: BAD_NUMBER for a value that is not finite; BAD_OPTION for `n` above 1000; BAD_ARGUMENT when `value` is not a Decimal, `n` not a whole number of at least 1 or `rounding` not a rounding mode.
 * @example
 * roundToSigFigs(new Decimal('2.45'), 2).toString() // '2.4' (half-to-even)
 */
export function roundToSigFigs(value: Decimal, n: number, rounding: RoundingMode = 'half-even'): Decimal {
  const v = decimalOf(value);
  wholeIn(n, 1, MAX_PLACES, 'the number of significant figures');
  const m = mode(rounding);
  if (v.isZero()) return v;
  return v.toSignificantDigits(n, m);
}

/**
 * Rounds so that the last digit kept is at 10^lsd.
 *
 * @param value - the Decimal to round.
 * @param lsd - the power of ten of the last digit kept (-2 for hundredths), a whole number from -10000 to 10000.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the rounded Decimal.
 * @throws PondusError: BAD_NUMBER for a value that is not finite; BAD_OPTION for `lsd` not a whole number in range; BAD_ARGUMENT when `value` is not a Decimal, `lsd` not a number or `rounding` not a rounding mode.
 * @example
 * roundToPosition(new Decimal('58.43976928'), -2).toString() // '58.44'
 */
export function roundToPosition(value: Decimal, lsd: number, rounding: RoundingMode = 'half-even'): Decimal {
  const v = decimalOf(value);
  wholeIn(lsd, -MAX_POSITION, MAX_POSITION, 'the position of the last digit (a power of ten)');
  if (lsd <= 0) return v.toDecimalPlaces(-lsd, mode(rounding));
  const f = pow10(lsd);
  return v.div(f).toDecimalPlaces(0, mode(rounding)).times(f);
}

/** How a measured number is shown. */
export interface Display {
  /** The reported figure: '18.015', '2.4 × 10³', '0.00340'. */
  text: string;
  /** The rounded value. */
  value: Decimal;
  /**
   * Significant figures reported, counted on the rounded value (null for
   * exact numbers). 0 when a measured value rounds to zero: it is below the
   * precision of the data and no figure of it is significant.
   */
  sigFigs: number | null;
  /** Power of ten of the last digit shown (null for exact numbers). */
  lsd: number | null;
  /** True when a measured value rounds to zero: smaller than the precision of the data. */
  belowPrecision: boolean;
}

/** Exact values with this many significant digits are taken as non-terminating (1/3) when shown. */
const EXACT_DIGITS_LIMIT = 40;

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function superscript(n: number): string {
  return String(n)
    .split('')
    .map((c) => (c === '-' ? '⁻' : SUPERSCRIPT_DIGITS[Number(c)]))
    .join('');
}

/**
 * The reported figure of a measured number: rounded once to its significant
 * figures, in scientific notation when trailing zeros would be ambiguous
 * (2.4 × 10³, not 2400) or the number is very large or small.
 *
 * The figures come from the rounded value. A value limited by significant
 * figures (a product or quotient) is rounded to that many figures, and when
 * rounding carries into the next power of ten the last digit moves up one
 * place, so no figure is gained: 0.9996 × 1.00 shows 1.00. A value limited by
 * a decimal place (a number as written, a sum) keeps that place: 9.9996 with
 * its last digit at 10⁻³ shows 10.000. A measured value that rounds to zero
 * reports 0 significant figures and sets `belowPrecision`.
 *
 * @param m - a measured number.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the reported text, the rounded value, its significant figures (null for exact, 0 below precision), the last digit's position and whether it rounds to zero.
 * @throws PondusError: BAD_NUMBER for a value that is not finite; BAD_OPTION for an `lsd` or `sigFigs` that is not a whole number in range; BAD_ARGUMENT when `m` is not a Measured or `rounding` not a rounding mode.
 * @example
 * displayMeasured({ value: new Decimal('2437.2'), lsd: 2 }).text // '2.4 × 10³'
 * displayMeasured(times(readNumber('0.9996'), readNumber('1.00'))).text      // '1.00'
 * displayMeasured({ value: new Decimal('2.45'), lsd: -1 }, 'half-up').text // '2.5'
 */
export function displayMeasured(m: Measured, rounding: RoundingMode = 'half-even'): Display {
  if (typeof m !== 'object' || m === null) throw fail({ code: 'BAD_NUMBER', message: `a measured number is { value, lsd }, not ${describe(m)}` });
  if (!Decimal.isDecimal(m.value)) m = { ...m, value: decimalOf(m.value) };
  else if (!m.value.isFinite()) decimalOf(m.value);
  if (m.lsd !== null) wholeIn(m.lsd, -MAX_POSITION, MAX_POSITION, 'the position of the last digit (lsd)');
  if (m.sigFigs !== undefined) wholeIn(m.sigFigs, 1, MAX_PLACES, 'the number of significant figures');
  return displayChecked(m, mode(rounding));
}

function displayChecked(m: Measured, r: Rounding): Display {
  if (m.lsd === null) {
    // an exact quotient that does not terminate (1/3) fills the working precision: show
    // 12 figures and an ellipsis rather than 50 digits that look exact
    const text = m.value.sd() >= EXACT_DIGITS_LIMIT ? `${m.value.toSignificantDigits(12, r).toFixed()}…` : m.value.toFixed();
    return { text, value: m.value, sigFigs: null, lsd: null, belowPrecision: false };
  }
  let value: Decimal;
  let lsd: number;
  if (m.sigFigs !== undefined && !m.value.isZero()) {
    value = m.value.toSignificantDigits(m.sigFigs, r);
    lsd = msd(value) - m.sigFigs + 1;
  } else {
    value = m.lsd <= 0 ? m.value.toDecimalPlaces(-m.lsd, r) : m.value.div(pow10(m.lsd)).toDecimalPlaces(0, r).times(pow10(m.lsd));
    lsd = m.lsd;
  }
  if (value.isZero()) {
    // below the precision of the data: shown with its last decimal place, no significant figure
    value = new Decimal(0);
    const text = lsd > 0 ? `0 × 10${superscript(lsd)}` : value.toFixed(Math.max(0, -lsd));
    return { text, value, sigFigs: 0, lsd, belowPrecision: true };
  }
  const e = msd(value);
  const n = e - lsd + 1;
  // trailing zeros before the decimal point would be read as not significant:
  // 2400 (2 s.f.) and 1300 known to the unit (4 s.f.) both go to scientific notation
  // (at lsd 0 the rounded value is a whole number, a multiple of 10 when its last non-zero digit is above the units)
  const ambiguousZeros = lsd > 0 || (lsd === 0 && value.e >= value.sd());
  if (ambiguousZeros || e >= 6 || e <= -5) {
    const mantissa = value.times(pow10(-e));
    const mText = mantissa.toFixed(Math.max(0, n - 1));
    return { text: `${mText} × 10${superscript(e)}`, value, sigFigs: n, lsd, belowPrecision: false };
  }
  return { text: value.toFixed(Math.max(0, -lsd)), value, sigFigs: n, lsd, belowPrecision: false };
}
