/** The expression tree the calculator's visitor builds. Offsets are 0-based. */

export type ExprNode =
  | { kind: 'number'; text: string; plusMinus: string | null; unit: string | null; start: number; end: number }
  /** `1:1000`: `parts` of something in `whole`; `text` is the ratio as written. */
  | { kind: 'ratio'; text: string; parts: string; whole: string; unit: string | null; start: number; end: number }
  | { kind: 'formulaMass'; formula: string; start: number; end: number }
  | { kind: 'binary'; op: '+' | '-' | '*' | '/'; left: ExprNode; right: ExprNode; opStart: number; start: number; end: number }
  | { kind: 'negate'; operand: ExprNode; start: number; end: number }
  | { kind: 'power'; base: ExprNode; exponent: number; start: number; end: number };

export interface CalcTree {
  input: string;
  expr: ExprNode;
  /** Unit asked for with `to`/`in`. */
  target: { unit: string; start: number } | null;
}
