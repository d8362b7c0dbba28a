/**
 * Lab sheets: a CSV of compounds — an id, a formula, and found percents in
 * columns named by element (C, H, N, S; also '%C', 'C%', 'C found') — one
 * analysis per row.
 */
import { parse } from 'csv-parse/sync';
import { fail } from '../errors/pondus-error.js';
import { isElementSymbol } from '../elements/element-table.js';

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

/** Maps a header cell to an element symbol, or null. */
function elementColumn(header: string): string | null {
  const h = header.trim().replace(/%/g, '').replace(/\s*found\s*$/i, '').trim();
  return isElementSymbol(h) ? h : null;
}

/**
 * Reads a lab sheet. Rows keep their line numbers; a row's problems (no formula, a bad number)
 * surface when the row is analysed, so one bad row never stops the others.
 *
 * @example
 * readSheet('id,formula,C,H,N\nJK-12,C20H25N3O,72.30,7.91,12.60\n')[0].found // 'C=72.30, H=7.91, N=12.60'
 */
export function readSheet(text: string): SheetRow[] {
  let records: { record: string[]; info: { lines: number; raw?: string } }[];
  try {
    records = parse(text, { bom: true, relax_column_count: true, skip_empty_lines: true, trim: true, info: true, raw: true }) as unknown as typeof records;
  } catch (e) {
    throw fail({ code: 'BAD_RECORD', message: `the sheet is not valid CSV: ${e instanceof Error ? e.message : String(e)}` });
  }
  if (records.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet is empty' });
  const header = records[0].record.map((h) => h.trim());
  const formulaCol = header.findIndex((h) => /^formula$/i.test(h));
  if (formulaCol < 0) throw fail({ code: 'BAD_RECORD', message: `the sheet has no 'formula' column (columns: ${header.join(', ')})` });
  const idCol = header.findIndex((h) => /^(id|compound|sample|name)$/i.test(h));
  const elementCols = header.map((h, i) => [elementColumn(h), i] as const).filter(([s]) => s !== null) as [string, number][];
  if (elementCols.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet has no element columns (C, H, N, S, …)' });
  return records.slice(1).map(({ record, info }) => {
    const raw = (info as { raw?: string }).raw ?? (record as unknown as { raw?: string }).raw ?? record.join(',');
    return {
      line: info.lines,
      raw: raw.replace(/\r?\n$/, ''),
      id: idCol >= 0 ? (record[idCol] ?? '') : '',
      formula: record[formulaCol] ?? '',
      found: elementCols
        .filter(([, i]) => (record[i] ?? '') !== '')
        .map(([s, i]) => `${s}=${record[i]}`)
        .join(', '),
    };
  });
}
