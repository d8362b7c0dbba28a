/**
 * The calculator's Chevrotain lexer and grammar, gathered in one module: the full parser reaches
 * them through grammar-loader.ts, which the command-line bundles load on first use (most
 * expressions never need them: the fast reader takes them).
 */
export { calcLexer } from './tokens.js';
export { calcGrammar } from './grammar.js';
