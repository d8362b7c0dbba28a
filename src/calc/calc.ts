/**
 * The calculator: an expression of measured quantities, units and formula
 * masses in, the reported figure out.
 */
import { Decimal } from '../exact/decimal.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { formatWithUncertainty } from '../mass/uncertainty.js';
import { sigFigsOf } from '../sigfig/measured.js';
import { standardUncertainty } from '../sigfig/quantity.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import { baseUnitText, sameDims, unitOf, type Unit } from '../sigfig/units.js';
import { evaluate, type CalcStep } from './evaluate.js';
import { parseExpression } from './parse-expression.js';

export interface CalcOptions {
  /** Rounding for the reported figure: half-to-even (default; ASTM E29, ISO 80000-1 Annex B rule A) or half-up. */
  rounding?: RoundingMode;
}

export interface CalcResult {
  input: string;
  /** The value in the reported unit, unrounded (guard digits kept). */
  value: Decimal;
  /** The reported value, rounded once. */
  rounded: Decimal;
  /** The reported figure then the unit: '10.9 g', '2.4 × 10³ mg'. */
  display: string;
  /** Significant figures of the reported figure (null for an exact result). */
  sigFigs: number | null;
  /** Unit symbol ('' for a pure number). */
  unit: string;
  /** Standard uncertainty in the reported unit, when inputs were written with ±. */
  uncertainty: Decimal | null;
  steps: CalcStep[];
  notes: string[];
}

/**
 * Evaluates a calculation with significant figures, units and formula masses.
 *
 * @example
 * calc('8.80 g + 2.1 g').display                          // '10.9 g'
 * calc('0.100 M * 250.0 mL * M(CuSO4·5H2O) to g').display  // '6.24 g'
 * calc('8.80 ± 0.05 g + 2.10 ± 0.05 g').display            // '10.900 ± 0.071 g'
 */
export function calc(input: string, options: CalcOptions = {}): CalcResult {
  const tree = parseExpression(input);
  const ev = evaluate(tree);
  const q = ev.result;
  let unit: Unit | null = q.unit && sameDims(q.unit.dims, q.dims) ? q.unit : null;
  if (tree.target) {
    const t = unitOf(tree.target.unit);
    if (!sameDims(t.dims, q.dims)) {
      throw fail({ code: 'INCOMPATIBLE_UNITS', message: `the result is ${baseUnitText(q.dims) || 'a pure number'}, not convertible to ${t.symbol}` }, input);
    }
    unit = t;
  }
  if (!unit) {
    const base = baseUnitText(q.dims);
    unit = base === '' ? null : safeUnit(base);
  }
  const exp10 = unit ? unit.exp10 : 0;
  const scale = new Decimal(10).pow(exp10);
  const value = q.value.div(scale);
  const lsd = q.lsd === null ? null : q.lsd - exp10;
  const unitText = unit ? unit.symbol : baseUnitText(q.dims);
  const uncertainty = ev.inputs.size > 0 ? standardUncertainty(q, ev.inputs).div(scale) : null;
  let display: string;
  let rounded: Decimal;
  let sigFigs: number | null;
  if (uncertainty) {
    display = formatWithUncertainty(value, uncertainty);
    rounded = new Decimal(display.split(' ± ')[0]);
    sigFigs = null;
  } else {
    const d = displayMeasured({ value, lsd }, options.rounding);
    display = d.text;
    rounded = d.value;
    sigFigs = d.sigFigs;
  }
  if (unitText) display += ` ${unitText}`;
  if (lsd !== null && sigFigsOf({ value, lsd }) > 0 && sigFigs === null && !uncertainty) sigFigs = sigFigsOf({ value, lsd });
  return { input, value, rounded, display, sigFigs, unit: unitText, uncertainty, steps: ev.steps, notes: ev.notes };
}

function safeUnit(symbol: string): Unit | null {
  try {
    return unitOf(symbol);
  } catch {
    return null;
  }
}

/**
 * Non-throwing {@link calc}.
 *
 * @example
 * safeCalc('5 g + 2 mL').success // false (INCOMPATIBLE_UNITS)
 */
export function safeCalc(input: string, options: CalcOptions = {}): SafeResult<CalcResult> {
  return toSafe(() => calc(input, options));
}

/** The stable JSON shape of a calc result (the `calc --json` contract). */
export interface CalcJson {
  input: string;
  value: number;
  rounded: number;
  display: string;
  sigFigs: number | null;
  unit: string;
  uncertainty?: number;
  notes?: string[];
}

/**
 * The JSON object `pondus calc --json` writes.
 *
 * @example
 * calcJson(calc('8.80 g + 2.1 g')) // { input: '8.80 g + 2.1 g', value: 10.9, display: '10.9 g', sigFigs: 3, unit: 'g' }
 */
export function calcJson(r: CalcResult): CalcJson {
  const o: CalcJson = { input: r.input, value: r.value.toNumber(), rounded: r.rounded.toNumber(), display: r.display, sigFigs: r.sigFigs, unit: r.unit };
  if (r.uncertainty) o.uncertainty = r.uncertainty.toNumber();
  if (r.notes.length) o.notes = r.notes;
  return o;
}
