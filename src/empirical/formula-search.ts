/**
 * The empirical formula from measurements, by a tolerance-aware search for
 * small whole-number counts — never by rounding mole ratios. Each measured
 * percent is known to half a unit in its last digit (40.00 % to ±0.005 %);
 * the search returns the smallest formula whose calculated percents all lie
 * within those limits, and lists other formulas that fit too.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { getAtomData } from '../elements/atom-data.js';
import { hillFormula } from '../formula/hill.js';
import { gcd } from '../reactions/rational.js';
import type { Measurements } from './measurements.js';

/** Largest count of the reference (least abundant) element searched. */
export const MAX_SCALE = 60;
/**
 * Slack added to every limit, for data computed with other atomic-weight tables
 * (O 16.00 or 15.9994, H 1.00794, …): relative differences of up to about
 * 3 × 10⁻⁴ in a percent, plus 0.001 percentage points.
 */
export const RELATIVE_SLACK = 0.0003;
export const ABSOLUTE_SLACK = 0.001;

export interface FormulaFit {
  /** Hill formula. */
  formula: string;
  counts: Map<string, number>;
  /** Calculated − measured, percentage points, per element. */
  residuals: Map<string, number>;
  /** Largest |residual| as a fraction of that element's limit (≤ 1 fits). */
  worst: number;
}

export interface SearchResult {
  /** Measured mass percents used (normalised for masses). */
  percents: Map<string, number>;
  /** Their limits, percentage points. */
  limits: Map<string, number>;
  best: FormulaFit;
  /** Other formulas that fit (larger, not multiples of the best), best first. */
  alternatives: FormulaFit[];
}

function weight(symbol: string): number {
  return Number(getAtomData(symbol, null)!.average.standard.text);
}

function fitOf(symbols: string[], counts: number[], percents: number[], limits: number[]): FormulaFit {
  const masses = counts.map((c, i) => c * weight(symbols[i]));
  const total = masses.reduce((a, b) => a + b, 0);
  const residuals = new Map<string, number>();
  let worst = 0;
  masses.forEach((m, i) => {
    const r = (100 * m) / total - percents[i];
    residuals.set(symbols[i], r);
    worst = Math.max(worst, Math.abs(r) / limits[i]);
  });
  const map = new Map(symbols.map((s, i) => [s, counts[i]]));
  return { formula: hillFormula(map), counts: map, residuals, worst };
}

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
export function plausible(symbols: readonly string[], counts: readonly number[]): boolean {
  let r2 = 2;
  for (let i = 0; i < symbols.length; i++) {
    const v = VALENCE[symbols[i]];
    if (v === undefined) return true;
    r2 += counts[i] * (v - 2);
  }
  return r2 >= 0;
}

function reduce(counts: number[]): number[] {
  let g = 0n;
  for (const c of counts) g = gcd(g, BigInt(c));
  return g > 1n ? counts.map((c) => c / Number(g)) : counts;
}

/**
 * Searches for the empirical formula that fits the measurements.
 *
 * @example
 * searchFormula(readMeasurements('C=40.00 H=6.71 O=53.29')).best.formula // 'CH2O'
 */
export function searchFormula(m: Measurements): SearchResult {
  const symbols = m.elements.map((e) => e.symbol);
  const values = m.elements.map((e) => e.value!);
  const total = m.kind === 'percent' ? new Decimal(100) : values.reduce((a, b) => a.plus(b), new Decimal(0));
  // percents and their limits (for masses, the half-units scaled to percent)
  const percents = values.map((v) => (m.kind === 'percent' ? v.toNumber() : v.div(total).times(100).toNumber()));
  const limits = m.elements.map((e, i) => (m.kind === 'percent' ? e.halfUnit.toNumber() : e.halfUnit.div(total).times(100).toNumber() * 2) + RELATIVE_SLACK * percents[i] + ABSOLUTE_SLACK);
  if (percents.some((p) => p <= 0)) throw fail({ code: 'BAD_MEASUREMENT', message: 'every element must be present (a value above zero)' });
  const moles = percents.map((p, i) => p / weight(symbols[i]));
  const ref = moles.indexOf(Math.min(...moles));
  const fits: FormulaFit[] = [];
  const seen = new Set<string>();
  let closest: FormulaFit | null = null;
  let work = 0;
  for (let s = 1; s <= MAX_SCALE; s++) {
    // candidate counts for each element at this scale, from the uncertainty of the ratios
    const options = moles.map((n, i) => {
      if (i === ref) return [s];
      const x = (n / moles[ref]) * s;
      const e = limits[i] / percents[i] + limits[ref] / percents[ref];
      const lo = Math.max(1, Math.floor(x * (1 - e) - 0.5));
      const hi = Math.ceil(x * (1 + e) + 0.5);
      const out: number[] = [];
      for (let c = lo; c <= hi && out.length < 12; c++) out.push(c);
      return out;
    });
    const counts = new Array<number>(symbols.length).fill(0);
    const walk = (i: number) => {
      if (++work > MAX_SEARCH_WORK) {
        throw fail({
          code: 'SEARCH_TOO_LARGE',
          message: `the search for a formula of ${symbols.length} elements at these precisions visits more than ${MAX_SEARCH_WORK.toLocaleString('en-US')} count combinations, more than pondus answers within about a second: give the values to fewer decimals only if they are not known better, or give a molar mass and use the candidates command`,
        });
      }
      if (i === symbols.length) {
        const reduced = reduce(counts);
        const key = reduced.join(',');
        if (seen.has(key) || !plausible(symbols, reduced)) return;
        const f = fitOf(symbols, reduced, percents, limits);
        if (!closest || f.worst < closest.worst) closest = f;
        if (f.worst <= 1) {
          seen.add(key);
          fits.push(f);
        }
        return;
      }
      for (const c of options[i]) {
        counts[i] = c;
        walk(i + 1);
      }
    };
    walk(0);
    if (fits.length >= 6) break;
  }
  if (fits.length === 0) {
    const c = closest as FormulaFit | null;
    let hint = '';
    if (c) {
      const [sym, r] = [...c.residuals].reduce((a, b) => (Math.abs(b[1]) / limits[symbols.indexOf(b[0])] > Math.abs(a[1]) / limits[symbols.indexOf(a[0])] ? b : a));
      hint = `; the closest, ${c.formula}, is off by ${Math.abs(r).toFixed(3)} percentage points in ${sym} (limit ${limits[symbols.indexOf(sym)].toFixed(3)})`;
    }
    throw fail({ code: 'NO_FORMULA_FITS', message: `no formula with up to ${MAX_SCALE} atoms of ${symbols[ref]} fits every value within its precision${hint}; check the values, or give fewer decimals than you trust` });
  }
  const size = (f: FormulaFit) => [...f.counts.values()].reduce((a, b) => a + b, 0);
  // the smallest formula that fits; the others by size, then by fit
  fits.sort((a, b) => size(a) - size(b) || a.worst - b.worst);
  // alternatives: other formulas that fit, of a size a chemist would consider (at most 2.5 × as many atoms)
  const alternatives = fits.slice(1).filter((f) => size(f) <= 2.5 * size(fits[0])).slice(0, 5);
  return { percents: new Map(symbols.map((s, i) => [s, percents[i]])), limits: new Map(symbols.map((s, i) => [s, limits[i]])), best: fits[0], alternatives };
}
