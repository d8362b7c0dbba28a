/**
 * The fast reader for the formulas that make up most of any batch: element
 * symbols (D and T too), whole counts in ASCII or subscript digits, decimal
 * counts below one (`Fe0.95O`), brackets, `·`/`*` between components, the
 * `CuSO4.5H2O` shorthand dot before water, heavy water or ammonia (with the
 * grammar's note), a charge at the end (`^2-`, `^-2`, `²⁻`, a bare sign after a
 * symbol or bracket), and spaces at the ends. It builds exactly the tree the
 * full parser (grammar.ts + visitor.ts) builds for the same text, and gives up
 * (returns null) on anything else: isotopes, lower-case starts, other decimals,
 * fractions, state symbols, names, abbreviations, every error. The full parser
 * then handles the input, so every message comes from one place.
 * tests/formula-parser/fast-path.test.ts checks the two agree.
 */
import { ELEMENT_SYMBOLS } from '../elements/element-table.js';
import type { Note } from '../errors/issue.js';
import { caseTrapNotes, isCapitalSlipAt, isCaseTrap } from './hints.js';
import { isMassNumberOf } from './leading-number.js';
import { columnOf, MAX_FORMULA_LENGTH, MAX_NESTING } from './prescan.js';
import { mayNeedSettling } from './readings.js';
import type { AtomNode, ComponentNode, CountNode, FormulaTree, GroupNode, PartNode } from './tree.js';
import { MAX_CHARGE, MAX_COUNT_DECIMALS, MAX_COUNT_DIGITS } from './visitor.js';

const CLOSE_OF: Record<string, string> = { '(': ')', '[': ']', '{': '}' };

/** Element symbols indexed by their letters' char codes, so the scanner finds a symbol without slicing the text. */
const ONE_LETTER: (string | undefined)[] = [];
const TWO_LETTER: (string | undefined)[] = [];
/** Symbols whose reading must be settled by the full parser: Ac, Ts and Pr are also abbreviations; Np, Ar and Am get a note. */
const SETTLE = new Set(['Ac', 'Ts', 'Pr', 'Np', 'Ar', 'Am']);
for (const symbol of ELEMENT_SYMBOLS) {
  if (SETTLE.has(symbol)) continue;
  const a = symbol.charCodeAt(0) - 65;
  if (symbol.length === 1) ONE_LETTER[a] = symbol;
  else TWO_LETTER[a * 26 + symbol.charCodeAt(1) - 97] = symbol;
}
/** D and T: hydrogen-2 and hydrogen-3. */
const NUCLIDE_LETTER: (number | undefined)[] = [];
NUCLIDE_LETTER['D'.charCodeAt(0) - 65] = 2;
NUCLIDE_LETTER['T'.charCodeAt(0) - 65] = 3;
ONE_LETTER['D'.charCodeAt(0) - 65] = 'H';
ONE_LETTER['T'.charCodeAt(0) - 65] = 'H';

/** Superscript digits and signs as their values (¹²³ sit in Latin-1, the rest from U+2070). */
const SUPERSCRIPT_DIGIT = new Map([...'⁰¹²³⁴⁵⁶⁷⁸⁹'].map((ch, i) => [ch.charCodeAt(0), i]));
const SUPER_PLUS = 0x207a;
const SUPER_MINUS = 0x207b;
/** After the shorthand dot, the adducts the grammar reads without asking. */
const SHORTHAND_ADDUCT = /^(?:H2O|D2O|NH3)(?![a-z0-9₀-₉])/;

class GiveUp extends Error {}
const GIVE_UP = new GiveUp();

/**
 * Parses a plain formula quickly, or returns null when the full parser is needed.
 *
 * @example
 * fastParse('CuSO4·5H2O')?.components.length // 2
 * fastParse('[13C]H4')                       // null
 */
export function fastParse(input: string): FormulaTree | null {
  if (input.length === 0 || input.length > MAX_FORMULA_LENGTH) return null;
  let start = 0;
  let limit = input.length;
  while (start < limit && input.charCodeAt(start) === 32) start++;
  while (limit > start && input.charCodeAt(limit - 1) === 32) limit--;
  if (start === limit) return null;
  const scanner = new Scanner(input, start, limit);
  try {
    const components = scanner.body(0, '');
    const charge = scanner.pos === limit ? 0 : scanner.charge();
    if (scanner.longRun && mayNeedSettling(input)) return null;
    return { kind: 'formula', input, components, charge, notes: scanner.notes(components) };
  } catch (e) {
    if (e === GIVE_UP) return null;
    throw e;
  }
}

/**
 * The element symbol the fast readers take for the letters `text[start..end)` (an upper-case
 * letter and at most one lower-case one; D and T give 'H'), or undefined for anything else,
 * including Ac, Ts, Pr and Np, whose readings the full parser settles.
 *
 * @example
 * plainSymbol('NaCl', 0, 2) // 'Na'
 * plainSymbol('Ac', 0, 2)   // undefined
 */
export function plainSymbol(text: string, start: number, end: number): string | undefined {
  const first = text.charCodeAt(start) - 65;
  return end - start === 1 ? ONE_LETTER[first] : end - start === 2 ? TWO_LETTER[first * 26 + text.charCodeAt(start + 1) - 97] : undefined;
}

/**
 * The charge that ends a plain formula at `pos` (running to `limit`), as the grammar reads it:
 * `^2-`, `^-2`, `^+`, superscripts `²⁻`, or a bare sign after a symbol or bracket; null when the
 * text there is anything else (the full parser then decides).
 *
 * @example
 * readEndCharge('SO4^2-', 3, 6) // -2
 * readEndCharge('NH4+', 3, 4)   // null
 */
export function readEndCharge(t: string, pos: number, limit: number): number | null {
  let p = pos;
  let sign = 0;
  let digits = '';
  const c = t[p];
  if (c === '^') {
    p++;
    if (t[p] === '+' || t[p] === '-') {
      sign = t[p] === '+' ? 1 : -1;
      p++;
      while (p < limit && t.charCodeAt(p) >= 48 && t.charCodeAt(p) <= 57) digits += t[p++];
    } else {
      while (p < limit && t.charCodeAt(p) >= 48 && t.charCodeAt(p) <= 57) digits += t[p++];
      if (t[p] !== '+' && t[p] !== '-') return null;
      sign = t[p] === '+' ? 1 : -1;
      p++;
    }
  } else if (c === '+' || c === '-') {
    const before = t.charCodeAt(p - 1);
    // after a digit a bare sign is ambiguous (NH4+): the grammar refuses it
    if ((before >= 48 && before <= 57) || (before >= 0x2080 && before <= 0x2089)) return null;
    sign = c === '+' ? 1 : -1;
    p++;
  } else {
    while (p < limit && SUPERSCRIPT_DIGIT.has(t.charCodeAt(p))) {
      digits += SUPERSCRIPT_DIGIT.get(t.charCodeAt(p));
      p++;
    }
    const s = t.charCodeAt(p);
    if (s !== SUPER_PLUS && s !== SUPER_MINUS) return null;
    sign = s === SUPER_PLUS ? 1 : -1;
    p++;
  }
  if (p !== limit || digits.startsWith('0') || digits.length > 2) return null;
  const n = digits === '' ? 1 : Number(digits);
  if (n > MAX_CHARGE) return null;
  return sign * n;
}

/**
 * True when the character at `pos` may start the charge that ends a formula (`^`, a sign, a superscript).
 *
 * @example
 * mayStartCharge('SO4^2-', 3) // true
 */
export function mayStartCharge(t: string, pos: number): boolean {
  const c = t.charCodeAt(pos);
  return c === 94 || c === 43 || c === 45 || c === SUPER_PLUS || c === SUPER_MINUS || SUPERSCRIPT_DIGIT.has(c);
}

/** '(', '[' or '{'. */
const isOpening = (c: number) => c === 40 || c === 91 || c === 123;

class Scanner {
  pos = 0;
  /** Set when three atoms stand next to each other with no count between them (a run such as THF or NBS). */
  longRun = false;
  private run = 0;
  private trap = false;
  private readonly dotNotes: Note[] = [];
  private readonly countNotes: Note[] = [];
  constructor(
    private readonly text: string,
    private readonly first: number,
    private readonly limit: number,
  ) {
    this.pos = first;
  }

  body(depth: number, close: string): ComponentNode[] {
    const components = [this.component(depth)];
    for (;;) {
      const ch = this.pos < this.limit ? this.text[this.pos] : undefined;
      if (ch === '·' || ch === '*') {
        this.pos++;
        components.push(this.component(depth));
        continue;
      }
      if (ch === '.' && depth === 0) {
        this.shorthandDot();
        components.push(this.component(depth));
        continue;
      }
      if (ch === undefined || ch === close) return components;
      if (depth === 0 && mayStartCharge(this.text, this.pos)) return components;
      throw GIVE_UP;
    }
  }

  /** `CuSO4.5H2O`: a '.' between a count and a whole multiplier of water, heavy water or ammonia, read as the addition dot with the grammar's note. */
  private shorthandDot(): void {
    const o = this.pos;
    const t = this.text;
    const before = t.charCodeAt(o - 1);
    if (!(before >= 48 && before <= 57)) throw GIVE_UP;
    let end = o + 1;
    while (end < this.limit && t.charCodeAt(end) >= 48 && t.charCodeAt(end) <= 57) end++;
    if (end === o + 1 || t.charCodeAt(o + 1) === 48 || end - o - 1 > MAX_COUNT_DIGITS) throw GIVE_UP;
    if (!SHORTHAND_ADDUCT.test(t.slice(end, this.limit)) || (end + 3 < this.limit && t[end + 3] !== '·' && t[end + 3] !== '*')) throw GIVE_UP;
    let b = o - 1;
    while (b > 0 && t.charCodeAt(b - 1) >= 48 && t.charCodeAt(b - 1) <= 57) b--;
    // a written count of 1 before the dot ('C1.5H2O') is lexed as a decimal count: the grammar's case
    if (o - b === 1 && before === 49) throw GIVE_UP;
    const col = columnOf(t, o);
    this.dotNotes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${col} is read as the addition dot: ${t.slice(0, o)}·${t.slice(o + 1)} (not a count of ${t.slice(b, o)}.${t.slice(o + 1, end)})`, column: col });
    this.pos++;
  }

  /** A charge at the end: `^2-`, `^-2`, `^+`, superscripts `²⁻`, or a bare sign after a symbol or bracket. */
  charge(): number {
    const z = readEndCharge(this.text, this.pos, this.limit);
    if (z === null) throw GIVE_UP;
    this.pos = this.limit;
    return z;
  }

  private component(depth: number): ComponentNode {
    const start = this.pos;
    const multiplier = this.count();
    const parts: PartNode[] = [];
    for (;;) {
      const c = this.text.charCodeAt(this.pos);
      if (c >= 65 && c <= 90) parts.push(this.atom());
      else if (c === 40 || c === 91 || c === 123) parts.push(this.group(depth));
      else break;
    }
    if (parts.length === 0) throw GIVE_UP;
    // a number first in the formula or a bracket that is a mass number of the atom after it (13CO2, [13C6]): the tree refuses it
    const atom = parts[0];
    if (multiplier && atom.kind === 'atom' && atom.massNumber === null && (start === this.first || isOpening(this.text.charCodeAt(start - 1))) && isMassNumberOf(atom.symbol, Number(multiplier.text))) throw GIVE_UP;
    return { kind: 'component', multiplier, parts, span: { start: multiplier ? start : parts[0].span.start, end: parts[parts.length - 1].span.end } };
  }

  private atom(): AtomNode {
    const start = this.pos;
    let end = start + 1;
    while (end < this.limit) {
      const c = this.text.charCodeAt(end);
      if (c < 97 || c > 122) break;
      end++;
    }
    const first = this.text.charCodeAt(start) - 65;
    const symbol = plainSymbol(this.text, start, end);
    if (symbol === undefined) throw GIVE_UP; // unknown symbols and long words go to the full parser
    if (end - start === 2 && isCaseTrap(symbol)) this.trap = true;
    else if (end - start === 1 && isCapitalSlipAt(this.text, start)) this.trap = true; // 'CI', 'CU': maybe Cl, Cu
    this.pos = end;
    const count = this.count(true);
    if (++this.run >= 3) this.longRun = true;
    if (count) this.run = 0;
    const massNumber = end - start === 1 ? (NUCLIDE_LETTER[first] ?? null) : null;
    return { kind: 'atom', symbol, massNumber, count, span: { start, end: count ? count.span.end : end } };
  }

  private group(depth: number): GroupNode {
    if (depth >= MAX_NESTING) throw GIVE_UP;
    const start = this.pos;
    const open = this.text[start] as GroupNode['bracket'];
    const after = this.text.charCodeAt(start + 1);
    if (open === '[' && after >= 48 && after <= 57) throw GIVE_UP; // '[13C]' is a nuclide label
    this.pos++;
    const body = this.body(depth + 1, CLOSE_OF[open]);
    if (this.text[this.pos] !== CLOSE_OF[open]) throw GIVE_UP;
    this.pos++;
    const closeEnd = this.pos;
    const count = this.count(true);
    return { kind: 'group', bracket: open, body, count, span: { start, end: count ? count.span.end : closeEnd } };
  }

  /** A whole count, or (after a symbol or bracket) a count in subscript digits or a decimal count below one. */
  private count(afterPart = false): CountNode | null {
    const t = this.text;
    const start = this.pos;
    let end = start;
    while (end < this.limit) {
      const c = t.charCodeAt(end);
      if (c < 48 || c > 57) break;
      end++;
    }
    if (end === start) return afterPart ? this.subscriptCount() : null;
    const next = end < this.limit ? t.charCodeAt(end) : -1;
    if (afterPart && next === 46 && end - start === 1 && t.charCodeAt(start) === 48) return this.decimalCount(start);
    if (afterPart && next === 46 && t.charCodeAt(start) !== 48 && end - start <= MAX_COUNT_DIGITS) {
      const d = this.endDecimalCount(start, end);
      if (d) return d;
    }
    // leading zeros, zero, huge counts, decimal points (but the shorthand dot, which body() checks) and
    // subscripts after digits go to the full parser
    if (t.charCodeAt(start) === 48 || end - start > MAX_COUNT_DIGITS || (next === 46 && !afterPart) || (next >= 0x2080 && next <= 0x2089)) throw GIVE_UP;
    this.pos = end;
    return { text: t.slice(start, end), integer: true, span: { start, end } };
  }

  /** `0.95`: a decimal count below one (no hydrate dot can be meant: a multiplier is never 0). */
  private decimalCount(start: number): CountNode {
    const t = this.text;
    let end = start + 2;
    while (end < this.limit && t.charCodeAt(end) >= 48 && t.charCodeAt(end) <= 57) end++;
    const decimals = end - start - 2;
    const next = end < this.limit ? t.charCodeAt(end) : -1;
    if (decimals === 0 || decimals > MAX_COUNT_DECIMALS || next === 46 || next === 47 || (next >= 0x2080 && next <= 0x2089)) throw GIVE_UP;
    // as the grammar writes it: trailing zeros of the fraction dropped ('0.50' is 0.5); all zeros is a count of zero
    let last = end;
    while (t.charCodeAt(last - 1) === 48) last--;
    if (last === start + 2) throw GIVE_UP;
    this.pos = end;
    return { text: t.slice(start, last), integer: false, span: { start, end } };
  }

  /**
   * `YBa2Cu3O6.95`: a decimal count of one or more that ends the formula, read as written; with one
   * or two decimals it could be a hydrate cut short (CuSO4.5), and the grammar's note says so.
   */
  private endDecimalCount(start: number, dot: number): CountNode | null {
    const t = this.text;
    let end = dot + 1;
    while (end < this.limit && t.charCodeAt(end) >= 48 && t.charCodeAt(end) <= 57) end++;
    const decimals = end - dot - 1;
    if (end !== this.limit || decimals === 0 || decimals > MAX_COUNT_DECIMALS) return null;
    let last = end;
    while (t.charCodeAt(last - 1) === 48) last--;
    if (last === dot + 1) return null;
    const written = t.slice(start, end);
    if (/^[1-9][0-9]*\.[0-9]{1,2}$/.test(written)) {
      const col = columnOf(t, start);
      this.countNotes.push({ code: 'DECIMAL_COUNT', message: `'${written}' at column ${col} is read as a decimal count; for an addition compound write the dot and its part (CuSO4·5H2O)`, column: col });
    }
    this.pos = end;
    return { text: t.slice(start, last), integer: false, span: { start, end } };
  }

  /** `H₂O`: a count in subscript digits, as ASCII digits. */
  private subscriptCount(): CountNode | null {
    const t = this.text;
    const start = this.pos;
    let end = start;
    let text = '';
    while (end < this.limit) {
      const c = t.charCodeAt(end);
      if (c < 0x2080 || c > 0x2089) break;
      text += String.fromCharCode(c - 0x2080 + 48);
      end++;
    }
    if (end === start) return null;
    const next = end < this.limit ? t.charCodeAt(end) : -1;
    if (text.charCodeAt(0) === 48 || text.length > MAX_COUNT_DIGITS || (next >= 48 && next <= 57) || next === 46) throw GIVE_UP;
    this.pos = end;
    return { text, integer: true, span: { start, end } };
  }

  notes(components: ComponentNode[]): Note[] {
    const trap = this.trap ? caseTrapNotes(components) : [];
    return this.dotNotes.length || this.countNotes.length ? [...this.countNotes, ...this.dotNotes, ...trap] : trap;
  }
}

