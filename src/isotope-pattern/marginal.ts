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

/** Pass as the threshold to get the most probable configuration alone. */
export const MODE_ONLY = -1;

/** Most configurations one element may contribute (the bound on time and memory). */
export const MAX_MARGINAL = 400_000;

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
  const seen = new Set<string>();
  const found: { lp: number; c: number[] }[] = [];
  const stack: number[][] = [mode];
  seen.add(mode.join(','));
  while (stack.length > 0) {
    const c = stack.pop()!;
    const lp = logProb(c);
    if (lp < logT) continue;
    found.push({ lp, c });
    if (found.length > MAX_MARGINAL) {
      throw fail({ code: 'PATTERN_TOO_LARGE', message: `${n} ${key} atoms alone have more than ${MAX_MARGINAL.toLocaleString('en-US')} isotope combinations at this coverage; ask for a lower --coverage or the aggregated pattern` }, input);
    }
    for (let i = 0; i < k; i++) {
      if (c[i] === 0) continue;
      for (let j = 0; j < k; j++) {
        if (i === j) continue;
        const next = c.slice();
        next[i]--;
        next[j]++;
        const id = next.join(',');
        if (seen.has(id)) continue;
        seen.add(id);
        stack.push(next);
      }
    }
  }
  found.sort((a, b) => b.lp - a.lp);
  const probs = new Float64Array(found.length);
  const masses = new Float64Array(found.length);
  const counts = new Int32Array(found.length * k);
  found.forEach((f, idx) => {
    probs[idx] = Math.exp(f.lp);
    let m = 0;
    for (let i = 0; i < k; i++) {
      m += f.c[i] * iso.masses[i];
      counts[idx * k + i] = f.c[i];
    }
    masses[idx] = m;
  });
  return { key, k, probs, masses, counts, threshold };
}
