/**
 * Using one form of a reagent for another: the pentahydrate for the anhydrous
 * salt, or one hydrate for another. Equal amounts of formula units, so the
 * mass scales with the molar masses.
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { AMOUNT, MASS, measureAs } from '../calc/measure.js';
import { partShare } from '../composition/part-share.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMass, type MassOptions, type MassResult } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';

export interface SubstituteResult {
  /** The form in hand. */
  use: MassResult;
  /** The form the recipe names. */
  instead: MassResult;
  /** The amount the recipe asks for. */
  asked: Quantity;
  moles: Quantity;
  /** Mass of the form in hand to weigh, g. */
  mass: Quantity;
  notes: Note[];
}

/** Atoms other than the water written in the formula (water of crystallisation). */
function core(m: MassResult, options: MassOptions): Map<string, string> {
  let water = 0;
  try {
    const w = partShare(m, 'H2O', options);
    if (w.countedFrom === 'written') water = toDecimal(w.count).toNumber();
  } catch {
    water = 0;
  }
  const out = new Map<string, string>();
  for (const [k, n] of m.atoms) {
    const left = toDecimal(n).minus(k === 'H' ? 2 * water : k === 'O' ? water : 0);
    if (!left.isZero()) out.set(k, left.toFixed());
  }
  return out;
}

/**
 * How much of `use` to weigh in place of an amount of `instead`.
 *
 * @example
 * substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g').mass // 15.64 g
 */
export function substituteForm(use: string, instead: string, amount: string, options: MassOptions = {}): SubstituteResult {
  const u = formulaMass(use, options);
  const i = formulaMass(instead, options);
  const notes: Note[] = [];
  const asked = measureAs(amount, [MASS, AMOUNT], `the amount of ${instead}`, notes);
  if (asked.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the amount must be positive' });
  const gPerMol = unitOf('g/mol');
  const moles = sameDims(asked.dims, MASS) ? divide(asked, quantity(reportedMolarMass(i), gPerMol)) : asked;
  const mass = multiply(moles, quantity(reportedMolarMass(u), gPerMol));
  const a = core(u, options);
  const b = core(i, options);
  const same = a.size === b.size && [...a].every(([k, v]) => b.get(k) === v);
  if (!same) notes.push({ code: 'FORMS_DIFFER', message: `${u.formula} and ${i.formula} differ by more than water of crystallisation; the substitution keeps equal amounts of formula units` });
  return { use: u, instead: i, asked, moles, mass, notes };
}

/** Non-throwing {@link substituteForm}. */
export function safeSubstituteForm(use: string, instead: string, amount: string, options: MassOptions = {}): SafeResult<SubstituteResult> {
  return toSafe(() => substituteForm(use, instead, amount, options));
}
