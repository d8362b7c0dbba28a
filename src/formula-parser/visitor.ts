/**
 * Turns the CST from grammar.ts into the typed tree of tree.ts, checking what
 * the grammar cannot: element symbols, nuclides, counts and charges.
 */
import type { CstNode, IToken } from 'chevrotain';
import type { Issue, Note, TypedIssue } from '../errors/issue.js';
import { typedIssue } from '../errors/message.js';
import { lcm } from '../exact/gcd.js';
import { getElement, isElementSymbol } from '../elements/element-table.js';
import { ABBREVIATION_CLASHES, ABBREVIATIONS, REFUSED_ABBREVIATIONS } from './abbreviations.js';
import { REAGENTS } from './names.js';
import { getNuclide } from '../elements/nuclides.js';
import { caseTrapNotes, unknownSymbolHint } from './hints.js';
import { columnOf } from './prescan.js';
import { end as endOf, type AtomNode, type ComponentNode, type CountNode, type GroupNode, type PartNode, type Span } from './tree.js';

/** Largest integer part of a count. */
export const MAX_COUNT_DIGITS = 9;
/** Most decimals in a count. */
export const MAX_COUNT_DECIMALS = 6;
/** Largest charge magnitude accepted. */
export const MAX_CHARGE = 99;

/** How letters that could be abbreviations are read: elements only, the default, or every abbreviation. */
export type ReadingMode = 'elements' | 'plain' | 'abbreviations';

/** Unicode vulgar fractions as numerator and denominator. */
const VULGAR_FRACTIONS: Record<string, [number, number]> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5], '⅗': [3, 5], '⅘': [4, 5],
  '⅙': [1, 6], '⅚': [5, 6], '⅐': [1, 7], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8], '⅞': [7, 8], '⅑': [1, 9], '⅒': [1, 10],
};

/** Adducts read after the `CuSO4.5H2O` shorthand dot without asking: water, heavy water, ammonia. */
const SHORTHAND_ADDUCT = /^(?:H2O|D2O|NH3)(?![a-z0-9₀-₉])/;

const SUPERSCRIPT: Record<string, string> = {
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁺': '+', '⁻': '-',
};

function fromSuperscript(s: string): string {
  let out = '';
  for (const ch of s) out += SUPERSCRIPT[ch] ?? ch;
  return out;
}

function fromSubscript(s: string): string {
  let out = '';
  for (let i = 0; i < s.length; i++) out += String.fromCharCode(s.charCodeAt(i) - 0x2080 + 48);
  return out;
}

/** Omit over each member of a union (so the fields of each code stay tied to it). */
type DistributiveOmit<T, K extends PropertyKey> = T extends unknown ? Omit<T, K> : never;

type Ctx = Record<string, (CstNode | IToken)[] | undefined>;

const tok = (ctx: Ctx, name: string): IToken | undefined => ctx[name]?.[0] as IToken | undefined;
const node = (ctx: Ctx, name: string): CstNode | undefined => ctx[name]?.[0] as CstNode | undefined;
const nodes = (ctx: Ctx, name: string): CstNode[] => (ctx[name] ?? []) as CstNode[];

/** Builds the typed tree; one instance is reused, with per-call state reset by {@link TreeBuilder.build}. */
/**
 * A CST visitor: each grammar rule has a method of the same name that receives
 * the rule's children. (It dispatches on the node name itself rather than
 * extending Chevrotain's generated base class, so that the grammar is built only
 * when a formula actually needs it.)
 */
export class TreeBuilder {
  private text = '';
  private issues: Issue[] = [];
  private notes: Note[] = [];
  private expand: (name: string, span: Span) => ComponentNode[] = () => [];
  private abbreviationsRead = new Set<string>();
  /** Denominators of fractional multipliers with no exact decimal form (⅓), per component offset. */
  private inexact = new Map<number, [number, number]>();

  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  private visit(node: CstNode): any {
    return (this as unknown as Record<string, (ctx: Ctx) => unknown>)[node.name](node.children as Ctx);
  }

  /** Builds the tree for one parsed formula. Issues found are returned, not thrown. */
  build(cst: CstNode, text: string, expand: (name: string, span: Span) => ComponentNode[]): { components: ComponentNode[]; charge: number; issues: Issue[]; notes: Note[] } {
    this.text = text;
    this.issues = [];
    this.notes = [];
    this.expand = expand;
    this.abbreviationsRead = new Set();
    this.inexact = new Map();
    const { components, charge } = this.visit(cst) as { components: ComponentNode[]; charge: number };
    this.notes.push(...caseTrapNotes(components));
    return { components, charge, issues: this.issues, notes: this.notes };
  }

  /** An issue with its message only (a reading refused with both readings in words). */
  private issue(code: Issue['code'], message: string, offset: number, length: number, hint?: string): void {
    const i: Issue = { code, message, column: columnOf(this.text, offset), length };
    if (hint) i.hint = hint;
    this.issues.push(i);
  }

  /** A typed issue: its code and machine fields, at an offset; the message is made from the fields. */
  private typed(fields: DistributiveOmit<TypedIssue, 'message' | 'column' | 'length'>, offset: number, length: number, hint?: string): void {
    const i: Issue = typedIssue({ ...fields, column: columnOf(this.text, offset), length } as Omit<TypedIssue, 'message'>);
    if (hint) i.hint = hint;
    this.issues.push(i);
  }

  formula(ctx: Ctx): { components: ComponentNode[]; charge: number } {
    const components = this.visit(node(ctx, 'body')!) as ComponentNode[];
    const c = node(ctx, 'charge');
    return { components, charge: c ? (this.visit(c) as number) : 0 };
  }

  body(ctx: Ctx): ComponentNode[] {
    const components = nodes(ctx, 'component').map((c) => this.visit(c) as ComponentNode);
    for (const sep of (ctx.Separator ?? []) as IToken[]) {
      const o = sep.startOffset;
      if (sep.image === '.' && /[0-9]/.test(this.text[o - 1] ?? '') && /[0-9½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒]/.test(this.text[o + 1] ?? '')) this.dotBetweenDigits(o, components);
    }
    if (this.inexact.size > 0 && components.some((c) => this.inexact.has(c.span.start))) this.refuseInexact(components);
    return components;
  }

  /** A '.' between a count and a multiplier: the addition dot, said in a note, or refused when a decimal count fits as well. */
  private dotBetweenDigits(o: number, components: ComponentNode[]): void {
    const col = columnOf(this.text, o);
    const next = components.find((c) => c.span.start === o + 1);
    const asDot = `${this.text.slice(0, o)}·${this.text.slice(o + 1)}`;
    if (!next?.multiplier || !next.multiplier.integer || /^[0-9]+[./]/.test(this.text.slice(o + 1))) {
      // `CaSO4.0.5H2O`, `CaSO4.1/2H2O`: no decimal count can be meant
      this.notes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${col} is read as the addition dot: ${asDot}`, column: col });
      return;
    }
    const before = /[0-9]+$/.exec(this.text.slice(0, o))![0];
    const decimal = `${before}.${next.multiplier.text}`;
    if (SHORTHAND_ADDUCT.test(this.text.slice(next.multiplier.span.end))) {
      this.notes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${col} is read as the addition dot: ${asDot} (not a count of ${decimal})`, column: col });
      return;
    }
    const end = next.multiplier.span.end;
    this.issue('AMBIGUOUS_READING', `'.' at column ${col} could be a decimal point (a count of ${decimal}) or the addition dot (${asDot})`, o, 1,
      `write ${asDot} for the addition compound, or put a space after a decimal count (${this.text.slice(0, end)} ${this.text.slice(end)})`);
  }

  /** Thirds, sixths, …: no exact decimal, so the formula is refused with the whole-number form to write instead. */
  private refuseInexact(components: ComponentNode[]): void {
    let scale = 1;
    for (const [, [, d]] of this.inexact) scale = lcm(scale, d);
    const texts: string[] = [];
    let whole = true;
    for (const c of components) {
      const f = this.inexact.get(c.span.start);
      const body = this.text.slice(c.parts[0].span.start, c.span.end);
      let m: number;
      if (f) m = (f[0] * scale) / f[1];
      else if (c.multiplier) m = Number(c.multiplier.text) * scale;
      else m = scale;
      if (!Number.isInteger(m)) whole = false;
      texts.push(m === 1 ? body : `${m}${body}`);
    }
    const [first] = [...this.inexact.keys()];
    const [n, d] = this.inexact.get(first)!;
    const hint = whole ? `write whole multipliers instead: ${texts.join('·')} has the same proportions` : 'write whole multipliers instead (multiply every component by the same number)';
    this.typed({ code: 'INEXACT_FRACTION', numerator: n, denominator: d }, first, 1, hint);
  }

  component(ctx: Ctx): ComponentNode {
    const m = tok(ctx, 'Number');
    const f = tok(ctx, 'Fraction');
    const parts = nodes(ctx, 'part').map((p) => this.visit(p) as PartNode);
    const start = m ? m.startOffset : f ? f.startOffset : parts[0].span.start;
    const multiplier = m ? this.countOf(m.image, m) : f ? this.fractionOf(f) : null;
    return { kind: 'component', multiplier, parts, span: { start, end: parts[parts.length - 1].span.end } };
  }

  /** A fraction as an exact decimal multiplier (½ → 0.5, 3/2 → 1.5); thirds and the like are refused by body(). */
  private fractionOf(t: IToken): CountNode {
    const span = { start: t.startOffset, end: endOf(t) };
    const [n, d] = VULGAR_FRACTIONS[t.image] ?? (t.image.split('/').map(Number) as [number, number]);
    const len = span.end - span.start;
    if (d === 0) {
      this.typed({ code: 'BAD_COUNT', count: t.image, problem: 'divides-by-zero', limit: null }, span.start, len);
      return { text: '1', integer: true, span };
    }
    if (n === 0) {
      this.typed({ code: 'BAD_COUNT', count: t.image, problem: 'zero-multiplier', limit: null }, span.start, len);
      return { text: '1', integer: true, span };
    }
    let rest = d;
    let twos = 0;
    let fives = 0;
    while (rest % 2 === 0) { rest /= 2; twos++; }
    while (rest % 5 === 0) { rest /= 5; fives++; }
    const places = Math.max(twos, fives);
    if (rest !== 1 || places > MAX_COUNT_DECIMALS || !Number.isSafeInteger(n * 10 ** places) || String(n).length > MAX_COUNT_DIGITS) {
      if (rest !== 1) this.inexact.set(span.start, [n, d]);
      else this.typed({ code: 'BAD_COUNT', count: t.image, problem: 'fraction-decimals', limit: MAX_COUNT_DECIMALS }, span.start, len);
      return { text: '1', integer: true, span };
    }
    const scaled = (n * 10 ** places) / d; // exact: d divides 10^places
    const digits = String(scaled).padStart(places + 1, '0');
    const text = places === 0 ? digits : `${digits.slice(0, -places)}.${digits.slice(-places)}`;
    const normal = text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
    return { text: normal, integer: !normal.includes('.'), span };
  }

  part(ctx: Ctx): PartNode {
    const inner = (node(ctx, 'atom') ? this.visit(node(ctx, 'atom')!) : this.visit(node(ctx, 'group')!)) as PartNode;
    const c = node(ctx, 'count');
    if (c) {
      inner.count = this.visit(c) as CountNode;
      inner.span = { start: inner.span.start, end: inner.count.span.end };
    }
    return inner;
  }

  atom(ctx: Ctx): PartNode {
    const label = tok(ctx, 'IsotopeLabel');
    if (label) {
      const m = /^\[([0-9]+)([A-Za-z]+)\]$/.exec(label.image)!;
      return this.makeAtom(m[2], Number(m[1]), label.startOffset + 1 + m[1].length, label.startOffset, endOf(label));
    }
    const abbr = tok(ctx, 'Abbreviation');
    if (abbr) {
      const span = { start: abbr.startOffset, end: endOf(abbr) };
      const known = ABBREVIATIONS[abbr.image] ?? REAGENTS[abbr.image];
      if (!this.abbreviationsRead.has(abbr.image)) {
        this.abbreviationsRead.add(abbr.image);
        const column = columnOf(this.text, abbr.startOffset);
        if (ABBREVIATION_CLASHES.includes(abbr.image)) {
          const element = getElement(abbr.image);
          const other = element ? `the element ${element.name}` : `the elements ${abbr.image.match(/[A-Z][a-z]?/g)!.join(', ')}`;
          this.notes.push({ code: 'ABBREVIATION_CLASH', message: `'${abbr.image}' is read as ${known.name} (${known.formula}), not as ${other}`, column });
        } else {
          this.notes.push({ code: 'ABBREVIATION', message: `'${abbr.image}' is read as ${known.name} (${known.formula})`, column });
        }
      }
      const group: GroupNode = { kind: 'group', bracket: '(', body: this.expand(abbr.image, span), count: null, span, abbreviation: abbr.image };
      return group;
    }
    const sup = tok(ctx, 'SuperscriptDigits');
    const word = tok(ctx, 'Word')!;
    const start = sup ? sup.startOffset : word.startOffset;
    const end = endOf(word);
    if (sup) {
      if (word.image === 'D' || word.image === 'T') {
        this.typed({ code: 'UNKNOWN_ISOTOPE', symbol: word.image, massNumber: null }, start, end - start);
        return placeholder(start, end);
      }
      return this.makeAtom(word.image, Number(fromSuperscript(sup.image)), word.startOffset, start, end);
    }
    if (word.image === 'D' || word.image === 'T') {
      return { kind: 'atom', symbol: 'H', massNumber: word.image === 'D' ? 2 : 3, count: null, span: { start, end } };
    }
    if (Object.hasOwn(REFUSED_ABBREVIATIONS, word.image) && this.issues.some((i) => i.code === 'AMBIGUOUS_READING' && i.message === REFUSED_ABBREVIATIONS[word.image])) {
      return placeholder(start, end); // said once
    }
    if (Object.hasOwn(REFUSED_ABBREVIATIONS, word.image)) {
      const asPy = this.text.replace(/Py(?![a-z])/g, (_m, at: number) => (/[A-Za-z]/.test(this.text[at - 1] ?? '') ? '(py)' : 'py'));
      const asPyridyl = this.text.replace(/Py(?![a-z])/g, '(C5H4N)').replace(/\(\((C5H4N)\)\)/g, '($1)');
      this.issue('AMBIGUOUS_READING', REFUSED_ABBREVIATIONS[word.image], start, end - start, `write ${asPy} for pyridine (py, C5H5N), or ${asPyridyl} for pyridyl`);
      return placeholder(start, end);
    }
    return this.makeAtom(word.image, null, word.startOffset, start, end);
  }

  private makeAtom(symbol: string, massNumber: number | null, symbolOffset: number, start: number, end: number): AtomNode {
    if (!isElementSymbol(symbol)) {
      this.issues.push(unknownElement(this.text, symbol, symbolOffset));
    } else if (massNumber !== null && !getNuclide(symbol, massNumber)) {
      this.typed({ code: 'UNKNOWN_ISOTOPE', symbol, massNumber }, start, end - start);
    }
    return { kind: 'atom', symbol, massNumber, count: null, span: { start, end } };
  }

  group(ctx: Ctx): GroupNode {
    const open = (tok(ctx, 'LParen') ?? tok(ctx, 'LSquare') ?? tok(ctx, 'LCurly'))!;
    const close = (tok(ctx, 'RParen') ?? tok(ctx, 'RSquare') ?? tok(ctx, 'RCurly'))!;
    return {
      kind: 'group',
      bracket: open.image as GroupNode['bracket'],
      body: this.visit(node(ctx, 'body')!) as ComponentNode[],
      count: null,
      span: { start: open.startOffset, end: endOf(close) },
    };
  }

  count(ctx: Ctx): CountNode {
    const n = tok(ctx, 'Number');
    if (n) {
      // a decimal count is read as written (Fe0.95O, YBa2Cu3O6.5), and said: 'CuSO4.5' may be a
      // hydrate cut short as well as 4.5 O
      if (/^[1-9][0-9]*\.[0-9]{1,2}$/.test(n.image)) {
        const col = columnOf(this.text, n.startOffset);
        this.notes.push({ code: 'DECIMAL_COUNT', message: `'${n.image}' at column ${col} is read as a decimal count; for an addition compound write the dot and its part (CuSO4·5H2O)`, column: col });
      }
      return this.countOf(n.image, n);
    }
    const s = tok(ctx, 'SubscriptDigits')!;
    return this.countOf(fromSubscript(s.image), s);
  }

  private countOf(text: string, t: IToken): CountNode {
    const span = { start: t.startOffset, end: endOf(t) };
    const dot = text.indexOf('.');
    const int = dot < 0 ? text : text.slice(0, dot);
    const frac = dot < 0 ? '' : text.slice(dot + 1);
    const len = span.end - span.start;
    if (int.length > MAX_COUNT_DIGITS) {
      this.typed({ code: 'COUNT_TOO_LARGE', count: text, limit: 10 ** MAX_COUNT_DIGITS - 1 }, span.start, len);
    } else if (int.length > 1 && int[0] === '0') {
      this.typed({ code: 'BAD_COUNT', count: text, problem: 'leading-zero', limit: null }, span.start, len);
    } else if (frac.length > MAX_COUNT_DECIMALS) {
      this.typed({ code: 'BAD_COUNT', count: text, problem: 'decimals', limit: MAX_COUNT_DECIMALS }, span.start, len);
    } else if (/^[0.]+$/.test(text)) {
      this.typed({ code: 'BAD_COUNT', count: text, problem: 'zero', limit: null }, span.start, len);
    }
    const normal = frac.replace(/0+$/, '');
    return { text: normal ? `${int}.${normal}` : int, integer: normal === '', span };
  }

  charge(ctx: Ctx): number {
    const t = (tok(ctx, 'CaretCharge') ?? tok(ctx, 'SuperscriptCharge') ?? tok(ctx, 'Sign'))!;
    const len = endOf(t) - t.startOffset;
    if (t.tokenType.name === 'Sign') {
      const before = this.text.slice(0, t.startOffset);
      const digits = /[0-9]+$/.exec(before);
      if (digits) {
        const head = before.slice(0, before.length - digits[0].length);
        const sign = t.image === '+' ? '+' : '-';
        this.typed({ code: 'AMBIGUOUS_CHARGE', written: t.image, digits: digits[0], sign }, t.startOffset, 1,
          `write ${head}${digits[0]}^${sign} for a charge of 1${sign}, or ${head}^${digits[0]}${sign} for ${digits[0]}${sign}`);
        return 0;
      }
    }
    const text = fromSuperscript(t.image.replace(/^\^/, '')).replace('−', '-');
    const sign = text.includes('-') ? -1 : 1;
    const digits = text.replace(/[+-]/g, '');
    const magnitude = digits === '' ? 1 : Number(digits);
    if (magnitude === 0 || digits.length > 2 || magnitude > MAX_CHARGE) {
      this.typed({ code: 'BAD_CHARGE', charge: digits === '' ? '1' : digits, limit: MAX_CHARGE }, t.startOffset, len);
      return 0;
    }
    return sign * magnitude;
  }

}

/**
 * The issue for a word that is no element symbol, at its offset in the text, with the short hint
 * (parse.ts may replace it with one that looks at the whole formula).
 *
 * @example
 * unknownElement('XxO', 'Xx', 0).column // 1
 */
export function unknownElement(text: string, symbol: string, offset: number): Issue {
  const i: Issue = typedIssue({ code: 'UNKNOWN_ELEMENT', symbol, column: columnOf(text, offset), length: symbol.length });
  const hint = unknownSymbolHint(symbol, false);
  if (hint) i.hint = hint;
  return i;
}

function placeholder(start: number, end: number): AtomNode {
  return { kind: 'atom', symbol: 'H', massNumber: null, count: null, span: { start, end } };
}
