/**
 * Mass percent by element: each kind of atom's mass over the molar mass, from the
 * same atom totals and exact sums as the mass (mass/formula-mass.ts). While the sums
 * are exact safe integers (10^-12 u) every number is computed in plain doubles and
 * correctly rounded (exact/ratio.ts); decimal counts and huge sums go through Decimal.
 */
import type { Note } from '../errors/issue.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { ATOMS } from '../elements/atom-data.js';
import { scaledRatio } from '../exact/ratio.js';
import { scaledToString, SCALE_DIGITS } from '../exact/scaled.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMassDetail, massCore, type MassCore, type MassDetail, type MassOptions } from '../mass/formula-mass.js';
import type { FormulaTree } from '../formula-parser/tree.js';
import { partShare, type PartShare } from './part-share.js';

/** One element's share of a formula's mass, as plain data. */
export interface ElementShare {
  /** As written in output: 'C', '[13C]', 'D'. */
  symbol: string;
  /** How many atoms one formula unit holds (a decimal count as its nearest number). */
  count: number;
  /** Mass of this element in one mole of the formula, g/mol (the nearest double to the exact product). */
  mass: number;
  /** The exact mass as decimal text ('2.016'). */
  massExact: string;
  /** Percent by mass. */
  massPercent: number;
}

/** A fragment's share, as plain data. */
export interface PartShareResult {
  /** The fragment as given. */
  part: string;
  /** Its Hill formula. */
  formula: string;
  /** How many fragment units one formula unit holds. */
  count: number;
  /** count × unit mass, g per mole of formula. */
  mass: number;
  massPercent: number;
  /** 'written': counted where the formula writes it; 'atoms': counted from the atom totals. */
  countedFrom: 'written' | 'atoms';
}

/** Options for {@link composition}. */
export interface CompositionOptions extends MassOptions {
  /** A fragment whose mass fraction to report as well (`H2O` in a hydrate, `SO4` in a salt). */
  part?: string;
}

/** Percent composition of one formula, as plain data (the `composition --json` row without its line number). */
export interface CompositionResult {
  input: string;
  /** Hill formula with charge. */
  formula: string;
  /** Molar mass, g/mol (the nearest double to the exact sum). */
  molarMass: number;
  /** The exact molar mass as decimal text. */
  molarMassExact: string;
  charge: number;
  /** Each element in Hill order. */
  elements: ElementShare[];
  /** With `part`: the fragment's share; null otherwise. */
  part: PartShareResult | null;
  notes: Note[];
}

/** A composition with the detailed mass and fragment share it came from (for tables and the library's own use). */
export interface CompositionDetail {
  result: CompositionResult;
  mass: MassDetail;
  part: PartShare | null;
}

const SCALE = 10 ** SCALE_DIGITS;

/**
 * The composition of a formula with its detailed mass: the exact values tables round from.
 *
 * @param input - a formula ('CuSO4·5H2O'), or a tree from parseFormula.
 * @param options - the atomic-weight table, the reading options of parseFormula and an optional fragment (`part`).
 * @returns the plain result with the detailed mass and the fragment's share beside it.
 * @throws PondusError: for a formula string or the fragment, the codes of parseFormula (UNKNOWN_ELEMENT, UNCLOSED_GROUP, BAD_COUNT, …); COUNT_TOO_LARGE past 10^12 atoms of one kind; PART_NOT_IN_FORMULA when the fragment is not in the formula; BAD_ARGUMENT when `input` is neither a string nor a parsed formula, or `options` is not an object or names an unknown weight table (a `part` that is not a string is not checked and gives INTERNAL_ERROR).
 * @example
 * compositionDetail('H2O').mass.molarMass.toString() // '18.015'
 */
export function compositionDetail(input: string | FormulaTree, options: CompositionOptions = {}): CompositionDetail {
  const mass = formulaMassDetail(input, options);
  const result = mass.molarScaled !== null ? exactResult(mass, mass.molarScaled) : decimalResult(mass);
  const share = options.part !== undefined ? partShare(mass, options.part, options) : null;
  if (share) {
    result.part = { part: share.part, formula: share.formula, count: toDecimal(share.count).toNumber(), mass: share.mass.toNumber(), massPercent: share.massPercent.toNumber(), countedFrom: share.countedFrom };
    result.notes.push(...share.notes);
  }
  return { result, mass, part: share };
}

/** What a composition is made from: a detailed mass, or the mass core the batch path reads. */
type MassSums = Pick<MassCore, 'input' | 'formula' | 'charge' | 'vector' | 'weights' | 'notes'>;

/**
 * The exact texts of count × weight already written, by weight table, kind of atom and whole count
 * below 4096 (a batch meets the same few hundred again and again, and writing one takes several
 * string allocations): one array per kind of atom, indexed by count. At most 256 kinds are held;
 * then the table starts again.
 */
interface MassTexts {
  byAtom: (string[] | undefined)[];
  kinds: number;
}
const ELEMENT_MASS_TEXTS: Record<'standard' | 'abridged', MassTexts> = { standard: { byAtom: [], kinds: 0 }, abridged: { byAtom: [], kinds: 0 } };
const COUNT_LIMIT = 4096;
const KIND_LIMIT = 256;

/** The exact text of `e` (10^-12 u), the mass of `count` atoms of kind `id`, from the table above where it can. */
function elementMassText(texts: MassTexts, id: number, count: number, e: number): string {
  if (count >= COUNT_LIMIT || (count | 0) !== count) return scaledToString(e);
  let byCount = texts.byAtom[id];
  if (byCount === undefined) {
    if (texts.kinds >= KIND_LIMIT) {
      texts.byAtom = [];
      texts.kinds = 0;
    }
    texts.byAtom[id] = byCount = new Array<string>(COUNT_LIMIT);
    texts.kinds++;
  }
  return (byCount[count] ??= scaledToString(e));
}

/** The composition from exact integer sums in 10^-12 u (each count × weight is exact while the total is). */
function exactResult(m: MassSums, total: number): CompositionResult {
  const { ids, counts } = m.vector;
  const n = ids.length;
  const elements = new Array<ElementShare>(n);
  const standard = m.weights === 'standard';
  const avg = standard ? ATOMS.standardScaled : ATOMS.abridgedScaled;
  const texts = standard ? ELEMENT_MASS_TEXTS.standard : ELEMENT_MASS_TEXTS.abridged;
  for (let i = 0; i < n; i++) {
    const c = counts[i] as number;
    const id = ids[i];
    const e = c * avg[id];
    elements[i] = { symbol: ATOMS.data[id].label, count: c, mass: e / SCALE, massExact: elementMassText(texts, id, c, e), massPercent: total === 0 ? 0 : scaledRatio(e, total, 100) };
  }
  return { input: m.input, formula: m.formula, molarMass: total / SCALE, molarMassExact: scaledToString(total), charge: m.charge, elements, part: null, notes: ownNotes(m.notes) };
}

/** The composition in Decimal: decimal counts and sums past the exact integers. */
function decimalResult(mass: MassDetail): CompositionResult {
  const totalD = mass.molarMass;
  const elements = mass.contributions.map((c) => ({ symbol: c.label, count: toDecimal(c.count).toNumber(), mass: c.mass.toNumber(), massExact: c.mass.toFixed(), massPercent: totalD.isZero() ? 0 : c.mass.div(totalD).times(100).toNumber() }));
  return { input: mass.input, formula: mass.formula, molarMass: totalD.toNumber(), molarMassExact: totalD.toFixed(), charge: mass.charge, elements, part: null, notes: ownNotes(mass.notes) };
}

/**
 * A result's own copy of the notes. The usual list is the mass's shared empty one, which is frozen,
 * and copying a frozen array with slice() takes V8's slow path (about 150 ns, a tenth of a row).
 */
function ownNotes(notes: readonly Note[]): Note[] {
  return notes.length === 0 ? [] : notes.slice();
}

/**
 * Mass percent of each element in a formula, and optionally of a fragment, as plain data.
 *
 * @param input - a formula ('CuSO4·5H2O'), or a tree from parseFormula.
 * @param options - the atomic-weight table, the reading options of parseFormula and an optional fragment (`part`).
 * @returns the composition: each element's count, mass and mass percent as numbers, the exact molar mass as text beside them, the fragment's share when asked for, and the notes.
 * @throws PondusError: for a formula string or the fragment, the codes of parseFormula (UNKNOWN_ELEMENT, UNCLOSED_GROUP, BAD_COUNT, …); COUNT_TOO_LARGE past 10^12 atoms of one kind; PART_NOT_IN_FORMULA when the fragment is not in the formula; BAD_ARGUMENT when `input` is neither a string nor a parsed formula, or `options` is not an object or names an unknown weight table (a `part` that is not a string is not checked and gives INTERNAL_ERROR).
 * @example
 * composition('H2O').elements.map(e => [e.symbol, e.massPercent.toFixed(2)]) // [['H','11.19'], ['O','88.81']]
 * composition('CuSO4·5H2O', { part: 'H2O' }).part?.massPercent.toFixed(2)   // '36.08'
 */
export function composition(input: string | FormulaTree, options: CompositionOptions = {}): CompositionResult {
  if (options.part === undefined) {
    // the usual row: exact sums straight from the core, with no detailed result in between
    const core = massCore(input, options);
    if (core.molarScaled !== null) return exactResult(core, core.molarScaled);
  }
  return compositionDetail(input, options).result;
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
