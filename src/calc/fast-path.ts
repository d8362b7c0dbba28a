/**
 * A hand-written reader for the plain calculations: numbers with an optional
 * `± u` and unit, M(formula), + - * / ^, signs, parentheses and a closing
 * `to`/`in` unit. It reads the tokens exactly as the calculator's lexer does
 * (the same order of tokens, the same unit spellings tried in the same order)
 * and builds exactly the tree the Chevrotain grammar and visitor build. It
 * declines (returns null) anything else: ratios, every lexing or syntax error,
 * an exponent the visitor refuses, too many operations. Those go through the
 * full parser, so every message comes from one place.
 * tests/calc/fast-path.test.ts checks that the two agree.
 */
import { symbolToEnd } from '../sigfig/units.js';
import { MAX_OPERATIONS } from './parse-expression.js';
import { calcUnitSpellings, matchFormulaMass } from './spellings.js';
import type { CalcTree, ExprNode } from './tree.js';
import { MAX_POWER } from './visitor.js';

const enum T {
  Number,
  PlusMinus,
  To,
  Unit,
  Plus,
  Minus,
  Times,
  Divide,
  Caret,
  LParen,
  RParen,
  FormulaMass,
  End,
}

/** The unit spellings by their first character, longest first as the Unit token tries them. */
let unitsByFirst: Map<string, string[]> | undefined;

/** The unit spellings by their first character, longest first (made on first use). */
function unitsStartingWith(ch: string): string[] | undefined {
  if (unitsByFirst === undefined) {
    unitsByFirst = new Map();
    for (const s of calcUnitSpellings()) {
      const list = unitsByFirst.get(s[0]);
      if (list) list.push(s);
      else unitsByFirst.set(s[0], [s]);
    }
  }
  return unitsByFirst.get(ch);
}

const isDigit = (c: number) => c >= 48 && c <= 57;
const isAsciiLetter = (c: number) => (c >= 65 && c <= 90) || (c >= 97 && c <= 122);
/** What may not follow a unit: a letter or a micro sign. */
const isUnitLetter = (c: number) => isAsciiLetter(c) || c === 0xb5 || c === 0x3bc;

/** Thrown to decline; caught in fastParseExpression. */
const DECLINE = { decline: true };

class Reader {
  kinds: T[] = [];
  starts: number[] = [];
  images: string[] = [];
  pos = 0;

  constructor(readonly text: string) {}

  /** The tokens of the text, as the calculator's lexer makes them; false when it would fail (or make a Ratio). */
  lex(): boolean {
    const s = this.text;
    const n = s.length;
    let ops = 0;
    let i = 0;
    while (i < n) {
      const c = s.charCodeAt(i);
      if (c === 32 || c === 9 || c === 0xa0) {
        i++;
        continue;
      }
      const start = i;
      let kind: T;
      let image: string | null = null;
      if (c === 77 /* M */ && s.charCodeAt(i + 1) === 40) {
        const m = matchFormulaMass(s, i);
        if (m !== null) {
          this.push(T.FormulaMass, start, m[0]);
          i += m[0].length;
          continue;
        }
      }
      if (isDigit(c) || (c === 46 && isDigit(s.charCodeAt(i + 1)))) {
        // (?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?
        let j = i;
        if (c === 46) {
          j++;
          while (j < n && isDigit(s.charCodeAt(j))) j++;
        } else {
          while (j < n && isDigit(s.charCodeAt(j))) j++;
          if (s.charCodeAt(j) === 46) {
            j++;
            while (j < n && isDigit(s.charCodeAt(j))) j++;
          }
        }
        const e = s.charCodeAt(j);
        if (e === 101 || e === 69) {
          let k = j + 1;
          const sign = s.charCodeAt(k);
          if (sign === 43 || sign === 45) k++;
          if (isDigit(s.charCodeAt(k))) {
            while (k < n && isDigit(s.charCodeAt(k))) k++;
            j = k;
          }
        }
        this.push(T.Number, start, s.slice(i, j));
        i = j;
        continue;
      }
      if (c === 0xb1) {
        kind = T.PlusMinus;
        image = '±';
      } else if (c === 43 && s.charCodeAt(i + 1) === 47 && s.charCodeAt(i + 2) === 45) {
        kind = T.PlusMinus;
        image = '+/-';
      } else if (c === 43 && s.charCodeAt(i + 1) === 45) {
        kind = T.PlusMinus;
        image = '+-';
      } else if (((c === 116 && s.charCodeAt(i + 1) === 111) || (c === 105 && s.charCodeAt(i + 1) === 110)) && !isAsciiLetter(s.charCodeAt(i + 2))) {
        kind = T.To;
        image = s.slice(i, i + 2);
      } else {
        const unit = this.unitAt(i);
        if (unit !== null) {
          kind = T.Unit;
          image = unit;
        } else if (c === 43) kind = T.Plus;
        else if (c === 45 || c === 0x2212) kind = T.Minus;
        else if (c === 42 || c === 0xd7 || c === 0xb7) kind = T.Times;
        else if (c === 47 || c === 0xf7) kind = T.Divide;
        else if (c === 94) kind = T.Caret;
        else if (c === 40) kind = T.LParen;
        else if (c === 41) kind = T.RParen;
        else return false; // a lexing error, or the start of a ratio's colon
        if (kind >= T.Plus && kind <= T.Caret && ++ops > MAX_OPERATIONS) return false;
        if (image === null) image = s[i];
      }
      this.push(kind, start, image);
      i += image.length;
    }
    this.push(T.End, n, '');
    return true;
  }

  private push(kind: T, start: number, image: string): void {
    this.kinds.push(kind);
    this.starts.push(start);
    this.images.push(image);
  }

  /** The unit spelling the Unit token would match at i, or null. */
  private unitAt(i: number): string | null {
    // a unit's symbol that ends the text is the longest spelling that can match there (any longer
    // one runs past the end): found without the table of every spelling ('0.100 M', '250.0 mL')
    const last = symbolToEnd(this.text, i);
    if (last !== null) return last;
    const list = unitsStartingWith(this.text[i]);
    if (list === undefined) return null;
    for (const u of list) {
      if (this.text.startsWith(u, i) && !isUnitLetter(this.text.charCodeAt(i + u.length))) return u;
    }
    return null;
  }

  private peek(): T {
    return this.kinds[this.pos];
  }

  private expect(kind: T): number {
    if (this.kinds[this.pos] !== kind) throw DECLINE;
    return this.pos++;
  }

  private end(t: number): number {
    return this.starts[t] + this.images[t].length;
  }

  calculation(): { expr: ExprNode; target: { unit: string; start: number } | null } {
    const expr = this.sum();
    let target: { unit: string; start: number } | null = null;
    if (this.peek() === T.To) {
      this.pos++;
      const u = this.expect(T.Unit);
      target = { unit: this.images[u], start: this.starts[u] };
    }
    if (this.peek() !== T.End) throw DECLINE;
    return { expr, target };
  }

  private sum(): ExprNode {
    let acc = this.product();
    while (this.peek() === T.Plus || this.peek() === T.Minus) {
      const op = this.pos++;
      const right = this.product();
      acc = { kind: 'binary', op: this.kinds[op] === T.Plus ? '+' : '-', left: acc, right, opStart: this.starts[op], start: acc.start, end: right.end };
    }
    return acc;
  }

  private product(): ExprNode {
    let acc = this.unary();
    while (this.peek() === T.Times || this.peek() === T.Divide) {
      const op = this.pos++;
      const right = this.unary();
      acc = { kind: 'binary', op: this.kinds[op] === T.Divide ? '/' : '*', left: acc, right, opStart: this.starts[op], start: acc.start, end: right.end };
    }
    return acc;
  }

  private unary(): ExprNode {
    const k = this.peek();
    if (k === T.Minus || k === T.Plus) {
      const sign = this.pos++;
      const operand = this.unary();
      if (k === T.Plus) return operand;
      return { kind: 'negate', operand, start: this.starts[sign], end: operand.end };
    }
    return this.power();
  }

  private power(): ExprNode {
    const base = this.atom();
    if (this.peek() !== T.Caret) return base;
    this.pos++;
    let sign = 1;
    if (this.peek() === T.Minus) {
      this.pos++;
      sign = -1;
    }
    const n = this.expect(T.Number);
    const image = this.images[n];
    // the visitor refuses any other exponent, with its message
    if (!/^[0-9]+$/.test(image) || Number(image) > MAX_POWER) throw DECLINE;
    return { kind: 'power', base, exponent: sign * Number(image), start: base.start, end: this.end(n) };
  }

  private atom(): ExprNode {
    const t = this.pos;
    switch (this.kinds[t]) {
      case T.Number: {
        this.pos++;
        let plusMinus: string | null = null;
        let last = t;
        if (this.peek() === T.PlusMinus) {
          this.pos++;
          last = this.expect(T.Number);
          plusMinus = this.images[last];
        }
        let unit: string | null = null;
        if (this.peek() === T.Unit) {
          last = this.pos++;
          unit = this.images[last];
        }
        return { kind: 'number', text: this.images[t], plusMinus, unit, start: this.starts[t], end: this.end(last) };
      }
      case T.FormulaMass:
        this.pos++;
        return { kind: 'formulaMass', formula: this.images[t].slice(2, -1), start: this.starts[t], end: this.end(t) };
      case T.LParen: {
        this.pos++;
        const inner = this.sum();
        const close = this.expect(T.RParen);
        // a copy with its span widened to the brackets (a spread with fields after it is slow in V8)
        const node = { ...inner };
        node.start = this.starts[t];
        node.end = this.end(close);
        return node;
      }
      default:
        throw DECLINE;
    }
  }
}

/**
 * Reads a plain calculation the fast way, or declines.
 *
 * @param input - the calculation text, already through the calculator's prescan.
 * @returns the expression and its target unit, exactly as the grammar would build them; null for anything the fast reader does not take.
 * @example
 * fastParseExpression('8.80 g + 2.1 g')?.expr.kind // 'binary'
 * fastParseExpression('1:1000') // null
 */
export function fastParseExpression(input: string): Omit<CalcTree, 'input'> | null {
  const r = new Reader(input);
  if (!r.lex()) return null;
  try {
    return r.calculation();
  } catch (e) {
    if (e === DECLINE) return null;
    throw e;
  }
}
