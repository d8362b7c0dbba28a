/**
 * A strength in each of the forms a label, a prescription or a pharmacopoeia
 * uses: % w/v, mg/mL, mg/dL and ratio strength 1:N for a solid in a liquid;
 * % w/w, mg/g, mg/kg and 1:N for a solid in a solid; % v/v and 1:N for a
 * liquid in a liquid. The forms differ by powers of ten except the ratio
 * (N = 1 ÷ fraction), so they keep the figures of the strength given.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, PURE } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { Decimal } from '../exact/decimal.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { PercentKind } from './strength.js';

export interface StrengthForms {
  kind: PercentKind;
  /** The strength as a fraction (w/w, v/v) or as g/L (w/v). */
  value: Quantity;
  /** N of the ratio strength 1:N (exact where the strength is). */
  ratio: Decimal;
  /** Each form: unit and value. */
  forms: { unit: string; value: Decimal }[];
  notes: Note[];
}

const W_V_UNITS: [string, number][] = [['% w/v', 1], ['mg/mL', 0], ['mg/dL', -2], ['g/L', 0]];
const W_W_UNITS: [string, number][] = [['% w/w', -2], ['mg/g', -3], ['mg/kg', -6]];

/**
 * A strength in all its forms.
 *
 * @param text - a strength: '1:1000', '0.02 % w/v', '12 mg/dL'.
 * @returns its kind (w/v, w/w, v/v), the ratio 1:N and each form.
 * @throws PondusError: BAD_AMOUNT for w/v, w/w or v/v not after a % or a ratio, a strength without a unit, or one above 100 %; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * strengthForms('1:1000').forms.find((f) => f.unit === 'mg/mL').value.toString() // '1'
 * strengthForms('0.02 % w/v').ratio.toString() // '5000'
 */
export function strengthForms(text: string): StrengthForms {
  const notes: Note[] = [];
  const t = text.trim();
  // the body is empty or ends in a non-space, so the spaces before the kind are tried once (linear)
  const m = /^(|.*?\S)\s*(w\/v|w\/w|v\/v)$/i.exec(t);
  const body = m ? m[1] : t;
  const isRatio = /^[0-9.]+\s*:\s*[0-9.]+$/.test(body);
  const isPercent = /%$/.test(body);
  let kind: PercentKind;
  let value: Quantity;
  if (isRatio || isPercent) {
    kind = (m?.[2].toLowerCase() as PercentKind | undefined) ?? 'w/v';
    if (!m) notes.push({ code: isRatio ? 'RATIO_AS_W_V' : 'PERCENT_AS_W_V', message: `${t} is read as w/v (${isRatio ? `1 g in ${body.split(':')[1].trim()} mL` : 'grams per 100 mL'}), the reading for a solid in a liquid; write w/w or v/v after it for the others` });
    const read: Note[] = [];
    const q = readPositive(body, [PURE], 'the strength', read);
    // the calculator's remark on a bare ratio is replaced by the reading above
    notes.push(...read.filter((n) => !(isRatio && /is read as the ratio/.test(n.message))));
    if (kind === 'w/v') {
      value = { ...q, value: q.value.times(1000), lsd: q.lsd === null ? null : q.lsd + 3, dims: MASS_CONCENTRATION, unit: null };
    } else value = q;
  } else {
    if (m) throw fail({ code: 'BAD_AMOUNT', message: `w/v, w/w and v/v follow a % or a ratio: '${t}'` }, text);
    const q = readPositive(body, [PURE, MASS_CONCENTRATION], 'the strength', notes);
    if (!q.unit) throw fail({ code: 'BAD_AMOUNT', message: `the strength needs a unit (% w/v, mg/mL, mg/dL, % w/w, mg/g, mg/kg) or a ratio 1:N; got '${t}'` }, text);
    kind = q.dims[2] === -1 ? 'w/v' : 'w/w';

    value = q;
  }
  if (kind === 'w/v' ? value.value.gt(1000) : value.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `a strength above 100 % is not a strength: '${t}'` }, text);
  const forms: { unit: string; value: Decimal }[] = [];
  let ratio: Decimal;
  if (kind === 'w/v') {
    for (const [u, e] of W_V_UNITS) forms.push({ unit: u, value: value.value.div(new Decimal(10).pow(e)) });
    ratio = new Decimal(1000).div(value.value); // 1 g in N mL
  } else if (kind === 'w/w') {
    for (const [u, e] of W_W_UNITS) forms.push({ unit: u, value: value.value.div(new Decimal(10).pow(e)) });
    ratio = new Decimal(1).div(value.value);
  } else {
    forms.push({ unit: '% v/v', value: value.value.times(100) }, { unit: 'mL/L', value: value.value.times(1000) });
    ratio = new Decimal(1).div(value.value);
  }
  ratio = ratio.toSignificantDigits(24);
  if (!ratio.isInteger()) notes.push({ code: 'RATIO_ROUNDED', message: `the ratio strength is 1:${ratio.toSignificantDigits(8).toFixed()}, shown to 4 figures` });
  if (forms.some((f) => !f.value.toSignificantDigits(12).eq(f.value))) notes.push({ code: 'FORM_ROUNDED', message: 'a form that is a repeating decimal is shown to 4 figures' });
  return { kind, value, ratio, forms, notes };
}
