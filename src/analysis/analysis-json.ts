import type { AnalysisResult, Fit } from './check.js';

const obj = (m: Map<string, { toNumber(): number }>) => Object.fromEntries([...m].map(([k, v]) => [k, v.toNumber()]));

const fitJson = (f: Fit) => ({
  formula: f.formula,
  solvates: f.solvates.map((s) => ({ formula: s.formula, name: s.name, amount: s.amount.toNumber() })),
  maxDeviation: f.maxDeviation.toNumber(),
  pass: f.pass,
  calculated: obj(f.calculated),
  reportLine: f.reportLine,
});

/**
 * The JSON object `pondus analysis --json` writes (contract keys: formula, calculated, found, deviation, pass, tolerance, fits).
 *
 * @example
 * analysisJson(analysis('C6H6', 'C=92.26,H=7.74')).pass // true
 */
export function analysisJson(r: AnalysisResult, extra: Record<string, unknown> = {}) {
  return {
    ...extra,
    input: r.input,
    formula: r.formula,
    calculated: obj(r.calculated),
    found: obj(r.found),
    deviation: obj(r.deviation),
    maxDeviation: r.maxDeviation.toNumber(),
    pass: r.pass,
    tolerance: r.tolerance.toNumber(),
    reportLine: r.reportLine,
    fits: r.fits.map(fitJson),
    continuous: r.continuous.map((c) => ({ formula: c.formula, name: c.name, amount: c.amount.toNumber(), maxDeviation: c.maxDeviation.toNumber() })),
  };
}
