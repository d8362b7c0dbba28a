/**
 * Errors as data: every problem pondus reports is an {@link Issue} with a stable
 * code, a plain-English message and, where it applies, the column it points at.
 */

/** Stable machine-readable codes. Scripts may rely on them; messages may change. */
export type IssueCode =
  // formula text
  | 'EMPTY_INPUT'
  | 'INPUT_TOO_LONG'
  | 'CONTROL_CHARACTER'
  | 'UNEXPECTED_CHARACTER'
  | 'UNEXPECTED_TOKEN'
  | 'UNKNOWN_ELEMENT'
  | 'UNKNOWN_ISOTOPE'
  | 'UNCLOSED_GROUP'
  | 'UNMATCHED_CLOSING'
  | 'MISMATCHED_BRACKET'
  | 'EMPTY_GROUP'
  | 'NESTING_TOO_DEEP'
  | 'BAD_COUNT'
  | 'COUNT_TOO_LARGE'
  | 'BAD_CHARGE'
  | 'AMBIGUOUS_CHARGE'
  | 'MISPLACED_CHARGE'
  | 'UNKNOWN_ABBREVIATION'
  | 'SPACE_IN_FORMULA'
  | 'AMBIGUOUS_READING'
  | 'INEXACT_FRACTION'
  // computing with formulas
  | 'NO_STANDARD_WEIGHT'
  | 'PART_NOT_IN_FORMULA'
  // ions and isotope patterns
  | 'BAD_ION'
  | 'ION_CONFLICT'
  | 'PATTERN_TOO_LARGE'
  // quantities, units and expressions
  | 'BAD_NUMBER'
  | 'UNKNOWN_UNIT'
  | 'INCOMPATIBLE_UNITS'
  | 'DIVISION_BY_ZERO'
  | 'NUMBER_OUT_OF_RANGE'
  | 'BAD_EXPRESSION'
  // measurements and results
  | 'BAD_MEASUREMENT'
  | 'NO_FORMULA_FITS'
  | 'SEARCH_TOO_LARGE'
  | 'BAD_EQUATION'
  | 'NO_BALANCE'
  | 'NOT_UNIQUE'
  | 'BAD_AMOUNT'
  | 'BAD_OPTION'
  | 'AMBIGUOUS_PURITY'
  | 'CONCENTRATED_REAGENT'
  | 'BAD_RECORD'
  | 'USAGE'
  // a public function called with an argument of the wrong kind (a number for a formula, null options)
  | 'BAD_ARGUMENT'
  | 'INTERNAL_ERROR';

/** One problem found in an input. `column` is 1-based and counts Unicode code points. */
export interface Issue {
  code: IssueCode;
  message: string;
  /** 1-based column of the first character the issue is about. */
  column?: number;
  /** How many characters from `column` the issue covers (at least 1 when a column is given). */
  length?: number;
  /** A suggestion for what the user may have meant. */
  hint?: string;
}

/** A remark attached to a successful result (an assumption made, a value flagged). */
export interface Note {
  code: string;
  message: string;
  column?: number;
}
