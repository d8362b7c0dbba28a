/**
 * The mass fraction of a fragment of a formula: water in a hydrate, sulfate in
 * a salt, iron in an iron salt. The fragment is counted where it is written
 * (`·5H2O`, `(SO4)3`, the run `SO4` in `CuSO4`); if it is not written as a unit,
 * it is counted from the atoms (how many whole units the atoms can supply) and
 * a note says so.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { Decimal } from '../exact/decimal.js';
import { addAmount, amountOf, mulAmount, toDecimal, type Amount } from '../formula/amount.js';
import { flattenFormula, type AtomCounts } from '../formula/flatten.js';
import type { ComponentNode, FormulaTree, PartNode } from '../formula-parser/tree.js';
import { formulaMassDetail, type MassDetail, type MassOptions } from '../mass/formula-mass.js';

/** A fragment's share of a formula's mass. */
export interface PartShare {
  /** The fragment as given. */
  part: string;
  /** Its Hill formula. */
  formula: string;
  /** How many fragment units one formula unit holds. */
  count: Amount;
  /** Molar mass of one fragment unit. */
  unitMass: Decimal;
  /** count × unit mass, g per mole of formula. */
  mass: Decimal;
  massPercent: Decimal;
  /** 'written': counted where the formula writes it; 'atoms': counted from the atom totals. */
  countedFrom: 'written' | 'atoms';
  notes: Note[];
}

/**
 * The mass share of `part` in a formula whose mass has been computed.
 *
 * @param whole - a detailed mass result of the whole formula (from formulaMassDetail).
 * @param part - the fragment as a formula ('SO4', 'H2O').
 * @param options - the atomic-weight table and reading options for the fragment, as for formulaMass.
 * @returns how many fragment units the formula holds, their mass and mass percent, and whether they were counted where written or from the atom totals (with a note).
 * @throws PondusError: PART_NOT_IN_FORMULA when the formula lacks the fragment's atoms; the codes of parseFormula for the fragment (EMPTY_INPUT, UNKNOWN_ELEMENT, …); BAD_ARGUMENT when `whole` is not a detailed mass result, `part` not a string or `options` not an object.
 * @example
 * partShare(formulaMassDetail('Fe2(SO4)3'), 'SO4').count // 3
 */
export function partShare(whole: MassDetail, part: string, options: MassOptions = {}): PartShare {
  if (typeof part !== 'string') throw fail({ code: 'BAD_ARGUMENT', message: `the part must be a formula written as text ('H2O'), not ${typeof part}` });
  const notes: Note[] = [];
  // '2H2O' in a formula with no nuclide labels can only be 2 × H2O (no ²H₂O is in it): read so, and said
  const lead = /^\s*([1-9][0-9]*)(?=[A-Z])/.exec(part);
  let text = part;
  if (lead && [...whole.atoms.keys()].every((k) => /^[A-Z][a-z]?$/.test(k))) {
    text = `(${part.slice(lead[0].length).trim()})${lead[1]}`;
    notes.push({ code: 'PART_MULTIPLIER', message: `the ${lead[1]} before the part is read as ${lead[1]} × ${part.slice(lead[0].length).trim()}: ${whole.input} has no nuclide label for it to be a mass number of` });
  }
  const frag = formulaMassDetail(text, { ...options });
  const fragCounts = frag.atoms;
  let count: Amount | null = countWritten(whole.tree, fragCounts);
  let countedFrom: PartShare['countedFrom'] = 'written';
  if (count === null) {
    count = countFromAtoms(whole.atoms, fragCounts);
    countedFrom = 'atoms';
    if (count === null) {
      throw fail(typedIssue({ code: 'PART_NOT_IN_FORMULA', part: frag.formula, formula: whole.formula, lacking: lacking(whole.atoms, fragCounts) }), part);
    }
    notes.push({ code: 'PART_FROM_ATOMS', message: `${part} is not written as a unit in ${whole.input}; its share is counted from the atoms (${toDecimal(count).toFixed()} units)` });
  }
  const mass = toDecimal(count).times(frag.molarMass);
  return {
    part,
    formula: frag.formula,
    count,
    unitMass: frag.molarMass,
    mass,
    massPercent: whole.molarMass.isZero() ? new Decimal(0) : mass.div(whole.molarMass).times(100),
    countedFrom,
    notes,
  };
}

/** Positive k with counts = k × unit for every atom, or null. */
function multipleOf(counts: AtomCounts, unit: AtomCounts): Amount | null {
  if (counts.size !== unit.size || counts.size === 0) return null;
  let k: Decimal | null = null;
  for (const [key, n] of unit) {
    const c = counts.get(key);
    if (c === undefined) return null;
    const r = toDecimal(c).div(toDecimal(n));
    if (k === null) k = r;
    else if (!k.eq(r)) return null;
  }
  return k && k.isInteger() && k.gt(0) ? k.toNumber() : null;
}

function countsOfParts(parts: PartNode[]): AtomCounts {
  const c: ComponentNode = { kind: 'component', multiplier: null, parts, span: parts[0].span };
  return flattenFormula({ kind: 'formula', input: '', components: [c], charge: 0, notes: [] });
}

/** Counts the fragment where the formula writes it; null when it is written nowhere. */
function countWritten(tree: FormulaTree, unit: AtomCounts): Amount | null {
  const keys = [...unit.keys()];
  const unitNumbers = keys.map((key) => toDecimal(unit.get(key)!).toNumber());
  let found: Amount = 0;
  let any = false;
  const visitComponents = (components: ComponentNode[], factor: Amount) => {
    for (const c of components) {
      const f = c.multiplier ? mulAmount(factor, amountOf(c.multiplier.text, c.multiplier.integer)) : factor;
      visitParts(c.parts, f);
    }
  };
  const visitParts = (parts: PartNode[], factor: Amount) => {
    // Screen runs parts[i..j) with plain numbers over prefix sums (a run is a multiple of the unit
    // only if it holds no other atom and its totals are one multiple of the unit's), then check
    // the few that pass exactly: linear in the parts for a fragment that is not there.
    const n = parts.length;
    const k = keys.length;
    const prefix = new Float64Array((n + 1) * k);
    const nextOther = new Int32Array(n + 1);
    const own = parts.map((p) => countsOfParts([p]));
    for (let i = 0; i < n; i++) {
      let other = false;
      for (const key of own[i].keys()) if (!unit.has(key)) other = true;
      nextOther[i] = other ? i : -1;
      for (let u = 0; u < k; u++) {
        const c = own[i].get(keys[u]);
        prefix[(i + 1) * k + u] = prefix[i * k + u] + (c === undefined ? 0 : typeof c === 'number' ? c : c.toNumber());
      }
    }
    nextOther[n] = n;
    for (let i = n - 1; i >= 0; i--) if (nextOther[i] < 0) nextOther[i] = nextOther[i + 1];
    const screen = (i: number, j: number): boolean => {
      let m = -1;
      for (let u = 0; u < k; u++) {
        const r = (prefix[j * k + u] - prefix[i * k + u]) / unitNumbers[u];
        if (!(r > 0)) return false;
        if (m < 0) m = r;
        else if (Math.abs(r - m) > 1e-9 * m) return false;
      }
      return Math.abs(m - Math.round(m)) <= 1e-9 * m;
    };
    let i = 0;
    while (i < n) {
      let matched = 0;
      for (let j = nextOther[i]; j > i; j--) {
        if (!screen(i, j)) continue;
        const m = multipleOf(countsOfParts(parts.slice(i, j)), unit);
        if (m !== null) {
          found = addAmount(found, mulAmount(factor, m));
          any = true;
          matched = j - i;
          break;
        }
      }
      if (matched > 0) {
        i += matched;
        continue;
      }
      const p = parts[i];
      if (p.kind === 'group') visitComponents(p.body, p.count ? mulAmount(factor, amountOf(p.count.text, p.count.integer)) : factor);
      i++;
    }
  };
  visitComponents(tree.components, 1);
  return any ? found : null;
}

/** How many fragment units the atom totals can supply; null when an atom is missing. */
function countFromAtoms(atoms: AtomCounts, unit: AtomCounts): Amount | null {
  let best: Decimal | null = null;
  for (const [key, n] of unit) {
    const have = atoms.get(key);
    if (have === undefined) return null;
    const r = toDecimal(have).div(toDecimal(n));
    if (best === null || r.lt(best)) best = r;
  }
  if (best === null) return null;
  return best.isInteger() ? best.toNumber() : best;
}

/** The atoms of the part the formula has none of. */
function lacking(atoms: AtomCounts, unit: AtomCounts): string[] {
  return [...unit.keys()].filter((k) => !atoms.has(k));
}
