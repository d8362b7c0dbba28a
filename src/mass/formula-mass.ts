/**
 * Molar mass, monoisotopic mass and nominal mass of a formula, computed
 * exactly: scaled integers on the fast path, Decimal otherwise.
 */
import type { Note } from '../errors/issue.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import { getAtomData, type AtomData, type WeightTable } from '../elements/atom-data.js';
import { Decimal } from '../exact/decimal.js';
import { fromScaled } from '../exact/scaled.js';
import { isWhole, toDecimal, type Amount } from '../formula/amount.js';
import { flattenFormula, type AtomCounts } from '../formula/flatten.js';
import { hillFormula, hillOrder } from '../formula/hill.js';
import { parseFormula, type ParseOptions } from '../formula-parser/parse.js';
import type { FormulaTree } from '../formula-parser/tree.js';

/** Options for the mass functions. */
export interface MassOptions extends ParseOptions {
  /** Atomic-weight table: 'standard' (CIAAW 2021 + 2024 revisions, conventional values for interval elements; default) or 'abridged' (five figures). */
  weights?: WeightTable;
}

/** One kind of atom's share of the molar mass. */
export interface Contribution {
  /** 'C', '13C'. */
  key: string;
  /** As written in output: 'C', '[13C]', 'D'. */
  label: string;
  symbol: string;
  massNumber: number | null;
  count: Amount;
  /** The atomic weight used, as tabulated. */
  atomicWeight: string;
  /** count × atomic weight, exact. */
  mass: Decimal;
  atom: AtomData;
}

/** Everything pondus computes about the mass of one formula. */
export interface MassResult {
  input: string;
  /** Hill formula with charge. */
  formula: string;
  charge: number;
  /** Average molar mass in g/mol (numerically the relative formula mass), exact sum of the tabulated weights. */
  molarMass: Decimal;
  /** Monoisotopic mass in u: principal isotopes (AME2020), less the electrons of a cation or plus those of an anion. */
  monoisotopicMass: Decimal;
  /** Nominal mass: the sum of the principal isotopes' mass numbers (null with non-integer counts). */
  nominalMass: number | null;
  /** Per-atom contributions in Hill order. */
  contributions: Contribution[];
  /** The atom totals. */
  atoms: AtomCounts;
  /** Assumptions and flags (elements without a standard atomic weight, how an ambiguous '.' was read, …). */
  notes: Note[];
  weights: WeightTable;
  tree: FormulaTree;
}

/**
 * Computes the molar, monoisotopic and nominal mass of a formula, with per-element contributions.
 * Throws a PondusError for bad input.
 *
 * @example
 * formulaMass('H2O').molarMass.toString()        // '18.015'
 * formulaMass('H2O').monoisotopicMass.toString() // '18.010564683704'
 */
export function formulaMass(input: string | FormulaTree, options: MassOptions = {}): MassResult {
  const tree = typeof input === 'string' ? parseFormula(input, options) : input;
  const atoms = flattenFormula(tree);
  const weights = options.weights ?? 'standard';
  const keys = hillOrder(atoms.keys());
  const data: AtomData[] = keys.map((k) => atomDataOf(k));
  const counts: Amount[] = keys.map((k) => atoms.get(k)!);

  const molar = sum(data, counts, (d) => d.average[weights].scaled, (d) => d.average[weights].text);
  let mono = sum(data, counts, (d) => d.monoisotopic.scaled, (d) => d.monoisotopic.text);
  if (tree.charge !== 0) mono = mono.minus(new Decimal(ELECTRON_MASS).times(tree.charge));

  let nominal: number | null = 0;
  for (let i = 0; i < data.length; i++) {
    const c = counts[i];
    if (typeof c !== 'number') {
      nominal = null;
      break;
    }
    nominal += c * data[i].nominal;
  }
  if (nominal !== null && !Number.isSafeInteger(nominal)) nominal = null;

  const notes: Note[] = [...tree.notes];
  const contributions: Contribution[] = data.map((d, i) => {
    if (d.noStandardWeight) {
      notes.push({ code: 'NO_STANDARD_WEIGHT', message: `${d.element.name} (${d.symbol}) has no standard atomic weight; the mass number of its longest-lived isotope, ${d.average.standard.text}, stands in for it` });
    }
    return {
      key: d.key,
      label: d.label,
      symbol: d.symbol,
      massNumber: d.massNumber,
      count: counts[i],
      atomicWeight: d.average[weights].text,
      mass: toDecimal(counts[i]).times(d.average[weights].text),
      atom: d,
    };
  });
  if (counts.some((c) => !isWhole(c))) {
    notes.push({ code: 'NON_INTEGER_COUNTS', message: 'the formula has non-integer counts; the nominal mass is not defined' });
  }

  return {
    input: tree.input,
    formula: hillFormula(atoms, tree.charge),
    charge: tree.charge,
    molarMass: molar,
    monoisotopicMass: mono,
    nominalMass: nominal,
    contributions,
    atoms,
    notes,
    weights,
    tree,
  };
}

/**
 * Non-throwing {@link formulaMass}.
 *
 * @example
 * safeFormulaMass('H2Q').success // false
 */
export function safeFormulaMass(input: string, options: MassOptions = {}): SafeResult<MassResult> {
  return toSafe(() => formulaMass(input, options));
}

/**
 * The average molar mass of a formula in g/mol, exact.
 *
 * @example
 * molarMass('NaCl').toString() // '58.43976928'
 */
export function molarMass(input: string | FormulaTree, options: MassOptions = {}): Decimal {
  return formulaMass(input, options).molarMass;
}

function atomDataOf(key: string): AtomData {
  const m = /^([0-9]*)([A-Za-z]+)$/.exec(key)!;
  return getAtomData(m[2], m[1] ? Number(m[1]) : null)!;
}

/** Σ count × value, exactly: in scaled integers while safe, else in Decimal. */
function sum(data: AtomData[], counts: Amount[], scaled: (d: AtomData) => number, text: (d: AtomData) => string): Decimal {
  let acc = 0;
  let exact = true;
  for (let i = 0; i < data.length; i++) {
    const c = counts[i];
    if (typeof c !== 'number') {
      exact = false;
      break;
    }
    acc += c * scaled(data[i]);
    if (!Number.isSafeInteger(acc)) {
      exact = false;
      break;
    }
  }
  if (exact) return fromScaled(acc);
  let d = new Decimal(0);
  for (let i = 0; i < data.length; i++) d = d.plus(toDecimal(counts[i]).times(text(data[i])));
  return d;
}
