import type { Decimal } from '../../exact/decimal.js';
/** Output formats every command offers. */
export type OutputFormat = 'table' | 'json' | 'csv' | 'tsv';

/** A cell value for CSV/TSV and tables. */
export type Cell = string | number | null | undefined;

/**
 * A CSV/TSV cell for an exact decimal: as written when it has at most 17 significant digits (what
 * a double holds), else the number JSON gives for it, so a quotient such as a gravimetric factor
 * is not 50 digits in one format and 16 in the other.
 *
 * @example
 * decimalCell(new Decimal('18.015')) // '18.015'
 * decimalCell(new Decimal(2).div(3)) // '0.6666666666666666'
 */
export function decimalCell(d: Decimal): string {
  return d.sd() <= 17 ? d.toFixed() : String(d.toNumber());
}

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

/**
 * The CSV/TSV `notes` cell: each remark as `CODE: message` (the message alone when it has no code),
 * joined with ` | `.
 *
 * @example
 * notesCell([{ code: 'BY_DIFFERENCE', message: 'O by difference: 53.29 %' }]) // 'BY_DIFFERENCE: O by difference: 53.29 %'
 */
export function notesCell(notes: readonly { code: string; message: string }[]): string {
  return notes.map((n) => (n.code ? `${n.code}: ${n.message}` : n.message)).join(' | ');
}

const NUMBER_TEXT = /^[-+]?(?:[0-9]+(?:\.[0-9]*)?|\.[0-9]+)(?:[eE][-+]?[0-9]+)?$/;

/**
 * Guards a text cell against formula injection in spreadsheets: a text starting with
 * `=`, `+`, `-`, `@`, a tab or a carriage return gets a leading apostrophe. Numbers
 * (`-0.39`, `+1.5e3`) are left as they are, so they stay numbers.
 *
 * @example
 * guardCell('=HYPERLINK("x")') // "'=HYPERLINK(\"x\")"
 * guardCell('-0.39') // '-0.39'
 */
export function guardCell(v: Cell): Cell {
  if (typeof v !== 'string' || v === '') return v;
  const c = v.charCodeAt(0);
  // = + - @ tab CR
  if (c !== 61 && c !== 43 && c !== 45 && c !== 64 && c !== 9 && c !== 13) return v;
  return NUMBER_TEXT.test(v) ? v : `'${v}`;
}

/**
 * Text echoed from the input, made harmless for a terminal: control characters (C0, DEL, C1,
 * escape sequences included) are shown as ␦, and a carriage return cannot overwrite a row.
 * With `keepColour`, colour sequences (ESC [ … m, which only change colours) are left for the
 * styled output pondus writes itself on a colour terminal.
 *
 * @param text text that may hold control characters
 * @param keepColour whether colour sequences stay
 * @returns the same text with each other control character replaced by ␦
 * @example
 * visibleControls('JK-9 fails\rJK-9 passes') // 'JK-9 fails␦JK-9 passes'
 */
export function visibleControls(text: string, keepColour = false): string {
  // eslint-disable-next-line no-control-regex
  if (!/[\u0000-\u001f\u007f-\u009f]/.test(text)) return text;
  // eslint-disable-next-line no-control-regex
  const pattern = keepColour ? /\u001b\[[0-9;]*m|[\u0000-\u001f\u007f-\u009f]/g : /[\u0000-\u001f\u007f-\u009f]/g;
  return text.replace(pattern, (m) => (m.length > 1 ? m : '\u2426'));
}
