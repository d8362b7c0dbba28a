/**
 * Reads a measured quantity written by a user — `4.00 g`, `25.0 mL of 0.100 M`,
 * `0.100 M * 25.00 mL`, `98.5 %` — through the calculator, so every command
 * takes amounts the same way, with significant figures and units.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import type { Quantity } from '../sigfig/quantity.js';
import { baseUnitText, dimsName, sameDims, type Dims } from '../sigfig/units.js';
import { evaluate } from './evaluate.js';
import { parseExpression } from './parse-expression.js';

/**
 * Evaluates a quantity; `of` reads as a product ('25.0 mL of 0.100 M').
 *
 * @example
 * measure('25.0 mL of 0.100 M').value.toString() // '0.0025' (mol)
 */
export function measure(text: string, what = 'the quantity', notes?: Note[]): Quantity {
  const expr = text.replace(/\s+of\s+/g, ' * ');
  try {
    const ev = evaluate(parseExpression(expr));
    for (const n of ev.notes) notes?.push({ code: 'MEASUREMENT', message: `${what}: ${n.message}` });
    return ev.result;
  } catch (e) {
    if (e instanceof PondusError) throw new PondusError(e.issues.map((i) => ({ ...i, message: `${what}: ${i.message}` })), text);
    throw e;
  }
}

/**
 * Evaluates a quantity that must have one of the given dimensions.
 *
 * @example
 * measureAs('250.0 mL', [VOLUME], 'the volume').value.toString() // '0.25' (litres)
 */
export function measureAs(text: string, dims: Dims[], what: string, notes?: Note[]): Quantity {
  const q = measure(text, what, notes);
  if (!dims.some((d) => sameDims(d, q.dims))) {
    throw fail({ code: 'BAD_AMOUNT', message: `${what} must be ${dims.map(dimsName).join(' or ')}; '${text}' is ${dimsName(q.dims)}${baseUnitText(q.dims) ? ` (${baseUnitText(q.dims)})` : ''}` }, text);
  }
  return q;
}

/** A quantity read from text, with the remarks made while reading it. */
export interface ReadQuantity {
  quantity: Quantity;
  /**
   * How the text was read, where it could be read two ways: trailing zeros
   * without a decimal point (`1300 mg`), 100 % taken as the defined whole, a
   * ratio such as 1:1000. Each message starts with `what`. A command must show
   * these with its result (text, JSON and CSV).
   */
  notes: Note[];
}

/**
 * Reads a quantity of one of the given dimensions and returns the notes with
 * it, so that they cannot be dropped by forgetting to pass a list: prefer this
 * to {@link measureAs} in new code.
 *
 * @example
 * readQuantity('1300 mg', [MASS], 'the dose').notes[0].message
 * // 'the dose: the trailing zeros of 1300 are read as not significant (2 significant figures); write 1300. or use scientific notation if they are'
 */
export function readQuantity(text: string, dims: Dims[], what: string): ReadQuantity {
  const notes: Note[] = [];
  const quantity = measureAs(text, dims, what, notes);
  return { quantity, notes };
}

export const MASS: Dims = [1, 0, 0];
export const AMOUNT: Dims = [0, 1, 0];
export const VOLUME: Dims = [0, 0, 1];
export const MOLARITY: Dims = [0, 1, -1];
export const MASS_CONCENTRATION: Dims = [1, 0, -1];
export const PURE: Dims = [0, 0, 0];
