/**
 * The Chevrotain lexer and grammar of formulas, gathered in one module: the full parser reaches
 * them through grammar-loader.ts, which the command-line bundles load on first use (most batches
 * never need them: the fast readers take their formulas).
 */
export { ABBREVIATION_MODE, ELEMENTS_MODE, formulaLexer, PLAIN_MODE } from './tokens.js';
export { formulaGrammar } from './grammar.js';
