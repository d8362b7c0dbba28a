/**
 * Replicate results: mean, sample standard deviation (n − 1), relative
 * standard deviation, and the confidence interval of the mean with Student's t
 * (x̄ ± t·s/√n; Harvey, Analytical Chemistry 2.1, §4.4). The mean follows the
 * significant-figure rules of its sum; the reported value is rounded to fit
 * its uncertainty: the half-width of the interval to two significant figures
 * (GUM, JCGM 100:2008 §7.2.6: at most two) and the mean to the same decimal
 * place. No outlier test is offered: none is applied, and none is implied.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { measureAs } from '../calc/measure.js';
import { Decimal } from '../exact/decimal.js';
import { sqrtDecimal } from '../exact/sqrt.js';
import { dividedBy, exact, sumMeasured, type Measured } from '../sigfig/measured.js';
import type { Quantity } from '../sigfig/quantity.js';
import { roundToPosition, roundToSigFigs, type RoundingMode } from '../sigfig/round.js';
import { msd } from '../sigfig/measured.js';
import { tCritical } from './student-t.js';
import { inRange } from './read-quantity.js';

/** More values than this in one list is refused (a list is one set of replicates, not a data file). */
export const MAX_REPLICATES = 10_000;

export interface ReplicateOptions {
  /** Confidence level in percent: 95 (default), 90, 99, or any from 50 to 99.9. */
  level?: number;
  rounding?: RoundingMode;
}

export interface ReplicateResult {
  /** The values as read, in base units. */
  values: Quantity[];
  /** The unit the values were written in ('' for a pure number), used for reporting. */
  unit: string;
  /** Power of ten from the reporting unit to the base unit. */
  exp10: number;
  n: number;
  /** The mean with its precision from the sum rules. */
  mean: Measured;
  /** Sample standard deviation (n − 1), in the reporting unit. */
  sd: Decimal;
  /** s ÷ x̄ × 100. */
  rsdPercent: Decimal;
  level: number;
  df: number;
  t: number;
  /** t·s/√n, in the reporting unit. */
  halfWidth: Decimal;
  /** The half-width rounded to two significant figures. */
  halfWidthRounded: Decimal;
  /** The mean rounded to the decimal place of the rounded half-width. */
  meanRounded: Decimal;
  /** The reported value: 'x̄ ± h' with the unit. */
  reported: string;
  /** The reported mean as text. */
  meanReported: string;
  /** The reported half-width as text. */
  halfWidthReported: string;
  rounding: RoundingMode;
  notes: Note[];
}

/**
 * Splits a list of values ('99.2, 99.5, 99.1 %' or '3.080 g 3.094 g') into value texts, each with its unit if written.
 *
 * @param text - the list.
 * @param notes - where the note that one unit was applied to every value is added.
 * @returns the value texts, each with its unit.
 * @throws PondusError: BAD_NUMBER for a piece that is not a number, or a comma between digits ('99,2': a decimal comma, a thousands separator or two values); INPUT_TOO_LONG past {@link MAX_REPLICATES} values; BAD_MEASUREMENT when some values have a unit and some do not; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * splitValues('99.2, 99.5 99.1 %', []) // ['99.2 %', '99.5 %', '99.1 %']
 */
export function splitValues(text: string, notes: Note[]): string[] {
  refuseCommaInNumber(text);
  const tokens = text.trim().split(/[\s,;]+/).filter((t) => t !== '');
  const values: { num: string; unit: string | null }[] = [];
  for (const t of tokens) {
    if (/^[-+]?(\d|\.\d)/.test(t)) {
      const m = /^([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)(.*)$/.exec(t)!;
      values.push({ num: m[1], unit: m[2] === '' ? null : m[2] });
    } else if (values.length && values[values.length - 1].unit === null) {
      values[values.length - 1].unit = t;
    } else {
      // a word after a value was taken as its unit: name it, as it may be the slip ('99.2 abc %')
      const last = values[values.length - 1];
      const after = last ? ` (or a unit after one; '${last.unit}' was taken as the unit of ${last.num})` : '';
      throw fail({ code: 'BAD_NUMBER', message: `'${t}' is not a number${after}`, column: text.indexOf(t) + 1 }, text);
    }
  }
  if (values.length > MAX_REPLICATES) throw fail({ code: 'INPUT_TOO_LONG', message: `more than ${MAX_REPLICATES} values in one list` }, text);
  const withUnit = values.filter((v) => v.unit !== null);
  if (withUnit.length > 0 && withUnit.length < values.length) {
    const last = values[values.length - 1];
    if (withUnit.length === 1 && last.unit !== null) {
      notes.push({ code: 'UNIT_APPLIED_TO_ALL', message: `the unit written after the last value (${last.unit}) is taken for every value` });
      for (const v of values) v.unit = last.unit;
    } else {
      const units = [...new Set(withUnit.map((v) => v.unit))];
      const bare = values.filter((v) => v.unit === null).map((v) => v.num);
      const which = `${bare.join(', ')} ${bare.length === 1 ? 'has' : 'have'} no unit`;
      throw fail({
        code: 'BAD_MEASUREMENT',
        message: units.length > 1
          ? `the values are in different units (${units.join(', ')}) and ${which}: write each value in the one unit of the list`
          : `some values have a unit (${units[0]}) and ${which}: write the unit after each value, or once after the last`,
      }, text);
    }
  }
  return values.map((v) => (v.unit === null ? v.num : `${v.num} ${v.unit}`));
}

/**
 * A comma between two digits ('99,2', '1,234') is read neither way: it could be a decimal comma,
 * a thousands separator, or two values with no space between; the refusal offers each reading.
 */
function refuseCommaInNumber(text: string): void {
  for (const m of text.matchAll(/[0-9]+(?:\.[0-9]+)?(?:,[0-9]+(?:\.[0-9]+)?)+/g)) {
    const piece = m[0];
    const parts = piece.split(',');
    // '99.2,99.5' is two values: a comma is read two ways only between two parts with no point
    if (!parts.some((p, i) => i > 0 && !p.includes('.') && !parts[i - 1].includes('.'))) continue;
    const readings: string[] = [];
    if (parts.length === 2) readings.push(`for a decimal comma write ${parts.join('.')}`);
    if (/^[0-9]{1,3}(?:,[0-9]{3})+$/.test(piece)) readings.push(`for a thousands separator write ${parts.join('')}`);
    readings.push(`for separate values put a space after the comma (${parts.join(', ')})`);
    throw fail({ code: 'BAD_NUMBER', message: `'${piece}' has a comma between digits, which pondus reads neither way`, column: m.index + 1, length: piece.length, hint: readings.join('; ') }, text);
  }
}

/**
 * Statistics of a list of replicate results.
 *
 * @param text - the values, separated by spaces or commas, the unit after each or once after the last: '99.2 99.5 99.1 %'.
 * @param o - the confidence level in percent (default 95) and the rounding.
 * @returns n, mean, standard deviation, RSD, Student's t, the half-width of the confidence interval and the reported 'mean ± half-width' (the half-width to two figures, the mean to the same place).
 * @throws PondusError: BAD_NUMBER for a value that is not a number (with its column); BAD_MEASUREMENT for fewer than two values, units on some values only, an exact number or a zero mean; INPUT_TOO_LONG past {@link MAX_REPLICATES} values; BAD_OPTION for a confidence level outside 50–99.9 %; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = replicates('3.080 3.094 3.107 3.056 3.112 3.174 3.198 g')
 * r.reported // '3.117 ± 0.047 g'
 */
export function replicates(text: string, o: ReplicateOptions = {}): ReplicateResult {
  const notes: Note[] = [];
  const rounding = o.rounding ?? 'half-even';
  const level = o.level ?? 95;
  const texts = splitValues(text, notes);
  if (texts.length < 2) throw fail({ code: 'BAD_MEASUREMENT', message: `replicate statistics need at least two values; got ${texts.length}` }, text);
  const first = measureAs(texts[0], [[0, 0, 0], [1, 0, 0], [0, 1, 0], [0, 0, 1], [0, 1, -1], [1, 0, -1]], 'the first value', notes);
  const values = texts.map((t, i) => (i === 0 ? first : measureAs(t, [first.dims], `value ${i + 1}`, notes)));
  values.forEach((v, i) => inRange(v, texts[i], `value ${i + 1}`));
  for (const v of values) if (v.lsd === null) throw fail({ code: 'BAD_MEASUREMENT', message: 'replicate values are measurements; an exact number has no place here' }, text);
  const unit = first.unit?.symbol ?? '';
  const exp10 = first.unit?.exp10 ?? 0;
  const scale = new Decimal(10).pow(exp10);
  const n = values.length;
  const inUnit = values.map((v) => ({ value: v.value.div(scale), lsd: v.lsd === null ? null : v.lsd - exp10 }));
  const mean = dividedBy(sumMeasured(inUnit), exact(n));
  let ss = new Decimal(0);
  for (const v of inUnit) ss = ss.plus(v.value.minus(mean.value).pow(2));
  const sd = sqrtDecimal(ss.div(n - 1));
  if (mean.value.isZero()) throw fail({ code: 'BAD_MEASUREMENT', message: 'the mean is zero: a relative standard deviation has no meaning' }, text);
  const rsdPercent = sd.div(mean.value.abs()).times(100);
  const df = n - 1;
  const t = tCritical(level, df);
  const tD = new Decimal(t.toPrecision(15));
  const halfWidth = tD.times(sd).div(new Decimal(n).sqrt());
  notes.push({ code: 'STUDENT_T', message: `t = ${t.toFixed(3)} for ${df} degree${df === 1 ? '' : 's'} of freedom at ${level} % confidence (two-sided; computed from the incomplete beta function)` });
  let halfWidthRounded: Decimal;
  let meanRounded: Decimal;
  let decimals: number;
  if (halfWidth.isZero()) {
    halfWidthRounded = halfWidth;
    meanRounded = mean.value;
    decimals = Math.max(0, -(mean.lsd ?? 0));
    meanRounded = roundToPosition(mean.value, -decimals, rounding);
    notes.push({ code: 'NO_SPREAD', message: 'the values are all equal: the standard deviation is zero, and the interval says nothing about the method' });
  } else {
    halfWidthRounded = roundToSigFigs(halfWidth, 2, rounding);
    const pos = msd(halfWidthRounded) - 1;
    decimals = Math.max(0, -pos);
    meanRounded = roundToPosition(mean.value, pos, rounding);
    if (mean.lsd !== null && pos < mean.lsd) {
      const digit = (p: number) => `${new Decimal(10).pow(p).toFixed()}${unit ? ` ${unit}` : ''}`;
      notes.push({ code: 'INTERVAL_FINER_THAN_DATA', message: `the interval, at two significant figures, is written to ${digit(pos)}, finer than the mean's last significant digit (${digit(mean.lsd)}); the reported value keeps the digit the interval supports` });
    }
  }
  notes.push({ code: 'REPORTED_TO_UNCERTAINTY', message: `reported value: the half-width rounded ${rounding} to two significant figures (GUM §7.2.6), the mean to the same decimal place` });
  notes.push({ code: 'NO_OUTLIER_TEST', message: 'every value is used; no outlier test is applied' });
  const u = unit ? ` ${unit}` : '';
  const meanReported = meanRounded.toFixed(decimals);
  const halfWidthReported = halfWidthRounded.toFixed(decimals);
  const reported = `${meanReported} ± ${halfWidthReported}${u}`;
  return { values, unit, exp10, n, mean, sd, rsdPercent, level, df, t, halfWidth, halfWidthRounded, meanRounded, reported, meanReported, halfWidthReported, rounding, notes };
}
