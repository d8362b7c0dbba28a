/**
 * The one serialiser of `pondus strength`: the JSON object of a strength in its forms, and the
 * texts the CLI's table and CSV show (the same digits as the JSON's displays).
 */
import { notesJson } from '../errors/note-json.js';
import type { Decimal } from '../exact/decimal.js';
import type { RoundingMode } from '../sigfig/round.js';
import { PHARMACY_CAUTION } from './caution.js';
import type { StrengthForms } from './ratio-strength.js';

function formText(value: Decimal): string {
  // the forms differ from the strength written by powers of ten: the same digits, the point moved;
  // only a repeating decimal (from a ratio such as 1:750) is cut, to 4 figures
  const long = value.toSignificantDigits(12);
  return long.eq(value) ? long.toFixed() : value.toSignificantDigits(4).toFixed();
}

/**
 * The ratio strength as shown: '1:1000'; a ratio that is not whole is cut to 4 figures.
 *
 * @param r - a result of `strengthForms`.
 * @returns the text '1:N'.
 * @example
 * strengthRatioText(strengthForms('0.1 %')) // '1:1000'
 */
export function strengthRatioText(r: StrengthForms): string {
  return `1:${r.ratio.isInteger() ? r.ratio.toFixed() : r.ratio.toSignificantDigits(4).toFixed()}`;
}

/**
 * Each form of a strength as shown: its unit, the value and the text.
 *
 * @param r - a result of `strengthForms`.
 * @returns one entry per form, in the order of the result.
 * @example
 * strengthFormsShown(strengthForms('0.1 %'))[1] // { unit: 'mg/mL', value: 1, display: '1 mg/mL' }
 */
export function strengthFormsShown(r: StrengthForms): { unit: string; value: number; display: string }[] {
  return r.forms.map((f) => ({ unit: f.unit, value: f.value.toNumber(), display: `${formText(f.value)} ${f.unit}` }));
}

/**
 * The JSON object `pondus strength --json` writes for one strength.
 *
 * @param r - a result of `strengthForms`.
 * @param input - the input text as given.
 * @param rounding - the rounding mode of the run (written in the row; the forms are exact).
 * @returns the row: kind, ratio, forms, rounding, notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a strength result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * strengthJson(strengthForms('1:1000 w/v'), '1:1000 w/v').ratio // '1:1000'
 */
export function strengthJson(r: StrengthForms, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  return { input, kind: r.kind, ratio: strengthRatioText(r), forms: strengthFormsShown(r), rounding, notes: notesJson(r.notes), caution: PHARMACY_CAUTION };
}
