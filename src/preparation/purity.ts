/**
 * Reading an assay (purity): '98.5 %' as written, a bare number up to 1 as a fraction
 * with a note saying so, and anything outside (0, 100 %] refused.
 */
import type { Note } from '../errors/issue.js';
import { readShare } from '../assay/read-quantity.js';
import type { Quantity } from '../sigfig/quantity.js';

/**
 * The assay as a fraction of 1.
 *
 * @example
 * readPurity('98.5 %', []).value.toString() // '0.985'
 * const notes = []
 * readPurity('0.985', notes).value.toString() // '0.985'
 * notes[0].code // 'PURITY_AS_FRACTION'
 */
export function readPurity(text: string, notes: Note[]): Quantity {
  return readShare(text, 'the purity', notes, { bare: 'fraction', note: 'PURITY_AS_FRACTION' });
}
