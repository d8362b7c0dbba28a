/**
 * The typed tree a parsed formula becomes. Offsets are 0-based UTF-16 offsets
 * into the input, `end` exclusive; error messages convert them to columns.
 */
import type { Note } from '../errors/issue.js';

export interface Span {
  start: number;
  end: number;
}

/** A count or multiplier as written, normalised to ASCII digits (`'2'`, `'0.5'`). */
export interface CountNode {
  text: string;
  /** True when the count has no decimal point. */
  integer: boolean;
  span: Span;
}

/** One atom: an element with natural isotopic composition, or a nuclide (`massNumber` set). */
export interface AtomNode {
  kind: 'atom';
  symbol: string;
  massNumber: number | null;
  count: CountNode | null;
  span: Span;
}

/** A bracketed group, or an abbreviation expanded to one (`abbreviation` set). */
export interface GroupNode {
  kind: 'group';
  bracket: '(' | '[' | '{';
  body: ComponentNode[];
  count: CountNode | null;
  span: Span;
  abbreviation?: string;
}

export type PartNode = AtomNode | GroupNode;

/** One component of an addition compound (`5H2O` in `CuSO4·5H2O`), with its multiplier. */
export interface ComponentNode {
  kind: 'component';
  multiplier: CountNode | null;
  parts: PartNode[];
  span: Span;
}

/** A whole parsed formula. */
export interface FormulaTree {
  kind: 'formula';
  input: string;
  components: ComponentNode[];
  /** Net charge in elementary charges (0 when none is written). */
  charge: number;
  notes: Note[];
}

/**
 * Offset just past a token (the lexer tracks start offsets only).
 *
 * @example
 * end({ startOffset: 3, image: 'Cl' }) // 5
 */
export function end(token: { startOffset: number; image: string }): number {
  return token.startOffset + token.image.length;
}
