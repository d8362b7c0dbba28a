/**
 * The aggregated isotope pattern: one peak per nominal mass, at the abundance-weighted mean
 * mass of the isotopologues it holds (its centroid). Each element's distribution is a
 * polynomial over nominal mass carrying, per term, the probability and the probability-weighted
 * mass; a formula's pattern is the product of its elements' polynomials raised to their counts,
 * by repeated squaring, with the negligible tails pruned after every product (Kubinyi, Anal.
 * Chim. Acta 247 (1991) 107; the centroids of aggregated isotopic peaks as in Rockwood, Van
 * Orden & Smith, Anal. Chem. 67 (1995) 2699, and Claesen et al., J. Am. Soc. Mass Spectrom. 23
 * (2012) 753). Carrying probability × mass through the products makes every centroid exact up to
 * the pruning, not an approximation.
 */
import { fail } from '../errors/pondus-error.js';
import { atomIsotopes, checkPatternAtoms } from './isotope-table.js';

/** A distribution over nominal masses: bin i is nominal mass `offset + i`. */
export interface NominalDistribution {
  offset: number;
  /** Probability of each bin. */
  p: Float64Array;
  /** Probability × centroid mass of each bin (u). */
  pm: Float64Array;
}

/** Bins with a probability below this are pruned from the ends after each product. */
export const PRUNE_BELOW = 1e-16;
/** Most nominal-mass bins a pattern may span (the bound on time and memory). */
export const MAX_BINS = 1200;

/**
 * Multiplies two distributions (the pattern of two parts together).
 *
 * @example
 * convolve(elementDistribution('Cl'), elementDistribution('Cl')).p.length // 5 (masses 70 to 74)
 */
export function convolve(a: NominalDistribution, b: NominalDistribution): NominalDistribution {
  const n = a.p.length + b.p.length - 1;
  const p = new Float64Array(n);
  const pm = new Float64Array(n);
  for (let i = 0; i < a.p.length; i++) {
    const ap = a.p[i];
    if (ap === 0) continue;
    const apm = a.pm[i];
    for (let j = 0; j < b.p.length; j++) {
      const bp = b.p[j];
      p[i + j] += ap * bp;
      pm[i + j] += apm * bp + ap * b.pm[j];
    }
  }
  return prune({ offset: a.offset + b.offset, p, pm });
}

function prune(d: NominalDistribution): NominalDistribution {
  let lo = 0;
  let hi = d.p.length - 1;
  while (lo < hi && d.p[lo] < PRUNE_BELOW) lo++;
  while (hi > lo && d.p[hi] < PRUNE_BELOW) hi--;
  if (lo === 0 && hi === d.p.length - 1) return d;
  return { offset: d.offset + lo, p: d.p.slice(lo, hi + 1), pm: d.pm.slice(lo, hi + 1) };
}

/**
 * The distribution of one atom of a kind ('C', '13C').
 *
 * @example
 * elementDistribution('Br').offset // 79
 */
export function elementDistribution(key: string): NominalDistribution {
  const iso = atomIsotopes(key);
  const offset = iso.massNumbers[0];
  const n = iso.massNumbers[iso.massNumbers.length - 1] - offset + 1;
  const p = new Float64Array(n);
  const pm = new Float64Array(n);
  iso.massNumbers.forEach((a, i) => {
    p[a - offset] += iso.fractions[i];
    pm[a - offset] += iso.fractions[i] * iso.masses[i];
  });
  return { offset, p, pm };
}

/**
 * A distribution raised to a whole power (n atoms of one kind), by repeated squaring.
 *
 * @example
 * power(elementDistribution('Cl'), 2).p.length // 5
 */
export function power(d: NominalDistribution, n: number): NominalDistribution {
  let result: NominalDistribution | null = null;
  let base = d;
  let k = n;
  while (k > 0) {
    if (k & 1) result = result ? convolve(result, base) : base;
    k = Math.floor(k / 2);
    if (k > 0) base = convolve(base, base);
  }
  return result ?? { offset: 0, p: Float64Array.of(1), pm: Float64Array.of(0) };
}

/**
 * The number of nominal-mass bins a pattern will span, estimated before computing it: eight
 * standard deviations each side of the mean (from each element's isotope variance) plus the
 * widest single-atom spread.
 *
 * @example
 * estimatedBins(new Map([['C', 60]])) // 15
 */
export function estimatedBins(atoms: Map<string, number>): number {
  let variance = 0;
  let spread = 0;
  for (const [key, n] of atoms) {
    const iso = atomIsotopes(key);
    let mean = 0;
    let sq = 0;
    iso.massNumbers.forEach((a, i) => {
      mean += iso.fractions[i] * a;
      sq += iso.fractions[i] * a * a;
    });
    variance += n * Math.max(0, sq - mean * mean);
    spread = Math.max(spread, iso.massNumbers[iso.massNumbers.length - 1] - iso.massNumbers[0]);
  }
  return Math.ceil(16 * Math.sqrt(variance)) + spread + 1;
}

/**
 * The aggregated distribution of a set of atoms (whole counts). Refuses with an estimate when
 * the pattern would span more than {@link MAX_BINS} nominal masses.
 *
 * @param atoms - the atoms: whole counts by atom key ('Cl', '37Cl').
 * @param input - the text to name in an error.
 * @returns the probability of each nominal mass from the lightest (offset), and each one's probability × centroid mass.
 * @throws PondusError: PATTERN_TOO_LARGE with an estimate when the pattern would span more than {@link MAX_BINS} nominal masses; BAD_ARGUMENT for a key that is not an atom key with isotope data, a count that is not a whole number ≥ 0, or an argument of the wrong kind.
 * @example
 * aggregatedDistribution(new Map([['Cl', 2]])).p[0] // 0.574… (35Cl2)
 */
export function aggregatedDistribution(atoms: Map<string, number>, input?: string): NominalDistribution {
  checkPatternAtoms(atoms);
  const bins = estimatedBins(atoms);
  if (bins > MAX_BINS) {
    throw fail({ code: 'PATTERN_TOO_LARGE', message: `the isotope pattern would span about ${bins} nominal masses; pondus computes patterns of up to ${MAX_BINS} (formulas up to a few hundred thousand atoms)` }, input);
  }
  let d: NominalDistribution | null = null;
  for (const [key, n] of atoms) {
    if (n === 0) continue;
    const e = power(elementDistribution(key), n);
    d = d ? convolve(d, e) : e;
  }
  return d ?? { offset: 0, p: Float64Array.of(1), pm: Float64Array.of(0) };
}
