/**
 * Shared pieces of the QC and pharmacy commands: each result row carries its
 * input and line, notes as {code, message}, and the caution; quantities are
 * written in JSON as amounts, the one shape every command uses:
 * {kind, value, unit, display, sigFigs, figure, displayUnit}, the value
 * unrounded in the base unit beside the figure as reported. CSV cells are
 * guarded and the notes cell written by the shared output writers (../output/format.ts).
 */
import { notesJson } from '../../errors/note-json.js';
import type { Quantity } from '../../sigfig/quantity.js';
import { displayQuantity } from '../../sigfig/display-quantity.js';
import type { RoundingMode } from '../../sigfig/round.js';
import type { Presenter } from '../output/presenter.js';

/** A result with the input it came from and its line. */
export interface Row<R> {
  input: string;
  line: number;
  r: R;
}

/**
 * A quantity in a unit, rounded once: the unrounded value in that unit and the reported figure (the CSV cells).
 *
 * @example
 * reportedIn(measure('250. mg'), 'g', 'half-even') // { value: 0.25, reported: '0.250' }
 */
export function reportedIn(q: Quantity, unit: string | undefined, rounding: RoundingMode): { value: number; reported: string } {
  const d = displayQuantity(q, unit, rounding);
  return { value: d.value.toNumber(), reported: d.figure };
}

/** The text of a quantity in a unit, with a label in place of the unit symbol when given (mEq for mmol of charge). */
export function qtext(q: Quantity, unit: string | undefined, rounding: RoundingMode, label?: string): string {
  const d = displayQuantity(q, unit, rounding);
  return label === undefined ? d.text : `${d.figure} ${label}`;
}

/** Notes as JSON. */
export { notesJson };

/**
 * Wraps a computation so each result knows its input and line (results come in input order).
 *
 * @example
 * const compute = numbered((s) => s.length); compute('ab').line // 1
 */
export function numbered<R>(f: (input: string) => R): (input: string) => Row<R> {
  let line = 0;
  return (input) => {
    const at = ++line;
    return { input, line: at, r: f(input) };
  };
}

export type RowPresenter<R> = Presenter<Row<R>>;
