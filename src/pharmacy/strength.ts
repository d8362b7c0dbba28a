/**
 * Reading a strength written on a label or a prescription: '0.9 %', '10 % w/v',
 * '2 mg/mL', '84 g/L', '0.154 M'. A bare
 * % is read as % w/v with a note; '% w/v', '% w/w' and '% v/v' are taken as
 * written and the kind is kept, so a caller can refuse a kind it cannot use.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, MOLARITY, PURE } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import type { Quantity } from '../sigfig/quantity.js';

export type PercentKind = 'w/v' | 'w/w' | 'v/v';

export interface Strength {
  /** The strength as a quantity: a pure fraction for %, else a mass or molar concentration. */
  value: Quantity;
  /** For a percent: its kind, as written or as read. */
  percent: PercentKind | null;
  /** True when the kind of percent was not written and was read by default. */
  defaulted: boolean;
}

/**
 * Reads a strength; `defaultPercent` is the kind a bare % is read as (noted).
 *
 * @param text - a strength: '0.9 %', '2 mg/mL', '0.154 M', '5 % w/w'.
 * @param defaultPercent - how a bare % is read ('w/v', 'w/w' or 'v/v'), with a note.
 * @param notes - where notes of the reading are added.
 * @param what - what the strength is, for messages: 'the strength'.
 * @returns the strength as a Quantity and its percent kind.
 * @throws PondusError: BAD_AMOUNT for a strength without a unit; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readStrength('10 % w/v', 'w/v', [], 'the strength').percent // 'w/v'
 */
export function readStrength(text: string, defaultPercent: PercentKind, notes: Note[], what: string): Strength {
  const m = /^(.*%)\s*(w\/v|w\/w|v\/v)\s*$/i.exec(text.trim());
  const body = m ? m[1] : text;
  const q = readPositive(body, [PURE, MASS_CONCENTRATION, MOLARITY], what, notes);
  const isPercent = /%\s*$/.test(body.trim());
  if (q.dims[0] === 0 && q.dims[1] === 0 && q.dims[2] === 0 && !isPercent) {
    throw fail({ code: 'BAD_AMOUNT', message: `${what} needs a unit: %, g/L, mg/mL, M or mM; got '${text}'` }, text);
  }
  if (!isPercent) return { value: q, percent: null, defaulted: false };
  if (m) return { value: q, percent: m[2].toLowerCase() as PercentKind, defaulted: false };
  notes.push({ code: defaultPercent === 'w/v' ? 'PERCENT_AS_W_V' : defaultPercent === 'w/w' ? 'PERCENT_AS_W_W' : 'PERCENT_AS_V_V', message: `${what}: % is read as % ${defaultPercent}${defaultPercent === 'w/v' ? ' (grams per 100 mL)' : defaultPercent === 'w/w' ? ' (grams per 100 g)' : ' (millilitres per 100 mL)'}; write '% w/w', '% w/v' or '% v/v' to say which` });
  return { value: q, percent: defaultPercent, defaulted: true };
}
