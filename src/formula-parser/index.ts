export { parseFormula, safeParseFormula, type ParseOptions } from './parse.js';
export { ABBREVIATIONS, ABBREVIATION_CLASHES } from './abbreviations.js';
export { symbolReadings } from './hints.js';
export { MAX_FORMULA_LENGTH, MAX_NESTING } from './prescan.js';
export type { FormulaTree, ComponentNode, PartNode, AtomNode, GroupNode, CountNode, Span } from './tree.js';
