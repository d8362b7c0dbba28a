import { keysFirst } from '../exact/json-row.js';
import { notesJson } from '../errors/note-json.js';
import type { AnalysisResult, Fit } from './check.js';
import { LazyTexts } from '../exact/lazy-texts.js';

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

/**
 * The texts of the hundredths from −100 to 100 (k/100 at index k + 10,000), each made on first
 * use: percents and deviations to two decimals are most of an analysis row's numbers, and a
 * table entry is found for far less than a double is written.
 */
const HUNDREDTHS = new LazyTexts(20_001);

/** A number as JSON.stringify writes it. */
function num(n: number): string {
  const k = Math.round(n * 100);
  // the same double as k/100: the same text
  if (k / 100 === n && k >= -10_000 && k <= 10_000) return HUNDREDTHS.get(k + 10_000) ?? HUNDREDTHS.keep(k + 10_000, String(n));
  return Number.isFinite(n) ? String(n) : 'null';
}

/** A record of numbers by element symbol (letters only: nothing to escape), as JSON.stringify writes it. */
function numbers(m: Record<string, number>): string {
  let s = '';
  for (const k in m) s += `${s ? ',' : ''}"${k}":${num(m[k])}`;
  return `{${s}}`;
}

/**
 * The JSON line of {@link analysisJson}, written directly: the same text as
 * `JSON.stringify(Object.assign(analysisJson(r), tail))`, without the objects in between.
 *
 * @param r - a result of {@link analysis}.
 * @param tail - JSON members written after the result's own, each with its leading comma (`,"rounding":"half-even"`); none by default.
 * @returns one line of JSON text, without a newline.
 * @example
 * analysisJsonLine(analysis('C6H6', 'C=92.26,H=7.74')) === JSON.stringify(analysisJson(analysis('C6H6', 'C=92.26,H=7.74'))) // true
 */
export function analysisJsonLine(r: AnalysisResult, tail = ''): string {
  const fits = r.fits.length === 0 ? '[]' : JSON.stringify(r.fits.map(fitJson));
  const continuous = r.continuous.length === 0 ? '[]' : JSON.stringify(r.continuous.map((c) => ({ formula: c.formula, written: c.written, name: c.name, amount: c.amount, maxDeviation: c.maxDeviation })));
  const notes = r.notes.length === 0 ? '[]' : JSON.stringify(notesJson(r.notes));
  return `{"input":${JSON.stringify(r.input)},"formula":${JSON.stringify(r.formula)},"reportFormula":${JSON.stringify(r.reportFormula)},"calculated":${numbers(r.calculated)},"found":${numbers(r.found)},"deviation":${numbers(r.deviation)},"maxDeviation":${num(r.maxDeviation)},"pass":${r.pass},"tolerance":${num(r.tolerance)},"reportLine":${JSON.stringify(r.reportLine)},"fits":${fits},"continuous":${continuous},"notes":${notes}${tail}}`;
}
