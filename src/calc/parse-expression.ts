/**
 * Parses a calculator expression into a tree; no evaluation here.
 */
import type { IRecognitionException } from 'chevrotain';
import type { Issue } from '../errors/issue.js';
import { PondusError } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import { columnOf } from '../formula-parser/prescan.js';
import { notReadHint, UNIT_SYMBOLS } from '../sigfig/units.js';
import { fastParseExpression } from './fast-path.js';
import { calcFullGrammar } from './grammar-loader.js';
import type { CalcTree } from './tree.js';
import { ExprBuilder } from './visitor.js';

/** Longest expression accepted. */
export const MAX_EXPRESSION_LENGTH = 10_000;
/** Deepest parenthesis nesting accepted. */
export const MAX_EXPRESSION_NESTING = 32;
/** Most signs in a row (`--1`): each one nests the rest of the expression one level deeper. */
export const MAX_SIGNS_IN_A_ROW = 4;
/** Most operators in one expression: the tree is evaluated recursively, one level per operator. */
export const MAX_OPERATIONS = 500;

let builder: ExprBuilder | null = null;

/**
 * Parses a calculation such as `0.100 M * 250.0 mL * M(CuSO4·5H2O) to g`.
 *
 * @param input - the calculation text.
 * @returns the expression tree and the target unit after `to`, if any; nothing is computed.
 * @throws PondusError: EMPTY_INPUT, INPUT_TOO_LONG (over the length or 500 operations), CONTROL_CHARACTER, NESTING_TOO_DEEP, UNCLOSED_GROUP, UNMATCHED_CLOSING, UNKNOWN_UNIT for an unknown word, UNEXPECTED_CHARACTER, BAD_EXPRESSION for bad syntax or an exponent that is not a whole number up to 100; BAD_ARGUMENT when `input` is not a string.
 * @example
 * parseExpression('8.80 g + 2.1 g').expr.kind // 'binary'
 */
export function parseExpression(input: string): CalcTree {
  const pre = prescanExpression(input);
  if (pre) throw new PondusError([pre], input);
  const fast = fastParseExpression(input);
  if (fast !== null) return { input, expr: fast.expr, target: fast.target };
  return parseWithGrammar(input);
}

/** A number written with a comma between digit groups ('1,000 mL', '1:10,000'): both readings, as a hint; undefined otherwise. */
function commaHint(input: string): string | undefined {
  const grouped = /([0-9]),(?=[0-9]{3}(?![0-9]))/g;
  if (!grouped.test(input)) return undefined;
  const text = input.trim();
  return `a comma is read neither way: for a thousands separator write ${text.replace(grouped, '$1')}; for a decimal comma write ${text.replace(grouped, '$1.')}`;
}

/**
 * Parses a calculation with the Chevrotain grammar alone, after the prescan: what parseExpression
 * does for everything the fast reader (fast-path.ts) declines.
 *
 * @param input - the calculation text.
 * @returns the expression tree and the target unit, as parseExpression.
 * @throws PondusError: the codes of parseExpression.
 * @example
 * parseWithGrammar('1:1000 g/mL').expr.kind // 'ratio'
 */
export function parseWithGrammar(input: string): CalcTree {
  const pre = prescanExpression(input);
  if (pre) throw new PondusError([pre], input);
  const { calcLexer, calcGrammar } = calcFullGrammar();
  const lexed = calcLexer().tokenize(input);
  if (lexed.errors.length > 0) {
    const o = lexed.errors[0].offset;
    const word = /^[A-Za-zµμ/%]+/.exec(input.slice(o));
    if (word) {
      throw new PondusError([typedIssue({ code: 'UNKNOWN_UNIT', unit: word[0], inExpression: true, column: columnOf(input, o), length: word[0].length, hint: notReadHint(word[0]) ?? 'write a molar mass as M(formula); units: g, mg, µg, kg, mol, mmol, µmol, L, mL, µL, M, mM, mol/L, g/L, mg/L, mg/mL, g/100 mL, mg/dL, g/mol, %, % w/v, ppm; a ratio as 1:1000' })], input);
    }
    const ch = String.fromCodePoint(input.codePointAt(o)!);
    const hint = ch === ',' ? commaHint(input) : undefined;
    throw new PondusError([{ code: 'UNEXPECTED_CHARACTER', message: `unexpected character '${ch}' at column ${columnOf(input, o)}`, column: columnOf(input, o), length: 1, ...(hint ? { hint } : {}) }], input);
  }
  let operations = 0;
  for (const t of lexed.tokens) {
    const name = t.tokenType.name;
    if ((name === 'Plus' || name === 'Minus' || name === 'Times' || name === 'Divide' || name === 'Caret') && ++operations > MAX_OPERATIONS) {
      throw new PondusError([{ code: 'INPUT_TOO_LONG', message: `the expression has more than ${MAX_OPERATIONS} operations (+ - * / ^); split it into steps`, column: columnOf(input, t.startOffset), length: 1 }], input);
    }
  }
  const g = calcGrammar();
  g.input = lexed.tokens;
  const cst = g.calculation();
  if (g.errors.length > 0) throw new PondusError([syntaxIssue(input, g.errors[0])], input);
  builder ??= new ExprBuilder();
  const { expr, target } = builder.build(cst, input);
  return { input, expr, target };
}

function prescanExpression(text: string): Issue | null {
  if (text.trim() === '') return { code: 'EMPTY_INPUT', message: 'the expression is empty' };
  if (text.length > MAX_EXPRESSION_LENGTH) return { code: 'INPUT_TOO_LONG', message: `the expression is ${text.length.toLocaleString('en-US')} characters long; the limit is ${MAX_EXPRESSION_LENGTH.toLocaleString('en-US')}` };
  let depth = 0;
  let signs = 0;
  let signStart = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 43 || c === 45 || c === 0x2212) {
      if (signs === 0) signStart = i;
      if (++signs > MAX_SIGNS_IN_A_ROW) {
        let n = signs;
        for (let k = i + 1; k < text.length && /[-+\u2212 \t]/.test(text[k]); k++) if (text[k] !== ' ' && text[k] !== '\t') n++;
        return { code: 'NESTING_TOO_DEEP', message: `${n.toLocaleString('en-US')} signs in a row at column ${columnOf(text, signStart)}; the calculator reads at most ${MAX_SIGNS_IN_A_ROW}`, column: columnOf(text, signStart), length: 1 };
      }
    } else if (c !== 32 && c !== 9) signs = 0;
    if ((c < 0x20 && c !== 0x09) || c === 0x7f || (c >= 0x80 && c < 0xa0)) {
      return { code: 'CONTROL_CHARACTER', message: `control character U+${c.toString(16).toUpperCase().padStart(4, '0')} in the expression`, column: columnOf(text, i) };
    }
    if (c === 40) {
      depth++;
      if (depth > MAX_EXPRESSION_NESTING) return { code: 'NESTING_TOO_DEEP', message: `parentheses nested more than ${MAX_EXPRESSION_NESTING} deep`, column: columnOf(text, i) };
    } else if (c === 41) {
      depth--;
      if (depth < 0) return { code: 'UNMATCHED_CLOSING', message: "')' has no opening '('", column: columnOf(text, i) };
    }
  }
  if (depth > 0) return { code: 'UNCLOSED_GROUP', message: "a '(' is never closed" };
  return null;
}

function syntaxIssue(input: string, err: IRecognitionException): Issue {
  const t = err.token;
  if (t.tokenType.name === 'EOF' || Number.isNaN(t.startOffset)) {
    return { code: 'BAD_EXPRESSION', message: 'the expression ends too early: expected a number, M(formula) or (', column: columnOf(input, input.trimEnd().length), length: 1 };
  }
  const column = columnOf(input, t.startOffset);
  if (t.tokenType.name === 'Unit') {
    // a unit after a unit ('mmol/mL', 'mol L-1') is a compound unit the table does not have
    const before = /([A-Za-zµμ%]+)(\s*\/\s*|\s+)$/.exec(input.slice(0, t.startOffset));
    if (before) {
      const written = input.slice(t.startOffset - before[0].length, t.startOffset + t.image.length);
      const at = t.startOffset - before[0].length;
      return typedIssue({ code: 'UNKNOWN_UNIT', unit: written, inExpression: true, column: columnOf(input, at), length: written.length, hint: notReadHint(written.replace(/\s+/g, '')) ?? `a unit made of two is read only when it is one of the units pondus knows: ${UNIT_SYMBOLS.join(', ')}` });
    }
    return { code: 'BAD_EXPRESSION', message: `unit '${t.image}' at column ${column} must follow a number`, column, length: t.image.length };
  }
  if (t.tokenType.name === 'NumberLiteral') {
    return { code: 'BAD_EXPRESSION', message: `a number at column ${column} follows another value: put an operator (+ - * /) between them`, column, length: t.image.length };
  }
  return { code: 'BAD_EXPRESSION', message: `unexpected '${t.image}' at column ${column}`, column, length: t.image.length };
}
