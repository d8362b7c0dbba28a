/** Output formats every command offers. */
export type OutputFormat = 'table' | 'json' | 'csv' | 'tsv';

/** A cell value for CSV/TSV and tables. */
export type Cell = string | number | null | undefined;

/**
 * Quotes a CSV/TSV cell where needed (RFC 4180 for CSV; TSV cells lose tabs and newlines).
 *
 * @example
 * delimitedCell('a,b', ',') // '"a,b"'
 */
export function delimitedCell(v: Cell, sep: string): string {
  if (v === null || v === undefined) return '';
  const s = String(v);
  if (sep === '\t') return s.replace(/[\t\r\n]/g, ' ');
  return /[",\r\n]/.test(s) || /^\s|\s$/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}
