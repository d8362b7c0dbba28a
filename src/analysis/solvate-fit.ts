/**
 * Searches for the retained solvent, water or salt partner that explains an
 * elemental analysis: fractional amounts (a grid of `step` up to `max`) of one
 * or two partners added to the formula, ranked by the largest deviation, then
 * by the sum of squared deviations, then by fewer partners and smaller amounts.
 *
 * A second partner always fits the noise of real data a little better, so for
 * ranking each partner adds PARTNER_PENALTY percentage points to the largest
 * deviation: a two-partner fit must beat a one-partner fit by more than that to
 * rank above it. The deviations reported are the real ones. The search runs in
 * floating point; the fits it reports are recomputed exactly by the caller.
 *
 * Cost. One partner: every grid amount is scored (at most 2000 per partner).
 * Two partners: the grid is not walked point by point (12 partners at step 0.01
 * up to 20 would be 264 million points). For a fixed amount of the first partner,
 * the largest deviation is a quasiconvex function of the second partner's amount
 * (each percent is a monotone linear-fractional function of it), so along each
 * row of the grid the best amount is found by ternary search and the amounts at
 * each rounded score level are bracketed by binary search; at most `top` points
 * of a row are scored in full. The result is the same as scoring every grid
 * point (the tests check it against the exhaustive search), at about
 * 60 scorings per row. The rows are bounded: when the pairs would take more than
 * {@link MAX_PAIR_ROWS} rows, the two-partner search is not run and a note
 * (PAIRS_NOT_SEARCHED) says so; it is never skipped silently.
 */
import { fail } from '../errors/pondus-error.js';
import type { Note } from '../errors/issue.js';

/** Element masses per formula unit (g/mol) for the elements analysed, and the molar mass. */
export interface MassVector {
  masses: number[];
  total: number;
}

export interface Candidate {
  /** Amount of each partner, same order as the partner list (0 when absent). */
  amounts: number[];
  maxDeviation: number;
  sumSquares: number;
}

/** The candidates found, best first, and what the search says about itself. */
export interface SolvateSearch {
  candidates: Candidate[];
  /** PAIRS_NOT_SEARCHED when the two-partner search was beyond its bound. */
  notes: Note[];
}

/** Most grid amounts per partner (step and largest amount). */
export const MAX_GRID = 2000;
/** Most partners one search takes. */
export const MAX_PARTNERS = 100;
/** Most fits one search lists. */
export const MAX_TOP = 100;
/** Most grid rows (amounts of the first partner of a pair, over all pairs) the two-partner search walks: about half a second. */
export const MAX_PAIR_ROWS = 400_000;

/** Percent by mass of each analysed element for base + Σ amounts × partners. */
export function percents(base: MassVector, partners: MassVector[], amounts: number[]): number[] {
  let total = base.total;
  for (let j = 0; j < partners.length; j++) total += amounts[j] * partners[j].total;
  return base.masses.map((m, i) => {
    let mi = m;
    for (let j = 0; j < partners.length; j++) mi += amounts[j] * partners[j].masses[i];
    return (100 * mi) / total;
  });
}

const EPS = 1e-9;
/** Percentage points added per partner when ranking (about the noise of a CHN analysis). */
export const PARTNER_PENALTY = 0.05;

const partnersIn = (c: Candidate) => c.amounts.filter((x) => x > 0).length;
const rankScore = (c: Candidate) => c.maxDeviation + PARTNER_PENALTY * partnersIn(c);

/** A rank score as reported: deviations are printed to 0.01, so fits equal at that figure are tied. */
const reported = (c: Candidate) => Math.round(rankScore(c) * 100 + EPS);
/** The reported rank score of a fit with this largest deviation and this many partners (the same arithmetic as `reported`). */
const reportedOf = (maxDeviation: number, n: number) => Math.round((maxDeviation + PARTNER_PENALTY * n) * 100 + EPS);

/** Ranks fits: by the rank score to the reported 0.01; ties go to the simpler fit (fewer partners, then less of them), then to the smaller sum of squares. */
function better(a: Candidate, b: Candidate): number {
  if (reported(a) !== reported(b)) return reported(a) - reported(b);
  if (partnersIn(a) !== partnersIn(b)) return partnersIn(a) - partnersIn(b);
  const amount = a.amounts.reduce((s, x) => s + x, 0) - b.amounts.reduce((s, x) => s + x, 0);
  if (Math.abs(amount) > EPS) return amount;
  return a.sumSquares - b.sumSquares;
}

/**
 * The best candidates: no partner, one partner, or two, on a grid of amounts (see the file's
 * comment for how the two-partner grid is searched without scoring every point).
 *
 * @example
 * const base = { masses: [120.11, 10.08], total: 130.19 }
 * const water = { masses: [0, 2.016], total: 18.015 }
 * searchSolvates([86.29, 7.97], base, [water], 0.05, 2, 5)[0].amounts // [0.5]
 */
export function searchSolvates(found: number[], base: MassVector, partners: MassVector[], step: number | readonly number[], max: number | readonly number[], top: number): Candidate[] {
  return solvateSearch(found, base, partners, step, max, top).candidates;
}

/**
 * The solvate search with its notes: the candidates, best first, and a PAIRS_NOT_SEARCHED note
 * when the two-partner search was beyond its bound ({@link MAX_PAIR_ROWS}).
 *
 * @example
 * const base = { masses: [120.11, 10.08], total: 130.19 }
 * const water = { masses: [0, 2.016], total: 18.015 }
 * solvateSearch([86.29, 7.97], base, [water], 0.05, 2, 5).notes // []
 */
export function solvateSearch(found: number[], base: MassVector, partners: MassVector[], step: number | readonly number[], max: number | readonly number[], top: number): SolvateSearch {
  if (!(Number.isInteger(top) && top >= 1 && top <= MAX_TOP)) throw fail({ code: 'BAD_OPTION', message: `the number of fits listed is a whole number from 1 to ${MAX_TOP}, not ${top}` });
  if (partners.length > MAX_PARTNERS) throw fail({ code: 'BAD_OPTION', message: `${partners.length} solvents and salt partners are more than one search takes (at most ${MAX_PARTNERS})` });
  // one grid of amounts per partner: its step up to its largest amount
  const grids = partners.map((_, j) => {
    const st = typeof step === 'number' ? step : step[j];
    const mx = typeof max === 'number' ? max : max[j];
    const n = Math.round(mx / st + EPS);
    if (!(st > 0 && n >= 0 && n <= MAX_GRID)) throw fail({ code: 'BAD_OPTION', message: `a step of ${st} up to ${mx} makes no sensible grid (at most ${MAX_GRID} steps)` });
    const g = new Float64Array(n);
    for (let k = 1; k <= n; k++) g[k - 1] = Number((k * st).toFixed(6));
    return g;
  });
  const E = found.length;
  const F = Float64Array.from(found);
  const M = Float64Array.from(base.masses);
  const T = base.total;
  const PM = partners.map((p) => Float64Array.from(p.masses));
  const PT = partners.map((p) => p.total);

  const best: Candidate[] = [];
  const full = () => best.length >= top;
  /** The reported rank score of the worst fit kept (meaningful once the list is full). */
  let cutoff = Infinity;
  const insert = (c: Candidate) => {
    if (best.length < top || better(c, best[best.length - 1]) < 0) {
      best.push(c);
      best.sort(better);
      if (best.length > top) best.pop();
      if (full()) cutoff = reported(best[best.length - 1]);
    }
  };
  const amountsOf = (j: number, a: number, k = -1, b = 0) => {
    const out = new Array<number>(partners.length).fill(0);
    if (j >= 0) out[j] = a;
    if (k >= 0) out[k] = b;
    return out;
  };

  // scoring with plain numbers: the same arithmetic as `percents` (a partner at 0 adds exactly 0)
  let lastSS = 0;
  /** Largest |found − calculated| for a units of partner j and b of partner k (j < k; -1 for none); the sum of squares in lastSS. */
  const score = (j: number, a: number, k: number, b: number): number => {
    let total = T;
    if (j >= 0) total += a * PT[j];
    if (k >= 0) total += b * PT[k];
    let worst = 0;
    let ss = 0;
    for (let i = 0; i < E; i++) {
      let mi = M[i];
      if (j >= 0) mi += a * PM[j][i];
      if (k >= 0) mi += b * PM[k][i];
      const d = F[i] - (100 * mi) / total;
      worst = Math.max(worst, Math.abs(d));
      ss += d * d;
    }
    lastSS = ss;
    return worst;
  };
  const consider = (j: number, a: number, k: number, b: number, n: number) => {
    const maxDeviation = score(j, a, k, b);
    // a fit whose rank score is above the worst kept cannot enter; allocate only for those that may
    if (full() && reportedOf(maxDeviation, n) > cutoff) return;
    insert({ amounts: n === 0 ? amountsOf(-1, 0) : n === 1 ? amountsOf(j, a) : amountsOf(j, a, k, b), maxDeviation, sumSquares: lastSS });
  };

  consider(-1, 0, -1, 0, 0);
  for (let j = 0; j < partners.length; j++) for (const a of grids[j]) consider(j, a, -1, 0, 1);

  const notes: Note[] = [];
  let rows = 0;
  const pairs: [number, number][] = [];
  for (let j = 0; j < partners.length; j++) {
    for (let k = j + 1; k < partners.length; k++) {
      if (grids[j].length === 0 || grids[k].length === 0) continue;
      pairs.push([j, k]);
      rows += Math.min(grids[j].length, grids[k].length);
    }
  }
  if (rows > MAX_PAIR_ROWS) {
    notes.push({
      code: 'PAIRS_NOT_SEARCHED',
      message: `two-partner fits were not searched: ${pairs.length} pairs of partners over their amount grids are ${rows.toLocaleString('en-US')} rows, more than the ${MAX_PAIR_ROWS.toLocaleString('en-US')} searched within about a second; only fits with one partner are listed. Give fewer solvents or a coarser \`step\``,
      options: ['step'],
    });
  } else {
    for (const [j, k] of pairs) searchPair(j, k);
  }
  return { candidates: best, notes };

  /**
   * One pair: each amount of the partner with the shorter grid is a row; along a row the largest
   * deviation is quasiconvex in the other amount, so its minimum is found by ternary search and the
   * amounts at each rounded score level (an interval around it) by binary search.
   */
  function searchPair(j: number, k: number): void {
    // rows along the shorter grid; score() takes the partners in list order (j < k)
    const rowsOfJ = grids[j].length <= grids[k].length;
    const rowGrid = rowsOfJ ? grids[j] : grids[k];
    const col = rowsOfJ ? grids[k] : grids[j];
    const n = col.length;
    let p = 0; // the previous row's best index: the best amount moves little from row to row
    for (const r of rowGrid) {
      const f = rowsOfJ ? (i: number) => score(j, r, k, col[i]) : (i: number) => score(j, col[i], k, r);
      const level = (i: number) => reportedOf(f(i), 2);
      // the minimum of a quasiconvex row, from the previous row's: bracket it by galloping
      // downhill, then ternary search (equal values at two points bracket a minimum between them)
      let lo = p;
      let hi = p;
      const fp = f(p);
      if (p + 1 < n && f(p + 1) < fp) [lo, hi] = gallop(f, p + 1, 1, n);
      else if (p > 0 && f(p - 1) < fp) [lo, hi] = gallop(f, p - 1, -1, n);
      while (hi - lo > 2) {
        const third = Math.floor((hi - lo) / 3);
        const m1 = lo + third;
        const m2 = hi - third;
        const f1 = f(m1);
        const f2 = f(m2);
        if (f1 < f2) hi = m2 - 1;
        else if (f1 > f2) lo = m1 + 1;
        else {
          lo = m1;
          hi = m2;
        }
      }
      let i0 = lo;
      let v0 = f(lo);
      for (let i = lo + 1; i <= hi; i++) {
        const v = f(i);
        if (v < v0) {
          v0 = v;
          i0 = i;
        }
      }
      p = i0;
      let lvl = reportedOf(v0, 2);
      if (full() && lvl > cutoff) continue;
      // walk the levels upward: the points at or below a level are an interval [l, u] around i0;
      // within a level the smaller amount ranks first, and at most `top` points of a row can be kept
      let l = i0;
      let u = i0;
      let L = i0 + 1; // the interval already taken is [L, U] (empty at first)
      let U = i0;
      let taken = 0;
      for (;;) {
        // leftmost index ≤ l with level ≤ lvl, rightmost ≥ u (levels fall towards i0; l and u are at or below it)
        l = levelEdge(level, l, lvl, -1, n);
        u = levelEdge(level, u, lvl, 1, n);
        // the new points, smaller amounts first: [l, L-1], then [U+1, u]
        const cap = top - taken;
        const left = Math.min(L - l, cap);
        for (let i = l; i < l + left; i++) emit(i);
        const right = Math.min(u - U, cap - left);
        for (let i = U + 1; i <= U + right; i++) emit(i);
        taken += left + right;
        if (taken >= top) break;
        L = l;
        U = u;
        const next = Math.min(l > 0 ? level(l - 1) : Infinity, u < n - 1 ? level(u + 1) : Infinity);
        if (next === Infinity || (full() && next > cutoff)) break;
        lvl = next;
      }
      function emit(i: number): void {
        if (rowsOfJ) consider(j, r, k, col[i], 2);
        else consider(j, col[i], k, r, 2);
      }
    }
  }
}

/**
 * From a point `from` where a quasiconvex f falls (going `dir`), the bracket [lo, hi] of its
 * minimum: steps double while f keeps falling.
 */
function gallop(f: (i: number) => number, from: number, dir: 1 | -1, n: number): [number, number] {
  // every minimum lies beyond the point before `from`; `b` is the lowest point seen
  let safe = from; // the minimum is at or beyond this index (in the direction)
  let b = from;
  let fb = f(b);
  for (let s = 1; ; s *= 2) {
    const q = dir > 0 ? Math.min(n - 1, b + s) : Math.max(0, b - s);
    if (q === b) return ordered(safe, b);
    const fq = f(q);
    if (fq > fb) return ordered(safe, q - dir); // the minimum is before q
    if (fq === fb) return ordered(b, q); // a minimum lies between equal values
    safe = b + dir; // f fell past b: the minimum is beyond it
    b = q;
    fb = fq;
  }
}

const ordered = (a: number, b: number): [number, number] => (a <= b ? [a, b] : [b, a]);

/**
 * The farthest index from `from` (going `dir`) whose level is at most `lvl`, given that the levels
 * rise (not strictly) going `dir` and `from` is at most `lvl`: gallop, then binary search.
 */
function levelEdge(level: (i: number) => number, from: number, lvl: number, dir: 1 | -1, n: number): number {
  let inside = from;
  let s = 1;
  let outside = -1;
  for (;;) {
    const q = from + dir * s;
    if (q < 0 || q > n - 1) {
      const end = dir > 0 ? n - 1 : 0;
      if (end === inside) return inside;
      if (level(end) <= lvl) return end;
      outside = end;
      break;
    }
    if (level(q) <= lvl) {
      inside = q;
      s *= 2;
    } else {
      outside = q;
      break;
    }
  }
  // inside ≤ lvl, outside > lvl: the edge lies between
  while (Math.abs(outside - inside) > 1) {
    const m = (inside + outside) >> 1;
    if (level(m) <= lvl) inside = m;
    else outside = m;
  }
  return inside;
}

/**
 * The continuous amount of one partner that best fits (least squares), searched on [0, max].
 *
 * @example
 * const base = { masses: [120.11, 10.08], total: 130.19 }
 * const water = { masses: [0, 2.016], total: 18.015 }
 * continuousAmount([86.29, 7.97], base, water, 2).toFixed(1) // '0.5'
 */
export function continuousAmount(found: number[], base: MassVector, partner: MassVector, max: number): number {
  const ss = (x: number) => {
    const total = base.total + x * partner.total;
    let s = 0;
    for (let i = 0; i < found.length; i++) {
      const d = found[i] - (100 * (base.masses[i] + x * partner.masses[i])) / total;
      s += d * d;
    }
    return s;
  };
  const samples = 400;
  let bestX = 0;
  let bestV = ss(0);
  for (let k = 1; k <= samples; k++) {
    const x = (max * k) / samples;
    const v = ss(x);
    if (v < bestV) {
      bestV = v;
      bestX = x;
    }
  }
  // golden-section refinement around the best sample
  let lo = Math.max(0, bestX - max / samples);
  let hi = Math.min(max, bestX + max / samples);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let it = 0; it < 60; it++) {
    const a = hi - g * (hi - lo);
    const b = lo + g * (hi - lo);
    if (ss(a) < ss(b)) hi = b;
    else lo = a;
  }
  return (lo + hi) / 2;
}
