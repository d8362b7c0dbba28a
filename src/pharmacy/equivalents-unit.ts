/**
 * Reading an amount of charge as written: '20 mEq', '0.020 Eq', or per volume of solution, '20
 * mEq/L', '2 mEq/mL', '20 meq/l'. The number is read by the common quantity reader (its
 * significant figures and notes) and the volume by the one unit vocabulary (so 'l' and 'ml' are
 * read as L and mL, exactly as in 'mol/l'); the prefix of Eq is the prefix of mol in that
 * vocabulary (mEq ↔ mmol, µEq ↔ µmol). An error quotes the text as written, at its own column.
 * The amount of charge is held in mol (Eq), a strength in mol/L (Eq/L).
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { inRange } from '../assay/read-quantity.js';
import { measure } from '../calc/measure.js';
import { checkInputLength } from '../errors/input-length.js';
import { MAX_EXPRESSION_LENGTH } from '../calc/parse-expression.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { AMOUNT, pow10, sameDims, UNIT_SYMBOLS, unitOf, VOLUME } from '../sigfig/units.js';

/**
 * An equivalents unit: a prefix of the vocabulary's mol (none, m, µ, μ or u) and Eq; lower-case eq
 * only after a prefix ('meq', a common pharmacy spelling of mEq: from memory), since a bare 'eq'
 * is also the molar equivalents of a reagent in a synthesis (a ratio, not a charge).
 */
const EQ = '([mµμu])?(Eq|eq)';
// the number's text is empty or ends in a non-space, so the spaces before the unit are tried once:
// `(.*?)\s*` tried them again from every start, quadratic in a long run of spaces
const PER_VOLUME = new RegExp(`^(|.*?\\S)\\s*${EQ}\\s*\\/\\s*(\\S+)$`);
const AMOUNT_OF_CHARGE = new RegExp(`^(|.*?\\S)\\s*${EQ}$`);
/** A text longer than any expression is not looked at as a strength in equivalents (its reader refuses it, INPUT_TOO_LONG). */
const tooLong = (t: string) => t.length > MAX_EXPRESSION_LENGTH;

/** The equivalents units read (for hints): per volume, with l and ml read as L and mL. */
export const EQUIVALENTS_UNITS = 'Eq/L, mEq/L, mEq/mL, µEq/mL (meq for mEq; l and ml for L and mL)';

/** An amount of charge per volume as written. */
export interface ChargePerVolume {
  /** The strength as an amount of charge per volume, held in mol/L (Eq/L). */
  value: Quantity;
  /** The equivalents unit as written: 'mEq', 'meq', 'Eq'. */
  eq: string;
  /** The volume unit as written: 'L', 'ml'. */
  per: string;
  /** The power of ten from Eq/L to the unit as written: the number in that unit is the value times 10^toWritten. */
  toWritten: number;
}

/**
 * Whether a text is written in equivalents per something ('20 mEq/L', '2 meq/ml').
 *
 * @example
 * isChargePerVolume('20 mEq/l') // true
 * isChargePerVolume('0.9 %') // false
 */
export function isChargePerVolume(text: string): boolean {
  const t = text.trim();
  return !tooLong(t) && PER_VOLUME.test(t);
}

/** The vocabulary's factor of a prefix of Eq: that of the same prefix of mol ('m' → mmol, -3). */
function prefixExp10(prefix: string | undefined): number {
  return unitOf(`${prefix ?? ''}mol`).exp10;
}

/**
 * Refuses a prefix pondus does not read on Eq ('MEq/mL', 'kEq', 'M Eq/L'), quoting the unit as
 * typed from its first letter: the letters before Eq are no number's unit.
 */
function refuseUnknownPrefix(text: string, t: string, before: string, lead: number): void {
  const letters = /[A-Za-zµμ]+$/.exec(before);
  if (letters === null) return;
  const at = before.length - letters[0].length;
  const unit = t.slice(at).replace(/\s+$/, '');
  throw fail({ code: 'UNKNOWN_UNIT', message: `unknown unit '${unit}' at column ${lead + at + 1}`, column: lead + at + 1, length: unit.length, hint: `equivalents are written ${EQUIVALENTS_UNITS}` }, text);
}

/** Refuses a bare lower-case 'eq': it reads two ways. */
function refuseBareEq(text: string, prefix: string | undefined, eq: string, column: number): void {
  if (prefix === undefined && eq === 'eq') {
    throw fail({ code: 'AMBIGUOUS_READING', message: `'eq' reads two ways: equivalents of charge (Eq), or the molar equivalents of a reagent (a ratio to another reagent); write 'Eq' or 'mEq' for equivalents of charge`, column }, text);
  }
}

/**
 * The number before the unit, read by the common reader as an amount in mol (so its figures are
 * those of a measurement, as '20 mmol' has them; a bare number there is an exact count); an error
 * is moved to the text as written, at its column.
 */
function readNumber(text: string, numberText: string, lead: number, what: string, notes: Note[]): Quantity {
  const t = text.trim();
  if (numberText.trim() === '') throw fail({ code: 'BAD_AMOUNT', message: `${what} needs a number before its unit; got '${t}'`, column: lead + 1 }, text);
  const read = `${numberText} mol`;
  let q: Quantity;
  try {
    q = measure(read, what, notes);
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    throw new PondusError(
      e.issues.map((i) => {
        const message = i.message.split(`'${read}'`).join(`'${t}'`);
        if (i.code === 'UNKNOWN_UNIT') i = { ...i, hint: `${i.hint ? `${i.hint}; ` : ''}equivalents are written ${EQUIVALENTS_UNITS}` };
        return i.column === undefined ? { ...i, message } : { ...i, column: i.column + lead, message: message.replace(`at column ${i.column}`, `at column ${i.column + lead}`) };
      }),
      text,
    );
  }
  if (!sameDims(q.dims, AMOUNT)) throw fail({ code: 'BAD_AMOUNT', message: `${what} is a number and an equivalents unit, like '20 mEq/L'; got '${t}'`, column: lead + 1 }, text);
  if (!q.value.gt(0)) throw fail({ code: 'BAD_AMOUNT', message: `${what} must be positive: '${t}'`, column: lead + 1 }, text);
  return inRange(q, text, what);
}

/**
 * Reads a strength in equivalents per volume of solution, or null for a text not written in
 * equivalents per something.
 *
 * @param text - the strength as written: '20 mEq/L', '2 meq/ml'.
 * @param what - what it is, for messages: 'the strength'.
 * @param notes - where the notes of reading the number go.
 * @returns the strength (held in mol/L), the equivalents unit and the volume unit as written; null when not in equivalents.
 * @throws PondusError, quoting `text`: INPUT_TOO_LONG past 10,000 characters; AMBIGUOUS_READING for a bare 'eq'; UNKNOWN_UNIT for a volume unit pondus does not know; BAD_AMOUNT for equivalents per something other than a volume, no number, or one that is not positive; the codes of reading the number (BAD_EXPRESSION, UNKNOWN_UNIT, NUMBER_OUT_OF_RANGE).
 * @example
 * readChargePerVolume('2 mEq/ml', 'the strength', []).value.value.toString() // '2' (Eq/L)
 */
export function readChargePerVolume(text: string, what: string, notes: Note[]): ChargePerVolume | null {
  checkInputLength(text, what, MAX_EXPRESSION_LENGTH);
  const t = text.trim();
  const lead = text.length - text.trimStart().length;
  const m = PER_VOLUME.exec(t);
  if (!m) return null;
  const perColumn = lead + t.length - m[4].length + 1;
  if (m[2] === undefined) refuseUnknownPrefix(text, t, m[1], lead);
  refuseBareEq(text, m[2], m[3], lead + t.slice(0, t.length - m[4].length).lastIndexOf(m[3]) + 1);
  let volume;
  try {
    volume = unitOf(m[4], perColumn);
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    const volumes = UNIT_SYMBOLS.filter((s) => sameDims(unitOf(s).dims, VOLUME));
    throw fail({ code: 'UNKNOWN_UNIT', message: `${what}: unknown unit '${m[4]}' after '${m[2] ?? ''}${m[3]}/' at column ${perColumn}`, column: perColumn, length: m[4].length, hint: `equivalents are read per volume of solution: ${volumes.join(', ')} (l and ml as well)` }, text);
  }
  if (!sameDims(volume.dims, VOLUME)) {
    throw fail({ code: 'BAD_AMOUNT', message: `a strength in equivalents is written per volume of solution, like '20 mEq/L' or '2 mEq/mL'; got '${t}'`, column: perColumn, length: m[4].length }, text);
  }
  const n = readNumber(text, m[1], lead, what, notes);
  // n mol of charge (the number as written) per 10^(volume − prefix) L: the prefix of Eq is that of mol
  const toWritten = volume.exp10 - prefixExp10(m[2]);
  const value = divide(n, quantity(exact(pow10(toWritten)), unitOf('L')));
  value.unit = unitOf('M');
  return { value, eq: `${m[2] ?? ''}${m[3]}`, per: m[4], toWritten };
}

/**
 * Reads an amount of charge: '20 mEq', '0.020 Eq', '20 meq'.
 *
 * @param text - the amount as written.
 * @param what - what it is, for messages: 'the target'.
 * @param notes - where the notes of reading the number go.
 * @returns the amount of charge, held in mol (Eq).
 * @throws PondusError, quoting `text`: INPUT_TOO_LONG past 10,000 characters; BAD_AMOUNT for a text not written in equivalents, no number, or one that is not positive; AMBIGUOUS_READING for a bare 'eq'; the codes of reading the number.
 * @example
 * readChargeAmount('20 mEq', 'the target', []).value.toString() // '0.02'
 */
export function readChargeAmount(text: string, what: string, notes: Note[]): Quantity {
  checkInputLength(text, what, MAX_EXPRESSION_LENGTH);
  const t = text.trim();
  const lead = text.length - text.trimStart().length;
  const m = AMOUNT_OF_CHARGE.exec(t);
  if (!m) throw fail({ code: 'BAD_AMOUNT', message: `a milliequivalent target is written like '20 mEq'; got '${text}'` }, text);
  if (m[2] === undefined) refuseUnknownPrefix(text, t, m[1], lead);
  refuseBareEq(text, m[2], m[3], lead + t.length - m[3].length + 1);
  const n = readNumber(text, m[1], lead, what, notes);
  const amount = multiply(n, quantity(exact(pow10(prefixExp10(m[2]))), null));
  amount.unit = unitOf(`${m[2] ?? ''}mol`);
  return amount;
}
