/**
 * The error of a found m/z against the calculated one, with the sign used in
 * accurate-mass reports (common practice): error = found − calculated, in ppm
 * relative to the calculated value, (found − calculated)/calculated × 10⁶, and in mDa.
 * A found value above the calculated one gives a positive error. Brenton & Godfrey, "Accurate
 * mass measurement: terminology and treatment of data", J. Am. Soc. Mass Spectrom. 21 (2010)
 * 1821, define the mass measurement error this way (measured less theoretical, relative to the
 * theoretical value; the formula as we recall it, from memory). The ppm error is computed from
 * the unrounded calculated m/z, not from the four decimals printed.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { readNumber } from '../sigfig/read-number.js';

/** A found m/z compared with the calculated one. */
export interface MassError {
  /** The found value as written. */
  text: string;
  value: Decimal;
  /** Decimals written in the found value. */
  decimals: number;
  /** found − calculated, in u (Th for m/z). */
  difference: Decimal;
  /** (found − calculated)/calculated × 10⁶, unrounded. */
  ppm: Decimal;
  /** (found − calculated) × 1000, unrounded. */
  mDa: Decimal;
  notes: Note[];
}

/** Above this |error| a note asks whether the ion or charge is the right one. */
export const LARGE_ERROR_PPM = 100;

/**
 * Compares a found m/z (as written) with a calculated one.
 *
 * @param found - the found m/z as written (its decimals count), e.g. '242.1172'.
 * @param calculated - the calculated m/z.
 * @param reportDecimals - the decimals the calculated m/z is reported with (default 4), for the note on a found value with fewer.
 * @returns the found value and its decimals, the difference, the error in ppm and mDa, and the notes.
 * @throws PondusError: BAD_NUMBER for a found m/z that is not a number, not positive or written with an exponent; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const e = massError('242.1172', new Decimal('242.117555'));
 * e.ppm.toFixed(1)  // '-1.5'
 * e.mDa.toFixed(1)  // '-0.4'
 */
export function massError(found: string, calculated: Decimal, reportDecimals = 4): MassError {
  const n = readNumber(found);
  if (n.value.lte(0)) throw fail({ code: 'BAD_NUMBER', message: `the found m/z must be a positive number, not '${found}'` }, found);
  if (/e/i.test(n.text)) throw fail({ code: 'BAD_NUMBER', message: `write the found m/z as a plain decimal number (as in 242.1172), not '${found}'` }, found);
  if (!calculated.gt(0)) throw fail({ code: 'BAD_NUMBER', message: `the calculated m/z must be a positive number, not ${calculated.toString()}: a ppm error is relative to it` });
  const decimals = Math.max(0, -(n.lsd ?? 0));
  const difference = n.value.minus(calculated);
  const ppm = difference.div(calculated).times(1e6);
  const notes: Note[] = [];
  if (decimals < reportDecimals) {
    notes.push({ code: 'FEW_DECIMALS', message: `the found m/z ${n.text} has ${decimals} decimal${decimals === 1 ? '' : 's'}, fewer than the ${reportDecimals} of the calculated value; the ppm error is good to about ±${new Decimal(10).pow(-decimals).div(2).div(calculated).times(1e6).toSignificantDigits(1).toFixed()} ppm` });
  }
  if (ppm.abs().gt(LARGE_ERROR_PPM)) {
    notes.push({ code: 'LARGE_MASS_ERROR', message: `the found m/z is ${ppm.toFixed(0)} ppm from the calculated one; check the ion, its charge and the formula` });
  }
  return { text: n.text, value: n.value, decimals, difference, ppm, mDa: difference.times(1000), notes };
}

/**
 * An error as a report gives it: one decimal, with its sign ('-1.5', '+0.8', '0.0').
 *
 * @example
 * signedFixed(new Decimal('-1.4969'), 1) // '-1.5'
 */
export function signedFixed(d: Decimal, decimals = 1): string {
  const t = d.toFixed(decimals);
  if (/^-0\.?0*$/.test(t)) return t.slice(1);
  return d.gt(0) && Number(t) !== 0 ? `+${t}` : t;
}
