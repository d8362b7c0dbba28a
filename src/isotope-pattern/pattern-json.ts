import { keysFirst } from '../exact/json-row.js';
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { Decimal } from '../exact/decimal.js';
import type { PatternResult } from './pattern.js';

/** The JSON shape of an isotope pattern (`pondus pattern --json`). */
export type PatternJson = Omit<PatternResult, 'peaks' | 'allPeaks' | 'notes'> & {
  peaks: { mz: number; abundance: number; relative: number; shift: number; label?: string; isotopologues?: number }[];
  notes: NoteJson[];
};

/**
 * The JSON object `pondus pattern --json` writes: the listed peaks by m/z, with their share of
 * all molecules (`abundance`) and their percentage of the largest (`relative`).
 *
 * @param r - a result of {@link isotopePattern}.
 * @param extra - keys written first, before the result's own (for example a row's id and line).
 * @returns the plain JSON object: the listed peaks by m/z with their abundance and relative height, and the pattern's settings and notes.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * patternJson(isotopePattern('Br2')).peaks[1].relative // 100
 */
export function patternJson(r: PatternResult, extra: Record<string, unknown> = {}): PatternJson & Record<string, unknown> {
  return keysFirst(extra, {
    input: r.input,
    formula: r.formula,
    ion: r.ion,
    speciesFormula: r.speciesFormula,
    charge: r.charge,
    kind: r.kind,
    resolvingPower: r.resolvingPower,
    coverage: r.coverage,
    monoisotopicMz: r.monoisotopicMz,
    monoisotopicMzExact: new Decimal(r.monoisotopicMzExact).toDecimalPlaces(15).toFixed(),
    averageMz: r.averageMz,
    isotopeAverageMz: r.isotopeAverageMz,
    minRelative: r.minRelative,
    peaks: r.peaks.map((p) => {
      const o: PatternJson['peaks'][number] = { mz: p.mz, abundance: p.abundance, relative: p.relative, shift: p.shift };
      if (p.label !== null) o.label = p.label;
      if (p.isotopologues !== null) o.isotopologues = p.isotopologues;
      return o;
    }),
    notes: notesJson(r.notes),
  });
}
