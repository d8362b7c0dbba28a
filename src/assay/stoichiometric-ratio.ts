/**
 * The mole ratio between two species of a titration reaction, written
 * `A:B` — A moles of the first react with B moles of the second — as an exact factor.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { exact } from '../sigfig/measured.js';
import { quantity, type Quantity } from '../sigfig/quantity.js';

export interface MoleRatio {
  /** Moles of the first species. */
  first: number;
  /** Moles of the second species. */
  second: number;
  /** first ÷ second, an exact number (never limits significant figures). */
  factor: Quantity;
  /** The ratio as written back: '1:2'. */
  text: string;
}

/**
 * Reads a mole ratio `A:B` of whole or decimal numbers; with no text, 1:1 with a note saying it was
 * assumed and which option (`option`) gives it.
 *
 * @param text - the ratio as written ('1:2'), or undefined for 1:1 with a note.
 * @param first - what the first number counts (the analyte), for messages.
 * @param second - what the second number counts (the titrant), for messages.
 * @param notes - where the note of the ratio given or assumed is added.
 * @param option - the option named in the notes, by its key in the options object (`ratio`, `reagentRatio`).
 * @returns the two sides and the text.
 * @throws PondusError: BAD_OPTION for a ratio not written A:B or with a side that is not positive; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readMoleRatio('1:2', 'Na2CO3', 'HCl', []).factor.value.toString() // '0.5'
 */
export function readMoleRatio(text: string | undefined, first: string, second: string, notes: Note[], option = 'ratio'): MoleRatio {
  if (text === undefined) {
    notes.push({ code: 'RATIO_ASSUMED', message: `1:1 mole ratio assumed between ${first} and ${second}; give \`${option}\` if the reaction is otherwise`, options: [option] });
    return { first: 1, second: 1, factor: quantity(exact(1), null), text: '1:1' };
  }
  const m = /^\s*(\d+(?:\.\d+)?)\s*:\s*(\d+(?:\.\d+)?)\s*$/.exec(text);
  if (!m) throw fail({ code: 'BAD_OPTION', message: `a mole ratio is written A:B, e.g. 1:2 (${first}:${second}); got '${text}'` }, text);
  const a = Number(m[1]);
  const b = Number(m[2]);
  if (a <= 0 || b <= 0) throw fail({ code: 'BAD_OPTION', message: `both sides of the mole ratio must be positive: '${text}'` }, text);
  notes.push({ code: 'RATIO_GIVEN', message: `${m[1]} mol ${first} per ${m[2]} mol ${second}, as given` });
  return { first: a, second: b, factor: quantity(exact(new Decimal(m[1]).div(m[2])), null), text: `${m[1]}:${m[2]}` };
}
