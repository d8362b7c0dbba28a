/**
 * Counts the atoms in a parsed formula: multiplies counts through groups and
 * components into one total per kind of atom (element, or nuclide). The one
 * counting walk every quantity starts from: {@link atomVector} gives the totals
 * as dense-table ids in Hill order, {@link flattenFormula} the same totals as a map.
 */
import { fail } from '../errors/pondus-error.js';
import { ATOMS, atomId } from '../elements/atom-data.js';
import type { ComponentNode, FormulaTree, PartNode } from '../formula-parser/tree.js';
import { addAmount, amountOf, mulAmount, toDecimal, type Amount } from './amount.js';

/** Largest total count of one kind of atom accepted (10^12): far beyond any real formula. */
export const MAX_ATOMS = 1e12;

/** Atom totals keyed by atom key ('C', '13C'), in order of first appearance. */
export type AtomCounts = Map<string, Amount>;

/** Atom totals over the dense per-atom tables (`ATOMS` in elements/atom-data.ts), in Hill order. */
export interface AtomVector {
  /** Dense-table ids, in Hill order (Hill 1900; IUPAC Red Book IR-4.7). */
  ids: number[];
  /** The total of each, exact: a number while whole and safe, a Decimal otherwise. */
  counts: Amount[];
  /** True when every count is a whole number held as a number. */
  whole: boolean;
  /** The same ids in order of first appearance in the formula. */
  seen: number[];
}

// scratch totals indexed by id, reset after each walk (the library is single-threaded)
const totals: (Amount | undefined)[] = [];
let touched: number[] = [];

/**
 * Totals the atoms of a formula tree over the dense per-atom tables, in Hill order.
 * Throws COUNT_TOO_LARGE past 10^12 atoms of one kind.
 *
 * @param tree - a parsed formula (from parseFormula).
 * @returns the atom totals: dense-table ids in Hill order, their exact counts, whether all are whole, and the ids in order of first appearance.
 * @throws PondusError: COUNT_TOO_LARGE past 10^12 atoms of one kind; UNKNOWN_ELEMENT for an atom the tables have no data for (a hand-built tree); BAD_ARGUMENT when `tree` is not a parsed formula.
 * @example
 * atomVector(parseFormula('CuSO4·5H2O')).counts // [1, 10, 9, 1]
 */
export function atomVector(tree: FormulaTree): AtomVector {
  touched = [];
  try {
    addComponents(tree.components, 1);
    const seen = touched;
    const n = seen.length;
    const ids = hillIds(seen);
    const counts = new Array<Amount>(n);
    let whole = true;
    for (let i = 0; i < n; i++) {
      const c = totals[ids[i]]!;
      if (typeof c !== 'number') whole = false;
      if (typeof c !== 'number' || c > MAX_ATOMS) {
        if (toDecimal(c).gt(MAX_ATOMS)) {
          throw fail({ code: 'COUNT_TOO_LARGE', message: `the formula has more than 10^12 atoms of ${ATOMS.data[ids[i]].key}; counts multiply through brackets` }, tree.input);
        }
      }
      counts[i] = c;
    }
    return { ids, counts, whole, seen };
  } finally {
    for (const id of touched) totals[id] = undefined;
  }
}

/**
 * Dense-table ids in Hill order: a sorted copy of `seen` (C first, then H, then the rest
 * alphabetically when carbon is present; all alphabetically otherwise).
 *
 * @param seen - dense-table ids, each once (in order of first appearance).
 * @returns a new array of the same ids in Hill order.
 * @example
 * hillIds(atomVector(parseFormula('OCH4')).seen).join() === atomVector(parseFormula('OCH4')).ids.join() // true
 */
export function hillIds(seen: readonly number[]): number[] {
  const n = seen.length;
  const ids = seen.slice();
  let organic = false;
  for (let i = 0; i < n; i++) if (ATOMS.data[ids[i]].symbol === 'C') organic = true;
  const rank = organic ? ATOMS.rankOrganic : ATOMS.rankPlain;
  // insertion sort: formulas have few kinds of atom, at most a few hundred
  for (let i = 1; i < n; i++) {
    const id = ids[i];
    const r = rank[id];
    let j = i - 1;
    while (j >= 0 && rank[ids[j]] > r) {
      ids[j + 1] = ids[j];
      j--;
    }
    ids[j + 1] = id;
  }
  return ids;
}

/**
 * Totals the atoms of a formula tree, keyed by atom key in order of first appearance.
 *
 * @param tree - a parsed formula (from parseFormula).
 * @returns a map from atom key ('C', '13C') to its exact total, in order of first appearance.
 * @throws PondusError: COUNT_TOO_LARGE past 10^12 atoms of one kind; UNKNOWN_ELEMENT for an atom the tables have no data for (a hand-built tree); BAD_ARGUMENT when `tree` is not a parsed formula.
 * @example
 * [...flattenFormula(parseFormula('CuSO4·5H2O'))] // [['Cu', 1], ['S', 1], ['O', 9], ['H', 10]]
 */
export function flattenFormula(tree: FormulaTree): AtomCounts {
  return countsMap(atomVector(tree));
}

/**
 * The totals of an atom vector as a map keyed by atom key, in order of first appearance.
 *
 * @example
 * countsMap(atomVector(parseFormula('H2O'))).get('H') // 2
 */
export function countsMap(v: AtomVector): AtomCounts {
  const out: AtomCounts = new Map();
  const at = new Map<number, Amount>();
  for (let i = 0; i < v.ids.length; i++) at.set(v.ids[i], v.counts[i]);
  for (const id of v.seen) out.set(ATOMS.data[id].key, at.get(id)!);
  return out;
}

function addComponents(components: ComponentNode[], factor: Amount): void {
  for (let i = 0; i < components.length; i++) {
    const c = components[i];
    addParts(c.parts, c.multiplier ? times(factor, c.multiplier.text, c.multiplier.integer) : factor);
  }
}

function times(factor: Amount, text: string, integer: boolean): Amount {
  if (integer && typeof factor === 'number') {
    const p = factor * Number(text);
    if (Number.isSafeInteger(p)) return p;
  }
  return mulAmount(factor, amountOf(text, integer));
}

function addParts(parts: PartNode[], factor: Amount): void {
  for (let i = 0; i < parts.length; i++) {
    const p = parts[i];
    const f = p.count ? times(factor, p.count.text, p.count.integer) : factor;
    if (p.kind === 'atom') {
      const id = atomId(p.symbol, p.massNumber);
      if (id < 0) throw fail({ code: 'UNKNOWN_ELEMENT', message: `no data for '${p.symbol}'` });
      const prev = totals[id];
      if (prev === undefined) {
        touched.push(id);
        totals[id] = f;
      } else if (typeof prev === 'number' && typeof f === 'number' && Number.isSafeInteger(prev + f)) {
        totals[id] = prev + f;
      } else {
        totals[id] = addAmount(prev, f);
      }
    } else {
      addComponents(p.body, f);
    }
  }
}
