/**
 * Where the calculator's full parser gets the Chevrotain lexer and grammar. In the library they are
 * imported as usual; the command-line build replaces this module with one that loads
 * full-grammar.ts on first use (scripts/build.mjs, lazyGrammar), so `calc` and the commands that
 * read amounts start without building the grammar's tokens and parser class.
 */
import * as full from './full-grammar.js';

/**
 * The lexer and grammar of calculations.
 *
 * @example
 * typeof calcFullGrammar().calcLexer // 'function'
 */
export function calcFullGrammar(): typeof full {
  return full;
}
