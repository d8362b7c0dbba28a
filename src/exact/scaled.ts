import { Decimal } from './decimal.js';

/**
 * Exact fixed-point arithmetic for the hot path: masses are held as integers in
 * units of 10^-12 u (pico-daltons). Every tabulated atomic weight and AME2020
 * nuclide mass has at most 12 decimals, so the scaled values are exact integers,
 * and sums of integer multiples stay exact while they are safe integers
 * (up to about 9000 g/mol); beyond that callers fall back to Decimal.
 */
export const SCALE_DIGITS = 12;
const SCALE = new Decimal(10).pow(SCALE_DIGITS);

/**
 * Converts a plain decimal string with at most 12 decimals to scaled integer units.
 *
 * @example
 * toScaled('1.008') // 1008000000000
 */
export function toScaled(text: string): number {
  const neg = text.startsWith('-');
  const t = neg ? text.slice(1) : text;
  const dot = t.indexOf('.');
  const int = dot < 0 ? t : t.slice(0, dot);
  const frac = dot < 0 ? '' : t.slice(dot + 1);
  if (frac.length > SCALE_DIGITS) throw new RangeError(`more than ${SCALE_DIGITS} decimals: ${text}`);
  const n = Number(int + frac.padEnd(SCALE_DIGITS, '0'));
  if (!Number.isSafeInteger(n)) throw new RangeError(`value out of the exact range: ${text}`);
  return neg ? -n : n;
}

/**
 * Converts scaled integer units back to an exact Decimal.
 *
 * @example
 * fromScaled(18015000000000).toString() // '18.015'
 */
export function fromScaled(n: number): Decimal {
  return new Decimal(n).div(SCALE);
}

/**
 * Formats scaled integer units as a plain decimal string without trailing zeros, exactly.
 *
 * @example
 * scaledToString(18015000000000) // '18.015'
 */
export function scaledToString(n: number): string {
  const abs = Math.abs(n);
  const int = Math.floor(abs / 1e12);
  const frac = abs - int * 1e12; // exact: both are integers below 2^53
  const sign = n < 0 ? '-' : '';
  if (frac === 0) return sign + int;
  let f = String(frac);
  if (f.length < SCALE_DIGITS) f = ZEROS.slice(f.length) + f;
  let end = SCALE_DIGITS;
  while (f.charCodeAt(end - 1) === 48) end--;
  return `${sign}${int}.${end === SCALE_DIGITS ? f : f.slice(0, end)}`;
}

const ZEROS = '000000000000';
