/**
 * How the assay and pharmacy calculations read a measured amount: through the
 * common quantity reader, refusing zero and negative values with the name of
 * the quantity.
 */
import type { Note, NoteCode } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { measureAs, PURE } from '../calc/measure.js';
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

/** How {@link readShare} takes a share written with no unit (a number at most 1). */
export type BareShare =
  /** Refused with both readings: a content ('0.05') may be 0.05 % or 5 %. */
  | { bare: 'refuse' }
  /** Read as a fraction of 1, with a note of this code: an assay of 0.985 is 98.5 %. */
  | { bare: 'fraction'; note: NoteCode };

/**
 * Reads a share of a whole (an assay, a purity, a water content, a mass fraction): '98.5 %',
 * '0.32 %', '985 mg/g'. A number with no unit above 1 is refused with the per cent it must mean;
 * one at most 1 is refused with both readings, or read as a fraction of 1 with a note, as the
 * caller says; a bare 0 is 0 % either way.
 *
 * @param text - the share as written.
 * @param what - what it is, for messages: 'the water content'.
 * @param notes - where the notes of the reading go.
 * @param o - how a bare number is taken, whether zero is allowed, and whether 100 % itself is (`below: true` refuses it, for a content removed from a sample).
 * @returns the share as a fraction of 1 (a Quantity with no dimensions).
 * @throws PondusError: BAD_AMOUNT for a bare number above 1, a bare number with `bare: 'refuse'`, a share above 100 % (or at 100 % with `below`), zero (unless allowed) or a negative one; a measurement that cannot be read (BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE).
 * @example
 * readShare('0.32 %', 'the water content', [], { bare: 'refuse', below: true }).value.toString() // '0.0032'
 * const notes = []
 * readShare('0.985', 'the purity', notes, { bare: 'fraction', note: 'PURITY_AS_FRACTION' }).value.toString() // '0.985'
 * notes[0].message // 'the purity 0.985 has no unit: read as a fraction of 1 (98.5 %)'
 */
export function readShare(text: string, what: string, notes: Note[], o: BareShare & { allowZero?: boolean; below?: boolean }): Quantity {
  const t = text.trim();
  const q = readPositive(t, [PURE], what, notes, o.allowZero);
  if (!q.unit) {
    const percent = q.value.times(100).toFixed();
    if (q.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `${what} ${t} has no unit: as a fraction of 1 it would be ${percent} %`, hint: `for per cent write '${t} %'` }, text);
    if (o.bare === 'refuse' && !q.value.isZero()) {
      throw fail({ code: 'BAD_AMOUNT', message: `${what} ${t} has no unit, and reads two ways`, hint: `for ${t} per cent write '${t} %'; for a fraction ${t} of 1 write '${percent} %'` }, text);
    }
    if (o.bare === 'fraction') notes.push({ code: o.note, message: `${what} ${t} has no unit: read as a fraction of 1 (${percent} %)` });
  }
  if (o.below ? q.value.gte(1) : q.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `${what} must be ${o.below ? 'below' : 'at most'} 100 %: '${t}'` }, text);
  return q;
}
