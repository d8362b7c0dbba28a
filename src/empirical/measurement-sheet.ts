/**
 * Measurement sheets for empirical formulas: a CSV with an optional id column,
 * one column per element (percents, or masses with a unit in the cell, or
 * 'rest'), optionally a sample-mass column and a molar-mass column. Oxide
 * columns (SiO2, Al2O3, MgO, Na2O, …: a header of element symbols and counts
 * ending in O) are read as compound keys, like `SiO2=42.70` in a set.
 */
import { fail } from '../errors/pondus-error.js';
import { columnIndex, elementColumns, readCsvSheet } from '../sheets/read-sheet.js';

export interface MeasurementRow {
  line: number;
  raw: string;
  id: string;
  /** The row as a measurement set: 'C=40.00 H=6.71 O=rest'. */
  measurements: string;
  /** Molar mass for the molecular formula, if the sheet gives one. */
  molarMass: string | undefined;
}

/**
 * Reads a measurement sheet into measurement sets, one per row.
 *
 * @param text - the CSV text of the sheet: element or oxide columns, and optionally id, sample and molar mass columns.
 * @returns one row for each data line, with its line number, raw text, id, the measurement set as text and the molar mass.
 * @throws PondusError: BAD_RECORD for text that is not valid CSV, an empty sheet, or a header without element or oxide columns; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readMeasurementSheet('id,C,H,O,molar mass\nS1,40.00,6.71,53.29,180.16\n')[0].measurements // 'C=40.00 H=6.71 O=53.29'
 */
export function readMeasurementSheet(text: string): MeasurementRow[] {
  const { header, rows } = readCsvSheet(text);
  const idCol = columnIndex(header, /^(id|compound|name)$/i);
  const sampleCol = columnIndex(header, /^sample( mass)?$/i);
  const molarCol = columnIndex(header, /^(molar mass|M|MW|molecular weight)$/i);
  const taken = new Set([idCol, sampleCol, molarCol]);
  const oxideCols: [string, number][] = header
    .map((h, i) => [h.trim(), i] as [string, number])
    .filter(([h, i]) => !taken.has(i) && /^(?:[A-Z][a-z]?[0-9]*)+O[0-9]*$/.test(h) && !/^[A-Z][a-z]?$/.test(h));
  const elementCols = [...elementColumns(header).filter(([, i]) => !taken.has(i)), ...oxideCols].sort((a, b) => a[1] - b[1]);
  if (elementCols.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet has no element columns (C, H, N, O, …) or oxide columns (SiO2, MgO, …)' });
  return rows.map(({ line, raw, cells }) => {
    const parts = elementCols.filter(([, i]) => (cells[i] ?? '') !== '').map(([s, i]) => `${s}=${cells[i]}`);
    if (sampleCol >= 0 && (cells[sampleCol] ?? '') !== '') parts.push(`sample=${cells[sampleCol]}`);
    const molar = molarCol >= 0 ? cells[molarCol] : undefined;
    return { line, raw, id: idCol >= 0 ? (cells[idCol] ?? '') : '', measurements: parts.join(' '), molarMass: molar === '' ? undefined : molar };
  });
}
