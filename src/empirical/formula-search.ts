/**
 * The empirical formula from measurements, by a tolerance-aware search for small whole-number
 * counts — never by rounding mole ratios.
 *
 * Each calculated percent must lie within a limit of the measured one: the analysis tolerance
 * (±0.3 percentage points by default, what a combustion analysis is good to; common practice), or
 * the precision of the written value when that is coarser (half a unit in its last digit, plus
 * 3 × 10⁻⁴ of the value and 0.001 points for data computed with other atomic-weight tables). An
 * element by difference carries the errors of all the others: its limit is their sum.
 *
 * Ranking: by fit, then by simplicity. The fit is graded in thirds of the limit (worst
 * |residual|/limit ≤ ⅓, ≤ ⅔, ≤ 1), because within a grade a better fit is noise, not evidence; within
 * a grade the formula with fewer atoms wins, then the closer fit. The search stops at small ratios:
 * the reference element (the least abundant by moles) goes up from 1, and the search ends once
 * formulas would have more than 2.5 times the atoms of the smallest fit, or more than
 * {@link MAX_EMPIRICAL_ATOMS} atoms, so a formula of hundreds of atoms never comes back when a
 * simple one fits. An element within its limit of zero (H=0.01 at ±0.3) is refused: the data
 * cannot fix its count.
 *
 * Scoring uses plain numbers on preallocated arrays; objects are made only for formulas that fit.
 * The walk over the counts is a branch and bound on the formula mass: each count fixed confines the
 * mass to the interval where that element's percent is within its limit, and that interval confines
 * the counts left, so formulas that cannot fit are never visited (ten elements with one by difference
 * take milliseconds, not a refusal). Only when nothing fits is the walk run again for the closest
 * formula the message names. Every walk is bounded by {@link MAX_SEARCH_WORK} steps.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { getAtomData } from '../elements/atom-data.js';
import { hillFormula, hillOrder } from '../formula/hill.js';
import { conventionalFormula } from './written.js';
import type { Measurements } from './measurements.js';

/** Largest count of the reference (least abundant) element searched. */
export const MAX_SCALE = 60;
/** Largest empirical formula searched, in atoms. */
export const MAX_EMPIRICAL_ATOMS = 150;
/** Default analysis tolerance, percentage points (combustion analysis is good to about ±0.3; common practice). */
export const DEFAULT_TOLERANCE = 0.3;
/**
 * Slack added to a precision limit, for data computed with other atomic-weight tables
 * (O 16.00 or 15.9994, H 1.00794, …): relative differences of up to about 3 × 10⁻⁴ in a
 * percent, plus 0.001 percentage points.
 */
export const RELATIVE_SLACK = 0.0003;
export const ABSOLUTE_SLACK = 0.001;

export interface FormulaFit {
  /** The formula as written: Hill order with carbon, IUPAC's electronegativity order without (Mg2SiO4). */
  formula: string;
  /** The Hill formula (Mg2O4Si). */
  hill: string;
  /** Atom counts by element, Hill order. */
  counts: Record<string, number>;
  /** Calculated − measured, percentage points, per element. */
  residuals: Record<string, number>;
  /** Largest |residual| as a fraction of that element's limit (≤ 1 fits). */
  worst: number;
  /** 1, 2 or 3: the third of the limit the worst residual falls in (1 is the best). */
  grade: number;
  /** Atoms in the formula. */
  atoms: number;
}

export interface SearchOptions {
  /** Analysis tolerance, percentage points (default 0.3). */
  tolerance?: number;
}

export interface SearchResult {
  /** Measured mass percents used (normalised for masses). */
  percents: Record<string, number>;
  /** Their limits, percentage points. */
  limits: Record<string, number>;
  best: FormulaFit;
  /** Other formulas that fit (not multiples of the best), best first. */
  alternatives: FormulaFit[];
}

function weight(symbol: string): number {
  return Number(getAtomData(symbol, null)!.average.standard.text);
}

/** Relative slack of the branch-and-bound intervals: far above rounding, far below any limit. */
const SLACK = 1e-9;

/** Count combinations a formula search may visit: about a second of work. */
export const MAX_SEARCH_WORK = 400_000;

/** Valences for the saturation check of formulas made only of these elements (common practice). */
const VALENCE: Readonly<Record<string, number>> = { C: 4, Si: 4, N: 3, P: 3, B: 3, O: 2, S: 2, H: 1, D: 1, F: 1, Cl: 1, Br: 1, I: 1 };

/**
 * Whether a formula of covalent elements can exist: its ring-plus-double-bond equivalents
 * (IUPAC Gold Book, "RDBE"; 1 + Σ nᵢ(vᵢ − 2)/2) are not negative. An empirical formula must pass too:
 * a molecular formula k times its counts has RDBE k·(r − 1) + 1, so it is negative for every k
 * when r is. Formulas with any other element (salts, metals) are not judged.
 *
 * @example
 * plausible(['C', 'H', 'O'], [2, 6, 1])       // true (ethanol)
 * plausible(['C', 'H', 'O'], [100, 299, 50])  // false (more H than any molecule of 100 C can hold)
 */
export function plausible(symbols: readonly string[], counts: ArrayLike<number>): boolean {
  let r2 = 2;
  for (let i = 0; i < symbols.length; i++) {
    const v = VALENCE[symbols[i]];
    if (v === undefined) return true;
    r2 += counts[i] * (v - 2);
  }
  return r2 >= 0;
}

/**
 * Whether a molecular formula of covalent elements has whole RDBE (an even valence sum: a
 * closed-shell molecule); formulas with other elements are not judged.
 *
 * @example
 * wholeRdbe(['C', 'H', 'N', 'O'], [18, 21, 1, 3]) // true
 * wholeRdbe(['C', 'H', 'N', 'O'], [18, 22, 1, 3]) // false
 */
export function wholeRdbe(symbols: readonly string[], counts: ArrayLike<number>): boolean {
  let sum = 0;
  for (let i = 0; i < symbols.length; i++) {
    const v = VALENCE[symbols[i]];
    if (v === undefined) return true;
    sum += counts[i] * v;
  }
  return sum % 2 === 0;
}

const gcd2 = (a: number, b: number): number => {
  while (b) [a, b] = [b, a % b];
  return a;
};

/** Percents and limits of a measurement set, as plain numbers. */
export interface PreparedData {
  symbols: string[];
  percents: number[];
  limits: number[];
  weights: number[];
  /** The percents and atomic weights as exact decimals: a fit's reported residuals are computed from them. */
  exact?: { percents: Decimal[]; weights: Decimal[] };
}

/**
 * The percents and their limits: max(tolerance, the precision of the value); the element by difference gets the sum of the others' limits.
 *
 * @example
 * prepareData(readMeasurements('C=40.00 H=6.71 O=53.29')).limits // [0.3, 0.3, 0.3]
 */
export function prepareData(m: Measurements, options: SearchOptions = {}): PreparedData {
  const tolerance = options.tolerance ?? DEFAULT_TOLERANCE;
  if (!(tolerance > 0 && tolerance <= 5)) throw fail({ code: 'BAD_OPTION', message: `the tolerance must be above 0 and at most 5 percentage points, not ${tolerance}` });
  const symbols = m.elements.map((e) => e.symbol);
  const values = m.elements.map((e) => e.value!);
  const total = m.kind === 'percent' ? new Decimal(100) : values.reduce((a, b) => a.plus(b), new Decimal(0));
  const exactPercents = values.map((v) => (m.kind === 'percent' ? v : v.div(total).times(100)));
  const percents = exactPercents.map((p) => p.toNumber());
  if (percents.some((p) => p <= 0)) throw fail({ code: 'BAD_MEASUREMENT', message: 'every element must be present (a value above zero)' });
  const precision = m.elements.map((e, i) => (m.kind === 'percent' ? e.halfUnit.toNumber() : e.halfUnit.div(total).times(100).toNumber() * 2) + RELATIVE_SLACK * percents[i] + ABSOLUTE_SLACK);
  const limits = precision.map((p) => Math.max(p, tolerance));
  const d = m.elements.findIndex((e) => e.byDifference);
  if (d >= 0) limits[d] = Math.max(precision[d], limits.reduce((a, l, i) => (i === d ? a : a + l), 0));
  // limits are derived figures: twelve significant digits are plenty (0.9, not 0.8999999999999999)
  const exact = { percents: exactPercents, weights: symbols.map((x) => new Decimal(getAtomData(x, null)!.average.standard.text)) };
  return { symbols, percents, limits: limits.map((l) => Number(l.toPrecision(12))), weights: symbols.map(weight), exact };
}

function makeFit(data: PreparedData, counts: ArrayLike<number>, residuals: ArrayLike<number>, worst: number, atoms: number): FormulaFit {
  const map = new Map<string, number>();
  data.symbols.forEach((s, i) => map.set(s, counts[i]));
  const order = hillOrder(map.keys());
  const c: Record<string, number> = {};
  const r: Record<string, number> = {};
  // the residuals reported are exact decimals' nearest numbers, not the search's float sums
  let total: Decimal | null = null;
  if (data.exact) {
    total = new Decimal(0);
    for (let i = 0; i < counts.length; i++) total = total.plus(data.exact.weights[i].times(counts[i]));
  }
  for (const s of order) {
    const i = data.symbols.indexOf(s);
    c[s] = counts[i];
    r[s] = total && data.exact ? data.exact.weights[i].times(counts[i] * 100).div(total).minus(data.exact.percents[i]).toNumber() : residuals[i];
  }
  return { formula: conventionalFormula(map), hill: hillFormula(map, 0, order), counts: c, residuals: r, worst, grade: gradeOf(worst), atoms };
}

/** The third of the limit a fit's worst residual falls in: 1, 2 or 3. */
export const gradeOf = (worst: number): number => (worst <= 1 / 3 + 1e-12 ? 1 : worst <= 2 / 3 + 1e-12 ? 2 : 3);

/** Fit first (by grade), then simplicity (fewer atoms), then the closer fit. */
export const byFitThenSimplicity = (a: FormulaFit, b: FormulaFit): number => a.grade - b.grade || a.atoms - b.atoms || a.worst - b.worst || (a.hill < b.hill ? -1 : 1);

/**
 * Scores one set of counts with plain numbers: writes the residuals and returns the worst
 * |residual|/limit (Infinity when a count is zero).
 */
function score(data: PreparedData, counts: ArrayLike<number>, residuals: Float64Array): number {
  let total = 0;
  for (let i = 0; i < counts.length; i++) total += counts[i] * data.weights[i];
  let worst = 0;
  for (let i = 0; i < counts.length; i++) {
    const r = (100 * counts[i] * data.weights[i]) / total - data.percents[i];
    residuals[i] = r;
    const w = Math.abs(r) / data.limits[i];
    if (w > worst) worst = w;
  }
  return worst;
}

/** Thrown to end the search for the closest formula at its budget. */
const OVER_BUDGET = Symbol('over budget');

const tooLarge = (n: number) =>
  fail(typedIssue({ code: 'SEARCH_TOO_LARGE', search: 'elements', estimate: null, limit: MAX_SEARCH_WORK, walkLimit: null, elements: n, window: null, options: ['molarMass', 'tolerance'] }));

/**
 * Searches for the empirical formula that fits the measurements.
 *
 * @param m - a measurement set read by {@link readMeasurements}.
 * @param options - the tolerance in percentage points (above 0, at most 5).
 * @returns the best formula with its fit, and the other formulas that fit, best first.
 * @throws PondusError: BAD_OPTION for a tolerance out of range; BAD_MEASUREMENT for an element with no value above zero; NO_FORMULA_FITS when no formula of the allowed size fits every value within its limit, or a value is too close to zero to count its atoms; SEARCH_TOO_LARGE for a search beyond the work limit; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * searchFormula(readMeasurements('C=40.00 H=6.71 O=53.29')).best.formula // 'CH2O'
 * searchFormula(readMeasurements('C=72.15 H=7.12 N=4.72 O=rest')).best.formula // 'C18H21NO3'
 */
export function searchFormula(m: Measurements, options: SearchOptions = {}): SearchResult {
  const data = prepareData(m, options);
  const { symbols, percents, limits, weights } = data;
  const k = symbols.length;
  const moles = percents.map((p, i) => p / weights[i]);
  const ref = moles.indexOf(Math.min(...moles));
  const fits: FormulaFit[] = [];
  let closest: FormulaFit | null = null;
  let closestWorst = Infinity;
  const counts = new Int32Array(k);
  const closestCounts = new Int32Array(k);
  const residuals = new Float64Array(k);
  let work = 0;
  // an element within its limit of zero cannot fix a count: the data cannot tell how much of it there is
  const trace = symbols.findIndex((_, i) => percents[i] <= limits[i]);
  if (trace >= 0) {
    throw fail({ code: 'NO_FORMULA_FITS', message: `${symbols[trace]} at ${Number(percents[trace].toPrecision(4))} % is within the limit (±${limits[trace].toFixed(3)} points) of zero: the data cannot tell how many ${symbols[trace]} atoms there are; give a tighter \`tolerance\` if the analysis is better than that, or leave ${symbols[trace]} out`, options: ['tolerance'] });
  }
  // the search ends past MAX_EMPIRICAL_ATOMS, or once the smallest formula of a scale has more than
  // 2.5 times the atoms of the smallest fit (the alternatives a chemist would consider)
  let atomLimit = MAX_EMPIRICAL_ATOMS;
  // Two passes. The first finds the fits: only formulas within every limit matter, and the bound
  // below cuts everything else. Only when none fits does a second pass look for the closest
  // formula, for the message; past its budget the message goes without it.
  const pass = (track: boolean) => {
    work = 0;
    for (let s = 1; s <= MAX_SCALE; s++) {
      // candidate counts for each element at this scale, from the limits of the ratios
      const choices: Int32Array[] = moles.map((n, i) => {
        if (i === ref) return Int32Array.of(s);
        const x = (n / moles[ref]) * s;
        const e = limits[i] / percents[i] + limits[ref] / percents[ref];
        const lo = Math.max(1, Math.floor(x * (1 - e) - 0.5));
        const hi = Math.ceil(x * (1 + e) + 0.5);
        const out: number[] = [];
        for (let c = lo; c <= hi; c++) out.push(c);
        return Int32Array.from(out);
      });
      // the smallest formula at this scale: past the atom limit, the search ends
      const smallest = choices.reduce((a, o) => a + o[0], 0);
      if (smallest > atomLimit) break;
      // suffix bounds of the choices: the least and most mass and the fewest atoms the elements from i on add
      const remMin = new Float64Array(k + 1);
      const remMax = new Float64Array(k + 1);
      const remAtoms = new Int32Array(k + 1);
      for (let i = k - 1; i >= 0; i--) {
        const o = choices[i];
        remMin[i] = remMin[i + 1] + o[0] * weights[i];
        remMax[i] = remMax[i + 1] + o[o.length - 1] * weights[i];
        remAtoms[i] = remAtoms[i + 1] + o[0];
      }
      // Branch and bound on the formula mass T: a count n of element i has percent 100·n·wᵢ/T, within
      // B·limit of the measured one only for T in an interval, so each count fixed narrows T, and T
      // narrows the counts left. B is the worst a leaf may score and still matter: 1 when looking
      // for fits, max(1, the closest so far) when looking for the closest, so nothing that matters
      // is ever cut (the slack covers rounding).
      const walk = (i: number, g: number, atoms: number, mass: number, tLo: number, tHi: number) => {
        if (++work > MAX_SEARCH_WORK) throw track ? OVER_BUDGET : tooLarge(k);
        if (i === k) {
          if (g !== 1 || atoms > atomLimit) return; // multiples were seen at a smaller scale
          if (!plausible(symbols, counts)) return;
          const worst = score(data, counts, residuals);
          if (track && worst < closestWorst) {
            closestWorst = worst;
            closestCounts.set(counts);
          }
          if (worst <= 1) {
            fits.push(makeFit(data, counts, residuals, worst, atoms));
            atomLimit = Math.min(atomLimit, Math.floor(2.5 * atoms));
          }
          return;
        }
        if (atoms + remAtoms[i] > atomLimit) return;
        const lo = Math.max(tLo, mass + remMin[i]);
        const hi = Math.min(tHi, mass + remMax[i]);
        if (lo > hi * (1 + SLACK)) return;
        const o = choices[i];
        const w = weights[i];
        let from = 0;
        let to = o.length - 1;
        const bound = !track ? 1 : closestWorst < Infinity ? Math.max(1, closestWorst) : Infinity;
        let bl = Infinity;
        if (bound < Infinity) {
          bl = bound * limits[i] * (1 + SLACK);
          const cLo = (lo * (percents[i] - bl)) / (100 * w);
          const cHi = (hi * (percents[i] + bl)) / (100 * w);
          while (from <= to && o[from] < cLo * (1 - SLACK)) from++;
          while (to >= from && o[to] > cHi * (1 + SLACK)) to--;
        }
        for (let j = from; j <= to; j++) {
          const c = o[j];
          counts[i] = c;
          let nLo = tLo;
          let nHi = tHi;
          if (bl < Infinity) {
            nLo = Math.max(tLo, (100 * c * w) / (percents[i] + bl));
            if (percents[i] > bl) nHi = Math.min(tHi, (100 * c * w) / (percents[i] - bl));
          }
          walk(i + 1, gcd2(g, c), atoms + c, mass + c * w, nLo, nHi);
        }
      };
      walk(0, 0, 0, 0, 0, Infinity);
    }
  };
  pass(false);
  if (fits.length === 0) {
    try {
      pass(true);
    } catch (e) {
      if (e !== OVER_BUDGET) throw e;
      closestWorst = Infinity; // past the budget: no closest formula to name
    }
  }
  if (closestWorst < Infinity) {
    const r = new Float64Array(k);
    const w = score(data, closestCounts, r);
    closest = makeFit(data, closestCounts, r, w, closestCounts.reduce((a, b) => a + b, 0));
  }
  if (fits.length === 0) {
    let hint = '';
    if (closest) {
      const [sym, r] = Object.entries(closest.residuals).reduce((a, b) => (Math.abs(b[1]) / limits[symbols.indexOf(b[0])] > Math.abs(a[1]) / limits[symbols.indexOf(a[0])] ? b : a));
      hint = `; the closest, ${closest.formula}, is off by ${Math.abs(r).toFixed(3)} percentage points in ${sym} (limit ${limits[symbols.indexOf(sym)].toFixed(3)})`;
    }
    throw fail({ code: 'NO_FORMULA_FITS', message: `no formula of up to ${MAX_EMPIRICAL_ATOMS} atoms fits every value within its limit${hint}; check the values, or give a molar mass` });
  }
  fits.sort(byFitThenSimplicity);
  const best = fits[0];
  // alternatives: other formulas that fit, of a size a chemist would consider (at most 2.5 × as many atoms)
  const alternatives = fits.slice(1).filter((f) => f.atoms <= 2.5 * best.atoms).slice(0, 5);
  const rec = (a: number[]) => Object.fromEntries(hillOrder(symbols).map((s) => [s, a[symbols.indexOf(s)]]));
  return { percents: rec(percents), limits: rec(limits), best, alternatives };
}

/** The molecular formulas searched directly from a molar mass: at most this many count combinations. */
export const MAX_MOLECULAR_WORK = 400_000;

/**
 * Searches molecular formulas directly: every set of counts whose molar mass lies in [lo, hi] and
 * whose percents fit within the limits (covalent formulas with whole, non-negative RDBE), ranked by
 * fit, then simplicity. Empty when none fits.
 *
 * @example
 * searchMolecular(readMeasurements('C=72.15 H=7.12 N=4.72 O=rest'), 296.4, 302.4)[0].formula // 'C18H21NO3'
 */
export function searchMolecular(m: Measurements, lo: number, hi: number, options: SearchOptions = {}): FormulaFit[] {
  const data = prepareData(m, options);
  const { symbols, percents, limits, weights } = data;
  const k = symbols.length;
  // each count from the mass share: n = M·p/(100·A), over the window and the limit
  const ranges = symbols.map((_, i) => {
    const a = Math.max(1, Math.ceil((lo * Math.max(0, percents[i] - limits[i])) / (100 * weights[i]) - 1e-9));
    const b = Math.floor((hi * (percents[i] + limits[i])) / (100 * weights[i]) + 1e-9);
    return [a, b] as const;
  });
  let size = 1;
  for (const [a, b] of ranges) size *= Math.max(0, b - a + 1);
  if (size > MAX_MOLECULAR_WORK) {
    throw fail(typedIssue({ code: 'SEARCH_TOO_LARGE', search: 'molecular', estimate: Math.round(size), limit: MAX_MOLECULAR_WORK, walkLimit: null, elements: k, window: null }));
  }
  const counts = new Int32Array(k);
  const residuals = new Float64Array(k);
  const fits: FormulaFit[] = [];
  const walk = (i: number, mass: number, atoms: number) => {
    if (mass > hi + 1e-9) return;
    if (i === k) {
      if (mass < lo - 1e-9 || !plausible(symbols, counts) || !wholeRdbe(symbols, counts)) return;
      const worst = score(data, counts, residuals);
      if (worst <= 1) fits.push(makeFit(data, counts, residuals, worst, atoms));
      return;
    }
    for (let c = ranges[i][0]; c <= ranges[i][1]; c++) {
      counts[i] = c;
      walk(i + 1, mass + c * weights[i], atoms + c);
    }
  };
  walk(0, 0, 0);
  return fits.sort(byFitThenSimplicity);
}
