/**
 * Reads a measured quantity written by a user — `4.00 g`, `25.0 mL of 0.100 M`,
 * `0.100 M * 25.00 mL`, `98.5 %` — through the calculator, so every command
 * takes amounts the same way, with significant figures and units.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { copyQuantity, type Quantity } from '../sigfig/quantity.js';
import { baseUnitText, dimsName, sameDims, unitSpellings, type Dims } from '../sigfig/units.js';
import { evaluate } from './evaluate.js';
import { parseExpression } from './parse-expression.js';

/**
 * Evaluates a quantity; `of` reads as a product ('25.0 mL of 0.100 M').
 *
 * @param text - the amount as written ('4.00 g', '25.0 mL of 0.100 M', '0.100 M * 25.00 mL').
 * @param what - what the amount is, put in front of every message and note ('the quantity' by default).
 * @param notes - a list that gets a MEASUREMENT note for each remark made while reading (trailing zeros, ratios).
 * @returns the quantity in the base unit of its dimension, with its precision.
 * @throws PondusError, each message starting with `what`: the codes of calc (BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, DIVISION_BY_ZERO, NUMBER_OUT_OF_RANGE, the codes of parseFormula inside M(…), …); BAD_ARGUMENT when `text` or `what` is not a string or `notes` not an array.
 * @example
 * measure('25.0 mL of 0.100 M').value.toString() // '0.0025' (mol)
 */
export function measure(text: string, what = 'the quantity', notes?: Note[]): Quantity {
  let read = READ.get(text);
  if (read === undefined) {
    // a match may start only where a run of white space starts, so a long run is tried once, not once per space
    const expr = text.replace(/(?<!\s)\s+of\s+/g, ' * ');
    try {
      const parsed = parseExpression(expr);
      // a conversion is the calculator's (calc '… to mL'); here it would be dropped without a word
      if (parsed.target) throw fail({ code: 'BAD_EXPRESSION', message: `'to ${parsed.target.unit}' converts a result in the calculator; give the quantity alone here`, column: expr === text ? parsed.target.start + 1 : undefined }, text);
      const ev = evaluate(parsed);
      read = { result: ev.result, notes: ev.notes };
    } catch (e) {
      if (e instanceof PondusError) {
        const named = nameAfterAmount(text);
        throw new PondusError(
          e.issues.map((i) =>
            named && i.code === 'UNKNOWN_UNIT'
              ? { ...i, message: `${what}: ${i.message}`, hint: `${what} is a number and its unit ('${named.amount}'); the name after it, '${named.name}', is not read here: give the amount alone`, length: named.name.length }
              : { ...i, message: `${what}: ${i.message}` },
          ),
          text,
        );
      }
      throw e;
    }
    if (text.length <= 200) {
      if (READ.size >= MAX_REMEMBERED) READ.clear();
      READ.set(text, read);
    }
  }
  for (const n of read.notes) notes?.push({ code: 'MEASUREMENT', message: `${what}: ${n.message}` });
  // a copy: callers may set the unit to show, or add sensitivities
  return copyQuantity(read.result);
}

/** An amount followed by a name ('6 M HCl', '18 M H2SO4'): the amount and the name, when the amount's unit is one pondus reads. */
function nameAfterAmount(text: string): { amount: string; name: string } | null {
  const m = /^\s*([-+]?[0-9.]+(?:[eE][-+]?[0-9]+)?\s*([^\s0-9][^\s]*))\s+(\S.*?)\s*$/.exec(text);
  if (!m || !unitSpellings().includes(m[2])) return null;
  return { amount: m[1], name: m[3] };
}

/**
 * The texts read lately, with what they read as: a batch reads the same option
 * ('0.100 M', '250.0 mL') for every line, and reading a text depends on nothing
 * else. Bounded: short texts only, emptied when full.
 */
const READ = new Map<string, { result: Quantity; notes: Note[] }>();
const MAX_REMEMBERED = 256;

/**
 * Evaluates a quantity that must have one of the given dimensions.
 *
 * @param text - the amount as written ('250.0 mL').
 * @param dims - the dimensions accepted (VOLUME, MASS, …).
 * @param what - what the amount is, put in front of every message and note ('the volume').
 * @param notes - a list that gets a MEASUREMENT note for each remark made while reading.
 * @returns the quantity in the base unit of its dimension, with its precision.
 * @throws PondusError: BAD_AMOUNT when the amount has none of the dimensions `dims`; the codes of measure (BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, DIVISION_BY_ZERO, NUMBER_OUT_OF_RANGE, …); BAD_ARGUMENT when `text` or `what` is not a string or `dims` or `notes` not an array.
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

// the dimensions are the unit vocabulary's (sigfig/units.ts), re-exported for the readers of amounts
export { AMOUNT, MASS, MASS_CONCENTRATION, MOLAR_MASS, MOLARITY, PURE, VOLUME } from '../sigfig/units.js';
