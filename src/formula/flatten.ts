/**
 * Counts the atoms in a parsed formula: multiplies counts through groups and
 * components into one total per kind of atom (element, or nuclide).
 */
import { fail } from '../errors/pondus-error.js';
import { atomKey } from '../elements/atom-data.js';
import type { ComponentNode, FormulaTree, PartNode } from '../formula-parser/tree.js';
import { addAmount, amountOf, mulAmount, toDecimal, type Amount } from './amount.js';

/** Largest total count of one kind of atom accepted (10^12): far beyond any real formula. */
export const MAX_ATOMS = 1e12;

/** Atom totals keyed by atom key ('C', '13C'), in order of first appearance. */
export type AtomCounts = Map<string, Amount>;

/**
 * Totals the atoms of a formula tree.
 *
 * @example
 * [...flattenFormula(parseFormula('CuSO4·5H2O'))] // [['Cu', 1], ['S', 1], ['O', 9], ['H', 10]]
 */
export function flattenFormula(tree: FormulaTree): AtomCounts {
  const out: AtomCounts = new Map();
  addComponents(tree.components, 1, out);
  for (const [key, n] of out) {
    if (typeof n !== 'number' || n > MAX_ATOMS) {
      if (toDecimal(n).gt(MAX_ATOMS)) {
        throw fail({ code: 'COUNT_TOO_LARGE', message: `the formula has more than 10^12 atoms of ${key}; counts multiply through brackets` }, tree.input);
      }
    }
  }
  return out;
}

function addComponents(components: ComponentNode[], factor: Amount, out: AtomCounts): void {
  for (const c of components) {
    const f = c.multiplier ? mulAmount(factor, amountOf(c.multiplier.text, c.multiplier.integer)) : factor;
    addParts(c.parts, f, out);
  }
}

function addParts(parts: PartNode[], factor: Amount, out: AtomCounts): void {
  for (const p of parts) {
    const f = p.count ? mulAmount(factor, amountOf(p.count.text, p.count.integer)) : factor;
    if (p.kind === 'atom') {
      const key = atomKey(p.symbol, p.massNumber);
      const prev = out.get(key);
      out.set(key, prev === undefined ? f : addAmount(prev, f));
    } else {
      addComponents(p.body, f, out);
    }
  }
}
