/**
 * How the assay and pharmacy calculations read a measured amount: through the
 * common quantity reader, refusing zero and negative values with the name of
 * the quantity.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { measureAs } from '../calc/measure.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { Dims } from '../sigfig/units.js';

/**
 * Reads a quantity of one of the given dimensions that must be positive (or, with `allowZero`, not negative).
 *
 * @example
 * readPositive('24.85 mL', [[0, 0, 1]], 'the titre').value.toString() // '0.02485'
 */
export function readPositive(text: string, dims: Dims[], what: string, notes: Note[], allowZero = false): Quantity {
  const q = measureAs(text, dims, what, notes);
  if (q.value.isNeg() || (!allowZero && q.value.isZero())) {
    throw fail({ code: 'BAD_AMOUNT', message: `${what} must be ${allowZero ? 'zero or more' : 'positive'}: '${text}'` }, text);
  }
  return inRange(q, text, what);
}

/** Largest power of ten accepted in a bench quantity (in base units), either way. */
export const MAX_MAGNITUDE = 60;

/**
 * Refuses a quantity beyond 10^±60 of its base unit: no bench measurement is, and results stay finite JSON numbers.
 *
 * @example
 * inRange(measure('2.0 g'), '2.0 g', 'the mass').value.toString() // '2'
 */
export function inRange(q: Quantity, text: string, what: string): Quantity {
  if (!q.value.isZero() && Math.abs(q.value.e) > MAX_MAGNITUDE) {
    throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: text, exponentLimit: MAX_MAGNITUDE, reading: 'measurement', what }), text);
  }
  return q;
}
