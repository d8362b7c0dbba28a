/**
 * Lab sheets of ions: a CSV with a header naming the columns id, formula, ion (or adduct) and
 * found (or 'found m/z'), one compound per row.
 */
import { fail } from '../errors/pondus-error.js';
import { columnIndex, readCsvSheet } from '../sheets/read-sheet.js';

/** One row of an ion sheet. */
export interface IonSheetRow {
  /** 1-based line number of the row in the sheet. */
  line: number;
  /** The row as it stands in the file. */
  raw: string;
  id: string;
  formula: string;
  /** The ion notation, or '' when the row gives none. */
  ion: string;
  /** The found m/z as written, or '' when the row gives none. */
  found: string;
}

/**
 * Reads an ion sheet. A row's own problems (no formula, a bad ion) surface when the row is
 * computed, so one bad row never stops the others.
 *
 * @param text - the CSV text of the sheet: a formula column, and optionally id, ion and found columns.
 * @returns one row for each data line, with its line number, raw text, id, formula, ion and found m/z.
 * @throws PondusError: BAD_RECORD for text that is not valid CSV, an empty sheet, or a header without a formula column; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readIonSheet('id,formula,ion,found\nAB-7,C15H15NO2,[M+H]+,242.1172\n')[0].ion // '[M+H]+'
 */
export function readIonSheet(text: string): IonSheetRow[] {
  const { header, rows } = readCsvSheet(text);
  const formulaCol = columnIndex(header, /^formula$/i);
  if (formulaCol < 0) throw fail({ code: 'BAD_RECORD', message: `the sheet has no 'formula' column (its header has ${header.length} column${header.length === 1 ? '' : 's'})` });
  const idCol = columnIndex(header, /^(id|compound|sample|name)$/i);
  const ionCol = columnIndex(header, /^(ion|adduct)$/i);
  const foundCol = columnIndex(header, /^(found|found m\/z|m\/z found|found mz)$/i);
  return rows.map(({ line, raw, cells }) => ({
    line,
    raw,
    id: idCol >= 0 ? (cells[idCol] ?? '') : '',
    formula: cells[formulaCol] ?? '',
    ion: ionCol >= 0 ? (cells[ionCol] ?? '') : '',
    found: foundCol >= 0 ? (cells[foundCol] ?? '') : '',
  }));
}
