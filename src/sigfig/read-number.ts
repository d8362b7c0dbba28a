/**
 * Reads a number as written and counts its significant figures by the textbook
 * rules (OpenStax Chemistry 2e §1.5): all non-zero digits count; zeros between
 * them count; leading zeros do not; trailing zeros count after a decimal point
 * (`8.80`, `250.`) and are ambiguous without one (`1300`: read as two
 * significant figures, with a note).
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import type { Measured } from './measured.js';
import { pow10 } from './units.js';

/** A number read from text, with the remark when its precision was ambiguous. */
export interface ReadNumber extends Measured {
  text: string;
  /** Set when trailing zeros made the precision ambiguous. */
  ambiguous: boolean;
}

const NUMBER = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/;
/** Largest decimal exponent accepted in input. */
export const MAX_EXPONENT = 1000;

/** Numbers are read up to this size (no bench quantity comes near it; results stay finite doubles). */
export const MAX_MAGNITUDE = new Decimal('1e100');
/** …and down to this size, zero apart. */
export const MIN_MAGNITUDE = new Decimal('1e-100');

/**
 * Reads a measured number from its text.
 *
 * @param text - the number as written ('0.00340', '1300', '2.50e2'); spaces at the ends are ignored.
 * @param column - the 1-based column of the text in a longer input, given to any error.
 * @returns the value with the power of ten of its last significant digit, the trimmed text and whether trailing zeros made the precision ambiguous.
 * @throws PondusError: BAD_NUMBER for text that is not a plain decimal number; NUMBER_OUT_OF_RANGE for an exponent past ±1000 or a size outside 1e-100 to 1e100 (zero apart); BAD_ARGUMENT when `text` is not a string or `column` is given and not a number.
 * @example
 * readNumber('0.00340').lsd  // -5  (3 significant figures)
 * readNumber('1300').lsd     // 2   (2 significant figures, ambiguous)
 * readNumber('2.50e2').lsd   // 0   (3 significant figures)
 */
export function readNumber(text: string, column?: number): ReadNumber {
  const known = typeof text === 'string' ? READ.get(text) : undefined;
  if (known !== undefined) return { ...known };
  const r = read(text, column);
  if (text.length > 64) return r;
  if (READ.size >= MAX_REMEMBERED) READ.clear();
  READ.set(text, r);
  return { ...r };
}

/** The short texts read lately (atomic weights, the same options and values line after line); bounded, emptied when full. */
const READ = new Map<string, ReadNumber>();
const MAX_REMEMBERED = 1024;

function read(text: string, column?: number): ReadNumber {
  if (typeof text !== 'string') throw fail({ code: 'BAD_NUMBER', message: `a number is read from its text (a string), not from a value of type ${text === null ? 'null' : typeof text}`, column });
  const t = text.trim();
  const m = NUMBER.exec(t);
  if (!m || (m[2] === '' && (m[3] === undefined || m[3] === ''))) {
    throw fail({ code: 'BAD_NUMBER', message: `'${text}' is not a number`, column });
  }
  const [, sign, int, frac, expText] = m;
  const exp = expText ? Number(expText) : 0;
  if (!Number.isSafeInteger(exp) || Math.abs(exp) > MAX_EXPONENT) {
    throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: text, exponentLimit: MAX_EXPONENT, reading: 'exponent', what: null, column }));
  }
  const mantissa = `${sign}${int || '0'}${frac ? '.' + frac : ''}`;
  // a number of up to 50 digits is exact as written (the product by 10^exp would not round it either)
  const value = int.length + (frac?.length ?? 0) <= Decimal.precision ? new Decimal(exp === 0 ? mantissa : `${mantissa}e${exp}`) : new Decimal(mantissa).times(pow10(exp));
  // both limits are powers of ten, so the position of the leading digit decides
  if (!value.isZero() && (value.e >= MAX_MAGNITUDE.e || value.e < MIN_MAGNITUDE.e)) {
    throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: text.trim(), exponentLimit: MAX_MAGNITUDE.e, reading: 'number', what: null, column }));
  }
  const hasPoint = frac !== undefined;
  let lsd: number;
  let ambiguous = false;
  if (hasPoint) {
    lsd = -(frac ?? '').length + exp;
  } else {
    // no decimal point: trailing zeros of the integer are not significant
    let trailing = 0;
    while (trailing < int.length && int.charCodeAt(int.length - 1 - trailing) === 48) trailing++;
    // every digit zero ('0', '000'): the value is zero
    if (value.isZero()) {
      lsd = exp; // '0'
    } else {
      lsd = trailing + exp;
      ambiguous = trailing > 0;
    }
  }
  return { value, lsd, text: t, ambiguous };
}
