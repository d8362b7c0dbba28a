/**
 * JSON text of numbers that come with their exact decimal: the shortest text of the
 * nearest double, which for values of at most 15 significant digits is the exact
 * decimal itself, so the digits need not be generated again.
 */
import { LazyTexts } from './lazy-texts.js';

/**
 * The JSON text of `value`, the nearest double to the exact decimal `exact`.
 *
 * @param value the nearest double to `exact`
 * @param exact the exact value as plain decimal text ('18.015')
 * @returns what JSON.stringify(value) gives
 * @example
 * jsonNumber(18.015, '18.015') // '18.015'
 * jsonNumber(0.1 + 0.2, '0.30000000000000004') // '0.30000000000000004'
 */
export function jsonNumber(value: number, exact: string): string {
  // at least 1 (no leading zeros, no exponent form below 1e-6), at most 15 significant digits and
  // below 1e15, told from the value and the text's length alone: the text is often a rope of short
  // pieces (exact/scaled.ts), which reading a character of it would flatten here, ahead of the output.
  // A decimal below 1 of at most 16 characters ('0.' and 14 digits) has a nearest double below 1;
  // of 16 characters, the text has a '.' (15 digits) exactly when the value is below 1e15.
  const n = exact.length;
  if (value >= 1 && (n <= 15 || (n === 16 && value < 1e15))) return exact;
  return numberText(value);
}

/**
 * The text JSON.stringify gives a number, which for a finite number is String(value). It is
 * JSON.stringify itself: for a double with a fraction V8 writes it two to four times faster than
 * `'' + value` or a template literal (those go through a number-to-string cache that a batch of
 * distinct values only fills), and the text is the same.
 *
 * @example
 * numberText(0.1 + 0.2) // '0.30000000000000004'
 * numberText(18) // '18'
 */
export function numberText(value: number): string {
  return JSON.stringify(value);
}

/** The texts of the whole numbers below TABLE_SIZE, each made on first use. */
const TABLE_SIZE = 4096;
const smallTexts = new LazyTexts(TABLE_SIZE);

/**
 * The text JSON.stringify gives a number, from a table for whole numbers from 0 to 4095 (atom
 * counts, mostly): a lookup instead of a conversion.
 *
 * @param value - any finite number.
 * @returns what JSON.stringify(value) gives.
 * @example
 * smallNumberText(12) // '12'
 * smallNumberText(0.5) // '0.5'
 */
export function smallNumberText(value: number): string {
  if (value >= 0 && value < TABLE_SIZE && (value | 0) === value) {
    return smallTexts.get(value) ?? smallTexts.keep(value, String(value));
  }
  return numberText(value);
}
