/**
 * Candidate formulas for an accurate mass (of a neutral molecule or of an ion written in the
 * notation of the trade), checked against found percents if given: every formula in the element ranges whose
 * monoisotopic mass lies in the window, filtered by chemical plausibility and ranked by a
 * documented score. Any element may be searched (metal complexes, boronates, silanes, salts).
 *
 * The search fixes the other atoms heaviest first, pruning a branch as soon as the mass already
 * taken is above the window or the most the remaining atoms could add cannot reach it; then it
 * bounds carbon from the window and solves hydrogen directly. Counts live in one integer array;
 * nothing is allocated per formula visited, only when a formula enters the top-k heap.
 *
 * Bounded cost: the walk over the other atoms is one function, run twice. First as the up-front
 * estimate (each leaf only adds the carbon-and-hydrogen steps it would take, and the walk gives up
 * past MAX_ESTIMATE_BRANCHES branches), which refuses a search of more than
 * {@link MAX_VISITS} steps with SEARCH_TOO_LARGE, the estimate and what to narrow; then as the
 * search itself. Memory is the count array and the heap of `limit` formulas, whatever the ranges.
 *
 * Plausibility (Kind T., Fiehn O., "Seven Golden Rules for heuristic filtering of molecular
 * formulas obtained by accurate mass spectrometry", BMC Bioinformatics 8 (2007) 105):
 * - rule 2, for formulas made only of elements with a usual lowest valence (C, H, N, O, S, P, B,
 *   Si, Se, As, Ge, the halogens, alkali and alkaline-earth metals): RDBE (ring-plus-double-bond
 *   equivalents, 1 + Σ nᵢ(vᵢ − 2)/2) whole and non-negative, and the SENIOR valence rules. With any
 *   other element (Fe, Pd, Pt, Cu, …) the valences are not fixed and these two checks are not
 *   applied; a note says so.
 * - rule 4, element ratios to carbon: the paper's "extended" ranges by default (which cover the
 *   compounds of its reference databases, glucose 6-phosphate and glyphosate among them), or its
 *   "common" ranges (`ratios: 'common'`, covering most but not all). Formulas without carbon are
 *   dropped while ratios apply.
 */
import { DEFAULT_RANGES } from './search-defaults.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { getAtomData } from '../elements/atom-data.js';
import { isElementSymbol } from '../elements/element-table.js';
import { ELECTRON_MASS } from '../elements/constants.js';
import { Decimal } from '../exact/decimal.js';
import { scaledToString } from '../exact/scaled.js';
import { hillFormula, hillOrder } from '../formula/hill.js';
import { conventionalFormula } from './written.js';
import { readFoundValues } from '../analysis/found-values.js';
import { readNumber } from '../sigfig/read-number.js';
import { readIonNotation } from '../ions/read-ion-notation.js';
import type { IonNotation } from '../ions/ion-notation.js';
import { patternSimilarity, readPeaks, type MeasuredPeak } from './pattern-match.js';
import { checkInputLength } from '../errors/input-length.js';

/**
 * Formulas a search may visit (the inner carbon-and-hydrogen steps plus the branches above them):
 * about a second of work on a 2-core laptop. A larger search is refused before it starts.
 */
export const MAX_VISITS = 100_000_000;
/** Branches and leaves the up-front estimate counts before it gives up and refuses (a few tenths of a second). */
const MAX_ESTIMATE_BRANCHES = 5_000_000;
/** The cost of checking one formula in the window, in carbon steps (measured, roughly). */
const CHECK_COST = 5;
/**
 * The pattern dissimilarity (1 − similarity) that counts as one allowance in the score: a pattern
 * 90 % similar scores like a mass error of the whole ppm window (pondus's choice, documented).
 */
export const PATTERN_ALLOWANCE = 0.1;
/** With a measured pattern, the best this many by mass and analysis are compared with it, then ranked again. */
export const PATTERN_POOL = 200;
/** Most candidates a search returns. */
export const MAX_LIMIT = 1000;

/** Which element-ratio ranges of Kind & Fiehn 2007 (rule 4) apply. */
export type RatioRanges = 'extended' | 'common' | 'none';

export interface CandidateOptions {
  /** The found mass: of the neutral molecule (u), or the m/z of the ion when `ion` is given. */
  mass?: string;
  /** Mass tolerance, ppm (default 5). */
  ppm?: number;
  /** The ion the mass is of, in the notation of the trade: '[M+Na]+', '[M-H]-', '[M+2H]2+'. */
  ion?: string;
  /** Average molar mass, g/mol, when no accurate mass is known. */
  molarMass?: string;
  /** Window on the molar mass, g/mol (default 0.5). */
  molarMassTolerance?: number;
  /** Found percents: 'C=64.85 H=5.44 N=6.30' (or 'C, 64.85; H, 5.44'). */
  found?: string;
  /** Allowed |found − calculated|, percentage points (default 0.4). */
  tolerance?: number;
  /** Element ranges, any element: 'C0-80 H0-160 N0-10 O0-20 Fe0-1 B0-2'. */
  elements?: string;
  /** Element-ratio ranges (default 'extended'); `false` is 'none', `true` 'extended'. */
  ratios?: RatioRanges | boolean;
  /** Most candidates to return (default 50). */
  limit?: number;
  /** A measured isotope pattern, m/z:intensity pairs ('203.0526:100 204.0560:6.9'): adds the pattern term to the score. */
  pattern?: string;
  /** Called now and then with the share of the search done (0–1); for progress displays. */
  onProgress?: (done: number) => void;
}

export interface Candidate {
  /** Formula of the neutral molecule M as written: Hill order with carbon, IUPAC's electronegativity order without (Mg2SiO4). */
  formula: string;
  /** Hill formula of M. */
  hill: string;
  /** Atom counts of M, by element symbol. */
  counts: Record<string, number>;
  /** Monoisotopic mass of M, u (AME2020 masses, summed exactly). */
  monoisotopicMass: number;
  /** Average molar mass of M, g/mol (standard atomic weights, summed exactly). */
  molarMass: number;
  /** Formula of the ion with its charge ('C6H12NaO6^+'), as written (see `formula`), when an ion was given. */
  ionFormula: string | null;
  /** Hill formula of the ion with its charge, when an ion was given. */
  ionHill: string | null;
  /** m/z of the ion, electrons counted, when an ion was given. */
  mz: number | null;
  /** (found − calculated)/calculated × 10⁶, of the m/z (or of the neutral mass), when an accurate mass was given. */
  ppm: number | null;
  /** Ring-plus-double-bond equivalents of M, or null when M holds an element without a fixed valence. */
  rdbe: number | null;
  /** Largest |found − calculated| percent, when found values were given. */
  maxDeviation: number | null;
  /** Similarity (0–1) of the measured isotope pattern to this candidate's, when a pattern was given. */
  patternSimilarity: number | null;
  /** The ranking score: 0 for a perfect fit, 1 at the edge of every allowance (see {@link candidateScore}). */
  score: number;
}

export interface CandidateResult {
  /** The mass as given. */
  input: string;
  /** The search in words: 'm/z 203.0526 [M+Na]+ ± 3 ppm, found C=…'. */
  search: string;
  /** The ion the mass is of (canonical notation), or null for a neutral mass. */
  ion: string | null;
  /** The ratio ranges applied. */
  ratios: RatioRanges;
  candidates: Candidate[];
  /** How many formulas met the mass window before the plausibility filters. */
  examined: number;
  /** The size of the search: carbon-and-hydrogen steps and branches visited (the figure the up-front limit is checked on). */
  visited: number;
  /** How many passed every filter (more than were returned when truncated). */
  plausible: number;
  /** More candidates fit than were returned. */
  truncated: boolean;
  /** Remarks (rules not applied, found values summing over 100 %, …), as {code, message}. */
  notes: Note[];
}

/** The default element ranges. */
export { DEFAULT_RANGES };

/**
 * Element-ratio ranges to carbon of Kind & Fiehn 2007, rule 4 (BMC Bioinformatics 8:105, the
 * table of element ratios; values from memory of the paper): "common" covers most formulas of
 * the paper's databases, "extended" nearly all of them.
 */
export const RATIO_RANGES: Readonly<Record<'common' | 'extended', Readonly<Record<string, readonly [number, number]>>>> = Object.freeze({
  common: Object.freeze({ H: [0.2, 3.1], F: [0, 1.5], Cl: [0, 0.8], Br: [0, 0.8], N: [0, 1.3], O: [0, 1.2], P: [0, 0.3], S: [0, 0.8], Si: [0, 0.5] } as const),
  extended: Object.freeze({ H: [0.1, 6], F: [0, 6], Cl: [0, 2], Br: [0, 2], N: [0, 4], O: [0, 3], P: [0, 2], S: [0, 3], Si: [0, 1] } as const),
});

/**
 * Lowest usual valences for the RDBE and SENIOR checks (common practice). Alkali and
 * alkaline-earth metals count as in their salts (Na like H, Mg like O).
 */
const VALENCE: Readonly<Record<string, number>> = Object.freeze({
  H: 1, D: 1, B: 3, C: 4, N: 3, O: 2, F: 1, Si: 4, P: 3, S: 2, Cl: 1, Ge: 4, As: 3, Se: 2, Br: 1, I: 1,
  Li: 1, Na: 1, K: 1, Rb: 1, Cs: 1, Be: 2, Mg: 2, Ca: 2, Sr: 2, Ba: 2,
});

/**
 * Ring-plus-double-bond equivalents (IUPAC Gold Book, "degree of unsaturation"):
 * 1 + Σ nᵢ(vᵢ − 2)/2 over the lowest usual valences — for CHNOPS and halogens,
 * 1 + C + Si + (N + P)/2 − (H + halogens)/2. Null when an element has no fixed valence (Fe, Pd, …).
 *
 * @param counts - the atom counts by element symbol, as a Map or a plain object.
 * @returns the ring-plus-double-bond equivalents, or null when an element has no fixed valence.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * rdbe(new Map([['C', 6], ['H', 6]])) // 4
 * rdbe({ C: 2, H: 3, Na: 1, O: 2 })   // 1
 * rdbe({ C: 10, H: 10, Fe: 1 })       // null
 */
export function rdbe(counts: Map<string, number> | Readonly<Record<string, number>>): number | null {
  const entries = counts instanceof Map ? [...counts] : Object.entries(counts);
  let r2 = 2;
  for (const [s, n] of entries) {
    const v = VALENCE[s];
    if (v === undefined) return null;
    r2 += n * (v - 2);
  }
  return r2 / 2;
}

/**
 * Reads element ranges such as 'C0-80 H0-160 N0-4 Fe0-1 Pd1'. Any element symbol; each range at most 0–500.
 *
 * @param text - element ranges such as 'C0-80 H0-160 N0-4 Fe0-1 Pd1'.
 * @returns each element with its lowest and highest count.
 * @throws PondusError: BAD_OPTION for text over 2000 characters, a piece that is not an element range, a symbol that is not an element or has no mass data, an element given twice, or a range that is empty or above 500; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readRanges('C1-10 H0-20 Fe0-1').get('Fe') // [0, 1]
 */
export function readRanges(text: string): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  if (text.length > 2000) throw fail({ code: 'BAD_OPTION', message: 'the element ranges are longer than 2000 characters' });
  for (const part of text.split(/[\s,;]+/).filter((x) => x)) {
    const m = /^([A-Z][a-z]?)(\d{1,4})(?:-(\d{1,4}))?$/.exec(part);
    if (!m) throw fail({ code: 'BAD_OPTION', message: `'${part}' is not an element range such as C0-40 or Fe0-1` });
    if (!isElementSymbol(m[1])) throw fail({ code: 'BAD_OPTION', message: `'${m[1]}' in '${part}' is not an element symbol` });
    if (!getAtomData(m[1], null)) throw fail({ code: 'BAD_OPTION', message: `${m[1]} has no mass data pondus can search with` });
    if (out.has(m[1])) throw fail({ code: 'BAD_OPTION', message: `${m[1]} is given twice in the element ranges` });
    const lo = Number(m[2]);
    const hi = m[3] === undefined ? lo : Number(m[3]);
    if (hi < lo || hi > 500) throw fail({ code: 'BAD_OPTION', message: `range ${part} is empty or too wide (at most 500)` });
    out.set(m[1], [lo, hi]);
  }
  if (!out.has('C')) out.set('C', [0, 0]);
  if (!out.has('H')) out.set('H', [0, 0]);
  return out;
}

/**
 * The ranking score of a candidate, in documented floating-point arithmetic: each error is divided
 * by its allowance — the ppm error by the ppm window (or the molar-mass difference by its window),
 * and each found-percent deviation by the tolerance — and the score is the root mean square of
 * the terms given, the analysis counting as one term (the RMS of its elements), and a measured
 * isotope pattern one more, its dissimilarity over {@link PATTERN_ALLOWANCE}:
 *
 *   score = √((e_mass² + e_analysis² + e_pattern²) / terms),
 *   e_analysis = √(Σ (dev_i / tolerance)² / k),  e_pattern = (1 − similarity) / 0.1
 *
 * 0 is a perfect fit; every candidate within all allowances scores at most 1. Ties go to the
 * formula with fewer atoms, then to the Hill formula in alphabetical order.
 *
 * @param massError - the ppm error (or the molar-mass difference), or null when no mass is given.
 * @param massAllowance - the ppm window (or the molar-mass window) the error is divided by.
 * @param deviations - the found-percent deviations, or null when no analysis is given.
 * @param tolerance - the tolerance each deviation is divided by.
 * @param similarity - the similarity (0–1) of the measured isotope pattern, or null when none is given.
 * @returns the score: 0 for a perfect fit, at most 1 within every allowance.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * candidateScore(1.5, 3, null, 0.4)          // 0.5
 * candidateScore(0, 3, [0.2, -0.2], 0.4)     // 0.3535533905932738
 */
export function candidateScore(massError: number | null, massAllowance: number, deviations: ArrayLike<number> | null, tolerance: number, similarity: number | null = null): number {
  let sum = 0;
  let terms = 0;
  if (similarity !== null) {
    const e = (1 - similarity) / PATTERN_ALLOWANCE;
    sum += e * e;
    terms++;
  }
  if (massError !== null) {
    const e = massError / massAllowance;
    sum += e * e;
    terms++;
  }
  if (deviations && deviations.length > 0) {
    let s = 0;
    for (let i = 0; i < deviations.length; i++) s += (deviations[i] / tolerance) * (deviations[i] / tolerance);
    sum += s / deviations.length;
    terms++;
  }
  return terms === 0 ? 0 : Math.sqrt(sum / terms);
}

interface Kept {
  score: number;
  atoms: number;
  counts: Int32Array;
}

/** Max-heap on (score, atoms): the worst kept candidate on top. */
class TopK {
  readonly items: Kept[] = [];
  constructor(readonly k: number) {}
  private worse(a: Kept, b: Kept): boolean {
    return a.score > b.score || (a.score === b.score && a.atoms > b.atoms);
  }
  /** Whether a candidate of this score and size would enter. */
  admits(score: number, atoms: number): boolean {
    if (this.items.length < this.k) return true;
    const top = this.items[0];
    return score < top.score || (score === top.score && atoms < top.atoms);
  }
  push(item: Kept): void {
    const a = this.items;
    if (a.length < this.k) {
      a.push(item);
      let i = a.length - 1;
      while (i > 0) {
        const p = (i - 1) >> 1;
        if (!this.worse(a[i], a[p])) break;
        [a[i], a[p]] = [a[p], a[i]];
        i = p;
      }
      return;
    }
    a[0] = item;
    let i = 0;
    for (;;) {
      const l = 2 * i + 1;
      const r = l + 1;
      let m = i;
      if (l < a.length && this.worse(a[l], a[m])) m = l;
      if (r < a.length && this.worse(a[r], a[m])) m = r;
      if (m === i) break;
      [a[i], a[m]] = [a[m], a[i]];
      i = m;
    }
  }
}

const monoOf = (s: string) => getAtomData(s, null)!.monoisotopic;
const avgOf = (s: string) => getAtomData(s, null)!.average.standard;

/** The exact sum Σ nᵢ·mᵢ of tabulated values, as the shortest double of the exact decimal. */
function exactSum(symbols: readonly string[], counts: ArrayLike<number>, value: (s: string) => { text: string; scaled: number }): { number: number; decimal: Decimal } {
  let scaled = 0;
  let safe = true;
  for (let i = 0; i < symbols.length; i++) {
    if (!counts[i]) continue;
    scaled += counts[i] * value(symbols[i]).scaled;
    if (!Number.isSafeInteger(scaled)) safe = false;
  }
  if (safe) {
    const text = scaledToString(scaled);
    return { number: Number(text), decimal: new Decimal(text) };
  }
  let d = new Decimal(0);
  for (let i = 0; i < symbols.length; i++) if (counts[i]) d = d.plus(new Decimal(value(symbols[i]).text).times(counts[i]));
  return { number: d.toNumber(), decimal: d };
}

/**
 * Lists plausible formulas for an accurate mass (± ppm), an ion's m/z, a molar mass and/or found
 * percents, best score first.
 *
 * @param options - an accurate mass with its ppm window (and the ion it is the m/z of) or a molar mass with its window; found percents and their tolerance; element ranges, ratio rules and how many to list; a measured isotope pattern; and a progress callback.
 * @returns the candidates best score first, each with its formula, masses, ppm error, RDBE, largest deviation, pattern similarity and score, with what the search covered (examined, plausible, truncated) and the notes.
 * @throws PondusError: BAD_OPTION for no mass window, both an accurate and a molar mass, an ion without an accurate mass, a mass, ppm, window, tolerance, limit or ratio setting out of range, element ranges that cannot be read, an ion that needs more atoms than the ranges allow, a found element not in the ranges, or a measured pattern that cannot be read; the codes of {@link readIonNotation} for the ion (BAD_ION, INPUT_TOO_LONG, CONTROL_CHARACTER, and a term's formula codes); BAD_ION for an ion term with a labelled atom or a decimal count; BAD_NUMBER for an accurate mass that is not a number; UNKNOWN_ELEMENT or BAD_MEASUREMENT for found values that cannot be read; SEARCH_TOO_LARGE for a search beyond the work limit; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * candidateFormulas({ mass: '180.06339', ppm: 3, elements: 'C0-20 H0-40 O0-10' }).candidates[0].formula // 'C6H12O6'
 * candidateFormulas({ mass: '203.05261', ion: '[M+Na]+', ppm: 3, elements: 'C0-20 H0-40 O0-10' }).candidates[0].formula // 'C6H12O6'
 */
export function candidateFormulas(options: CandidateOptions): CandidateResult {
  checkInputLength(options.mass, 'the accurate mass', 100);
  checkInputLength(options.molarMass, 'the molar mass', 100);
  checkInputLength(options.found, 'the found values');
  checkInputLength(options.ion, 'the ion notation', 200);
  const ranges = readRanges(options.elements ?? DEFAULT_RANGES);
  const ppm = options.ppm ?? 5;
  if (!(ppm > 0 && ppm <= 1000)) throw fail({ code: 'BAD_OPTION', message: 'ppm must be between 0 and 1000' });
  const ratioSetting: RatioRanges = options.ratios === undefined || options.ratios === true ? 'extended' : options.ratios === false ? 'none' : options.ratios;
  if (ratioSetting !== 'extended' && ratioSetting !== 'common' && ratioSetting !== 'none') throw fail({ code: 'BAD_OPTION', message: `ratios are 'extended', 'common' or 'none', not '${String(ratioSetting)}'` });
  const limit = options.limit ?? 50;
  if (!(Number.isInteger(limit) && limit >= 1 && limit <= MAX_LIMIT)) throw fail({ code: 'BAD_OPTION', message: `the limit is a whole number from 1 to ${MAX_LIMIT}, not ${limit}` });
  const notes: Note[] = [];

  // the ion, when the mass is an m/z
  let notation: IonNotation | null = null;
  if (options.ion !== undefined) {
    if (options.mass === undefined) throw fail({ code: 'BAD_OPTION', message: 'an ion goes with an accurate m/z (`mass`); a molar-mass search is of the neutral compound', options: ['mass'] });
    notation = readIonNotation(options.ion);
  }
  // the ion's atoms less n·M: Σ sign·count·term, by element; its mass less the electrons
  const adduct = new Map<string, number>();
  let adductMass = new Decimal(0);
  if (notation) {
    for (const t of notation.terms) {
      for (const [s, n] of t.atoms) {
        const sym = /^[A-Z][a-z]?$/.test(s) ? s : null;
        if (!sym || typeof n !== 'number') throw fail({ code: 'BAD_ION', message: `the ion term '${t.text}' holds a labelled atom or a decimal count; candidates are searched for natural elements` });
        adduct.set(sym, (adduct.get(sym) ?? 0) + t.sign * t.count * n);
        adductMass = adductMass.plus(new Decimal(monoOf(sym).text).times(t.sign * t.count * n));
      }
    }
    adductMass = adductMass.minus(new Decimal(ELECTRON_MASS).times(notation.charge));
  }
  const n = notation?.multiplier ?? 1;
  const z = notation ? Math.abs(notation.charge) : 1;

  let lo: number;
  let hi: number;
  let found: Decimal | null = null;
  let massTarget: number | null = null; // the molar mass target
  let molarTolerance = 0;
  let useAverage = false;
  if (options.mass !== undefined) {
    if (options.molarMass !== undefined) throw fail({ code: 'BAD_OPTION', message: 'give an accurate mass or a molar mass, not both' });
    const m = readNumber(options.mass).value;
    if (m.lte(0) || m.gt(5000)) throw fail({ code: 'BAD_OPTION', message: `the accurate ${notation ? 'm/z' : 'mass'} must be between 0 and 5000${notation ? '' : ' u'}` });
    found = m;
    // calculated m/z with |found − calc|/calc ≤ ppm: found/(1 + t) ≤ calc ≤ found/(1 − t); then M from the ion
    const t = ppm * 1e-6;
    const toNeutral = (mz: number) => (mz * z - adductMass.toNumber()) / n;
    lo = toNeutral(m.toNumber() / (1 + t));
    hi = toNeutral(m.toNumber() / (1 - t));
    if (hi <= 0) throw fail({ code: 'BAD_OPTION', message: `an m/z of ${options.mass} is below the mass of the ion's own atoms (${notation!.canonical}): no molecule fits` });
  } else if (options.molarMass !== undefined) {
    // through the one number reader: '0x10' or '1e2 ' is refused, never read some other way
    const m = readNumber(options.molarMass).value.toNumber();
    molarTolerance = options.molarMassTolerance ?? 0.5;
    if (!(m > 0 && m <= 5000)) throw fail({ code: 'BAD_OPTION', message: 'the molar mass must be between 0 and 5000 g/mol' });
    if (!(molarTolerance > 0 && molarTolerance <= 10)) throw fail({ code: 'BAD_OPTION', message: 'the molar-mass window must be between 0 and 10 g/mol' });
    massTarget = m;
    lo = m - molarTolerance;
    hi = m + molarTolerance;
    useAverage = true;
  } else {
    throw fail({ code: 'BAD_OPTION', message: 'give an accurate mass (`mass`, with `ppm`) or a molar mass (`molarMass`): the search needs a mass window', options: ['mass', 'ppm', 'molarMass'] });
  }
  const read = options.found ? readFoundValues(options.found) : null;
  if (read) notes.push(...read.notes);
  const tolerance = options.tolerance ?? 0.4;
  if (!(tolerance > 0 && tolerance <= 100)) throw fail({ code: 'BAD_OPTION', message: 'the tolerance must be between 0 and 100 percentage points' });

  // the slots: every element searched, C and H last; the others heaviest first
  const others = [...ranges.keys()].filter((s) => s !== 'C' && s !== 'H').sort((a, b) => Number(monoOf(b).text) - Number(monoOf(a).text));
  const symbols = [...others, 'C', 'H'];
  const S = symbols.length;
  const iC = S - 2;
  const iH = S - 1;
  const massOf = (s: string) => Number((useAverage ? avgOf(s) : monoOf(s)).text);
  const mass = Float64Array.from(symbols, massOf);
  const avg = Float64Array.from(symbols, (s) => Number(avgOf(s).text));
  const min = Int32Array.from(symbols, (s) => ranges.get(s)![0]);
  const max = Int32Array.from(symbols, (s) => ranges.get(s)![1]);
  // an ion that takes atoms away needs them in M: n·count + Σ ≥ 0 (and no element may be taken that M cannot hold)
  for (const [s, d] of adduct) {
    if (d >= 0) continue;
    const need = Math.ceil(-d / n);
    const k = symbols.indexOf(s);
    if (k < 0 || max[k] < need) throw fail({ code: 'BAD_OPTION', message: `the ion ${notation!.canonical} takes ${-d} ${s} from the molecule, but the element ranges allow no more than ${k < 0 ? 0 : max[k]} ${s}` });
    min[k] = Math.max(min[k], need);
  }
  const valence = Int32Array.from(symbols, (s) => VALENCE[s] ?? -1);
  const unfixed = symbols.filter((s) => VALENCE[s] === undefined);
  const ratioTable = ratioSetting === 'none' ? null : RATIO_RANGES[ratioSetting];
  const ratioLo = Float64Array.from(symbols, (s) => (ratioTable && ratioTable[s] ? ratioTable[s][0] : 0));
  const ratioHi = Float64Array.from(symbols, (s) => (ratioTable && ratioTable[s] ? ratioTable[s][1] : Infinity));
  const foundSlots: number[] = [];
  const foundValues: number[] = [];
  if (read) {
    for (const [s, v] of read.values) {
      const k = symbols.indexOf(s);
      if (k < 0) throw fail({ code: 'BAD_OPTION', message: `a found value for ${s}, which the element ranges do not include: add ${s} to \`elements\``, options: ['elements'] });
      foundSlots.push(k);
      foundValues.push(v.toNumber());
    }
  }
  if (unfixed.length > 0) {
    notes.push({ code: 'RULES_NOT_APPLIED', message: `${unfixed.join(', ')} ha${unfixed.length === 1 ? 's' : 've'} no fixed valence: the RDBE and SENIOR checks are not applied to formulas that contain ${unfixed.length === 1 ? 'it' : 'them'} (the element-ratio limits still are)` });
  }
  // the most the slots from i on can add, and the least they must
  const maxRest = new Float64Array(S + 1);
  const minRest = new Float64Array(S + 1);
  for (let i = S - 1; i >= 0; i--) {
    maxRest[i] = maxRest[i + 1] + max[i] * mass[i];
    minRest[i] = minRest[i + 1] + min[i] * mass[i];
  }
  const eps = 1e-9;
  const mC = mass[iC];
  const mH = mass[iH];
  const hSpan = 1 + Math.floor((hi - lo) / mH + eps);
  // work per carbon step: the hydrogen steps, plus the formulas that reach the checks (about five steps' worth each)
  const perCarbon = hSpan + (CHECK_COST * (hi - lo)) / mH;

  // carbon bounds at a leaf: from the window, and from the ratio limits of the atoms already fixed
  // (cLow, carried down the walk: C ≥ n / (largest ratio) for every element fixed so far)
  const cMinBase = ratioTable ? Math.max(1, min[iC]) : min[iC];
  const hMaxMass = max[iH] * mH;
  const hMinMass = min[iH] * mH;
  const ratioStep = Float64Array.from(symbols, (_, i) => (ratioHi[i] === Infinity ? 0 : 1 / ratioHi[i]));

  // the one walk over the other elements' counts, heaviest first, pruned by the window and the
  // ratio limits; at each carbon slot it calls `leaf` with the mass taken and the least carbon.
  // It runs twice: first as the up-front estimate (leaves only sum the carbon-and-hydrogen steps
  // they would take, and the walk gives up past `budget` branches), then as the search itself.
  const counts = new Int32Array(S);
  let branches = 0;
  const walkBranches = (leaf: (cum: number, cLow: number) => void, budget: number): boolean => {
    branches = 0;
    const go = (i: number, cum: number, cLow: number): boolean => {
      if (++branches > budget) return false;
      if (i === iC) {
        leaf(cum, cLow);
        return true;
      }
      const m = mass[i];
      const r = ratioStep[i];
      let ok = true;
      for (let k = min[i]; k <= max[i]; k++) {
        const next = cum + k * m;
        if (next + minRest[i + 1] > hi + eps) break;
        if (next + maxRest[i + 1] < lo - eps) continue;
        counts[i] = k;
        const need = r === 0 || k === 0 ? cLow : Math.max(cLow, Math.ceil(k * r - eps));
        if (need > max[iC]) break;
        if (!go(i + 1, next, need)) {
          ok = false;
          break;
        }
      }
      counts[i] = 0;
      return ok;
    };
    return go(0, 0, cMinBase);
  };
  /** The carbon counts a leaf can take: from the window, and from the ratio limits of the atoms fixed above it. */
  const carbonFrom = (cum: number, cLow: number) => Math.max(cLow, Math.ceil((lo - cum - hMaxMass) / mC - eps));
  const carbonTo = (cum: number) => Math.min(max[iC], Math.floor((hi - cum - hMinMass) / mC + eps));
  let estimate = 0;
  const gaveUp = !walkBranches((cum, cLow) => {
    const cFrom = carbonFrom(cum, cLow);
    const cTo = carbonTo(cum);
    if (cTo >= cFrom) estimate += (cTo - cFrom + 1) * perCarbon;
  }, MAX_ESTIMATE_BRANCHES);
  const total = Math.round(estimate + branches);
  if (gaveUp || total > MAX_VISITS) {
    throw fail(
      typedIssue({
        code: 'SEARCH_TOO_LARGE',
        search: 'candidates',
        estimate: gaveUp ? null : total,
        limit: MAX_VISITS,
        walkLimit: gaveUp ? MAX_ESTIMATE_BRANCHES : null,
        elements: S,
        window: describe(options),
        options: ['ppm', 'elements', 'found'],
      }),
    );
  }

  const peaks = options.pattern !== undefined ? readPeaks(options.pattern) : null;
  const heap = new TopK(peaks ? Math.max(limit, PATTERN_POOL) : limit);
  let examined = 0;
  let plausible = 0;
  let visits = 0;
  const adductNumber = adductMass.toNumber();
  const foundNumber = found === null ? 0 : found.toNumber();
  const ppmOf = (m: number) => {
    // the calculated m/z (or neutral mass) of M of mass m against the found value
    const calc = (n * m + adductNumber) / z;
    return ((foundNumber - calc) / calc) * 1e6;
  };
  const deviations = new Float64Array(foundSlots.length);
  const consider = (): void => {
    examined++;
    let atoms = 0;
    let r2 = 2;
    let fixed = true;
    let vSum = 0;
    let vMax = 0;
    let odd = 0;
    for (let i = 0; i < S; i++) {
      const k = counts[i];
      if (!k) continue;
      atoms += k;
      const v = valence[i];
      if (v < 0) fixed = false;
      else {
        r2 += k * (v - 2);
        vSum += k * v;
        if (v > vMax) vMax = v;
        if (v & 1) odd += k;
      }
    }
    if (atoms === 0) return;
    if (fixed) {
      // RDBE whole and non-negative; SENIOR: even valence sum, ≥ 2 × the largest valence, ≥ 2(atoms − 1)
      if (r2 < 0 || (odd & 1) !== 0) return;
      if (vSum < 2 * vMax || vSum < 2 * (atoms - 1)) return;
    }
    if (ratioTable) {
      const c = counts[iC];
      if (c === 0) return;
      for (let i = 0; i < S; i++) {
        if (i === iC) continue;
        const q = counts[i] / c;
        if (q < ratioLo[i] || q > ratioHi[i]) return;
      }
    }
    let massError: number | null = null;
    let m = 0;
    for (let i = 0; i < S; i++) if (counts[i]) m += counts[i] * mass[i];
    if (found !== null) {
      massError = ppmOf(m);
      if (Math.abs(massError) > ppm) return;
    } else {
      massError = m - massTarget!;
      if (Math.abs(massError) > molarTolerance) return;
    }
    if (foundSlots.length > 0) {
      let total = 0;
      for (let i = 0; i < S; i++) if (counts[i]) total += counts[i] * avg[i];
      for (let j = 0; j < foundSlots.length; j++) {
        const k = foundSlots[j];
        const d = foundValues[j] - (100 * counts[k] * avg[k]) / total;
        if (d > tolerance || d < -tolerance) return;
        deviations[j] = d;
      }
    }
    plausible++;
    const score = candidateScore(massError, found !== null ? ppm : molarTolerance, foundSlots.length ? deviations : null, tolerance);
    if (heap.admits(score, atoms)) heap.push({ score, atoms, counts: counts.slice() });
  };

  const invH = 1 / mH;
  const stepX = mC * invH;
  const hMin = min[iH];
  const hMax = max[iH];
  const progress = options.onProgress;
  let leaves = 0;
  const searchLeaf = (cum: number, cLow: number): void => {
    const cFrom = carbonFrom(cum, cLow);
    const cTo = carbonTo(cum);
    if (progress && (++leaves & 0xffff) === 0) progress(Math.min(1, visits / Math.max(1, estimate)));
    if (cTo < cFrom) return;
    visits += cTo - cFrom + 1;
    const L = lo - cum;
    const U = hi - cum + eps;
    if (hSpan === 1) {
      // a window narrower than one H: at most one hydrogen count per carbon count
      let x = (L - cFrom * mC) * invH - eps;
      for (let c = cFrom; c <= cTo; c++, x -= stepX) {
        const h = Math.ceil(x);
        if (h < hMin || h > hMax || c * mC + h * mH > U) continue;
        counts[iC] = c;
        counts[iH] = h;
        consider();
      }
    } else {
      for (let c = cFrom; c <= cTo; c++) {
        const rest = c * mC;
        const hFrom = Math.max(hMin, Math.ceil((L - rest) * invH - eps));
        const hTo = Math.min(hMax, Math.floor((U - rest) * invH));
        counts[iC] = c;
        for (let h = hFrom; h <= hTo; h++) {
          counts[iH] = h;
          consider();
        }
      }
    }
    counts[iC] = 0;
    counts[iH] = 0;
  };
  walkBranches(searchLeaf, Infinity);
  if (options.onProgress) options.onProgress(1);

  let candidates = heap.items.map((kept) => candidateOf(kept, symbols, notation, adduct, adductMass, found, foundSlots, read, tolerance, ppm, massTarget, molarTolerance, peaks));
  candidates.sort((a, b) => a.score - b.score || atomCount(a) - atomCount(b) || (a.hill < b.hill ? -1 : a.hill > b.hill ? 1 : 0));
  if (peaks) {
    notes.push({ code: 'PATTERN_COMPARED', message: `the measured isotope pattern was compared with the best ${Math.min(PATTERN_POOL, plausible)} candidates by mass${read ? ' and analysis' : ''}, which were then ranked again with it` });
    candidates = candidates.slice(0, limit);
  }
  return {
    input: options.mass ?? options.molarMass ?? '',
    search: describe(options),
    ion: notation?.canonical ?? null,
    ratios: ratioSetting,
    candidates,
    examined,
    visited: total,
    plausible,
    truncated: plausible > candidates.length,
    notes,
  };
}

const atomCount = (c: Candidate) => Object.values(c.counts).reduce((a, b) => a + b, 0);

/** The plain result for a kept formula, its numbers from exact sums. */
function candidateOf(
  kept: Kept,
  symbols: readonly string[],
  notation: IonNotation | null,
  adduct: Map<string, number>,
  adductMass: Decimal,
  found: Decimal | null,
  foundSlots: readonly number[],
  read: ReturnType<typeof readFoundValues> | null,
  tolerance: number,
  ppm: number,
  massTarget: number | null,
  molarTolerance: number,
  peaks: MeasuredPeak[] | null,
): Candidate {
  const order = hillOrder(symbols.filter((_, i) => kept.counts[i] > 0));
  const counts: Record<string, number> = {};
  for (const s of order) counts[s] = kept.counts[symbols.indexOf(s)];
  const map = new Map(order.map((s) => [s, counts[s]]));
  const mono = exactSum(symbols, kept.counts, monoOf);
  const molar = exactSum(symbols, kept.counts, avgOf);
  let mz: Decimal | null = null;
  let ionFormula: string | null = null;
  let ionHill: string | null = null;
  if (notation) {
    const n = notation.multiplier;
    const ionAtoms = new Map<string, number>();
    for (const [s, k] of map) ionAtoms.set(s, k * n);
    for (const [s, d] of adduct) ionAtoms.set(s, (ionAtoms.get(s) ?? 0) + d);
    for (const [s, k] of ionAtoms) if (k === 0) ionAtoms.delete(s);
    ionHill = hillFormula(ionAtoms, notation.charge);
    ionFormula = conventionalFormula(ionAtoms, notation.charge);
    mz = mono.decimal.times(n).plus(adductMass).div(Math.abs(notation.charge));
  }
  const calc = mz ?? mono.decimal;
  const ppmError = found === null ? null : found.minus(calc).div(calc).times(1e6).toNumber();
  let maxDeviation: number | null = null;
  const deviations: number[] = [];
  if (read) {
    maxDeviation = 0;
    for (const k of foundSlots) {
      const s = symbols[k];
      const calcPercent = new Decimal(avgOf(s).text).times(kept.counts[k]).times(100).div(molar.decimal);
      const d = read.values.get(s)!.minus(calcPercent).toNumber();
      deviations.push(d);
      maxDeviation = Math.max(maxDeviation, Math.abs(d));
    }
  }
  const massError = ppmError !== null ? ppmError : molar.number - massTarget!;
  let similarity: number | null = null;
  if (peaks) {
    const n = notation?.multiplier ?? 1;
    const ionAtoms = new Map<string, number>();
    for (const [s, k] of map) ionAtoms.set(s, k * n);
    for (const [s, d] of adduct) ionAtoms.set(s, (ionAtoms.get(s) ?? 0) + d);
    for (const [s, k] of ionAtoms) if (k === 0) ionAtoms.delete(s);
    similarity = patternSimilarity(peaks, ionAtoms, calc.toNumber(), notation?.charge ?? 1);
  }
  return {
    formula: conventionalFormula(map),
    hill: hillFormula(map),
    counts,
    monoisotopicMass: mono.number,
    molarMass: molar.number,
    ionFormula,
    ionHill,
    mz: mz === null ? null : mz.toNumber(),
    ppm: ppmError,
    rdbe: rdbe(counts),
    maxDeviation,
    patternSimilarity: similarity,
    score: candidateScore(massError, found !== null ? ppm : molarTolerance, read ? deviations : null, tolerance, similarity),
  };
}

function describe(o: CandidateOptions): string {
  const parts: string[] = [];
  if (o.mass !== undefined) parts.push(o.ion !== undefined ? `m/z ${o.mass} ${o.ion} ± ${o.ppm ?? 5} ppm` : `mass ${o.mass} ± ${o.ppm ?? 5} ppm`);
  if (o.molarMass !== undefined) parts.push(`molar mass ${o.molarMass} ± ${o.molarMassTolerance ?? 0.5}`);
  if (o.found) parts.push(`found ${o.found}`);
  if (o.pattern) parts.push('measured pattern');
  return parts.join(', ');
}
