/**
 * Where the full parser gets the Chevrotain lexer and grammar. In the library they are imported as
 * usual; the command-line build replaces this module with one that loads full-grammar.ts on first
 * use (scripts/build.mjs, lazyGrammar), so a command whose inputs the fast readers take starts
 * without building the grammar's tokens and parser class.
 */
import * as full from './full-grammar.js';

/**
 * The lexer and grammar of formulas.
 *
 * @example
 * typeof fullGrammar().formulaLexer // 'function'
 */
export function fullGrammar(): typeof full {
  return full;
}
