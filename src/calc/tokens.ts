/**
 * Tokens of the calculator's expression language. Patterns only.
 */
import { createToken, Lexer, type TokenType } from 'chevrotain';
import { calcUnitSpellings, matchFormulaMass } from './spellings.js';

export { calcUnitSpellings, matchFormulaMass };

const unitSpellings = calcUnitSpellings().map((s) => s.replace(/[.*+?^${}()|[\]\\/%]/g, (c) => `\\${c}`));

export const WhiteSpace = createToken({ name: 'WhiteSpace', pattern: /[ \t\u00a0]+/, group: Lexer.SKIPPED });
export const FormulaMass = createToken({ name: 'FormulaMass', pattern: { exec: matchFormulaMass }, line_breaks: false, start_chars_hint: ['M'] });
/** A ratio such as `1:1000` (ratio strength): two numbers around a colon. */
export const Ratio = createToken({ name: 'Ratio', pattern: /(?:[0-9]+\.?[0-9]*|\.[0-9]+)[ \t]*:[ \t]*(?:[0-9]+\.?[0-9]*|\.[0-9]+)/ });
export const NumberLiteral = createToken({ name: 'NumberLiteral', pattern: /(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][+-]?[0-9]+)?/ });
export const PlusMinus = createToken({ name: 'PlusMinus', pattern: /±|\+\/-|\+-/ });
export const To = createToken({ name: 'To', pattern: /(?:to|in)(?![A-Za-z])/ });
export const UnitToken = createToken({ name: 'Unit', pattern: new RegExp(`(?:${unitSpellings.join('|')})(?![A-Za-zµμ])`) });
export const Plus = createToken({ name: 'Plus', pattern: /\+/ });
export const Minus = createToken({ name: 'Minus', pattern: /[-−]/ });
export const Times = createToken({ name: 'Times', pattern: /[*×·]/ });
export const Divide = createToken({ name: 'Divide', pattern: /[/÷]/ });
export const Caret = createToken({ name: 'Caret', pattern: /\^/ });
export const LParen = createToken({ name: 'LParen', pattern: /\(/ });
export const RParen = createToken({ name: 'RParen', pattern: /\)/ });

export const calcTokens: TokenType[] = [WhiteSpace, FormulaMass, Ratio, NumberLiteral, PlusMinus, To, UnitToken, Plus, Minus, Times, Divide, Caret, LParen, RParen];

let lexer: Lexer | null = null;

/** The calculator's lexer, built on first use. */
export function calcLexer(): Lexer {
  lexer ??= new Lexer(calcTokens, { positionTracking: 'onlyOffset', skipValidations: true, safeMode: true });
  return lexer;
}
