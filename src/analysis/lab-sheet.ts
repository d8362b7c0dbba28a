/**
 * Lab sheets: a CSV of compounds — an id, a formula, and found percents in
 * columns named by element (C, H, N, S; also '%C', 'C%', 'C found') — one
 * analysis per row.
 */
import { fail } from '../errors/pondus-error.js';
import { columnIndex, elementColumns, readCsvSheet } from '../sheets/read-sheet.js';

export interface SheetRow {
  /** 1-based line number of the row in the sheet. */
  line: number;
  /** The row as it stands in the file. */
  raw: string;
  id: string;
  formula: string;
  /** Found values as `C=72.30, H=7.91`. */
  found: string;
  /** Why the row cannot be analysed as it stands (a cell holding more than one value), if so. */
  problem?: string;
}

/** A found cell holds one value: a number, optionally with '%'. */
const ONE_VALUE = /^\s*[-+]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)\s*%?\s*$/;

/**
 * Reads a lab sheet. Rows keep their line numbers; a row's problems (no formula, a bad number)
 * surface when the row is analysed, so one bad row never stops the others.
 *
 * @param text - the CSV text of the sheet: a header with a formula column, element columns (C, %C, C found, …) and optionally an id column.
 * @returns one row for each data line, with its line number, raw text, id, formula and found values (and a problem for a cell that does not hold one value).
 * @throws PondusError: BAD_RECORD for text that is not valid CSV, an empty sheet, or a header with no formula column or no element columns; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readSheet('id,formula,C,H,N\nJK-12,C20H25N3O,72.30,7.91,12.60\n')[0].found // 'C=72.30, H=7.91, N=12.60'
 */
export function readSheet(text: string): SheetRow[] {
  const { header, rows } = readCsvSheet(text);
  const formulaCol = columnIndex(header, /^formula$/i);
  if (formulaCol < 0) throw fail({ code: 'BAD_RECORD', message: `the sheet has no 'formula' column (its header has ${header.length} column${header.length === 1 ? '' : 's'})` });
  const idCol = columnIndex(header, /^(id|compound|sample|name)$/i);
  const elementCols = elementColumns(header);
  if (elementCols.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet has no element columns (C, H, N, S, …)' });
  return rows.map(({ line, raw, cells }) => {
    const filled = elementCols.filter(([, i]) => (cells[i] ?? '') !== '');
    const bad = filled.find(([, i]) => !ONE_VALUE.test(cells[i]));
    const row: SheetRow = {
      line,
      raw,
      id: idCol >= 0 ? (cells[idCol] ?? '') : '',
      formula: cells[formulaCol] ?? '',
      found: filled.map(([s, i]) => `${s}=${cells[i].trim()}`).join(', '),
    };
    if (bad) row.problem = `the ${bad[0]} cell holds '${cells[bad[1]]}', not one value: each element column holds one found percent`;
    return row;
  });
}
