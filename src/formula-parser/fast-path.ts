/**
 * A fast path for the plainest formulas, which are most of any batch: ASCII
 * element symbols, whole counts, brackets, and `·`/`*` between components.
 * It builds exactly the tree the full parser (grammar.ts + visitor.ts) builds
 * for the same text, and gives up (returns null) on anything else: lower-case
 * starts, D and T, isotopes, charges, decimals, spaces, Unicode digits, any
 * error. The full parser then handles the input, so every message comes from
 * one place. tests/formula-parser/fast-path.test.ts checks the two agree.
 */
import { ELEMENTS } from '../elements/element-table.js';
import type { Note } from '../errors/issue.js';
import { caseTrapNotes, isCaseTrap } from './hints.js';
import { MAX_FORMULA_LENGTH, MAX_NESTING } from './prescan.js';
import { mayNeedSettling } from './readings.js';
import type { AtomNode, ComponentNode, CountNode, FormulaTree, GroupNode, PartNode } from './tree.js';
import { MAX_COUNT_DIGITS } from './visitor.js';

const CLOSE_OF: Record<string, string> = { '(': ')', '[': ']', '{': '}' };

/** Element symbols indexed by their letters' char codes, so the scanner finds a symbol without slicing the text. */
const ONE_LETTER: (string | undefined)[] = [];
const TWO_LETTER: (string | undefined)[] = [];
/** Symbols whose reading must be settled by the full parser: Ac, Ts and Pr are also abbreviations, Np gets a note. */
const SETTLE = new Set(['Ac', 'Ts', 'Pr', 'Np']);
for (const e of ELEMENTS) {
  if (SETTLE.has(e.symbol)) continue;
  const a = e.symbol.charCodeAt(0) - 65;
  if (e.symbol.length === 1) ONE_LETTER[a] = e.symbol;
  else TWO_LETTER[a * 26 + e.symbol.charCodeAt(1) - 97] = e.symbol;
}

class GiveUp extends Error {}
const GIVE_UP = new GiveUp();

/**
 * Parses a plain formula quickly, or returns null when the full parser is needed.
 *
 * @example
 * fastParse('CuSO4·5H2O')?.components.length // 2
 * fastParse('NH4^+')                         // null
 */
export function fastParse(input: string): FormulaTree | null {
  if (input.length === 0 || input.length > MAX_FORMULA_LENGTH) return null;
  const scanner = new Scanner(input);
  try {
    const components = scanner.body(0, '');
    if (scanner.pos !== input.length) return null;
    if (scanner.longRun && mayNeedSettling(input)) return null;
    return { kind: 'formula', input, components, charge: 0, notes: scanner.notes(components) };
  } catch (e) {
    if (e === GIVE_UP) return null;
    throw e;
  }
}

class Scanner {
  pos = 0;
  /** Set when three atoms stand next to each other with no count between them (a run such as THF or NBS). */
  longRun = false;
  private run = 0;
  private trap = false;
  constructor(private readonly text: string) {}

  body(depth: number, close: string): ComponentNode[] {
    const components = [this.component(depth)];
    for (;;) {
      const ch = this.text[this.pos];
      if (ch === '·' || ch === '*') {
        this.pos++;
        components.push(this.component(depth));
        continue;
      }
      if (ch === undefined || ch === close) return components;
      throw GIVE_UP;
    }
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
    return { kind: 'component', multiplier, parts, span: { start: multiplier ? start : parts[0].span.start, end: parts[parts.length - 1].span.end } };
  }

  private atom(): AtomNode {
    const start = this.pos;
    let end = start + 1;
    while (end < this.text.length) {
      const c = this.text.charCodeAt(end);
      if (c < 97 || c > 122) break;
      end++;
    }
    const first = this.text.charCodeAt(start) - 65;
    const symbol = end - start === 1 ? ONE_LETTER[first] : end - start === 2 ? TWO_LETTER[first * 26 + this.text.charCodeAt(start + 1) - 97] : undefined;
    if (symbol === undefined) throw GIVE_UP; // D, T, unknown symbols and long words go to the full parser
    if (end - start === 2 && isCaseTrap(symbol)) this.trap = true;
    this.pos = end;
    const count = this.count();
    if (++this.run >= 3) this.longRun = true;
    if (count) this.run = 0;
    return { kind: 'atom', symbol, massNumber: null, count, span: { start, end: count ? count.span.end : end } };
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
    const count = this.count();
    return { kind: 'group', bracket: open, body, count, span: { start, end: count ? count.span.end : closeEnd } };
  }

  private count(): CountNode | null {
    const start = this.pos;
    let end = start;
    while (end < this.text.length) {
      const c = this.text.charCodeAt(end);
      if (c < 48 || c > 57) break;
      end++;
    }
    if (end === start) return null;
    const next = this.text[end];
    // leading zeros, zero, huge counts and decimal points go to the full parser
    if (this.text.charCodeAt(start) === 48 || end - start > MAX_COUNT_DIGITS || next === '.') throw GIVE_UP;
    this.pos = end;
    return { text: this.text.slice(start, end), integer: true, span: { start, end } };
  }

  notes(components: ComponentNode[]): Note[] {
    return this.trap ? caseTrapNotes(components) : [];
  }
}

