import type { LibraryFunction } from '../../errors/issue.js';
import type { Cell } from './format.js';

/**
 * A remark as a presenter hands it to the writers: its words in the library's naming and the
 * options and functions they name, which the writers show as flags and commands (`noteText`).
 */
export interface NoteWords {
  message: string;
  options?: readonly string[];
  functions?: readonly LibraryFunction[];
}

/** A remark with its code, for the CSV/TSV `notes` column. */
export interface CodedNote extends NoteWords {
  code: string;
}

/**
 * How one command turns inputs into results and results into each output
 * format. The batch runner drives it; commands only describe.
 */
export interface Presenter<R> {
  /** Computes the result for one input; throws PondusError on bad input. */
  compute(input: string): R;
  /** The JSON Lines object for a result. */
  json(result: R): unknown;
  /** Optional: the JSON line for a result, written directly (must equal JSON.stringify(json(result))). */
  jsonLine?(result: R): string;
  /**
   * Optional: the JSON row for an input straight from the library's plain result and its one
   * serialiser, with the input's line number first (must equal what compute, json and the JSON
   * writer give: `{"line":N,…}`); throws like compute for bad input. Skips the detail a table needs.
   */
  jsonRow?(input: string, line: number): string;
  /** CSV/TSV header (first column is the input). */
  columns: string[];
  /** CSV/TSV cells for a result, matching `columns`. */
  cells(result: R): Cell[];
  /**
   * Optional: CSV/TSV columns that depend on the results (one column per element), decided from
   * the first block of results, and the rows of each result under them (several in a long form),
   * with notes for anything the columns cannot hold. When given, `columns` and `cells` are unused.
   */
  delimited?: {
    columns(first: R[]): string[];
    rows(result: R, columns: string[]): { rows: Cell[][]; notes: readonly CodedNote[] };
  };
  /** Row-style table: header and cells. */
  table?: { head: string[]; row(result: R): Cell[]; align?: ('left' | 'right')[] };
  /** Block-style table output: a block of text per result. */
  block?(result: R): string;
  /** Remarks to print under the table for a result (the writer names their options by flag). */
  notes?(result: R): readonly NoteWords[];
  /** Optional: the remarks with their codes, for the CSV/TSV `notes` column (`CODE: message`); else `notes` is used. */
  noteItems?(result: R): readonly CodedNote[];
  /** Counts a result toward a closing tally ('3 of 4 compounds pass'), with the words for it. */
  tally?: { count(result: R): boolean; words: string };
  /** A caution printed once after table output (results someone will act on). */
  caution?: string;
}
