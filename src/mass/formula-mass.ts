/**
 * Molar mass, monoisotopic mass and nominal mass of a formula, computed
 * exactly from the one pipeline: text → tree (parse.ts) → atom totals over the
 * dense per-atom tables (formula/flatten.ts) → sums in scaled integers
 * (10^-12 u) while they are exact safe integers, in Decimal where counts are
 * decimal or sums grow past that range.
 *
 * Two shapes of one computation:
 * - {@link formulaMass}: the public result, plain data (numbers, with the exact
 *   decimals as strings beside them; JSON.stringify, spread and structuredClone
 *   keep everything);
 * - {@link formulaMassDetail}: the same, with Decimal values, the tree, the atom
 *   map and per-element contributions, for the library's own calculations.
 */
import type { Note } from '../errors/issue.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import { ATOMS, type AtomData, type WeightTable } from '../elements/atom-data.js';
import { Decimal } from '../exact/decimal.js';
import { smallNumberText } from '../exact/json-number.js';
import { bigScaledToString, fromScaled, scaledToString, SCALE_DIGITS } from '../exact/scaled.js';
import { amountText, toDecimal, type Amount } from '../formula/amount.js';
import { atomVector, countsMap, type AtomCounts, type AtomVector } from '../formula/flatten.js';
import { plainVectorFor } from '../formula/plain-vector.js';
import { chargeText } from '../formula/hill.js';
import { parseFormula, type ParseOptions } from '../formula-parser/parse.js';
import type { FormulaTree } from '../formula-parser/tree.js';

/** Options for the mass functions. */
export interface MassOptions extends ParseOptions {
  /** Atomic-weight table: 'standard' (CIAAW 2021 + 2024 revisions, conventional values for interval elements; default) or 'abridged' (five figures). */
  weights?: WeightTable;
}

/** The mass of one formula, as plain data (the `mass --json` row without its line number). */
export interface MassResult {
  /** The text as given. */
  input: string;
  /** Hill formula with charge. */
  formula: string;
  /** Average molar mass in g/mol: the nearest double to the exact sum of the tabulated weights. */
  molarMass: number;
  /** The exact molar mass as decimal text ('18.015'). */
  molarMassExact: string;
  /** Monoisotopic mass in u: principal isotopes (AME2020), less the electrons of a cation or plus those of an anion (CODATA). */
  monoisotopicMass: number;
  /** The exact monoisotopic mass as decimal text. */
  monoisotopicMassExact: string;
  /** Nominal mass: the sum of the principal isotopes' mass numbers (null with non-integer counts). */
  nominalMass: number | null;
  charge: number;
  /** Assumptions and flags (elements without a standard atomic weight, how an ambiguous '.' was read, …). */
  notes: Note[];
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

/** Everything pondus computes about the mass of one formula, with exact Decimal values (for the library's own use). */
export interface MassDetail {
  readonly input: string;
  /** Hill formula with charge. */
  readonly formula: string;
  readonly charge: number;
  /** Average molar mass in g/mol, exact. */
  readonly molarMass: Decimal;
  /** Monoisotopic mass in u, exact. */
  readonly monoisotopicMass: Decimal;
  readonly nominalMass: number | null;
  /** Per-atom contributions in Hill order. */
  readonly contributions: Contribution[];
  /** The atom totals, in order of first appearance. */
  readonly atoms: AtomCounts;
  /** The atom totals over the dense tables, in Hill order. */
  readonly vector: AtomVector;
  readonly notes: Note[];
  readonly weights: WeightTable;
  readonly tree: FormulaTree;
  /** Exact sums in 10^-12 u, or null when they need Decimal (the monoisotopic one before the electrons). */
  readonly molarScaled: number | null;
  readonly monoScaled: number | null;
  /** The molar mass as the nearest JavaScript number. */
  molarMassNumber(): number;
  /** The monoisotopic mass as the nearest JavaScript number. */
  monoisotopicMassNumber(): number;
  /** The molar mass as exact decimal text ('18.015'). */
  molarMassText(): string;
  /** The monoisotopic mass as exact decimal text. */
  monoisotopicMassText(): string;
}

const SCALE = 10 ** SCALE_DIGITS;
const ABRIDGED_NOTE: Note = Object.freeze({ code: 'WEIGHTS_ABRIDGED', message: 'atomic weights from the abridged table (CIAAW 2021, five significant figures; Prohaska et al. 2022), not the standard atomic weights' });
const NO_NOTES: Note[] = Object.freeze([]) as unknown as Note[];

/** The sums and notes of one formula: the shared core of both result shapes. */
export interface MassCore {
  input: string;
  charge: number;
  /** The parsed formula, or null when the atom totals came straight from the text (read again when asked for). */
  tree: FormulaTree | null;
  /** The options the text was read with (to read it again into a tree). */
  options: MassOptions;
  vector: AtomVector;
  weights: WeightTable;
  formula: string;
  molarScaled: number | null;
  monoScaled: number | null;
  nominal: number | null;
  notes: Note[];
}

/** The core of a formula given as text: plain formulas go straight to their atom totals, the rest through the tree. */
function coreOfText(input: string, options: MassOptions): MassCore {
  const plain = plainVectorFor(input, options);
  if (plain) return sums(input, plain.charge, NO_NOTES, plain.vector, null, options);
  const tree = parseFormula(input, options);
  return sums(input, tree.charge, tree.notes, atomVector(tree), tree, options);
}

/**
 * The sums and notes of one formula, before either result shape is made: for the library's own
 * batch paths (composition), which need the atom totals and exact sums but no Decimal values.
 *
 * @param input - a formula ('H2O'), or a tree from parseFormula.
 * @param options - the atomic-weight table and the reading options of parseFormula.
 * @returns the atom totals, the exact sums in 10^-12 u (null where they need Decimal), the Hill formula and the notes.
 * @throws PondusError: the codes of parseFormula; COUNT_TOO_LARGE past 10^12 atoms of one kind.
 * @example
 * massCore('H2O', {}).molarScaled // 18015000000000
 */
export function massCore(input: string | FormulaTree, options: MassOptions): MassCore {
  return typeof input === 'string' ? coreOfText(input, options) : sums(input.input, input.charge, input.notes, atomVector(input), input, options);
}

function sums(input: string, charge: number, treeNotes: Note[], vector: AtomVector, tree: FormulaTree | null, options: MassOptions): MassCore {
  const weights = options.weights ?? 'standard';
  const { ids, counts } = vector;
  const avg = weights === 'standard' ? ATOMS.standardScaled : ATOMS.abridgedScaled;
  const monoTable = ATOMS.monoScaled;
  const nominalTable = ATOMS.nominal;
  // plain numbers with flags beside them (a number-or-null variable would box every partial sum)
  let molarSum = 0;
  let monoSum = 0;
  let nominalSum = 0;
  let exact = true;
  let formula = '';
  let fractional = false;
  let notes = treeNotes.length ? treeNotes.slice() : NO_NOTES;
  for (let i = 0; i < ids.length; i++) {
    const id = ids[i];
    const c = counts[i];
    const d = ATOMS.data[id];
    if (typeof c === 'number') {
      formula += c === 1 ? d.label : labelWithCount(id, d.label, c);
      molarSum += c * avg[id];
      monoSum += c * monoTable[id];
      nominalSum += c * nominalTable[id];
    } else {
      formula += d.label + amountText(c);
      exact = false;
      if (!c.isInteger()) fractional = true;
    }
    if (d.noStandardWeight) {
      if (notes === NO_NOTES) notes = [];
      notes.push((noWeightNotes[id] ??= Object.freeze({ code: 'NO_STANDARD_WEIGHT', message: `${d.element.name} (${d.symbol}) has no standard atomic weight; the mass number of its longest-lived isotope, ${d.average.standard.text}, stands in for it` })));
    }
  }
  // a partial sum past the safe integers makes the total inexact too: the totals only grow
  const molar = exact && Number.isSafeInteger(molarSum) ? molarSum : null;
  const mono = exact && Number.isSafeInteger(monoSum) ? monoSum : null;
  let nominal: number | null = exact ? nominalSum : null;
  if (charge !== 0) formula += chargeText(charge);
  if (nominal !== null && !Number.isSafeInteger(nominal)) nominal = null;
  if (weights === 'abridged') {
    // the table used goes with every result, so a row read alone says which weights it has
    if (notes === NO_NOTES) notes = [];
    notes.push(ABRIDGED_NOTE);
  }
  if (fractional) {
    if (notes === NO_NOTES) notes = [];
    notes.push(NON_INTEGER_NOTE);
  }
  if (charge !== 0) {
    if (notes === NO_NOTES) notes = [];
    notes.push(ionNote(charge));
  }
  return { input, charge, tree, options, vector, weights, formula, molarScaled: molar, monoScaled: mono, nominal, notes };
}

/**
 * The Hill formula's piece for `count` atoms of kind `id` ('H65'), kept by kind and whole count
 * below 4096 (a batch meets the same few hundred again and again): one join less per element. At
 * most 256 kinds are held; then the table starts again.
 */
const labelTexts: { byAtom: (string[] | undefined)[]; kinds: number; untabled: number } = { byAtom: [], kinds: 0, untabled: 0 };

function labelWithCount(id: number, label: string, count: number): string {
  if (count >= 4096 || (count | 0) !== count || count < 0) return label + smallNumberText(count);
  let byCount = labelTexts.byAtom[id];
  if (byCount === undefined) {
    // a command writing a few formulas joins them: the 4,096-slot tables are for batches
    if (labelTexts.untabled < 64) {
      labelTexts.untabled++;
      return label + smallNumberText(count);
    }
    if (labelTexts.kinds >= 256) {
      labelTexts.byAtom = [];
      labelTexts.kinds = 0;
    }
    labelTexts.byAtom[id] = byCount = new Array<string>(4096);
    labelTexts.kinds++;
  }
  return (byCount[count] ??= label + smallNumberText(count));
}

// The notes that depend only on the kind of atom or the charge are made once and shared (frozen,
// as ABRIDGED_NOTE is): a batch of ions or of decimal counts writes the same few again and again,
// and their JSON text is then kept by the serialisers.
const NON_INTEGER_NOTE: Note = Object.freeze({ code: 'NON_INTEGER_COUNTS', message: 'the formula has non-integer counts; the nominal mass is not defined' });
/** NO_STANDARD_WEIGHT by dense-table id. */
const noWeightNotes: (Note | undefined)[] = [];
/** ION_MOLAR_MASS by charge (at most 256 charges held). */
const ionNotes = new Map<number, Note>();

function ionNote(charge: number): Note {
  let note = ionNotes.get(charge);
  if (note === undefined) {
    const z = Math.abs(charge);
    const e = (Number(ELECTRON_MASS) * z).toPrecision(2);
    note = Object.freeze({
      code: 'ION_MOLAR_MASS',
      message: `the molar mass is the sum of the atomic weights (neutral atoms): the ${z} electron${z === 1 ? '' : 's'} ${charge > 0 ? 'missing from' : 'added to'} the ion (${e} g/mol) ${z === 1 ? 'is' : 'are'} not counted (common practice for molar masses); the monoisotopic mass counts ${z === 1 ? 'it' : 'them'}`,
    });
    if (ionNotes.size < 256) ionNotes.set(charge, note);
  }
  return note;
}

function decimalSum(core: MassCore, value: (d: AtomData) => string): Decimal {
  const { ids, counts } = core.vector;
  let d = new Decimal(0);
  for (let i = 0; i < ids.length; i++) d = d.plus(toDecimal(counts[i]).times(value(ATOMS.data[ids[i]])));
  return d;
}

const weightText = (weights: WeightTable) => (d: AtomData) => d.average[weights].text;
const monoText = (d: AtomData) => d.monoisotopic.text;

/** The exact molar mass of a core as [number, text]. */
function molarOf(core: MassCore): [number, string] {
  if (core.molarScaled !== null) return [core.molarScaled / SCALE, scaledToString(core.molarScaled)];
  const avg = core.weights === 'standard' ? ATOMS.standardScaled : ATOMS.abridgedScaled;
  const big = bigSum(core, avg, 0n);
  if (big !== null) return big;
  const d = decimalSum(core, weightText(core.weights));
  return [d.toNumber(), d.toFixed()];
}

const COUNT_DECIMALS = 6;
const COUNT_SCALE = 10n ** BigInt(COUNT_DECIMALS);

/**
 * Σ count × value in exact BigInt arithmetic, for decimal counts (at most 6 decimals, as the
 * parser allows) and sums past the safe integers: counts in 10^-6, values in 10^-12 u, so the
 * sum is in 10^-18 u; `extra` is added in the same unit. Null when a count has more decimals.
 */
function bigSum(core: MassCore, values: readonly number[], extra: bigint): [number, string] | null {
  const { ids, counts } = core.vector;
  let sum = extra;
  for (let i = 0; i < ids.length; i++) {
    const c = counts[i];
    let n: bigint;
    if (typeof c === 'number') n = BigInt(c) * COUNT_SCALE;
    else {
      const t = c.toFixed();
      const dot = t.indexOf('.');
      const frac = dot < 0 ? '' : t.slice(dot + 1);
      if (frac.length > COUNT_DECIMALS || t.startsWith('-')) return null;
      n = BigInt((dot < 0 ? t : t.slice(0, dot)) + frac.padEnd(COUNT_DECIMALS, '0'));
    }
    sum += n * BigInt(values[ids[i]]);
  }
  const text = bigScaledToString(sum, COUNT_DECIMALS + SCALE_DIGITS);
  return [Number(text), text];
}

function monoDecimal(core: MassCore): Decimal {
  const m = core.monoScaled !== null ? fromScaled(core.monoScaled) : decimalSum(core, monoText);
  return core.charge !== 0 ? m.minus(new Decimal(ELECTRON_MASS).times(core.charge)) : m;
}

/** The electron mass in 10^-15 u (CODATA 2018 gives it to 15 decimals), for exact ion masses in BigInt. */
let electron15: bigint | null = null;

function monoOf(core: MassCore): [number, string] {
  // an exact integer divided by 10^12 is the correctly rounded double of the exact decimal
  if (core.monoScaled !== null) {
    if (core.charge === 0) return [core.monoScaled / SCALE, scaledToString(core.monoScaled)];
    // an ion: the electrons in exact integer arithmetic, and Number() of the exact text is its nearest double
    electron15 ??= electronIn15();
    if (electron15 !== null) {
      const text = bigScaledToString(BigInt(core.monoScaled) * 1000n - BigInt(core.charge) * electron15, 15);
      return [Number(text), text];
    }
  }
  electron15 ??= electronIn15();
  if (electron15 !== null) {
    const big = bigSum(core, ATOMS.monoScaled, -BigInt(core.charge) * electron15 * 1000n);
    if (big !== null) return big;
  }
  const d = monoDecimal(core);
  return [d.toNumber(), d.toFixed()];
}

function electronIn15(): bigint | null {
  const m = /^0\.([0-9]{1,15})$/.exec(ELECTRON_MASS);
  return m ? BigInt(m[1].padEnd(15, '0')) : null;
}

function plainResult(core: MassCore): MassResult {
  let molarMass: number;
  let molarMassExact: string;
  let monoisotopicMass: number;
  let monoisotopicMassExact: string;
  // the usual case without a pair in between: exact integer sums of a neutral formula
  if (core.molarScaled !== null) {
    molarMass = core.molarScaled / SCALE;
    molarMassExact = scaledToString(core.molarScaled);
  } else [molarMass, molarMassExact] = molarOf(core);
  if (core.monoScaled !== null && core.charge === 0) {
    monoisotopicMass = core.monoScaled / SCALE;
    monoisotopicMassExact = scaledToString(core.monoScaled);
  } else [monoisotopicMass, monoisotopicMassExact] = monoOf(core);
  return {
    input: core.input,
    formula: core.formula,
    molarMass,
    molarMassExact,
    monoisotopicMass,
    monoisotopicMassExact,
    nominalMass: core.nominal,
    charge: core.charge,
    notes: core.notes === NO_NOTES ? [] : core.notes,
  };
}

/**
 * The molar, monoisotopic and nominal mass of a formula, as plain data. Throws a PondusError for bad input.
 *
 * @param input - a formula ('CuSO4·5H2O'), or a tree from parseFormula.
 * @param options - the atomic-weight table (`weights`) and the reading options of parseFormula.
 * @returns the molar, monoisotopic and nominal mass as numbers, with their exact decimals as strings beside them, the Hill formula, the charge and the notes.
 * @throws PondusError: for a formula string, the codes of parseFormula (UNKNOWN_ELEMENT, UNCLOSED_GROUP, BAD_COUNT, …); COUNT_TOO_LARGE past 10^12 atoms of one kind; BAD_ARGUMENT when `input` is neither a string nor a parsed formula, or `options` is not an object or names an unknown weight table.
 * @example
 * formulaMass('H2O').molarMass             // 18.015
 * formulaMass('H2O').monoisotopicMassExact // '18.010564683056'
 * formulaMass('SO4^2-').charge             // -2
 */
export function formulaMass(input: string | FormulaTree, options: MassOptions = {}): MassResult {
  return plainResult(massCore(input, options));
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

class Detail implements MassDetail {
  readonly input: string;
  readonly formula: string;
  readonly charge: number;
  readonly nominalMass: number | null;
  readonly notes: Note[];
  readonly vector: AtomVector;
  readonly weights: WeightTable;
  readonly molarScaled: number | null;
  readonly monoScaled: number | null;
  private molarCache: Decimal | null = null;
  private monoCache: Decimal | null = null;
  private contributionsCache: Contribution[] | null = null;
  private atomsCache: AtomCounts | null = null;

  constructor(private readonly core: MassCore) {
    this.input = core.input;
    this.formula = core.formula;
    this.charge = core.charge;
    this.nominalMass = core.nominal;
    this.notes = core.notes;
    this.vector = core.vector;
    this.weights = core.weights;
    this.molarScaled = core.molarScaled;
    this.monoScaled = core.monoScaled;
  }

  /** The parsed formula (a plain formula read straight to its totals is parsed now, once). */
  get tree(): FormulaTree {
    return (this.core.tree ??= parseFormula(this.core.input, this.core.options));
  }

  get atoms(): AtomCounts {
    return (this.atomsCache ??= countsMap(this.core.vector));
  }

  get molarMass(): Decimal {
    return (this.molarCache ??= this.molarScaled !== null ? fromScaled(this.molarScaled) : decimalSum(this.core, weightText(this.weights)));
  }

  get monoisotopicMass(): Decimal {
    return (this.monoCache ??= monoDecimal(this.core));
  }

  molarMassNumber(): number {
    return this.molarScaled !== null ? this.molarScaled / SCALE : this.molarMass.toNumber();
  }

  monoisotopicMassNumber(): number {
    return monoOf(this.core)[0];
  }

  molarMassText(): string {
    return this.molarScaled !== null ? scaledToString(this.molarScaled) : this.molarMass.toFixed();
  }

  monoisotopicMassText(): string {
    return monoOf(this.core)[1];
  }

  get contributions(): Contribution[] {
    if (this.contributionsCache) return this.contributionsCache;
    const { ids, counts } = this.core.vector;
    this.contributionsCache = ids.map((id, i) => {
      const d = ATOMS.data[id];
      return {
        key: d.key,
        label: d.label,
        symbol: d.symbol,
        massNumber: d.massNumber,
        count: counts[i],
        atomicWeight: d.average[this.weights].text,
        mass: toDecimal(counts[i]).times(d.average[this.weights].text),
        atom: d,
      };
    });
    return this.contributionsCache;
  }
}

/**
 * The mass of a formula with exact Decimal values, the tree, the atom totals and per-element
 * contributions: what the library's own calculations build on. Throws a PondusError for bad input.
 *
 * @param input - a formula ('CuSO4·5H2O'), or a tree from parseFormula.
 * @param options - the atomic-weight table (`weights`) and the reading options of parseFormula.
 * @returns the detailed mass result: Decimal masses, the tree, the atom totals and the per-element contributions.
 * @throws PondusError: for a formula string, the codes of parseFormula (UNKNOWN_ELEMENT, UNCLOSED_GROUP, BAD_COUNT, …); COUNT_TOO_LARGE past 10^12 atoms of one kind; BAD_ARGUMENT when `input` is neither a string nor a parsed formula, or `options` is not an object or names an unknown weight table.
 * @example
 * formulaMassDetail('H2O').molarMass.toString()        // '18.015'
 * formulaMassDetail('H2O').monoisotopicMass.toString() // '18.010564683056'
 */
export function formulaMassDetail(input: string | FormulaTree, options: MassOptions = {}): MassDetail {
  return new Detail(massCore(input, options));
}

/**
 * The plain result of a detailed one (the same numbers, no Decimal).
 *
 * @param d - a detailed mass result (from formulaMassDetail).
 * @returns the same masses as formulaMass gives, as plain data.
 * @throws PondusError: BAD_ARGUMENT when `d` is not a detailed mass result.
 * @example
 * plainMass(formulaMassDetail('NaCl')).molarMassExact // '58.43976928'
 */
export function plainMass(d: MassDetail): MassResult {
  return plainResult((d as Detail)['core']);
}

/**
 * The average molar mass of a formula in g/mol, exact.
 *
 * @param input - a formula ('NaCl'), or a tree from parseFormula.
 * @param options - the atomic-weight table (`weights`) and the reading options of parseFormula.
 * @returns the average molar mass in g/mol as an exact Decimal.
 * @throws PondusError: for a formula string, the codes of parseFormula (UNKNOWN_ELEMENT, UNCLOSED_GROUP, BAD_COUNT, …); COUNT_TOO_LARGE past 10^12 atoms of one kind; BAD_ARGUMENT when `input` is neither a string nor a parsed formula, or `options` is not an object or names an unknown weight table.
 * @example
 * molarMass('NaCl').toString() // '58.43976928'
 */
export function molarMass(input: string | FormulaTree, options: MassOptions = {}): Decimal {
  return formulaMassDetail(input, options).molarMass;
}
