/**
 * A result checked against specification limits such as 98.0–102.0 %. The
 * result is first rounded to the last digit of the limits and then compared,
 * limits included (the pharmacopoeial convention: USP General Notices 7.20,
 * from memory). A 5 in the first digit dropped rounds up there, so half-up is the
 * default here (unlike the rounding of reported results, half to even); half to even
 * is used when it is asked for, and the note then says the convention differs.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { readNumber } from '../sigfig/read-number.js';
import { roundToPosition, type RoundingMode } from '../sigfig/round.js';
import type { Quantity } from '../sigfig/quantity.js';

export interface Limits {
  /** Lower limit in %, as written. */
  low: string;
  /** Upper limit in %, as written. */
  high: string;
  /** Power of ten of the last digit written in the limits (-1 for 98.0–102.0). */
  lsd: number;
}

export interface SpecificationCheck {
  limits: Limits;
  /** The result in %, rounded to the limits' last digit. */
  rounded: Decimal;
  /** The rounded result as text ('99.6'). */
  roundedText: string;
  complies: boolean;
  rounding: RoundingMode;
  notes: Note[];
}

/** The place of a last digit in words: 1, 0.1, 10. */
function place(lsd: number): string {
  return new Decimal(10).pow(lsd).toFixed();
}

/**
 * Reads limits written `98.0-102.0` (an en dash or `to` also do; a trailing % is optional).
 *
 * @param text - limits in percent: '98.0-102.0', '98.0–102.0 %', '98.0 to 102.0'.
 * @returns the low and high limits as written and the place of their last digit.
 * @throws PondusError: BAD_OPTION for limits not written low-high or a lower limit above the upper; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readLimits('98.0–102.0 %').lsd // -1
 */
export function readLimits(text: string): Limits {
  const m = /^\s*(\d+(?:\.\d*)?)\s*%?\s*(?:-|–|to|\.\.)\s*(\d+(?:\.\d*)?)\s*%?\s*$/.exec(text);
  if (!m) throw fail({ code: 'BAD_OPTION', message: `limits are written LOW-HIGH in percent, e.g. 98.0-102.0; got '${text}'` }, text);
  const lo = readNumber(m[1]);
  const hi = readNumber(m[2]);
  if (lo.value.gt(hi.value)) throw fail({ code: 'BAD_OPTION', message: `the lower limit ${m[1]} is above the upper limit ${m[2]}` }, text);
  return { low: m[1], high: m[2], lsd: Math.min(Math.min(0, lo.lsd ?? 0), Math.min(0, hi.lsd ?? 0)) };
}

/**
 * Checks a result (a fraction) against limits in percent.
 *
 * @param result - the result, a fraction (0.99462 for 99.462 %).
 * @param limitsText - the limits in percent: '98.0-102.0'.
 * @param rounding - how the result is rounded to the limits' last place: 'half-up' (the default, as USP General Notices 7.20 rounds) or 'half-even'.
 * @param basisName - the basis named in the verdict.
 * @returns the limits, the result rounded as the limits are written, and whether it complies.
 * @throws PondusError: BAD_OPTION for limits that cannot be read or a lower limit above the upper; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const q = measure('0.99462')
 * checkSpecification(q, '98.0-102.0').roundedText // '99.5'
 */
export function checkSpecification(result: Quantity, limitsText: string, rounding: RoundingMode = 'half-up', basisName = 'the reported'): SpecificationCheck {
  const limits = readLimits(limitsText);
  const percent = result.value.times(100);
  const rounded = roundToPosition(percent, limits.lsd, rounding);
  const roundedText = rounded.toFixed(Math.max(0, -limits.lsd));
  const complies = rounded.gte(limits.low) && rounded.lte(limits.high);
  const notes: Note[] = [
    {
      code: 'LIMITS_ROUNDING',
      message:
        rounding === 'half-up'
          ? `${basisName} result ${percent.toSignificantDigits(8).toFixed()} % is rounded half-up to the last digit of the limits (${roundedText} %) before comparison with ${limits.low}–${limits.high} % (limits included; USP General Notices 7.20, from memory)`
          : `${basisName} result ${percent.toSignificantDigits(8).toFixed()} % is rounded ${rounding}, as asked, to the last digit of the limits (${roundedText} %) before comparison with ${limits.low}–${limits.high} % (limits included); USP General Notices 7.20 rounds a 5 up (from memory), which can give another verdict`,
    },
  ];
  // the result's own last significant digit, in percent. One place coarser than the limits is the
  // ordinary case of three figures just above 100 % (100. % against 102.0 %), and the limits' digit
  // is then a guard digit (common practice); two or more places coarser, the verdict reads digits
  // the data do not give, so it is said beside the verdict
  const resultLsd = result.lsd === null ? null : result.lsd + 2;
  if (resultLsd !== null && resultLsd > limits.lsd + 1) {
    notes.push({
      code: 'RESULT_COARSER_THAN_LIMITS',
      message: `${basisName} result is known only to the nearest ${place(resultLsd)} % (its significant figures), while the limits ${limits.low}–${limits.high} % are written to ${place(limits.lsd)} %: the verdict compares ${roundedText} %, a digit the data do not give; give the measurements to more figures for a verdict they support`,
    });
  }
  return { limits, rounded, roundedText, complies, rounding, notes };
}
