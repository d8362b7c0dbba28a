import { notesJson } from '../errors/note-json.js';
import type { CandidateResult } from './candidates.js';

/**
 * The JSON object `pondus candidates --json` writes: the plain result, keys in a fixed order.
 *
 * @param r - a result of {@link candidateFormulas}.
 * @returns the plain JSON object, keys in a fixed order.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * candidatesJson(candidateFormulas({ mass: '180.06339', ppm: 3, elements: 'C0-20 H0-40 O0-10' })).candidates[0].formula // 'C6H12O6'
 */
export function candidatesJson(r: CandidateResult) {
  return {
    input: r.input,
    search: r.search,
    ion: r.ion,
    ratios: r.ratios,
    candidates: r.candidates.map((c) => ({
      formula: c.formula,
      hill: c.hill,
      counts: { ...c.counts },
      monoisotopicMass: c.monoisotopicMass,
      molarMass: c.molarMass,
      ionFormula: c.ionFormula,
      ionHill: c.ionHill,
      mz: c.mz,
      ppm: c.ppm,
      rdbe: c.rdbe,
      maxDeviation: c.maxDeviation,
      patternSimilarity: c.patternSimilarity,
      score: c.score,
    })),
    examined: r.examined,
    visited: r.visited,
    plausible: r.plausible,
    truncated: r.truncated,
    notes: notesJson(r.notes),
  };
}
