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
