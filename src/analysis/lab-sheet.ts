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
}

/**
 * Reads a lab sheet. Rows keep their line numbers; a row's problems (no formula, a bad number)
 * surface when the row is analysed, so one bad row never stops the others.
 *
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
  return rows.map(({ line, raw, cells }) => ({
    line,
    raw,
    id: idCol >= 0 ? (cells[idCol] ?? '') : '',
    formula: cells[formulaCol] ?? '',
    found: elementCols
      .filter(([, i]) => (cells[i] ?? '') !== '')
      .map(([s, i]) => `${s}=${cells[i]}`)
      .join(', '),
  }));
}
