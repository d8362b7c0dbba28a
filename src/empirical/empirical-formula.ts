/**
 * Empirical and molecular formulas from measurements.
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { Decimal } from '../exact/decimal.js';
import { formulaMassDetail } from '../mass/formula-mass.js';
import { readMeasurements, type Measurements } from './measurements.js';
import { searchFormula, type FormulaFit } from './formula-search.js';

/** An empirical formula with more atoms than this gets a note: such a fit says more about the data's precision than about the compound. */
export const LARGE_EMPIRICAL = 60;

export interface EmpiricalOptions {
  /** Molar mass (g/mol) or a range '170-190', for the molecular formula. */
  molarMass?: string;
}

export interface EmpiricalResult {
  input: string;
  measurements: Measurements;
  /** The empirical formula, Hill order. */
  empirical: string;
  fit: FormulaFit;
  alternatives: FormulaFit[];
  /** Measured percents (normalised for masses) and their limits. */
  percents: Map<string, number>;
  limits: Map<string, number>;
  empiricalMass: Decimal;
  /** The molecular formula, when a molar mass was given and it is a near-whole multiple. */
  molecular: string | null;
  multiple: number | null;
  notes: Note[];
}

function multiply(f: FormulaFit, k: number): string {
  const m = new Map([...f.counts].map(([s, c]) => [s, c * k]));
  return formulaMassDetail([...m].map(([s, c]) => `${s}${c}`).join(''), { abbreviations: 'none' }).formula; // element symbols written by code
}

/**
 * The empirical formula of measurements, and the molecular formula for a molar mass.
 *
 * @example
 * empirical('C=40.00 H=6.71 O=53.29', { molarMass: '180.16' }).molecular // 'C6H12O6'
 */
export function empirical(input: string, options: EmpiricalOptions = {}): EmpiricalResult {
  const m = readMeasurements(input);
  const s = searchFormula(m);
  const empiricalMass = formulaMassDetail(s.best.formula, { abbreviations: 'none' }).molarMass; // a Hill formula: element symbols only
  const notes: Note[] = [];
  const d = m.difference;
  if (d) notes.push({ code: 'BY_DIFFERENCE', message: `${d.symbol} by difference: ${d.value.toFixed()}${m.kind === 'percent' ? ' %' : ' g'}` });
  notes.push(...(m.notes ?? []));
  let molecular: string | null = null;
  let multiple: number | null = null;
  if (options.molarMass !== undefined) {
    const range = /^\s*([0-9.]+)\s*(?:-|–|\.\.)\s*([0-9.]+)\s*$/.exec(options.molarMass);
    if (range) {
      const lo = new Decimal(range[1]);
      const hi = new Decimal(range[2]);
      const ks: number[] = [];
      for (let k = 1; k <= 200; k++) {
        const mk = empiricalMass.times(k);
        if (mk.gte(lo) && mk.lte(hi)) ks.push(k);
      }
      if (ks.length === 0) throw fail({ code: 'NO_FORMULA_FITS', message: `no whole multiple of ${s.best.formula} (${empiricalMass.toFixed(3)} g/mol) lies between ${lo.toFixed()} and ${hi.toFixed()} g/mol` }, input);
      if (ks.length > 1) notes.push({ code: 'SEVERAL_MULTIPLES', message: `several multiples fit the range: ${ks.map((k) => `×${k} (${multiply(s.best, k)})`).join(', ')}; the first is shown` });
      multiple = ks[0];
    } else {
      if (!/^\s*[0-9]+(\.[0-9]+)?\s*(g\/mol)?\s*$/.test(options.molarMass)) throw fail({ code: 'BAD_OPTION', message: `--molar-mass takes a number of g/mol or a range such as 170-190, not '${options.molarMass}'` });
      const M = new Decimal(options.molarMass.replace(/g\/mol/, '').trim());
      if (M.lte(0)) throw fail({ code: 'BAD_OPTION', message: 'the molar mass must be positive' });
      const n = M.div(empiricalMass);
      const k = Math.max(1, Math.round(n.toNumber()));
      const off = n.minus(k).abs().div(k);
      if (off.gt('0.05')) {
        notes.push({ code: 'NOT_A_MULTIPLE', message: `${M.toFixed()} g/mol is ${n.toFixed(2)} × ${empiricalMass.toFixed(3)} g/mol, not near a whole multiple: no molecular formula` });
      } else {
        multiple = k;
        if (off.gt('0.01')) notes.push({ code: 'ROUGH_MULTIPLE', message: `${M.toFixed()} g/mol is ${n.toFixed(3)} × the empirical formula mass; taken as ×${k}` });
      }
    }
    if (multiple !== null) molecular = multiply(s.best, multiple);
  }
  const atoms = [...s.best.counts.values()].reduce((a, b) => a + b, 0);
  if (atoms > LARGE_EMPIRICAL) {
    notes.push({ code: 'LARGE_FORMULA', message: `the smallest formula within the limits has ${atoms} atoms: the values are given more precisely than an analysis usually is (about ±0.3 points for combustion analysis, common practice), or the compound is not what the values suggest; check them, or search near a measured mass with the candidates command` });
  }
  return { input, measurements: m, empirical: s.best.formula, fit: s.best, alternatives: s.alternatives, percents: s.percents, limits: s.limits, empiricalMass, molecular, multiple, notes };
}

/** Non-throwing {@link empirical}. */
export function safeEmpirical(input: string, options: EmpiricalOptions = {}): SafeResult<EmpiricalResult> {
  return toSafe(() => empirical(input, options));
}

/** The stable JSON shape of an empirical result (contract keys `empirical`, `molecular`). */
export function empiricalJson(r: EmpiricalResult) {
  const obj = (m: Map<string, number>) => Object.fromEntries(m);
  return {
    input: r.input,
    empirical: r.empirical,
    molecular: r.molecular,
    multiple: r.multiple,
    empiricalMass: r.empiricalMass.toNumber(),
    percents: obj(r.percents),
    residuals: obj(r.fit.residuals),
    alternatives: r.alternatives.map((a) => ({ formula: a.formula, residuals: obj(a.residuals) })),
    notes: r.notes.map((n) => n.message),
    ...(r.measurements.conversions?.length
      ? { conversions: r.measurements.conversions.map((c) => ({ key: c.key, formula: c.formula, value: c.value.toNumber(), elements: Object.fromEntries(c.parts.map((p) => [p.symbol, p.value.toNumber()])) })) }
      : {}),
  };
}
