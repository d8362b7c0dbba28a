/**
 * Reads the ion notation of the trade into an {@link IonNotation}: `[M+H]+`, `[M+Na]+`,
 * `[M-H]-` (also with U+2212 −), `[M+2H]2+`, `[M+H-H2O]+`, `[2M+Na]+`, `[M+HCOO]-`, radical
 * ions `M+•` and `M-•` (ASCII `M+.`; the dot may come before the sign), and a formula in place
 * of M (`[C15H15NO2+H]+`). Spaces are allowed around the signs (`[M + H]+`). Every problem is a
 * PondusError with the code BAD_ION (or the formula parser's code for a bad term) and a column.
 */
import type { Issue } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { flattenFormula } from '../formula/flatten.js';
import { hillFormula } from '../formula/hill.js';
import { parseFormula } from '../formula-parser/parse.js';
import type { IonNotation, IonTerm } from './ion-notation.js';

/** Longest ion notation accepted. */
export const MAX_NOTATION_LENGTH = 200;
/** Largest multiplier, term count or charge accepted. */
export const MAX_ION_COUNT = 1000;

const MINUS = new Set(['-', '\u2212', '\u2013']);
const RADICAL = new Set(['\u2022', '.', '\u00b7', '\u2219']);
const SUPER_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const isSign = (c: string | undefined) => c === '+' || (c !== undefined && MINUS.has(c));
const isDigit = (c: string | undefined) => c !== undefined && c >= '0' && c <= '9';
const isSpace = (c: string | undefined) => c === ' ' || c === '\t';

class Reader {
  readonly chars: string[];
  i = 0;
  constructor(readonly input: string) {
    this.chars = Array.from(input);
  }
  cur(): string | undefined {
    return this.chars[this.i];
  }
  peekNonSpace(from = this.i): string | undefined {
    let j = from;
    while (isSpace(this.chars[j])) j++;
    return this.chars[j];
  }
  skipSpaces(): void {
    while (isSpace(this.cur())) this.i++;
  }
  digits(): string {
    let s = '';
    while (isDigit(this.cur())) s += this.chars[this.i++];
    return s;
  }
  error(message: string, column: number, hint?: string, length = 1): PondusError {
    const issue: Issue = { code: 'BAD_ION', message, column, length };
    if (hint) issue.hint = hint;
    return fail(issue, this.input);
  }
}

const HINT = "write an ion as [M+H]+, [M+Na]+, [M-H]-, [M+2H]2+, [2M+Na]+, [M+H-H2O]+, or a radical ion as M+• (M+. in ASCII)";

/**
 * Reads an ion notation. Throws a PondusError (BAD_ION, with a column) for anything else.
 *
 * @param text - an ion notation such as '[M+H]+', '[M−H]−', '[2M+Na]+', 'M+.' or '[C6H12O6+Na]+'.
 * @returns the notation read: the multiplier of M, the terms added or taken away, the charge, whether it is a radical, a formula of its own when it names one, and its canonical form.
 * @throws PondusError: BAD_ION for text that is not an ion notation (with its column: no M, no charge, an unclosed bracket, a count or charge out of range, a charged term, …); INPUT_TOO_LONG past the length limit; CONTROL_CHARACTER for a control character; a term's formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, …, with the column in the notation); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readIonNotation('[M+H]+').terms[0].formula   // 'H'
 * readIonNotation('[M−H]−').charge             // -1
 * readIonNotation('M+.').radical               // true
 */
export function readIonNotation(text: string): IonNotation {
  if (text.trim() === '') throw fail({ code: 'BAD_ION', message: 'the ion notation is empty', hint: HINT }, text);
  if (text.length > MAX_NOTATION_LENGTH) throw fail({ code: 'INPUT_TOO_LONG', message: `the ion notation is longer than ${MAX_NOTATION_LENGTH} characters` }, text);
  const r = new Reader(text);
  r.chars.forEach((ch, k) => {
    const code = ch.codePointAt(0)!;
    if (code < 0x20 || code === 0x7f || (code >= 0x80 && code < 0xa0)) throw fail({ code: 'CONTROL_CHARACTER', message: `control character at column ${k + 1}`, column: k + 1, length: 1 }, text);
  });
  r.skipSpaces();
  const bracketed = r.cur() === '[';
  const openColumn = r.i + 1;
  if (bracketed) r.i++;
  r.skipSpaces();

  // the molecule: an optional multiplier, then M or (in brackets) a formula
  const multColumn = r.i + 1;
  const multText = r.digits();
  const multiplier = multText === '' ? 1 : Number(multText);
  if (multText !== '' && (multiplier < 1 || multiplier > MAX_ION_COUNT)) throw r.error(`the multiplier ${multText} at column ${multColumn} must be between 1 and ${MAX_ION_COUNT}`, multColumn, undefined, multText.length);
  let formula: string | null = null;
  let formulaColumn: number | null = null;
  if (r.cur() === 'M' && !/[a-z]/.test(r.chars[r.i + 1] ?? '')) {
    r.i++;
  } else if (bracketed && /[A-Z([{¹²³⁴⁵⁶⁷⁸⁹⁰]/.test(r.cur() ?? "")) {
    formulaColumn = r.i + 1;
    const body = readTermText(r);
    const tree = parseTerm(r, body, formulaColumn);
    formula = body;
    void tree;
  } else if (r.cur() === 'm') {
    throw r.error(`the molecule is written M (capital) in an ion; found 'm' at column ${r.i + 1}`, r.i + 1, HINT);
  } else {
    const at = r.i + 1;
    throw r.error(r.cur() === undefined ? 'the ion notation ends before the molecule M' : `expected M (the molecule) at column ${at}, found '${r.cur()}'`, at, HINT);
  }

  // the terms added or taken away
  const terms: IonTerm[] = [];
  for (;;) {
    r.skipSpaces();
    const c = r.cur();
    if (!isSign(c)) break;
    if (!bracketed) {
      // unbracketed: a sign here is the charge, unless a term follows it
      const next = r.peekNonSpace(r.i + 1);
      if (next !== undefined && (/[A-Z(\[]/.test(next) || (isDigit(next) && /[A-Z]/.test(afterDigits(r, r.i + 1) ?? '')))) {
        throw r.error(`terms added to or taken from M go in square brackets (column ${r.i + 1})`, r.i + 1, `write [${text.trim()}] with the charge after the bracket, e.g. [M+H]+`);
      }
      break;
    }
    const signColumn = r.i + 1;
    r.i++;
    r.skipSpaces();
    if (r.cur() === ']' || r.cur() === undefined) throw r.error(`expected an adduct formula after '${c}' at column ${signColumn}`, signColumn, HINT);
    const countColumn = r.i + 1;
    const countText = r.digits();
    const count = countText === '' ? 1 : Number(countText);
    if (countText !== '' && (count < 1 || count > MAX_ION_COUNT)) throw r.error(`the count ${countText} at column ${countColumn} must be between 1 and ${MAX_ION_COUNT}`, countColumn, undefined, countText.length);
    const column = r.i + 1;
    if (r.cur() === undefined || r.cur() === ']' || isSign(r.cur()) || isSpace(r.cur())) throw r.error(`expected an adduct formula after '${countText}' at column ${countColumn}`, countColumn, HINT);
    if (r.cur() === 'M' && !/[a-z]/.test(r.chars[r.i + 1] ?? '')) throw r.error(`M may appear once, first, in an ion; write [2M+Na]+ for two molecules (column ${column})`, column);
    const body = readTermText(r);
    const atoms = parseTerm(r, body, column);
    terms.push({ sign: MINUS.has(c!) ? -1 : 1, count, text: body, atoms, formula: hillFormula(atoms), column });
  }

  if (bracketed) {
    r.skipSpaces();
    if (r.cur() !== ']') {
      if (r.cur() === undefined) throw r.error(`'[' at column ${openColumn} is never closed`, openColumn, HINT);
      throw r.error(`unexpected '${r.cur()}' at column ${r.i + 1} in the ion`, r.i + 1, HINT);
    }
    r.i++;
  }

  // the charge, with an optional radical dot before or after the sign
  r.skipSpaces();
  let radical = false;
  if (RADICAL.has(r.cur() ?? "")) {
    radical = true;
    r.i++;
  }
  const chargeColumn = r.i + 1;
  let magText = '';
  while (isDigit(r.cur()) || (r.cur() !== undefined && SUPER_DIGITS.includes(r.cur()!))) {
    const ch = r.chars[r.i++];
    magText += isDigit(ch) ? ch : String(SUPER_DIGITS.indexOf(ch));
  }
  const signChar = r.cur();
  let sign = 0;
  if (signChar === '+' || signChar === '⁺') sign = 1;
  else if ((signChar !== undefined && MINUS.has(signChar)) || signChar === '⁻') sign = -1;
  if (sign === 0) {
    const at = r.i + 1;
    if (signChar === undefined) throw r.error(`the ion has no charge: write it after the ${bracketed ? 'bracket' : 'M'}, as in ${bracketed ? '[M+H]+ or [M-H]-' : 'M+• or M-•'}`, at, HINT);
    throw r.error(`expected the charge (+ or -) at column ${at}, found '${signChar}'`, at, HINT);
  }
  r.i++;
  if (isDigit(r.cur())) {
    const at = r.i + 1;
    throw r.error(`the number of charges goes before the sign: write ${r.cur()}${sign > 0 ? '+' : '-'}, not ${sign > 0 ? '+' : '-'}${r.cur()} (column ${at})`, at, 'for example [M+2H]2+');
  }
  if (RADICAL.has(r.cur() ?? "")) {
    if (radical) throw r.error(`a second radical dot at column ${r.i + 1}`, r.i + 1);
    radical = true;
    r.i++;
  }
  const magnitude = magText === '' ? 1 : Number(magText);
  if (magnitude < 1 || magnitude > MAX_ION_COUNT) throw r.error(`the charge ${magText}${sign > 0 ? '+' : '-'} at column ${chargeColumn} must be between 1 and ${MAX_ION_COUNT}`, chargeColumn, undefined, magText.length + 1);
  r.skipSpaces();
  if (r.cur() !== undefined) throw r.error(`unexpected '${r.cur()}' at column ${r.i + 1} after the charge`, r.i + 1, HINT);

  const charge = sign * magnitude;
  return { input: text, multiplier, formula, formulaColumn, terms, charge, radical, ...spell(multiplier, terms, charge, radical, bracketed || terms.length > 0) };
}

/**
 * Non-throwing check: true when the text reads as an ion notation.
 *
 * @param text - the text to check.
 * @returns true when {@link readIonNotation} reads it, false when it refuses it.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * isIonNotation('[M+Na]+') // true
 * isIonNotation('NaCl')    // false
 */
export function isIonNotation(text: string): boolean {
  try {
    readIonNotation(text);
    return true;
  } catch (e) {
    if (e instanceof PondusError) return false;
    throw e;
  }
}

function afterDigits(r: Reader, from: number): string | undefined {
  let j = from;
  while (isSpace(r.chars[j])) j++;
  while (isDigit(r.chars[j])) j++;
  return r.chars[j];
}

/** A term's text: everything up to the next sign, closing bracket, space or the end. */
function readTermText(r: Reader): string {
  let s = '';
  let depth = 0;
  while (r.cur() !== undefined && !isSpace(r.cur())) {
    const c = r.cur()!;
    if (c === '^') {
      // a charge written on the term: keep it with the term, so the term is refused as charged
      s += c;
      r.i++;
      while (isDigit(r.cur())) s += r.chars[r.i++];
      if (isSign(r.cur())) s += r.chars[r.i++];
      continue;
    }
    if (c === '(' || c === '{') depth++;
    if (c === ')' || c === '}') depth--;
    if (depth <= 0 && (isSign(c) || c === ']')) {
      // '[' opens a nuclide label ([13C]) inside a formula; a ']' closes it when one is open
      if (c === ']' && s.lastIndexOf('[') > s.lastIndexOf(']')) {
        s += c;
        r.i++;
        continue;
      }
      break;
    }
    s += c;
    r.i++;
  }
  return s;
}

/** Reads a term with the formula parser; its errors point into the whole notation. */
function parseTerm(r: Reader, body: string, column: number) {
  let tree;
  try {
    tree = parseFormula(body);
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    const shift = column - 1;
    const issues = e.issues.map((i): Issue => ({
      ...i,
      message: `in '${body}': ${i.message.replace(/column (\d+)/g, (_m, n: string) => `column ${Number(n) + shift}`)}`,
      column: i.column !== undefined ? i.column + shift : column,
    }));
    throw new PondusError(issues, r.input);
  }
  if (tree.charge !== 0) throw r.error(`'${body}' at column ${column} carries a charge; the terms of an ion are neutral formulas and the ion's charge goes after the bracket`, column, HINT, Array.from(body).length);
  return flattenFormula(tree);
}

function spell(multiplier: number, terms: IonTerm[], charge: number, radical: boolean, bracketed: boolean): { canonical: string; journal: string } {
  const mag = Math.abs(charge);
  const chargeText = `${mag === 1 ? '' : mag}${charge > 0 ? '+' : '-'}${radical ? '•' : ''}`;
  const m = `${multiplier === 1 ? '' : multiplier}M`;
  const parts = terms.map((t) => ({ sign: t.sign > 0 ? '+' : '-', body: `${t.count === 1 ? '' : t.count}${t.text}` }));
  if (!bracketed || (terms.length === 0 && radical)) return { canonical: `${m}${chargeText}`, journal: `${m}${chargeText}` };
  return {
    canonical: `[${m}${parts.map((p) => p.sign + p.body).join('')}]${chargeText}`,
    journal: `[${m}${parts.map((p) => ` ${p.sign} ${p.body}`).join('')}]${chargeText}`,
  };
}
