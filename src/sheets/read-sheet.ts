/**
 * Reading CSV sheets (a lab's results exported from a spreadsheet): the header,
 * and each row with its line number and its text as it stands in the file, so
 * results and errors can point back to the row.
 */
import { parse } from 'csv-parse/sync';
import { fail } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';

export interface CsvRow {
  /** 1-based line number in the file. */
  line: number;
  /** The row as written. */
  raw: string;
  cells: string[];
}

export interface CsvSheet {
  header: string[];
  rows: CsvRow[];
}

const CSV_PROBLEMS: Record<string, string> = {
  CSV_QUOTE_NOT_CLOSED: 'a quote is never closed',
  INVALID_OPENING_QUOTE: 'a quote inside a cell that does not start with one',
  CSV_INVALID_OPENING_QUOTE: 'a quote inside a cell that does not start with one',
  CSV_INVALID_CLOSING_QUOTE: 'text right after a closing quote',
  CSV_NON_TRIMABLE_CHAR_AFTER_CLOSING_QUOTE: 'text right after a closing quote',
  CSV_MAX_RECORD_SIZE: 'a row too long',
};

/**
 * Parses a CSV sheet with a header row (BOM, quotes, ragged rows and blank lines allowed).
 *
 * @param text - the CSV text, its first row the header.
 * @returns the trimmed header cells and each later row with its line number, its raw text and its cells.
 * @throws PondusError: BAD_RECORD for text that is not valid CSV (an unclosed quote, text after a closing quote, …) or an empty sheet; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readCsvSheet('id,C\nA,40.00\n').rows[0] // { line: 2, raw: 'A,40.00', cells: ['A', '40.00'] }
 */
export function readCsvSheet(text: string): CsvSheet {
  let records: { record: string[]; info: { lines: number }; raw: string }[];
  try {
    records = parse(text, { bom: true, relax_column_count: true, skip_empty_lines: true, trim: true, info: true, raw: true }) as unknown as typeof records;
  } catch (e) {
    // csv-parse quotes the offending text; the message names the line and the problem only
    const err = e as { code?: string; lines?: number };
    const where = typeof err.lines === 'number' ? ` at line ${err.lines}` : '';
    throw fail({ code: 'BAD_RECORD', message: `the sheet is not valid CSV${where}: ${(err.code && CSV_PROBLEMS[err.code]) ?? 'a quote or delimiter out of place'}` });
  }
  if (records.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet is empty' });
  return {
    header: records[0].record.map((h) => h.trim()),
    rows: records.slice(1).map(({ record, info, raw }) => ({ line: info.lines, raw: raw.replace(/\r?\n$/, ''), cells: record })),
  };
}

/**
 * The columns of a header that name elements ('C', '%C', 'C%', 'C found'), as [symbol, index].
 *
 * @param header - the header cells.
 * @returns each column that names an element, as [symbol, index], in header order.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * elementColumns(['id', '%C', 'H found', 'notes']) // [['C', 1], ['H', 2]]
 */
export function elementColumns(header: string[]): [string, number][] {
  const out: [string, number][] = [];
  header.forEach((h, i) => {
    const s = h.trim().replace(/%/g, '').replace(/\s*found\s*$/i, '').trim();
    if (isElementSymbol(s)) out.push([s, i]);
  });
  return out;
}

/**
 * The index of the first header cell matching a pattern, or -1.
 *
 * @example
 * columnIndex(['ID', 'formula'], /^id$/i) // 0
 */
export function columnIndex(header: string[], pattern: RegExp): number {
  return header.findIndex((h) => pattern.test(h.trim()));
}
