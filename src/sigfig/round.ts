/**
 * Rounding done once, at the end, on decimal digits: half-to-even by default
 * (ASTM E29; ISO 80000-1 Annex B, rule A), half-up on request.
 */
import { Decimal } from '../exact/decimal.js';
import { msd, sigFigsOf, type Measured } from './measured.js';

export type RoundingMode = 'half-even' | 'half-up';

type Rounding = NonNullable<Parameters<Decimal['toDecimalPlaces']>[1]>;

function mode(m: RoundingMode): Rounding {
  return m === 'half-up' ? (Decimal.ROUND_HALF_UP as Rounding) : (Decimal.ROUND_HALF_EVEN as Rounding);
}

/**
 * Rounds to a number of significant figures.
 *
 * @example
 * roundToSigFigs(new Decimal('2.45'), 2).toString() // '2.4' (half-to-even)
 */
export function roundToSigFigs(value: Decimal, n: number, rounding: RoundingMode = 'half-even'): Decimal {
  if (value.isZero()) return value;
  return value.toSignificantDigits(n, mode(rounding));
}

/**
 * Rounds so that the last digit kept is at 10^lsd.
 *
 * @example
 * roundToPosition(new Decimal('58.43976928'), -2).toString() // '58.44'
 */
export function roundToPosition(value: Decimal, lsd: number, rounding: RoundingMode = 'half-even'): Decimal {
  if (lsd <= 0) return value.toDecimalPlaces(-lsd, mode(rounding));
  const f = new Decimal(10).pow(lsd);
  return value.div(f).toDecimalPlaces(0, mode(rounding)).times(f);
}

/** How a measured number is shown. */
export interface Display {
  /** The reported figure: '18.015', '2.4 × 10³', '0.00340'. */
  text: string;
  /** The rounded value. */
  value: Decimal;
  /** Significant figures reported (null for exact numbers). */
  sigFigs: number | null;
}

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
 * @example
 * displayMeasured({ value: new Decimal('2437.2'), lsd: 2 }).text // '2.4 × 10³'
 */
export function displayMeasured(m: Measured, rounding: RoundingMode = 'half-even'): Display {
  if (m.lsd === null) {
    return { text: m.value.toFixed(), value: m.value, sigFigs: null };
  }
  const value = roundToPosition(m.value, m.lsd, rounding);
  const n = sigFigsOf({ value, lsd: m.lsd });
  const e = msd(value);
  // trailing zeros before the decimal point would be read as not significant:
  // 2400 (2 s.f.) and 1300 known to the unit (4 s.f.) both go to scientific notation
  const ambiguousZeros = m.lsd > 0 || (m.lsd === 0 && !value.isZero() && value.mod(10).isZero());
  if (ambiguousZeros || e >= 6 || e <= -5) {
    const mantissa = value.isZero() ? new Decimal(0) : value.div(new Decimal(10).pow(e));
    const mText = mantissa.toFixed(Math.max(0, n - 1));
    return { text: `${mText} × 10${superscript(e)}`, value, sigFigs: n };
  }
  return { text: value.toFixed(Math.max(0, -m.lsd)), value, sigFigs: n };
}
