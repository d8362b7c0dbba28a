/**
 * Found values of an elemental analysis: `C=72.30, H=7.91, N=12.60`.
 */
import { Decimal } from '../exact/decimal.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';
import { readKeyValues } from '../key-values/read-key-values.js';

const NUMBER = /^([-+]?[0-9]+(?:\.[0-9]+)?|[-+]?\.[0-9]+)\s*%?$/;

const HUNDRED = new Decimal(100);

/** Above this sum the found values cannot be percents of one compound, whatever the analysis error. */
export const FOUND_SUM_LIMIT = 105;
/** Above this sum a warning: the values add up to more than 100 % beyond rounding. */
export const FOUND_SUM_WARNING = 100.5;

const SUM_LIMIT = new Decimal(FOUND_SUM_LIMIT);
const SUM_WARNING = new Decimal(FOUND_SUM_WARNING);

/** Found values with the text each was written with, and remarks. */
export interface FoundValues {
  values: Map<string, Decimal>;
  /** Each value as written ('72.30'). */
  text: Map<string, string>;
  notes: Note[];
}

/**
 * Reads found mass percents with their written text and remarks: every key must be an element
 * symbol, every value a number from 0 to 100; a sum over 100.5 % is noted, over 105 % refused.
 *
 * @example
 * readFoundValues('C=72.30, H=7.91, N=12.60').text.get('C') // '72.30'
 */
export function readFoundValues(text: string): FoundValues {
  const entries = readKeyValues(fromJournalForm(text), { colon: true, example: 'C=72.30,H=7.91,N=12.60' });
  const values = new Map<string, Decimal>();
  const written = new Map<string, string>();
  const notes: Note[] = [];
  for (const { key, value, column, valueColumn } of entries) {
    if (!isElementSymbol(key)) throw fail({ code: 'UNKNOWN_ELEMENT', message: `unknown element symbol '${key}'`, column, length: key.length }, text);
    const m = NUMBER.exec(value);
    if (!m) throw fail({ code: 'BAD_MEASUREMENT', message: `'${key}=${value}' is not a found value such as C=72.30`, column: valueColumn }, text);
    const v = new Decimal(m[1]);
    if (v.isNegative()) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} found at ${m[1]} %: a percent cannot be negative`, column: valueColumn }, text);
    if (v.gt(HUNDRED)) throw fail({ code: 'BAD_MEASUREMENT', message: `${key} found at ${m[1]} %, over 100 %`, column: valueColumn }, text);
    values.set(key, v);
    written.set(key, m[1].replace(/^\+/, ''));
  }
  const total = [...values.values()].reduce((a, b) => a.plus(b), new Decimal(0));
  if (total.gt(SUM_LIMIT)) throw fail({ code: 'BAD_MEASUREMENT', message: `the found values add up to ${total.toFixed()} %, over 100 % by more than any analysis error` }, text);
  if (total.gt(SUM_WARNING)) notes.push({ code: 'SUM_OVER_100', message: `the found values add up to ${total.toFixed()} %, over 100 %: check them` });
  return { values, text: written, notes };
}

const JOURNAL_PAIR = /^\s*[A-Z][a-z]?\s*,\s*[-+]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)\s*%?\s*$/;

/**
 * Found values in the form journals print them, 'C, 74.77; H, 6.21; N, 4.50' (optionally after
 * 'Found:' and with a closing full stop), rewritten as 'C= 74.77, H= 6.21, N= 4.50' with every
 * character in its place, so that columns in messages still point into the text as given.
 * Any other text is returned as it is.
 *
 * @example
 * fromJournalForm('C, 74.77; H, 6.21; N, 4.50') // 'C= 74.77, H= 6.21, N= 4.50'
 * fromJournalForm('Found: C, 74.77; H, 6.21.')   // '       C= 74.77, H= 6.21 '
 */
export function fromJournalForm(text: string): string {
  if (text.length > 10_000 || !text.includes(',')) return text;
  let t = text;
  const lead = /^\s*Found\s*:/i.exec(t);
  if (lead) t = ' '.repeat(lead[0].length) + t.slice(lead[0].length);
  if (/\.\s*$/.test(t)) t = t.replace(/\.(\s*)$/, ' $1');
  const pairs = t.split(';');
  if (!pairs.every((p) => JOURNAL_PAIR.test(p))) return text;
  return pairs.map((p) => p.replace(',', '=')).join(',');
}

/**
 * Reads found mass percents; every symbol must be an element, every value 0–100.
 *
 * @param text - found mass percents, e.g. 'C=72.30, H=7.91, N=12.60' (or in the journal form 'C, 72.30; H, 7.91').
 * @returns each element symbol with its found percent.
 * @throws PondusError: UNKNOWN_ELEMENT for a key that is not an element symbol (with its column); BAD_MEASUREMENT for text not written key=value, a key given twice, a value that is not a number, a negative value or one over 100 %, or values that add up to well over 100 %; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readFound('C=72.30, H=7.91, N=12.60').get('C')?.toString() // '72.3'
 */
export function readFound(text: string): Map<string, Decimal> {
  return readFoundValues(text).values;
}

/** Found values in 10^-8 percentage points: {@link readPlainFound}'s unit. */
export const FOUND_SCALE = 1e8;

/** A set of found values read without Decimal (see {@link readPlainFound}). */
export interface PlainFound {
  /** The element symbols, in the order given. */
  symbols: string[];
  /** Each value as written ('74.75'), which is also its text to its written decimals. */
  texts: string[];
  /** Each value in 10^-8 percentage points, an exact whole number. */
  scaled: number[];
  /** Remarks, as readFoundValues makes them (a sum over 100.5 %). */
  notes: Note[];
}

/**
 * The usual found-value set read straight to exact whole numbers, for the batch path: element
 * symbols, each `=` a value written 0 to 100 with at most 8 decimals and no sign, leading zero or
 * percent sign, separated by a comma (and at most one space) or one space (`C=74.75 H=7.49`,
 * `C=40.46,H=10.19`). Null for anything else, or for a set {@link readFoundValues} would refuse
 * (an unknown symbol, a key twice, a value over 100 %, a sum over 105 %): those go the general
 * way. Where it gives a set, readFoundValues gives the same values, texts and notes.
 *
 * @param text - found mass percents, e.g. 'C=74.75 H=7.49 N=12.58'.
 * @returns the symbols, texts and values in 10^-8 percentage points, or null.
 * @example
 * readPlainFound('C=74.75 H=7.49').scaled // [7475000000, 749000000]
 * readPlainFound('C=74.75 H=+7.49')        // null
 */
export function readPlainFound(text: string): PlainFound | null {
  const symbols: string[] = [];
  const texts: string[] = [];
  const scaled: number[] = [];
  const n = text.length;
  let i = 0;
  let sum = 0;
  for (;;) {
    // the key: a capital and at most one small letter, then '='
    const k0 = i;
    let c = i < n ? text.charCodeAt(i) : 0;
    if (c < 65 || c > 90) return null;
    i++;
    c = i < n ? text.charCodeAt(i) : 0;
    if (c >= 97 && c <= 122) c = ++i < n ? text.charCodeAt(i) : 0;
    if (c !== 61) return null;
    const key = text.slice(k0, i);
    if (!isElementSymbol(key) || symbols.includes(key)) return null;
    // the value: 0, or 1 to 3 digits without a leading zero, then at most 8 decimals
    const v0 = ++i;
    let whole = 0;
    while (i < n && (c = text.charCodeAt(i)) >= 48 && c <= 57) {
      whole = whole * 10 + (c - 48);
      i++;
    }
    const intDigits = i - v0;
    if (intDigits === 0 || intDigits > 3 || (intDigits > 1 && text.charCodeAt(v0) === 48)) return null;
    let frac = 0;
    let fracDigits = 0;
    if (i < n && text.charCodeAt(i) === 46) {
      i++;
      while (i < n && (c = text.charCodeAt(i)) >= 48 && c <= 57) {
        frac = frac * 10 + (c - 48);
        fracDigits++;
        i++;
      }
      if (fracDigits === 0 || fracDigits > 8) return null;
    }
    const value = whole * FOUND_SCALE + frac * 10 ** (8 - fracDigits);
    if (value > 100 * FOUND_SCALE) return null;
    symbols.push(key);
    texts.push(text.slice(v0, i));
    scaled.push(value);
    sum += value;
    if (i === n) break;
    // the separator: ',' with at most one space after it, or one space
    c = text.charCodeAt(i++);
    if (c === 44) {
      if (i < n && text.charCodeAt(i) === 32) i++;
    } else if (c !== 32) return null;
  }
  if (sum > FOUND_SUM_LIMIT * FOUND_SCALE) return null;
  const notes: Note[] = sum > FOUND_SUM_WARNING * FOUND_SCALE ? [{ code: 'SUM_OVER_100', message: `the found values add up to ${scaledText(sum)} %, over 100 %: check them` }] : [];
  return { symbols, texts, scaled, notes };
}

/** A whole number of 10^-8 as decimal text without trailing zeros, as Decimal's toFixed() writes the exact value ('100.58', '101'). */
function scaledText(n: number): string {
  const whole = Math.floor(n / FOUND_SCALE);
  const frac = n - whole * FOUND_SCALE;
  return frac === 0 ? String(whole) : `${whole}.${String(frac).padStart(8, '0').replace(/0+$/, '')}`;
}
