/**
 * The isotope configurations of one element's n atoms (how many of each isotope), each with its
 * multinomial probability, down to a probability threshold. The configurations above a
 * threshold form a connected set around the most probable one (the multinomial is log-concave),
 * so they are found by walking outwards from the mode, moving one atom between two isotopes at
 * a time (Łącki, Startek, Valkenborg & Gambin, Anal. Chem. 89 (2017) 3272, the marginal
 * distributions of IsoSpec).
 */
import { fail } from '../errors/pondus-error.js';
import { atomIsotopes } from './isotope-table.js';
import { logFactorial } from './log-factorial.js';

/** One element's configurations, most probable first. */
export interface Marginal {
  key: string;
  /** Number of isotopes. */
  k: number;
  /** Probabilities, descending. */
  probs: Float64Array;
  masses: Float64Array;
  /** counts[c * k + i]: atoms of isotope i in configuration c. */
  counts: Int32Array;
  /** The threshold the set was built to. */
  threshold: number;
}

/** Most configurations looked at for one element (those found and their neighbours). */
const MAX_SEEN = 150_000;

/** Pass as the threshold to get the most probable configuration alone. */
export const MODE_ONLY = -1;

/** Most configurations one element may contribute (the bound on time and memory). */
export const MAX_MARGINAL = 30_000;

/**
 * The configurations of n atoms of a kind with probability at least `threshold`.
 *
 * @example
 * marginal('Cl', 2, 0).probs.length // 3 (35Cl2, 35Cl37Cl, 37Cl2)
 */
export function marginal(key: string, n: number, threshold: number, input?: string): Marginal {
  const iso = atomIsotopes(key);
  const k = iso.fractions.length;
  const logp = iso.fractions.map(Math.log);
  const lfn = logFactorial(n);
  const logProb = (c: number[]) => {
    let s = lfn;
    for (let i = 0; i < k; i++) s += c[i] * logp[i] - logFactorial(c[i]);
    return s;
  };
  // the mode: start from n·p rounded, then climb
  const mode = iso.fractions.map((f) => Math.floor(n * f));
  let left = n - mode.reduce((a, b) => a + b, 0);
  for (let i = 0; left > 0; i = (i + 1) % k, left--) mode[i]++;
  let best = logProb(mode);
  for (let improved = true; improved; ) {
    improved = false;
    for (let i = 0; i < k; i++) {
      for (let j = 0; j < k; j++) {
        if (i === j || mode[i] === 0) continue;
        mode[i]--;
        mode[j]++;
        const lp = logProb(mode);
        if (lp > best + 1e-12) {
          best = lp;
          improved = true;
        } else {
          mode[i]++;
          mode[j]--;
        }
      }
    }
  }
  const logT = threshold === MODE_ONLY ? best - 1e-9 : threshold > 0 ? Math.log(threshold) : -Infinity;
  const estimate = estimatedCount(n, iso.fractions, best - logT);
  if (estimate > 4 * MAX_MARGINAL) {
    throw fail({ code: 'PATTERN_TOO_LARGE', message: `${n} ${key} atoms alone have about ${Number(estimate.toPrecision(2)).toLocaleString('en-US')} isotope combinations at this coverage (pondus keeps up to ${MAX_MARGINAL.toLocaleString('en-US')}); ask for a lower \`coverage\` or the aggregated pattern`, options: ['coverage'] }, input);
  }
  // walk outwards from the mode; configurations live in one flat pool, keyed by number when the
  // counts fit (n+1)^(k-1) < 2^53, by text otherwise; a move's log-probability change is cheap
  const numeric = Math.pow(n + 1, k - 1) < Number.MAX_SAFE_INTEGER;
  const keyOf = (c: Int32Array, off: number): number | string => {
    if (numeric) {
      let id = 0;
      for (let i = 0; i < k - 1; i++) id = id * (n + 1) + c[off + i];
      return id;
    }
    let id = '';
    for (let i = 0; i < k - 1; i++) id += c[off + i] + ',';
    return id;
  };
  let pool = new Int32Array(k * 1024);
  let lps = new Float64Array(1024);
  let size = 0;
  const add = (src: Int32Array, off: number, lp: number) => {
    if (size * k >= pool.length) {
      const p2 = new Int32Array(pool.length * 2);
      p2.set(pool);
      pool = p2;
      const l2 = new Float64Array(lps.length * 2);
      l2.set(lps);
      lps = l2;
    }
    for (let i = 0; i < k; i++) pool[size * k + i] = src[off + i];
    lps[size] = lp;
    return size++;
  };
  const seen = new Set<number | string>();
  const start0 = Int32Array.from(mode);
  add(start0, 0, best);
  seen.add(keyOf(start0, 0));
  const kept: number[] = [];
  const stack: number[] = [0];
  const scratch = new Int32Array(k);
  while (stack.length > 0) {
    const at = stack.pop()!;
    const lp = lps[at];
    if (lp < logT) continue;
    kept.push(at);
    if (kept.length > MAX_MARGINAL) {
      throw fail({ code: 'PATTERN_TOO_LARGE', message: `${n} ${key} atoms alone have more than ${MAX_MARGINAL.toLocaleString('en-US')} isotope combinations at this coverage; ask for a lower \`coverage\` or the aggregated pattern`, options: ['coverage'] }, input);
    }
    for (let i = 0; i < k; i++) {
      const ci = pool[at * k + i];
      if (ci === 0) continue;
      for (let j = 0; j < k; j++) {
        if (i === j) continue;
        for (let q = 0; q < k; q++) scratch[q] = pool[at * k + q];
        const cj = scratch[j];
        scratch[i]--;
        scratch[j]++;
        const id = keyOf(scratch, 0);
        if (seen.has(id)) continue;
        seen.add(id);
        if (seen.size > MAX_SEEN) {
          throw fail({ code: 'PATTERN_TOO_LARGE', message: `${n} ${key} atoms alone have more than ${MAX_MARGINAL.toLocaleString('en-US')} isotope combinations at this coverage; ask for a lower \`coverage\` or the aggregated pattern`, options: ['coverage'] }, input);
        }
        // ln P changes by ln(c_i) − ln(c_j + 1) + ln p_j − ln p_i
        const next = lp + Math.log(ci) - Math.log(cj + 1) + logp[j] - logp[i];
        stack.push(add(scratch, 0, next));
      }
    }
  }
  kept.sort((a, b) => lps[b] - lps[a]);
  const probs = new Float64Array(kept.length);
  const masses = new Float64Array(kept.length);
  const counts = new Int32Array(kept.length * k);
  kept.forEach((at, idx) => {
    probs[idx] = Math.exp(lps[at]);
    let m = 0;
    for (let i = 0; i < k; i++) {
      const c = pool[at * k + i];
      m += c * iso.masses[i];
      counts[idx * k + i] = c;
    }
    masses[idx] = m;
  });
  return { key, k, probs, masses, counts, threshold };
}

/**
 * About how many configurations of n atoms lie within `logRatio` (natural log) of the most
 * probable one: the lattice points inside the ellipsoid of the multinomial's normal
 * approximation, of dimension k − 1 and covariance determinant n^(k−1) Π p_i. Used only to
 * refuse early a set far too large to enumerate.
 *
 * @example
 * Math.round(estimatedCount(40, [0.5, 0.5], Math.log(1000))) // 24
 */
export function estimatedCount(n: number, fractions: number[], logRatio: number): number {
  const p = fractions.filter((f) => f > 0);
  const d = p.length - 1;
  if (d <= 0) return 1;
  if (!Number.isFinite(logRatio)) {
    // every configuration: C(n + d, d)
    let c = 1;
    for (let i = 1; i <= d; i++) c = (c * (n + i)) / i;
    return c;
  }
  const r = Math.sqrt(2 * Math.max(logRatio, 0));
  let logDet = d * Math.log(n);
  for (const f of p) logDet += Math.log(f);
  // volume of the d-ball: π^(d/2) r^d / Γ(d/2 + 1)
  const m = (d + 1) / 2; // for odd d, Γ(d/2 + 1) = Γ(m + ½) = (2m)! √π / (4^m m!)
  const logGamma = d % 2 === 0 ? lnFact(d / 2) : lnFact(2 * m) + 0.5 * Math.log(Math.PI) - m * Math.log(4) - lnFact(m);
  return Math.exp((d / 2) * Math.log(Math.PI) + d * Math.log(r || 1e-9) - logGamma + 0.5 * logDet);
}

function lnFact(m: number): number {
  let s = 0;
  for (let i = 2; i <= m; i++) s += Math.log(i);
  return s;
}
