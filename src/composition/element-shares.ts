/**
 * Mass percent by element: each kind of atom's mass over the molar mass.
 */
import type { Note } from '../errors/issue.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import type { Amount } from '../formula/amount.js';
import { formulaMass, type MassOptions, type MassResult } from '../mass/formula-mass.js';
import type { FormulaTree } from '../formula-parser/tree.js';
import { partShare, type PartShare } from './part-share.js';

/** One element's share of a formula's mass. */
export interface ElementShare {
  /** As written in output: 'C', '[13C]', 'D'. */
  symbol: string;
  count: Amount;
  /** Mass of this element in one mole of the formula, g/mol. */
  mass: Decimal;
  /** Percent by mass. */
  massPercent: Decimal;
}

/** Options for {@link composition}. */
export interface CompositionOptions extends MassOptions {
  /** A fragment whose mass fraction to report as well (`H2O` in a hydrate, `SO4` in a salt). */
  part?: string;
}

/** Percent composition of one formula. */
export interface CompositionResult {
  input: string;
  formula: string;
  charge: number;
  molarMass: Decimal;
  elements: ElementShare[];
  part: PartShare | null;
  notes: Note[];
  mass: MassResult;
}

/**
 * Mass percent of each element in a formula, and optionally of a fragment.
 *
 * @example
 * composition('H2O').elements.map(e => [e.symbol, e.massPercent.toFixed(2)]) // [['H','11.19'], ['O','88.81']]
 * composition('CuSO4·5H2O', { part: 'H2O' }).part?.massPercent.toFixed(2)   // '36.08'
 */
export function composition(input: string | FormulaTree, options: CompositionOptions = {}): CompositionResult {
  const mass = formulaMass(input, options);
  const total = mass.molarMass;
  const elements = mass.contributions.map((c) => ({
    symbol: c.label,
    count: c.count,
    mass: c.mass,
    massPercent: total.isZero() ? new Decimal(0) : c.mass.div(total).times(100),
  }));
  const part = options.part !== undefined ? partShare(mass, options.part, options) : null;
  const notes = part ? [...mass.notes, ...part.notes] : mass.notes;
  return { input: mass.input, formula: mass.formula, charge: mass.charge, molarMass: total, elements, part, notes, mass };
}

/**
 * Non-throwing {@link composition}.
 *
 * @example
 * safeComposition('H2O', { part: 'NaCl' }).success // false
 */
export function safeComposition(input: string, options: CompositionOptions = {}): SafeResult<CompositionResult> {
  return toSafe(() => composition(input, options));
}
