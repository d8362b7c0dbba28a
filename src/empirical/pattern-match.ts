/**
 * How well a measured isotope pattern matches a candidate's calculated one (Kind & Fiehn 2007,
 * rule 3, isotope pattern filter). The measured peaks are placed on the candidate's nominal-mass
 * grid by their distance from its monoisotopic m/z (shift = round((m/z − monoisotopic m/z) × |z|));
 * the calculated pattern is the aggregated one (one peak per nominal mass, as for `pattern`),
 * keeping the peaks of at least 1 % of the largest. Both are scaled to sum 1 over the union of
 * those bins, and the similarity is 1 − ½ Σ |measured − calculated| (one minus the total variation
 * distance): 1 for identical relative abundances, 0 for patterns with no peak in common.
 */
import { fail } from '../errors/pondus-error.js';
import { aggregatedDistribution, estimatedBins, MAX_BINS } from '../isotope-pattern/aggregated.js';
import { atomIsotopes } from '../isotope-pattern/isotope-table.js';

/** A measured peak: m/z and intensity (any scale). */
export interface MeasuredPeak {
  mz: number;
  intensity: number;
}

/** Most measured peaks accepted. */
export const MAX_PEAKS = 50;
/** Calculated peaks below this share of the largest are left out (too small to be measured; common practice). */
export const SMALLEST_PEAK = 0.01;

/**
 * Reads measured peaks written as m/z:intensity pairs: '203.0526:100 204.0560:6.9 205.0570:1.3'.
 *
 * @param text - m/z:intensity pairs separated by spaces, commas or semicolons, e.g. '203.0526:100 204.0560:6.9'.
 * @returns the peaks, sorted by m/z.
 * @throws PondusError: BAD_OPTION for text over 5000 characters, no peaks, too many, a piece not written m/z:intensity, an m/z not between 0 and 100000, a negative intensity, or all intensities zero; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readPeaks('203.0526:100, 204.0560:6.9').length // 2
 */
export function readPeaks(text: string): MeasuredPeak[] {
  if (text.length > 5000) throw fail({ code: 'BAD_OPTION', message: 'the measured pattern is longer than 5000 characters' });
  const parts = text.split(/[\s,;]+/).filter((x) => x);
  if (parts.length === 0) throw fail({ code: 'BAD_OPTION', message: "give the measured pattern as m/z:intensity pairs, e.g. '203.0526:100 204.0560:6.9'" });
  if (parts.length > MAX_PEAKS) throw fail({ code: 'BAD_OPTION', message: `at most ${MAX_PEAKS} measured peaks` });
  const peaks = parts.map((p) => {
    const m = /^([0-9]+(?:\.[0-9]+)?):([0-9]+(?:\.[0-9]+)?(?:[eE][-+]?[0-9]+)?)$/.exec(p);
    if (!m) throw fail({ code: 'BAD_OPTION', message: `'${p}' is not a peak written as m/z:intensity, such as 203.0526:100` });
    const mz = Number(m[1]);
    const intensity = Number(m[2]);
    if (!(mz > 0 && mz < 1e5) || !(intensity >= 0 && Number.isFinite(intensity))) throw fail({ code: 'BAD_OPTION', message: `'${p}': the m/z must be above 0 and the intensity not negative` });
    return { mz, intensity };
  });
  if (!peaks.some((p) => p.intensity > 0)) throw fail({ code: 'BAD_OPTION', message: 'every measured intensity is zero' });
  return peaks.sort((a, b) => a.mz - b.mz);
}

/**
 * The similarity (0–1) of measured peaks to the aggregated pattern of an ion's atoms, given the
 * ion's monoisotopic m/z and charge. Null when the pattern would be too large to compute.
 *
 * @param peaks - the measured peaks, as read by {@link readPeaks}.
 * @param atoms - the ion's atoms: counts by element symbol.
 * @param monoMz - the ion's monoisotopic m/z.
 * @param charge - the ion's charge (0 is read as 1).
 * @returns the similarity from 0 (no likeness) to 1 (the same pattern), or null when the pattern would be too large to compute.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * patternSimilarity(readPeaks('69.9377:100 71.9348:64 73.9318:10.2'), new Map([['Cl', 2]]), 69.9377, 1) > 0.99 // true
 */
export function patternSimilarity(peaks: readonly MeasuredPeak[], atoms: Map<string, number>, monoMz: number, charge: number): number | null {
  if (estimatedBins(atoms) > MAX_BINS) return null;
  const d = aggregatedDistribution(atoms);
  let mono = 0;
  for (const [key, n] of atoms) {
    const iso = atomIsotopes(key);
    mono += n * iso.massNumbers[iso.principal];
  }
  const z = Math.abs(charge) || 1;
  const calc = new Map<number, number>();
  let top = 0;
  for (let i = 0; i < d.p.length; i++) top = Math.max(top, d.p[i]);
  for (let i = 0; i < d.p.length; i++) if (d.p[i] >= SMALLEST_PEAK * top) calc.set(d.offset + i - mono, d.p[i]);
  const measured = new Map<number, number>();
  for (const p of peaks) {
    const shift = Math.round((p.mz - monoMz) * z);
    measured.set(shift, (measured.get(shift) ?? 0) + p.intensity);
  }
  const bins = new Set([...calc.keys(), ...measured.keys()]);
  let sc = 0;
  let sm = 0;
  for (const b of bins) {
    sc += calc.get(b) ?? 0;
    sm += measured.get(b) ?? 0;
  }
  let tv = 0;
  for (const b of bins) tv += Math.abs((measured.get(b) ?? 0) / sm - (calc.get(b) ?? 0) / sc);
  return 1 - tv / 2;
}
