/**
 * Instructions computed from targets (a salt mass for a target mEq, the
 * amounts to mix in alligation) keep working precision, by the one policy of
 * ../sigfig/instruction.ts: at least WORKING_FIGURES significant figures,
 * whatever the figures of the target, with a note when the target was written
 * with fewer than FEW_FIGURES. These two helpers apply it to quantities that
 * pharmacy results carry on.
 */
import type { Note } from '../errors/issue.js';
import { FEW_FIGURES, instruction, WORKING_FIGURES, workingFigures } from '../sigfig/instruction.js';
import { lsdForSigFigs, sigFigsOf } from '../sigfig/measured.js';
import type { Quantity } from '../sigfig/quantity.js';

/**
 * The quantity shown with at least four significant figures (more when its inputs carry more).
 *
 * @param q - a Quantity.
 * @returns the same quantity with the precision of at least four significant figures.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayQuantity(atWorkingPrecision(measure('2.0 g')), 'g').text // '2.000 g'
 */
export function atWorkingPrecision(q: Quantity): Quantity {
  if (q.value.isZero()) return { ...q, lsd: -WORKING_FIGURES, sigFigs: undefined };
  const n = workingFigures(instruction(q, []));
  return { ...q, lsd: lsdForSigFigs(q.value, n), sigFigs: n };
}

/**
 * Adds a TARGET_FEW_FIGURES note when a target has fewer than {@link FEW_FIGURES} significant figures.
 *
 * @param target - the target, a Quantity.
 * @param text - the target as written.
 * @param what - what it is: 'the target'.
 * @param notes - where the note is added.
 * @returns nothing; the note is added to `notes`.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const notes = []
 * noteFewFigures(measure('20 mmol'), '20 mmol', 'the target', notes)
 * notes[0].code // 'TARGET_FEW_FIGURES'
 */
export function noteFewFigures(target: Quantity, text: string, what: string, notes: Note[]): void {
  const n = sigFigsOf(target);
  if (n < FEW_FIGURES) {
    notes.push({ code: 'TARGET_FEW_FIGURES', message: `${what} '${text.trim()}' has ${n} significant figure${n === 1 ? '' : 's'}; the instruction keeps working precision (${WORKING_FIGURES} figures), which does not make the target more exact` });
  }
}
