/**
 * Reading an assay (purity): '98.5 %' as written, a bare number as a fraction
 * with a note saying so, and anything outside (0, 100 %] refused.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { PURE, measureAs } from '../calc/measure.js';
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
  const purity = measureAs(text, [PURE], 'the purity', notes);
  if (purity.value.lte(0) || purity.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `the purity must be above 0 and at most 100 %: '${text}'` });
  if (!purity.unit) notes.push({ code: 'PURITY_AS_FRACTION', message: `the purity ${text.trim()} has no unit: read as a fraction of 1 (${purity.value.times(100).toFixed()} %)` });
  return purity;
}
