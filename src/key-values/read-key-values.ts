/**
 * The one reader of KEY=VALUE lists: measurement sets (`C=40.00 H=6.71 O=rest`),
 * found values (`C=72.30, H=7.91, N=12.60`), mixtures (`NaCl=5.00 g, KCl=3.00 g`).
 *
 * The rule: entries are separated by a comma, a semicolon, or white space that
 * is followed by the next `KEY=`; a key is a run of characters without white
 * space, `=`, `,` or `;` (`:` also separates key and value where the caller
 * allows it); a value runs to the next separator and may contain spaces
 * (`5.00 g`). Every entry keeps the column where its key starts and the column
 * of its value, so errors can point at them. Parsing only: no value is read as
 * a number here.
 */
import { fail } from '../errors/pondus-error.js';
import type { IssueCode } from '../errors/issue.js';

/** One KEY=VALUE entry as written. */
export interface KeyValue {
  key: string;
  /** The value as written, trimmed ('' when nothing follows the `=`). */
  value: string;
  /** 1-based column of the key. */
  column: number;
  /** 1-based column of the value (of where it would be, when empty). */
  valueColumn: number;
}

export interface KeyValueOptions {
  /** Also accept `KEY: VALUE` (measurement sets do; formulas keys do not). */
  colon?: boolean;
  /** Also accept a JSON object on the line: `{"C": "40.00", "H": "6.71"}`. */
  json?: boolean;
  /** The code of the errors thrown (default BAD_MEASUREMENT). */
  code?: IssueCode;
  /** An example for the messages: 'C=40.00 H=6.71 O=53.29'. */
  example?: string;
}

/**
 * Reads a KEY=VALUE list. Keys must be unique; an entry without `=` is refused
 * with its column.
 *
 * @example
 * readKeyValues('C=40.00, H=6.71 O=rest').map((e) => `${e.key}:${e.value}`) // ['C:40.00', 'H:6.71', 'O:rest']
 * readKeyValues('NaCl=5.00 g KCl=3.00 g')[1] // { key: 'KCl', value: '3.00 g', column: 13, valueColumn: 17 }
 */
export function readKeyValues(text: string, options: KeyValueOptions = {}): KeyValue[] {
  const code = options.code ?? 'BAD_MEASUREMENT';
  const example = options.example ?? 'C=40.00 H=6.71 O=53.29';
  const trimmed = text.trim();
  if (options.json && trimmed.startsWith('{')) return jsonEntries(text, code);
  const { startRe, pairRe } = options.colon ? COLON_PATTERNS : EQUALS_PATTERNS;
  // a new entry starts at the text start, after , or ;, or after white space followed by KEY=
  const starts: number[] = [];
  // white space starts an entry only at the first space of a run (the rest of the run would fail the same way),
  // so a long run of spaces is tried once, not once per space
  startRe.lastIndex = 0;
  let m: RegExpExecArray | null;
  while ((m = startRe.exec(text)) !== null) {
    starts.push(m.index + m[0].length - m[2].length);
    startRe.lastIndex = m.index + m[0].length;
  }
  const out: KeyValue[] = [];
  // pieces between separators: each must be KEY=VALUE
  const pieces: { text: string; at: number }[] = [];
  let from = 0;
  const cut = (to: number) => {
    const chunk = text.slice(from, to);
    for (const part of splitCommas(chunk, from)) pieces.push(part);
    from = to;
  };
  for (const s of starts) if (s > from) cut(s);
  cut(text.length);
  for (const piece of pieces) {
    const lead = piece.text.length - piece.text.trimStart().length;
    const body = piece.text.trim();
    if (body === '') continue;
    const column = piece.at + lead + 1;
    const pm = pairRe.exec(body);
    if (!pm) throw fail({ code, message: `'${body}' is not KEY=VALUE (write the set as ${example})`, column, length: body.length }, text);
    const [, key, rawValue] = pm;
    const value = rawValue.trim();
    const valueColumn = column + body.length - rawValue.length + (rawValue.length - rawValue.trimStart().length);
    if (out.some((e) => e.key === key)) throw fail({ code, message: `${key} is given twice`, column, length: key.length }, text);
    out.push({ key, value, column, valueColumn });
  }
  if (out.length === 0) throw fail({ code, message: `nothing to read: write the values as ${example}` }, text);
  return out;
}

/**
 * The patterns of a set, made once: where an entry starts (at the text start, after , or ;, or
 * after white space followed by KEY=; white space only at the first space of a run, so a long run
 * of spaces is tried once, not once per space), and one entry, KEY=VALUE.
 */
function patterns(colon: boolean): { startRe: RegExp; pairRe: RegExp } {
  const sep = colon ? '[=:]' : '=';
  const keyChars = colon ? '[^\\s=:,;]' : '[^\\s=,;]';
  return { startRe: new RegExp(`(^|[,;]|(?<!\\s)\\s)\\s*(${keyChars}+\\s*${sep})`, 'g'), pairRe: new RegExp(`^(${keyChars}+)\\s*${sep}\\s*(.*)$`, 's') };
}
const COLON_PATTERNS = patterns(true);
const EQUALS_PATTERNS = patterns(false);

function splitCommas(chunk: string, at: number): { text: string; at: number }[] {
  const out: { text: string; at: number }[] = [];
  let from = 0;
  for (let i = 0; i <= chunk.length; i++) {
    if (i === chunk.length || chunk[i] === ',' || chunk[i] === ';') {
      out.push({ text: chunk.slice(from, i), at: at + from });
      from = i + 1;
    }
  }
  return out;
}

function jsonEntries(text: string, code: IssueCode): KeyValue[] {
  let obj: unknown;
  try {
    obj = JSON.parse(text);
  } catch {
    throw fail({ code, message: 'the line starts with { but is not valid JSON' }, text);
  }
  if (obj === null || typeof obj !== 'object' || Array.isArray(obj)) throw fail({ code, message: 'a JSON line must be an object such as {"C": "40.00", "H": "6.71", "O": "rest"}' }, text);
  const entries = Object.entries(obj as Record<string, unknown>);
  if (entries.length === 0) throw fail({ code, message: 'the JSON object has no entries' }, text);
  return entries.map(([key, v]) => {
    const at = text.indexOf(JSON.stringify(key));
    const column = at >= 0 ? at + 2 : 1;
    if (typeof v !== 'string' && typeof v !== 'number') throw fail({ code, message: `the value of ${key} must be a number or a string`, column }, text);
    return { key, value: String(v).trim(), column, valueColumn: column };
  });
}

/**
 * Is this text exactly one KEY=VALUE entry with no white space (one shell word)?
 *
 * @example
 * isSinglePair('C=40.00') // true
 * isSinglePair('C=40.00 H=6.71') // false
 */
export function isSinglePair(text: string): boolean {
  return /^[^\s=,;:{}]+=[^\s=,;]+$/.test(text);
}

/**
 * Splits a line `FORMULA  C=72.30 H=7.91 N=12.60` into the text before the first
 * `El=value` entry and the entries' text; null when the line has no such entries.
 *
 * @example
 * splitTrailingValues('C20H25N3O  C=72.30 H=7.91') // ['C20H25N3O', 'C=72.30 H=7.91']
 */
export function splitTrailingValues(line: string): [string, string] | null {
  // The entries run from the first of them to the end, each from its capital to the next one's:
  // read backwards, the line is scanned once (a pattern `^(.*?)[\s;,]+(entries)$` tried every
  // start of the entries against every run of spaces, quadratic in a long line of them).
  // An entry holds no capital past its own first letter, so the one that can continue a run to
  // the end is the one that ends where the nearest run found so far starts.
  const t = line.trim();
  let run = t.length;
  let first = -1;
  for (let i = t.length - 1; i > 0; i--) {
    const c = t.charCodeAt(i);
    if (c < 65 || c > 90) continue;
    ENTRY.lastIndex = i;
    if (ENTRY.test(t) && ENTRY.lastIndex === run) {
      run = i;
      if (isSeparator(t.charCodeAt(i - 1))) first = i;
    }
  }
  if (first < 0) return null;
  let end = first;
  while (end > 0 && isSeparator(t.charCodeAt(end - 1))) end--;
  return [t.slice(0, end).trim(), t.slice(first).trim()];
}

/** One `El=value` entry with what follows it up to the next (a sticky pattern: it matches where it is put). */
const ENTRY = /[A-Z][a-z]?\s*[=:]\s*[-+]?[0-9.]+\s*%?[\s,;]*/y;
/** A space, tab, ';' or ',': what may stand between a formula and its entries. */
const isSeparator = (c: number) => c === 59 || c === 44 || /\s/.test(String.fromCharCode(c));

/** One KEY=VALUE pair split at its first `=`, as written and trimmed. */
export interface KeyValuePair extends KeyValue {
  /** The text before the `=`, untrimmed ('' when the text starts with `=`). */
  keyText: string;
  /** The text after the `=`, untrimmed. */
  valueText: string;
}

/**
 * Splits one KEY=VALUE pair — an option such as `--replace 'CuSO4=10.00 g'`,
 * `--amount 'HCl=25.0 mL of 0.100 M'`, a reagent row, one salt of a solution —
 * at its first `=`: the key may hold spaces and the value anything after the
 * `=`, and each keeps its column. Null when there is no `=`. Callers refuse
 * an empty key (`keyText === ''`) with their own message.
 *
 * @example
 * readKeyValuePair('CuSO4=10.00 g')?.value // '10.00 g'
 * readKeyValuePair(' n-BuLi = 1.1 equiv')?.key // 'n-BuLi'
 * readKeyValuePair(' n-BuLi = 1.1 equiv')?.valueColumn // 11
 * readKeyValuePair('NaCl') // null
 */
export function readKeyValuePair(text: string): KeyValuePair | null {
  const eq = text.indexOf('=');
  if (eq < 0) return null;
  const keyText = text.slice(0, eq);
  const valueText = text.slice(eq + 1);
  const keyLead = keyText.length - keyText.trimStart().length;
  const valueLead = valueText.length - valueText.trimStart().length;
  return { key: keyText.trim(), value: valueText.trim(), column: keyLead + 1, valueColumn: eq + 2 + valueLead, keyText, valueText };
}
