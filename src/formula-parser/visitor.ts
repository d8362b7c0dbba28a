/**
 * Turns the CST from grammar.ts into the typed tree of tree.ts, checking what
 * the grammar cannot: element symbols, nuclides, counts and charges.
 */
import type { CstNode, IToken } from 'chevrotain';
import type { Issue, Note } from '../errors/issue.js';
import { getElement, isElementSymbol } from '../elements/element-table.js';
import { ABBREVIATION_CLASHES, ABBREVIATIONS } from './abbreviations.js';
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
    const { components, charge } = this.visit(cst) as { components: ComponentNode[]; charge: number };
    this.notes.push(...caseTrapNotes(components));
    return { components, charge, issues: this.issues, notes: this.notes };
  }

  private issue(code: Issue['code'], message: string, offset: number, length: number, hint?: string): void {
    const i: Issue = { code, message, column: columnOf(this.text, offset), length };
    if (hint) i.hint = hint;
    this.issues.push(i);
  }

  formula(ctx: Ctx): { components: ComponentNode[]; charge: number } {
    const components = this.visit(node(ctx, 'body')!) as ComponentNode[];
    const c = node(ctx, 'charge');
    return { components, charge: c ? (this.visit(c) as number) : 0 };
  }

  body(ctx: Ctx): ComponentNode[] {
    for (const sep of (ctx.Separator ?? []) as IToken[]) {
      const o = sep.startOffset;
      if (sep.image === '.' && /[0-9]/.test(this.text[o - 1] ?? '') && /[0-9]/.test(this.text[o + 1] ?? '')) {
        this.notes.push({ code: 'DOT_AS_ADDITION', message: `'.' at column ${columnOf(this.text, o)} is read as the addition dot '·' (as in CuSO4·5H2O)`, column: columnOf(this.text, o) });
      }
    }
    return nodes(ctx, 'component').map((c) => this.visit(c) as ComponentNode);
  }

  component(ctx: Ctx): ComponentNode {
    const m = tok(ctx, 'Number');
    const parts = nodes(ctx, 'part').map((p) => this.visit(p) as PartNode);
    const start = m ? m.startOffset : parts[0].span.start;
    return { kind: 'component', multiplier: m ? this.countOf(m.image, m) : null, parts, span: { start, end: parts[parts.length - 1].span.end } };
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
      if (ABBREVIATION_CLASHES.includes(abbr.image)) {
        this.notes.push({
          code: 'ABBREVIATION_CLASH',
          message: `'${abbr.image}' is read as ${ABBREVIATIONS[abbr.image].name} (${ABBREVIATIONS[abbr.image].formula}); with abbreviations off it is the element ${getElement(abbr.image)!.name}`,
          column: columnOf(this.text, abbr.startOffset),
        });
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
        this.issue('UNKNOWN_ISOTOPE', `'${word.image}' already names a hydrogen isotope; it takes no mass number`, start, end - start);
        return placeholder(start, end);
      }
      return this.makeAtom(word.image, Number(fromSuperscript(sup.image)), word.startOffset, start, end);
    }
    if (word.image === 'D' || word.image === 'T') {
      return { kind: 'atom', symbol: 'H', massNumber: word.image === 'D' ? 2 : 3, count: null, span: { start, end } };
    }
    return this.makeAtom(word.image, null, word.startOffset, start, end);
  }

  private makeAtom(symbol: string, massNumber: number | null, symbolOffset: number, start: number, end: number): AtomNode {
    if (!isElementSymbol(symbol)) {
      const hint = unknownSymbolHint(symbol, false);
      this.issue('UNKNOWN_ELEMENT', `unknown element symbol '${symbol}'`, symbolOffset, symbol.length, hint);
    } else if (massNumber !== null && !getNuclide(symbol, massNumber)) {
      this.issue('UNKNOWN_ISOTOPE', `no nuclide ${symbol}-${massNumber} is known (AME2020 lists none)`, start, end - start);
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
    if (n) return this.countOf(n.image, n);
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
      this.issue('COUNT_TOO_LARGE', `count ${text} is too large; counts go up to 999,999,999`, span.start, len);
    } else if (int.length > 1 && int[0] === '0') {
      this.issue('BAD_COUNT', `count '${text}' has a leading zero`, span.start, len);
    } else if (frac.length > MAX_COUNT_DECIMALS) {
      this.issue('BAD_COUNT', `count '${text}' has more than ${MAX_COUNT_DECIMALS} decimals`, span.start, len);
    } else if (/^[0.]+$/.test(text)) {
      this.issue('BAD_COUNT', 'a count of zero; leave the part out instead', span.start, len);
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
        this.issue('AMBIGUOUS_CHARGE', `the '${t.image}' after '${digits[0]}' could mean a charge of ${sign === '+' ? '1+' : '1-'} or of ${digits[0]}${sign}`, t.startOffset, 1,
          `write ${head}${digits[0]}^${sign} for a charge of 1${sign}, or ${head}^${digits[0]}${sign} for ${digits[0]}${sign}`);
        return 0;
      }
    }
    const text = fromSuperscript(t.image.replace(/^\^/, '')).replace('−', '-');
    const sign = text.includes('-') ? -1 : 1;
    const digits = text.replace(/[+-]/g, '');
    const magnitude = digits === '' ? 1 : Number(digits);
    if (magnitude === 0 || digits.length > 2 || magnitude > MAX_CHARGE) {
      this.issue('BAD_CHARGE', magnitude === 0 ? 'a charge of zero; leave it out' : `charge ${digits} is out of range (at most ${MAX_CHARGE})`, t.startOffset, len);
      return 0;
    }
    return sign * magnitude;
  }

}

function placeholder(start: number, end: number): AtomNode {
  return { kind: 'atom', symbol: 'H', massNumber: null, count: null, span: { start, end } };
}
