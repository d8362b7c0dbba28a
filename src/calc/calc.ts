/**
 * The calculator: an expression of measured quantities, units and formula
 * masses in, the reported figure out.
 */
import { notesJson } from '../errors/note-json.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { Decimal } from '../exact/decimal.js';
import { toSafe, type SafeResult } from '../errors/pondus-error.js';
import { formatWithUncertainty } from '../mass/uncertainty.js';
import { standardUncertainty } from '../sigfig/quantity.js';
import { displayQuantity, reportUnit } from '../sigfig/display-quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import type { Note } from '../errors/issue.js';
import { evaluate, type CalcStep } from './evaluate.js';
import { parseExpression } from './parse-expression.js';
import { inUnitOf, pow10 } from '../sigfig/units.js';
import { jsonString, notesLine } from '../mass/mass-json.js';
import { decimalToNumber } from './to-number.js';

const NO_STEPS = { steps: false };

/** The largest and smallest sizes of a result pondus reports. */
const MAX_RESULT = new Decimal('1e300');
const MIN_RESULT = new Decimal('1e-300');

export interface CalcOptions {
  /** Rounding for the reported figure: half-to-even (default; ASTM E29, ISO 80000-1 Annex B rule A) or half-up. */
  rounding?: RoundingMode;
  /** Write down the steps (default true); false leaves `steps` empty, for a batch that does not show them. */
  steps?: boolean;
}

export interface CalcResult {
  input: string;
  /** The value in the reported unit, unrounded (guard digits kept). */
  value: Decimal;
  /** The reported value, rounded once. */
  rounded: Decimal;
  /** The reported figure then the unit: '10.9 g', '2.4 × 10³ mg'. */
  display: string;
  /**
   * Significant figures of the reported figure, counted on the rounded value:
   * null for an exact result (or one given with ± uncertainty); 0 when a
   * measured result rounds to zero (`10.0 g - 9.95 g`), which is below the
   * precision of the data — a note then says so.
   */
  sigFigs: number | null;
  /** Unit symbol ('' for a pure number). */
  unit: string;
  /** Standard uncertainty in the reported unit, when inputs were written with ±. */
  uncertainty: Decimal | null;
  steps: CalcStep[];
  /** Remarks on how the expression was read (exact numbers, trailing zeros, ratios, formula readings). */
  notes: Note[];
}

const SUPERSCRIPT: Readonly<Record<string, string>> = { '2': '²', '3': '³', '-': '⁻' };

/**
 * The unit asked for after `to`, in the spelling asked: '5 mL to cm3' is 5 cm³, not 5 mL (the
 * two are one unit; a power is written as a superscript).
 */
function spelledAsAsked(unit: ReturnType<typeof reportUnit>, asked: string | undefined): ReturnType<typeof reportUnit> {
  if (!unit || asked === undefined) return unit;
  const spelled = asked.trim().replace(/([a-zA-Zµμ])(-?)([23])(?![0-9])/g, (_m, l: string, minus: string, d: string) => l + (minus ? SUPERSCRIPT['-'] : '') + SUPERSCRIPT[d]);
  return spelled === unit.symbol ? unit : { ...unit, symbol: spelled };
}

/**
 * Evaluates a calculation with significant figures, units and formula masses.
 *
 * @param input - the calculation ('8.80 g + 2.1 g', '0.100 M * 250.0 mL * M(NaCl) to g').
 * @param options - how the result is rounded (`rounding`).
 * @returns the value, the rounded value, the display text, its significant figures, the unit, the uncertainty when inputs carry ±, the steps and the notes.
 * @throws PondusError: the codes of parseExpression (BAD_EXPRESSION, UNKNOWN_UNIT, UNCLOSED_GROUP, …); the codes of parseFormula inside M(…) (UNKNOWN_ELEMENT, …); INCOMPATIBLE_UNITS for a sum of different dimensions or a `to` unit of another; DIVISION_BY_ZERO; BAD_NUMBER for a negative uncertainty; NUMBER_OUT_OF_RANGE for a number outside 1e-100 to 1e100 or a result beyond 1e±300; BAD_ARGUMENT when `input` is not a string or `options` not an object or names an unknown rounding mode.
 * @example
 * calc('8.80 g + 2.1 g').display                          // '10.9 g'
 * calc('0.100 M * 250.0 mL * M(CuSO4·5H2O) to g').display  // '6.24 g'
 * calc('8.80 ± 0.05 g + 2.10 ± 0.05 g').display            // '10.900 ± 0.071 g'
 */
export function calc(input: string, options: CalcOptions = {}): CalcResult {
  const tree = parseExpression(input);
  const ev = evaluate(tree, options.steps === false ? NO_STEPS : {});
  const q = ev.result;
  // only a value with its leading digit at 10^300 or beyond (or below 10^-300) can be out of range
  if (!q.value.isZero() && (q.value.e >= 300 || q.value.e < -300) && (q.value.abs().gt(MAX_RESULT) || q.value.abs().lt(MIN_RESULT))) {
    throw fail(typedIssue({ code: 'NUMBER_OUT_OF_RANGE', value: q.value.toSignificantDigits(3).toExponential(), exponentLimit: 300, reading: 'result', what: null }), input);
  }
  const unit = spelledAsAsked(reportUnit(q, tree.target ? tree.target.unit : null), tree.target?.unit);
  const shown = displayQuantity(q, unit, options.rounding);
  const uncertainty = ev.inputs.size > 0 ? inUnitOf(standardUncertainty(q, ev.inputs), unit) : null;
  const value = shown.value;
  const unitText = shown.unit;
  let display = shown.text;
  let rounded = shown.rounded;
  let sigFigs = shown.sigFigs;
  if (uncertainty) {
    const figure = formatWithUncertainty(value, uncertainty);
    display = unitText ? `${figure} ${unitText}` : figure;
    rounded = new Decimal(figure.split(' ± ')[0]);
    sigFigs = null;
  }
  const notes = [...ev.notes];
  if (shown.belowPrecision && !uncertainty) {
    const top = tree.expr.kind === 'binary' ? tree.expr.op : null;
    notes.push({ code: 'BELOW_PRECISION', message: belowPrecisionNote(value, shown.lsd ?? 0, unitText, top === '-' ? 'the difference' : top === '+' ? 'the sum' : 'the result') });
  }
  return { input, value, rounded, display, sigFigs, unit: unitText, uncertainty, steps: ev.steps, notes };
}

/**
 * The note for a measured result that rounds to zero: no significant figure is left.
 *
 * @example
 * belowPrecisionNote(new Decimal('0.05'), -1, 'g')
 * // 'the result (0.05 g unrounded) is below the precision of the data (its last significant digit is at 0.1 g): it rounds to zero and has no significant figures'
 */
export function belowPrecisionNote(value: Decimal, lsd: number, unit: string, what = 'the result'): string {
  const u = unit ? ` ${unit}` : '';
  return `${what} (${value.toFixed()}${u} unrounded) is below the precision of the data (its last significant digit is at ${pow10(lsd).toFixed()}${u}): it rounds to zero and has no significant figures`;
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
  /** Always present; empty when there is nothing to say. */
  notes: { code: string; message: string }[];
}

/**
 * The JSON object `pondus calc --json` writes.
 *
 * @param r - a calculator result (from calc).
 * @returns `{ input, value, rounded, display, sigFigs, unit, uncertainty?, notes }`.
 * @throws PondusError: NUMBER_OUT_OF_RANGE when a value cannot be written as a finite number (never for a result of calc); BAD_ARGUMENT when `r` is not a calculator result.
 * @example
 * calcJson(calc('8.80 g + 2.1 g')) // { input: '8.80 g + 2.1 g', value: 10.9, rounded: 10.9, display: '10.9 g', sigFigs: 3, unit: 'g', notes: [] }
 */
export function calcJson(r: CalcResult): CalcJson {
  const notes = notesJson(r.notes);
  const value = finite(decimalToNumber(r.value));
  const rounded = finite(decimalToNumber(r.rounded));
  // object literals, not a spread with fields after it (which V8 builds slowly)
  if (r.uncertainty) return { input: r.input, value, rounded, display: r.display, sigFigs: r.sigFigs, unit: r.unit, uncertainty: finite(decimalToNumber(r.uncertainty)), notes };
  return { input: r.input, value, rounded, display: r.display, sigFigs: r.sigFigs, unit: r.unit, notes };
}

/**
 * The JSON text of {@link calcJson}'s object, written directly (the same text as
 * `JSON.stringify(calcJson(r))`), with the line number first when one is given.
 *
 * @param r - a calculator result (from calc).
 * @param line - the input's line number, written first as `"line"` (for a batch row), or none.
 * @returns one JSON object, without a line end.
 * @throws PondusError: NUMBER_OUT_OF_RANGE when a value cannot be written as a finite number (never for a result of calc).
 * @example
 * calcJsonLine(calc('8.80 g + 2.1 g')) // '{"input":"8.80 g + 2.1 g","value":10.9,"rounded":10.9,"display":"10.9 g","sigFigs":3,"unit":"g","notes":[]}'
 */
export function calcJsonLine(r: CalcResult, line?: number): string {
  const value = finite(decimalToNumber(r.value));
  const rounded = finite(decimalToNumber(r.rounded));
  const uncertainty = r.uncertainty ? `,"uncertainty":${finite(decimalToNumber(r.uncertainty))}` : '';
  return `${line === undefined ? '{"input":' : `{"line":${line},"input":`}${jsonString(r.input)},"value":${value},"rounded":${rounded},"display":${jsonString(r.display)},"sigFigs":${r.sigFigs},"unit":${jsonString(r.unit)}${uncertainty},"notes":${notesLine(r.notes)}}`;
}

/** A number JSON can carry: calc refuses results beyond 1e±300, so this never fails on its own results. */
function finite(x: number): number {
  if (!Number.isFinite(x)) throw fail({ code: 'NUMBER_OUT_OF_RANGE', message: 'the result cannot be written as a finite number' });
  return x;
}
