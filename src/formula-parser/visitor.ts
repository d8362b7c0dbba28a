/**
 * Turns the CST from grammar.ts into the typed tree of tree.ts, checking what
 * the grammar cannot: element symbols, nuclides, counts and charges.
 */
import type { IToken } from 'chevrotain';
import type { AtomCstNode, BodyCstNode, ChargeCstNode, ComponentCstNode, CountCstNode, FormulaCstNode, GroupCstNode, PartCstNode } from './cst.js';
import type { Issue, Note, TypedIssue } from '../errors/issue.js';
import { chargeReadingsHint, typedIssue } from '../errors/message.js';
import { lcm } from '../exact/gcd.js';
import { getElement, isElementSymbol } from '../elements/element-table.js';
import { ABBREVIATION_CLASHES, ABBREVIATIONS, REFUSED_ABBREVIATIONS } from './abbreviations.js';
import { REAGENTS } from './names.js';
import { getNuclide } from '../elements/nuclides.js';
import { caseTrapNotes, chargeReadings, unknownSymbolHint } from './hints.js';
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

/**
 * What one build gathers as it walks the tree: made fresh for each formula and passed to every
 * rule's function, so the visitor itself holds nothing between calls (and may be re-entered).
 */
interface Build {
  readonly text: string;
  readonly issues: Issue[];
  readonly notes: Note[];
  readonly expand: (name: string, span: Span) => ComponentNode[];
  readonly abbreviationsRead: Set<string>;
  /** Denominators of fractional multipliers with no exact decimal form (⅓), per component offset. */
  readonly inexact: Map<number, [number, number]>;
}

/** The tree of one parsed formula, with the issues and notes found on the way (issues are returned, not thrown). */
export interface BuiltTree {
  components: ComponentNode[];
  charge: number;
  issues: Issue[];
  notes: Note[];
}

/**
 * Builds the typed tree from the CST of one formula: one function per grammar rule, each given
 * the rule's node (typed by the CST types generated from the grammar, cst.ts) and the build.
 *
 * @example
 * // parse.ts feeds it the grammar's CST of a formula that the fast path declines:
 * parseFormula('[13C]H4').components[0].parts.length // 2
 */
export function buildTree(cst: FormulaCstNode, text: string, expand: (name: string, span: Span) => ComponentNode[]): BuiltTree {
  const b: Build = { text, issues: [], notes: [], expand, abbreviationsRead: new Set(), inexact: new Map() };
  const { components, charge } = formula(b, cst);
  b.notes.push(...caseTrapNotes(components));
  return { components, charge, issues: b.issues, notes: b.notes };
}

/** An issue with its message only (a reading refused with both readings in words). */
function issue(b: Build, code: Issue['code'], message: string, offset: number, length: number, hint?: string): void {
  const i: Issue = { code, message, column: columnOf(b.text, offset), length };
  if (hint) i.hint = hint;
  b.issues.push(i);
}

/** A typed issue: its code and machine fields, at an offset; the message is made from the fields. */
function typed(b: Build, fields: DistributiveOmit<TypedIssue, 'message' | 'column' | 'length'>, offset: number, length: number, hint?: string): void {
  const i: Issue = typedIssue({ ...fields, column: columnOf(b.text, offset), length } as Omit<TypedIssue, 'message'>);
  if (hint) i.hint = hint;
  b.issues.push(i);
}

function formula(b: Build, node: FormulaCstNode): { components: ComponentNode[]; charge: number } {
  const ch = node.children;
  const components = body(b, ch.body[0]);
  const c = ch.charge?.[0];
  return { components, charge: c ? charge(b, c, components) : 0 };
}

function body(b: Build, node: BodyCstNode): ComponentNode[] {
  const components = node.children.component.map((c) => component(b, c));
  for (const sep of node.children.Separator ?? []) {
    const o = sep.startOffset;
    if (sep.image === '.' && /[0-9]/.test(b.text[o - 1] ?? '') && /[0-9½⅓⅔¼¾⅕⅖⅗⅘⅙⅚⅐⅛⅜⅝⅞⅑⅒]/.test(b.text[o + 1] ?? '')) dotBetweenDigits(b, o, components);
  }
  if (b.inexact.size > 0 && components.some((c) => b.inexact.has(c.span.start))) refuseInexact(b, components);
  return components;
}

/** A '.' between a count and a multiplier: the addition dot, said in a note, or refused when a decimal count fits as well. */
function dotBetweenDigits(b: Build, o: number, components: ComponentNode[]): void {
  const col = columnOf(b.text, o);
  const next = components.find((c) => c.span.start === o + 1);
  const asDot = `${b.text.slice(0, o)}·${b.text.slice(o + 1)}`;
  if (!next?.multiplier || !next.multiplier.integer || /^[0-9]+[./]/.test(b.text.slice(o + 1))) {
    // `CaSO4.0.5H2O`, `CaSO4.1/2H2O`: no decimal count can be meant
    b.notes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${col} is read as the addition dot: ${asDot}`, column: col });
    return;
  }
  const before = /[0-9]+$/.exec(b.text.slice(0, o))![0];
  const decimal = `${before}.${next.multiplier.text}`;
  if (SHORTHAND_ADDUCT.test(b.text.slice(next.multiplier.span.end))) {
    b.notes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${col} is read as the addition dot: ${asDot} (not a count of ${decimal})`, column: col });
    return;
  }
  const end = next.multiplier.span.end;
  issue(b, 'AMBIGUOUS_READING', `'.' at column ${col} could be a decimal point (a count of ${decimal}) or the addition dot (${asDot})`, o, 1,
    `write ${asDot} for the addition compound, or put a space after a decimal count (${b.text.slice(0, end)} ${b.text.slice(end)})`);
}

/** Thirds, sixths, …: no exact decimal, so the formula is refused with the whole-number form to write instead. */
function refuseInexact(b: Build, components: ComponentNode[]): void {
  let scale = 1;
  for (const [, [, d]] of b.inexact) scale = lcm(scale, d);
  const texts: string[] = [];
  let whole = true;
  for (const c of components) {
    const f = b.inexact.get(c.span.start);
    const body = b.text.slice(c.parts[0].span.start, c.span.end);
    let m: number;
    if (f) m = (f[0] * scale) / f[1];
    else if (c.multiplier) m = Number(c.multiplier.text) * scale;
    else m = scale;
    if (!Number.isInteger(m)) whole = false;
    texts.push(m === 1 ? body : `${m}${body}`);
  }
  const [first] = [...b.inexact.keys()];
  const [n, d] = b.inexact.get(first)!;
  const hint = whole ? `write whole multipliers instead: ${texts.join('·')} has the same proportions` : 'write whole multipliers instead (multiply every component by the same number)';
  typed(b, { code: 'INEXACT_FRACTION', numerator: n, denominator: d }, first, 1, hint);
}

function component(b: Build, node: ComponentCstNode): ComponentNode {
  const m = node.children.Number?.[0];
  const f = node.children.Fraction?.[0];
  const parts = node.children.part.map((p) => part(b, p));
  const start = m ? m.startOffset : f ? f.startOffset : parts[0].span.start;
  const multiplier = m ? countOf(b, m.image, m) : f ? fractionOf(b, f) : null;
  return { kind: 'component', multiplier, parts, span: { start, end: parts[parts.length - 1].span.end } };
}

/** A fraction as an exact decimal multiplier (½ → 0.5, 3/2 → 1.5); thirds and the like are refused by body(). */
function fractionOf(b: Build, t: IToken): CountNode {
  const span = { start: t.startOffset, end: endOf(t) };
  const [n, d] = VULGAR_FRACTIONS[t.image] ?? (t.image.split('/').map(Number) as [number, number]);
  const len = span.end - span.start;
  if (d === 0) {
    typed(b, { code: 'BAD_COUNT', count: t.image, problem: 'divides-by-zero', limit: null }, span.start, len);
    return { text: '1', integer: true, span };
  }
  if (n === 0) {
    typed(b, { code: 'BAD_COUNT', count: t.image, problem: 'zero-multiplier', limit: null }, span.start, len);
    return { text: '1', integer: true, span };
  }
  let rest = d;
  let twos = 0;
  let fives = 0;
  while (rest % 2 === 0) { rest /= 2; twos++; }
  while (rest % 5 === 0) { rest /= 5; fives++; }
  const places = Math.max(twos, fives);
  if (rest !== 1 || places > MAX_COUNT_DECIMALS || !Number.isSafeInteger(n * 10 ** places) || String(n).length > MAX_COUNT_DIGITS) {
    if (rest !== 1) b.inexact.set(span.start, [n, d]);
    else typed(b, { code: 'BAD_COUNT', count: t.image, problem: 'fraction-decimals', limit: MAX_COUNT_DECIMALS }, span.start, len);
    return { text: '1', integer: true, span };
  }
  const scaled = (n * 10 ** places) / d; // exact: d divides 10^places
  const digits = String(scaled).padStart(places + 1, '0');
  const text = places === 0 ? digits : `${digits.slice(0, -places)}.${digits.slice(-places)}`;
  const normal = text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
  return { text: normal, integer: !normal.includes('.'), span };
}

function part(b: Build, node: PartCstNode): PartNode {
  const ch = node.children;
  const inner: PartNode = ch.atom ? atom(b, ch.atom[0]) : group(b, ch.group![0]);
  const c = ch.count?.[0];
  if (c) {
    inner.count = count(b, c);
    inner.span = { start: inner.span.start, end: inner.count.span.end };
  }
  return inner;
}

function atom(b: Build, node: AtomCstNode): PartNode {
  const ch = node.children;
  const label = ch.IsotopeLabel?.[0];
  if (label) {
    const m = /^\[([0-9]+)([A-Za-z]+)\]$/.exec(label.image)!;
    return makeAtom(b, m[2], Number(m[1]), label.startOffset + 1 + m[1].length, label.startOffset, endOf(label));
  }
  const abbr = ch.Abbreviation?.[0];
  if (abbr) {
    const span = { start: abbr.startOffset, end: endOf(abbr) };
    const known = ABBREVIATIONS[abbr.image] ?? REAGENTS[abbr.image];
    if (!b.abbreviationsRead.has(abbr.image)) {
      b.abbreviationsRead.add(abbr.image);
      const column = columnOf(b.text, abbr.startOffset);
      if (ABBREVIATION_CLASHES.includes(abbr.image)) {
        const element = getElement(abbr.image);
        const other = element ? `the element ${element.name}` : `the elements ${abbr.image.match(/[A-Z][a-z]?/g)!.join(', ')}`;
        b.notes.push({ code: 'ABBREVIATION_CLASH', message: `'${abbr.image}' is read as ${known.name} (${known.formula}), not as ${other}`, column });
      } else {
        b.notes.push({ code: 'ABBREVIATION', message: `'${abbr.image}' is read as ${known.name} (${known.formula})`, column });
      }
    }
    const group: GroupNode = { kind: 'group', bracket: '(', body: b.expand(abbr.image, span), count: null, span, abbreviation: abbr.image };
    return group;
  }
  const sup = ch.SuperscriptDigits?.[0];
  const word = ch.Word![0];
  const start = sup ? sup.startOffset : word.startOffset;
  const end = endOf(word);
  if (sup) {
    if (word.image === 'D' || word.image === 'T') {
      typed(b, { code: 'UNKNOWN_ISOTOPE', symbol: word.image, massNumber: null }, start, end - start);
      return placeholder(start, end);
    }
    return makeAtom(b, word.image, Number(fromSuperscript(sup.image)), word.startOffset, start, end);
  }
  if (word.image === 'D' || word.image === 'T') {
    return { kind: 'atom', symbol: 'H', massNumber: word.image === 'D' ? 2 : 3, count: null, span: { start, end } };
  }
  if (Object.hasOwn(REFUSED_ABBREVIATIONS, word.image) && b.issues.some((i) => i.code === 'AMBIGUOUS_READING' && i.message === REFUSED_ABBREVIATIONS[word.image])) {
    return placeholder(start, end); // said once
  }
  if (Object.hasOwn(REFUSED_ABBREVIATIONS, word.image)) {
    const asPy = b.text.replace(/Py(?![a-z])/g, (_m, at: number) => (/[A-Za-z]/.test(b.text[at - 1] ?? '') ? '(py)' : 'py'));
    const asPyridyl = b.text.replace(/Py(?![a-z])/g, '(C5H4N)').replace(/\(\((C5H4N)\)\)/g, '($1)');
    issue(b, 'AMBIGUOUS_READING', REFUSED_ABBREVIATIONS[word.image], start, end - start, `write ${asPy} for pyridine (py, C5H5N), or ${asPyridyl} for pyridyl`);
    return placeholder(start, end);
  }
  return makeAtom(b, word.image, null, word.startOffset, start, end);
}

function makeAtom(b: Build, symbol: string, massNumber: number | null, symbolOffset: number, start: number, end: number): AtomNode {
  if (!isElementSymbol(symbol)) {
    b.issues.push(unknownElement(b.text, symbol, symbolOffset));
  } else if (massNumber !== null && !getNuclide(symbol, massNumber)) {
    typed(b, { code: 'UNKNOWN_ISOTOPE', symbol, massNumber }, start, end - start);
  }
  return { kind: 'atom', symbol, massNumber, count: null, span: { start, end } };
}

function group(b: Build, node: GroupCstNode): GroupNode {
  const ch = node.children;
  const open = (ch.LParen ?? ch.LSquare ?? ch.LCurly)![0];
  const close = (ch.RParen ?? ch.RSquare ?? ch.RCurly)![0];
  return {
    kind: 'group',
    bracket: open.image as GroupNode['bracket'],
    body: body(b, ch.body![0]),
    count: null,
    span: { start: open.startOffset, end: endOf(close) },
  };
}

function count(b: Build, node: CountCstNode): CountNode {
  const n = node.children.Number?.[0];
  if (n) {
    // a decimal count is read as written (Fe0.95O, YBa2Cu3O6.5), and said: 'CuSO4.5' may be a
    // hydrate cut short as well as 4.5 O
    if (/^[1-9][0-9]*\.[0-9]{1,2}$/.test(n.image)) {
      const col = columnOf(b.text, n.startOffset);
      b.notes.push({ code: 'DECIMAL_COUNT', message: `'${n.image}' at column ${col} is read as a decimal count; for an addition compound write the dot and its part (CuSO4·5H2O)`, column: col });
    }
    return countOf(b, n.image, n);
  }
  const s = node.children.SubscriptDigits![0];
  return countOf(b, fromSubscript(s.image), s);
}

function countOf(b: Build, text: string, t: IToken): CountNode {
  const span = { start: t.startOffset, end: endOf(t) };
  const dot = text.indexOf('.');
  const int = dot < 0 ? text : text.slice(0, dot);
  const frac = dot < 0 ? '' : text.slice(dot + 1);
  const len = span.end - span.start;
  if (int.length > MAX_COUNT_DIGITS) {
    typed(b, { code: 'COUNT_TOO_LARGE', count: text, limit: 10 ** MAX_COUNT_DIGITS - 1 }, span.start, len);
  } else if (int.length > 1 && int[0] === '0') {
    typed(b, { code: 'BAD_COUNT', count: text, problem: 'leading-zero', limit: null }, span.start, len);
  } else if (frac.length > MAX_COUNT_DECIMALS) {
    typed(b, { code: 'BAD_COUNT', count: text, problem: 'decimals', limit: MAX_COUNT_DECIMALS }, span.start, len);
  } else if (/^[0.]+$/.test(text)) {
    typed(b, { code: 'BAD_COUNT', count: text, problem: 'zero', limit: null }, span.start, len);
  }
  const normal = frac.replace(/0+$/, '');
  return { text: normal ? `${int}.${normal}` : int, integer: normal === '', span };
}

function charge(b: Build, node: ChargeCstNode, components: ComponentNode[]): number {
  const ch = node.children;
  const t = (ch.CaretCharge ?? ch.SuperscriptCharge ?? ch.Sign)![0];
  const len = endOf(t) - t.startOffset;
  if (t.tokenType.name === 'Sign') {
    const before = b.text.slice(0, t.startOffset);
    const digits = /[0-9]+$/.exec(before);
    if (digits) {
      const head = before.slice(0, before.length - digits[0].length);
      const sign = t.image === '+' ? '+' : '-';
      // every split of the digits into a count and a charge, the likeliest first (SO4^2- for SO42-)
      const parts = components.length === 1 ? components[0].parts : [];
      const loneAtom = parts.length === 1 && parts[0].kind === 'atom';
      // after a decimal point the count is the whole decimal (C2.53+: 2.5 and 3+, or 2.53 and 1+)
      const point = /[0-9]+\.$/.exec(head)?.[0] ?? '';
      const readings = chargeReadings(digits[0], loneAtom, point !== '', MAX_CHARGE).map((r) => ({ ...r, count: point + r.count }));
      typed(b, { code: 'AMBIGUOUS_CHARGE', written: t.image, digits: digits[0], sign }, t.startOffset, 1, chargeReadingsHint(head.slice(0, head.length - point.length), sign, readings));
      return 0;
    }
  }
  const text = fromSuperscript(t.image.replace(/^\^/, '')).replace('−', '-');
  const sign = text.includes('-') ? -1 : 1;
  const digits = text.replace(/[+-]/g, '');
  const magnitude = digits === '' ? 1 : Number(digits);
  if (magnitude === 0 || digits.length > 2 || magnitude > MAX_CHARGE) {
    typed(b, { code: 'BAD_CHARGE', charge: digits === '' ? '1' : digits, limit: MAX_CHARGE }, t.startOffset, len);
    return 0;
  }
  return sign * magnitude;
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
