/**
 * The formula and calculator grammars with Chevrotain, as one file of their own in the command
 * line (dist/cli/grammars.cjs): the command bundles load it on first use (scripts/build.mjs,
 * lazyGrammar), so a command whose inputs the fast readers take neither reads nor compiles the
 * parser library.
 */
export * as formula from '../formula-parser/full-grammar.js';
export * as calc from '../calc/full-grammar.js';
