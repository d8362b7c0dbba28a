/**
 * Turns the calculator's CST into an expression tree.
 */
import type { CstNode, IToken } from 'chevrotain';
import { fail } from '../errors/pondus-error.js';
import { columnOf } from '../formula-parser/prescan.js';
import type { ExprNode } from './tree.js';

type Ctx = Record<string, (CstNode | IToken)[] | undefined>;
const toks = (ctx: Ctx, name: string): IToken[] => (ctx[name] ?? []) as IToken[];
const nodes = (ctx: Ctx, name: string): CstNode[] => (ctx[name] ?? []) as CstNode[];
const end = (t: IToken) => t.startOffset + t.image.length;

/** Largest integer exponent accepted after ^. */
export const MAX_POWER = 100;

/**
 * A CST visitor: each grammar rule has a method of the same name that receives
 * the rule's children. (It dispatches on the node name itself rather than
 * extending Chevrotain's generated base class, so that the grammar is built only
 * when a formula actually needs it.)
 */
export class ExprBuilder {
  private text = '';

  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  private visit(node: CstNode): any {
    return (this as unknown as Record<string, (ctx: Ctx) => unknown>)[node.name](node.children as Ctx);
  }

  build(cst: CstNode, text: string): { expr: ExprNode; target: { unit: string; start: number } | null } {
    this.text = text;
    return this.visit(cst);
  }

  calculation(ctx: Ctx): { expr: ExprNode; target: { unit: string; start: number } | null } {
    const expr = this.visit(nodes(ctx, 'sum')[0]) as ExprNode;
    const unit = toks(ctx, 'Unit')[0];
    return { expr, target: unit ? { unit: unit.image, start: unit.startOffset } : null };
  }

  /** Left-associative chain of binary operators. */
  private chain(operands: ExprNode[], ops: IToken[]): ExprNode {
    ops.sort((a, b) => a.startOffset - b.startOffset);
    let acc = operands[0];
    for (let i = 0; i < ops.length; i++) {
      const right = operands[i + 1];
      const image = ops[i].image;
      const op = image === '+' ? '+' : image === '-' || image === '−' ? '-' : image === '/' || image === '÷' ? '/' : '*';
      acc = { kind: 'binary', op, left: acc, right, opStart: ops[i].startOffset, start: acc.start, end: right.end };
    }
    return acc;
  }

  sum(ctx: Ctx): ExprNode {
    return this.chain(nodes(ctx, 'product').map((n) => this.visit(n) as ExprNode), [...toks(ctx, 'Plus'), ...toks(ctx, 'Minus')]);
  }

  product(ctx: Ctx): ExprNode {
    return this.chain(nodes(ctx, 'unary').map((n) => this.visit(n) as ExprNode), [...toks(ctx, 'Times'), ...toks(ctx, 'Divide')]);
  }

  unary(ctx: Ctx): ExprNode {
    const inner = nodes(ctx, 'unary')[0];
    if (inner) {
      const operand = this.visit(inner) as ExprNode;
      const minus = toks(ctx, 'Minus')[0];
      if (!minus) return operand;
      return { kind: 'negate', operand, start: minus.startOffset, end: operand.end };
    }
    return this.visit(nodes(ctx, 'power')[0]) as ExprNode;
  }

  power(ctx: Ctx): ExprNode {
    const base = this.visit(nodes(ctx, 'atom')[0]) as ExprNode;
    const n = toks(ctx, 'NumberLiteral')[0];
    if (!n) return base;
    if (!/^[0-9]+$/.test(n.image) || Number(n.image) > MAX_POWER) {
      throw fail({ code: 'BAD_EXPRESSION', message: `an exponent must be a whole number up to ${MAX_POWER}; got '${n.image}'`, column: columnOf(this.text, n.startOffset), length: n.image.length }, this.text);
    }
    const sign = toks(ctx, 'Minus').length ? -1 : 1;
    return { kind: 'power', base, exponent: sign * Number(n.image), start: base.start, end: end(n) };
  }

  atom(ctx: Ctx): ExprNode {
    const q = nodes(ctx, 'quantity')[0];
    if (q) return this.visit(q) as ExprNode;
    const r = nodes(ctx, 'ratio')[0];
    if (r) return this.visit(r) as ExprNode;
    const fm = toks(ctx, 'FormulaMass')[0];
    if (fm) return { kind: 'formulaMass', formula: fm.image.slice(2, -1), start: fm.startOffset, end: end(fm) };
    const open = toks(ctx, 'LParen')[0];
    const close = toks(ctx, 'RParen')[0];
    const inner = this.visit(nodes(ctx, 'sum')[0]) as ExprNode;
    return { ...inner, start: open.startOffset, end: end(close) };
  }

  ratio(ctx: Ctx): ExprNode {
    const r = toks(ctx, 'Ratio')[0];
    const unit = toks(ctx, 'Unit')[0];
    const [parts, whole] = r.image.split(':').map((x) => x.trim());
    return { kind: 'ratio', text: r.image, parts, whole, unit: unit?.image ?? null, start: r.startOffset, end: end(unit ?? r) };
  }

  quantity(ctx: Ctx): ExprNode {
    const nums = toks(ctx, 'NumberLiteral');
    const unit = toks(ctx, 'Unit')[0];
    const last = unit ?? nums[nums.length - 1];
    return { kind: 'number', text: nums[0].image, plusMinus: nums[1]?.image ?? null, unit: unit?.image ?? null, start: nums[0].startOffset, end: end(last) };
  }
}
