/**
 * Molar mass, monoisotopic mass and nominal mass of a formula, computed
 * exactly: in scaled integers (10^-12 u) on the fast path, in Decimal where
 * counts are decimal or sums grow past the exact integer range. Decimal values
 * and per-element contributions are built only when asked for, which keeps
 * million-line batches fast.
 */
import type { Note } from '../errors/issue.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import type { AtomData, WeightTable } from '../elements/atom-data.js';
import { Decimal } from '../exact/decimal.js';
import { fromScaled, scaledToJson, scaledToString, SCALE_DIGITS } from '../exact/scaled.js';
import { isWhole, toDecimal, type Amount } from '../formula/amount.js';
import { flattenFormula, type AtomCounts } from '../formula/flatten.js';
import { formatFormula, hillEntries } from '../formula/hill.js';
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
  readonly input: string;
  /** Hill formula with charge. */
  readonly formula: string;
  readonly charge: number;
  /** Average molar mass in g/mol (numerically the relative formula mass), the exact sum of the tabulated weights. */
  readonly molarMass: Decimal;
  /** Monoisotopic mass in u: principal isotopes (AME2020), less the electrons of a cation or plus those of an anion (CODATA). */
  readonly monoisotopicMass: Decimal;
  /** Nominal mass: the sum of the principal isotopes' mass numbers (null with non-integer counts). */
  readonly nominalMass: number | null;
  /** Per-atom contributions in Hill order. */
  readonly contributions: Contribution[];
  /** The atom totals. */
  readonly atoms: AtomCounts;
  /** Assumptions and flags (elements without a standard atomic weight, how an ambiguous '.' was read, …). */
  readonly notes: Note[];
  readonly weights: WeightTable;
  readonly tree: FormulaTree;
  /** The molar mass as the nearest JavaScript number. */
  molarMassNumber(): number;
  /** The monoisotopic mass as the nearest JavaScript number. */
  monoisotopicMassNumber(): number;
  /** The molar mass as exact decimal text ('18.015'). */
  molarMassText(): string;
  /** The molar mass as JSON number text (JSON.stringify of molarMassNumber(), produced faster). */
  molarMassJson(): string;
  /** The monoisotopic mass as JSON number text. */
  monoisotopicMassJson(): string;
  /** The monoisotopic mass as exact decimal text. */
  monoisotopicMassText(): string;
}

const SCALE = 10 ** SCALE_DIGITS;
const NO_NOTES: Note[] = Object.freeze([]) as unknown as Note[];

class Computed implements MassResult {
  readonly formula: string;
  readonly nominalMass: number | null;
  readonly notes: Note[];
  private molarCache: Decimal | null = null;
  private monoCache: Decimal | null = null;
  private contributionsCache: Contribution[] | null = null;

  constructor(
    readonly tree: FormulaTree,
    readonly atoms: AtomCounts,
    private readonly data: AtomData[],
    private readonly counts: Amount[],
    readonly weights: WeightTable,
    /** Exact sums in 10^-12 u, or null when they need Decimal. */
    private readonly molarScaled: number | null,
    private readonly monoScaled: number | null,
  ) {
    this.formula = formatFormula(data.map((d) => d.label), counts, tree.charge);
    let nominal: number | null = 0;
    let notes: Note[] = tree.notes.length ? [...tree.notes] : NO_NOTES;
    for (let i = 0; i < data.length; i++) {
      const c = counts[i];
      if (nominal !== null) nominal = typeof c === 'number' ? nominal + c * data[i].nominal : null;
      if (data[i].noStandardWeight) {
        const d = data[i];
        if (notes === NO_NOTES) notes = [];
        notes.push({ code: 'NO_STANDARD_WEIGHT', message: `${d.element.name} (${d.symbol}) has no standard atomic weight; the mass number of its longest-lived isotope, ${d.average.standard.text}, stands in for it` });
      }
    }
    this.nominalMass = nominal !== null && Number.isSafeInteger(nominal) ? nominal : null;
    if (this.nominalMass === null && counts.some((c) => !isWhole(c))) {
      if (notes === NO_NOTES) notes = [];
      notes.push({ code: 'NON_INTEGER_COUNTS', message: 'the formula has non-integer counts; the nominal mass is not defined' });
    }
    if (tree.charge !== 0) {
      if (notes === NO_NOTES) notes = [];
      const z = Math.abs(tree.charge);
      const e = (Number(ELECTRON_MASS) * z).toPrecision(2);
      notes.push({
        code: 'ION_MOLAR_MASS',
        message: `the molar mass is the sum of the atomic weights (neutral atoms): the ${z} electron${z === 1 ? '' : 's'} ${tree.charge > 0 ? 'missing from' : 'added to'} the ion (${e} g/mol) ${z === 1 ? 'is' : 'are'} not counted (common practice for molar masses); the monoisotopic mass counts ${z === 1 ? 'it' : 'them'}`,
      });
    }
    this.notes = notes;
  }

  get input(): string {
    return this.tree.input;
  }

  get charge(): number {
    return this.tree.charge;
  }

  get molarMass(): Decimal {
    this.molarCache ??= this.molarScaled !== null ? fromScaled(this.molarScaled) : decimalSum(this.data, this.counts, (d) => d.average[this.weights].text);
    return this.molarCache;
  }

  get monoisotopicMass(): Decimal {
    if (this.monoCache) return this.monoCache;
    let m = this.monoScaled !== null ? fromScaled(this.monoScaled) : decimalSum(this.data, this.counts, (d) => d.monoisotopic.text);
    if (this.tree.charge !== 0) m = m.minus(new Decimal(ELECTRON_MASS).times(this.tree.charge));
    this.monoCache = m;
    return m;
  }

  molarMassNumber(): number {
    // an exact integer divided by 10^12 is the correctly rounded double of the exact decimal
    return this.molarScaled !== null ? this.molarScaled / SCALE : this.molarMass.toNumber();
  }

  monoisotopicMassNumber(): number {
    return this.monoScaled !== null && this.tree.charge === 0 ? this.monoScaled / SCALE : this.monoisotopicMass.toNumber();
  }

  molarMassJson(): string {
    return this.molarScaled !== null ? scaledToJson(this.molarScaled) : JSON.stringify(this.molarMassNumber());
  }

  monoisotopicMassJson(): string {
    return this.monoScaled !== null && this.tree.charge === 0 ? scaledToJson(this.monoScaled) : JSON.stringify(this.monoisotopicMassNumber());
  }

  molarMassText(): string {
    return this.molarScaled !== null ? scaledToString(this.molarScaled) : this.molarMass.toFixed();
  }

  monoisotopicMassText(): string {
    return this.monoScaled !== null && this.tree.charge === 0 ? scaledToString(this.monoScaled) : this.monoisotopicMass.toFixed();
  }

  get contributions(): Contribution[] {
    this.contributionsCache ??= this.data.map((d, i) => ({
      key: d.key,
      label: d.label,
      symbol: d.symbol,
      massNumber: d.massNumber,
      count: this.counts[i],
      atomicWeight: d.average[this.weights].text,
      mass: toDecimal(this.counts[i]).times(d.average[this.weights].text),
      atom: d,
    }));
    return this.contributionsCache;
  }
}

/**
 * Computes the molar, monoisotopic and nominal mass of a formula, with per-element contributions.
 * Throws a PondusError for bad input.
 *
 * @example
 * formulaMass('H2O').molarMass.toString()        // '18.015'
 * formulaMass('H2O').monoisotopicMass.toString() // '18.010564683056'
 */
export function formulaMass(input: string | FormulaTree, options: MassOptions = {}): MassResult {
  const tree = typeof input === 'string' ? parseFormula(input, options) : input;
  const atoms = flattenFormula(tree);
  const weights = options.weights ?? 'standard';
  const order = hillEntries(atoms.keys());
  const n = order.length;
  const data = new Array<AtomData>(n);
  const counts = new Array<Amount>(n);
  let molar: number | null = 0;
  let mono: number | null = 0;
  for (let i = 0; i < n; i++) {
    const d = (data[i] = order[i].atom!);
    const c = (counts[i] = atoms.get(order[i].key)!);
    if (typeof c === 'number') {
      if (molar !== null) molar = safe(molar + c * d.average[weights].scaled);
      if (mono !== null) mono = safe(mono + c * d.monoisotopic.scaled);
    } else {
      molar = mono = null;
    }
  }
  return new Computed(tree, atoms, data, counts, weights, molar, mono);
}

function safe(n: number): number | null {
  return Number.isSafeInteger(n) ? n : null;
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

function decimalSum(data: AtomData[], counts: Amount[], text: (d: AtomData) => string): Decimal {
  let d = new Decimal(0);
  for (let i = 0; i < data.length; i++) d = d.plus(toDecimal(counts[i]).times(text(data[i])));
  return d;
}
