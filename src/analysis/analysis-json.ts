import { keysFirst } from '../exact/json-row.js';
import { notesJson } from '../errors/note-json.js';
import type { AnalysisResult, Fit } from './check.js';

const fitJson = (f: Fit) => ({
  formula: f.formula,
  solvates: f.solvates.map((s) => ({ formula: s.formula, written: s.written, name: s.name, amount: s.amount })),
  maxDeviation: f.maxDeviation,
  pass: f.pass,
  calculated: { ...f.calculated },
  deviation: { ...f.deviation },
  reportLine: f.reportLine,
});

/**
 * The JSON object `pondus analysis --json` writes (contract keys: formula, calculated, found, deviation, pass, tolerance, fits).
 *
 * @param r - a result of {@link analysis}.
 * @param extra - keys written first, before the result's own (for example a row's id and line).
 * @returns the plain JSON object: input, formula, calculated, found, deviation, pass, tolerance, fits and notes.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * analysisJson(analysis('C6H6', 'C=92.26,H=7.74')).pass // true
 */
export function analysisJson(r: AnalysisResult, extra: Record<string, unknown> = {}) {
  return keysFirst(extra, {
    input: r.input,
    formula: r.formula,
    reportFormula: r.reportFormula,
    calculated: { ...r.calculated },
    found: { ...r.found },
    deviation: { ...r.deviation },
    maxDeviation: r.maxDeviation,
    pass: r.pass,
    tolerance: r.tolerance,
    reportLine: r.reportLine,
    fits: r.fits.map(fitJson),
    continuous: r.continuous.map((c) => ({ formula: c.formula, written: c.written, name: c.name, amount: c.amount, maxDeviation: c.maxDeviation })),
    notes: notesJson(r.notes),
  });
}
