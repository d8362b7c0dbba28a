/**
 * The mass fraction of a fragment of a formula: water in a hydrate, sulfate in
 * a salt, iron in an iron salt. The fragment is counted where it is written
 * (`·5H2O`, `(SO4)3`, the run `SO4` in `CuSO4`); if it is not written as a unit,
 * it is counted from the atoms (how many whole units the atoms can supply) and
 * a note says so.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { addAmount, amountOf, mulAmount, toDecimal, type Amount } from '../formula/amount.js';
import { flattenFormula, type AtomCounts } from '../formula/flatten.js';
import type { ComponentNode, FormulaTree, PartNode } from '../formula-parser/tree.js';
import { formulaMass, type MassOptions, type MassResult } from '../mass/formula-mass.js';

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
 * @example
 * partShare(formulaMass('Fe2(SO4)3'), 'SO4').count // 3
 */
export function partShare(whole: MassResult, part: string, options: MassOptions = {}): PartShare {
  const frag = formulaMass(part, { ...options });
  const fragCounts = frag.atoms;
  let count: Amount | null = countWritten(whole.tree, fragCounts);
  let countedFrom: PartShare['countedFrom'] = 'written';
  const notes: Note[] = [];
  if (count === null) {
    count = countFromAtoms(whole.atoms, fragCounts);
    countedFrom = 'atoms';
    if (count === null) {
      throw fail({ code: 'PART_NOT_IN_FORMULA', message: `${frag.formula} is not part of ${whole.formula}: the formula lacks ${missing(whole.atoms, fragCounts)}` }, part);
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
  let found: Amount = 0;
  let any = false;
  const visitComponents = (components: ComponentNode[], factor: Amount) => {
    for (const c of components) {
      const f = c.multiplier ? mulAmount(factor, amountOf(c.multiplier.text, c.multiplier.integer)) : factor;
      visitParts(c.parts, f);
    }
  };
  const visitParts = (parts: PartNode[], factor: Amount) => {
    let i = 0;
    while (i < parts.length) {
      let matched = 0;
      for (let j = parts.length; j > i; j--) {
        const k = multipleOf(countsOfParts(parts.slice(i, j)), unit);
        if (k !== null) {
          found = addAmount(found, mulAmount(factor, k));
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

function missing(atoms: AtomCounts, unit: AtomCounts): string {
  return [...unit.keys()].filter((k) => !atoms.has(k)).join(', ') || 'enough atoms';
}
