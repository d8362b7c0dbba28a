/**
 * Shared pieces of the QC and pharmacy commands: each result row carries its
 * input and line, notes as {code, message}, and the caution; quantities are
 * written as a JSON number (unrounded, in the reported unit) beside the
 * reported figure as text.
 */
import { Option, type Command } from 'commander';
import type { Note } from '../../errors/issue.js';
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

/** A quantity in JSON: the unrounded value in the unit, the reported figure, the unit. */
export interface QuantityJson {
  value: number;
  reported: string;
  unit: string;
}

/**
 * A quantity as JSON, in a unit, rounded once for the reported figure.
 *
 * @example
 * quantityJson(measure('250. mg'), 'g', 'half-even') // { value: 0.25, reported: '0.250', unit: 'g' }
 */
export function quantityJson(q: Quantity, unit: string | undefined, rounding: RoundingMode, label = unit): QuantityJson {
  const d = displayQuantity(q, unit, rounding);
  return { value: d.value.toNumber(), reported: d.figure, unit: label ?? d.unit };
}

/** The text of a quantity in a unit, with a label in place of the unit symbol when given (mEq for mmol of charge). */
export function qtext(q: Quantity, unit: string | undefined, rounding: RoundingMode, label?: string): string {
  const d = displayQuantity(q, unit, rounding);
  return label === undefined ? d.text : `${d.figure} ${label}`;
}

/** Notes as JSON. */
export const notesJson = (notes: Note[]) => notes.map((n) => ({ code: n.code, message: n.message }));

/** Notes in one CSV cell. */
export const notesCell = (notes: Note[]) => notes.map((n) => `${n.code}: ${n.message}`).join(' | ');

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

/** Adds --rounding. */
export function withRounding(cmd: Command): Command {
  return cmd.addOption(new Option('--rounding <mode>', 'rounding of reported figures: half-even (default) or half-up (many pharmacopoeias and house rules)').choices(['half-even', 'half-up']).default('half-even'));
}

export type RowPresenter<R> = Presenter<Row<R>>;

/**
 * A text cell a spreadsheet could run as a formula (starting with =, +, @, a tab or a carriage
 * return, or - not followed by a digit) gets a leading apostrophe; numbers are left alone.
 *
 * @example
 * protectCell('=1+2') // "'=1+2"
 */
export function protectCell<C>(c: C): C | string {
  return typeof c === 'string' && /^(?:[=+@\t\r]|-(?![\d.]))/.test(c) ? `'${c}` : c;
}

/** The presenter with its CSV/TSV cells protected (see {@link protectCell}). */
export function withProtectedCells<R>(p: Presenter<R>): Presenter<R> {
  return { ...p, cells: (r) => p.cells(r).map(protectCell) };
}
