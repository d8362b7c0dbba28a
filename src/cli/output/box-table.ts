/**
 * Fixed-width tables drawn with box characters, written directly: a row is a few
 * string concatenations, so a batch streams its table row by row with the widths
 * taken from a first block. Widths count code points (pondus's cells are narrow
 * characters: digits, letters, subscripts, ␦).
 */

export type Align = 'left' | 'right';

/**
 * The display width of a text (code points; colour sequences are added after padding, never measured).
 *
 * @example
 * textWidth('H₂O') // 3
 */
export function textWidth(s: string): number {
  let n = 0;
  for (let i = 0; i < s.length; i++) {
    const c = s.charCodeAt(i);
    if (c < 0xdc00 || c > 0xdfff) n++; // a low surrogate belongs to the code point before it
  }
  return n;
}

/**
 * Cuts a text to `width` columns, ending in '…' when it had to be cut.
 *
 * @example
 * fitText('C6H12O6', 5) // 'C6H1…'
 */
export function fitText(s: string, width: number): string {
  if (textWidth(s) <= width) return s;
  if (width <= 1) return '…'.slice(0, width);
  let out = '';
  let n = 0;
  for (const ch of s) {
    if (n === width - 1) break;
    out += ch;
    n++;
  }
  return out + '…';
}

function pad(s: string, width: number, align: Align): string {
  const gap = width - textWidth(s);
  if (gap <= 0) return s;
  const fill = ' '.repeat(gap);
  return align === 'right' ? fill + s : s + fill;
}

/**
 * The widths (text only, without the one space either side) that fit a header and rows.
 *
 * @example
 * columnWidths(['a', 'bb'], [['123', '4']]) // [3, 2]
 */
export function columnWidths(head: readonly string[], rows: readonly (readonly string[])[]): number[] {
  const w = head.map(textWidth);
  for (const r of rows) for (let i = 0; i < w.length; i++) w[i] = Math.max(w[i], textWidth(r[i] ?? ''));
  return w;
}

/**
 * Narrows columns until the table fits `columns` terminal columns: first the left-aligned ones
 * (echoed text: inputs, formulas) down to 6 characters, then headers wider than their numbers.
 * Numbers (right-aligned) are never cut: `numberWidths` gives the widest value of each column.
 *
 * @example
 * fitWidths([20, 8], ['left', 'right'], 24, [0, 8]) // [9, 8]
 */
export function fitWidths(widths: number[], align: readonly Align[], columns: number | undefined, numberWidths: readonly number[] = []): number[] {
  if (!columns) return widths;
  const w = widths.slice();
  const floor = w.map((x, i) => (align[i] === 'right' ? Math.max(1, numberWidths[i] ?? x) : Math.min(x, 6)));
  const total = () => w.reduce((s, x) => s + x + 3, 1);
  for (const pass of ['left', 'right'] as const) {
    while (total() > columns) {
      let widest = -1;
      for (let i = 0; i < w.length; i++) if ((align[i] ?? 'left') === pass && w[i] > floor[i] && (widest < 0 || w[i] - floor[i] > w[widest] - floor[widest])) widest = i;
      if (widest < 0) break;
      w[widest]--;
    }
  }
  return w;
}

/**
 * The rule above the header, below the rows.
 *
 * @example
 * ruleLine([1, 2], 'top') // '┌───┬────┐'
 */
export function ruleLine(widths: readonly number[], where: 'top' | 'bottom'): string {
  const [l, m, r] = where === 'top' ? ['┌', '┬', '┐'] : ['└', '┴', '┘'];
  let s = l;
  for (let i = 0; i < widths.length; i++) s += (i ? m : '') + '─'.repeat(widths[i] + 2);
  return s + r;
}

/**
 * One row of cells, each cut to its width and padded; `style` colours a cell after padding.
 *
 * @example
 * rowLine(['H', '2'], [2, 3], ['left', 'right']) // '│ H  │   2 │'
 */
export function rowLine(cells: readonly string[], widths: readonly number[], align: readonly Align[], style?: (s: string) => string): string {
  let s = '│';
  for (let i = 0; i < widths.length; i++) {
    const text = pad(fitText(cells[i] ?? '', widths[i]), widths[i], align[i] ?? 'left');
    s += ` ${style ? style(text) : text} │`;
  }
  return s;
}

/**
 * A whole small table as text.
 *
 * @example
 * boxTable(['a', 'b'], [['1', '22']], ['left', 'right']).split('\n')[2] // '│ 1 │ 22 │'
 */
export function boxTable(head: readonly string[], rows: readonly (readonly string[])[], align: readonly Align[]): string {
  const w = columnWidths(head, rows);
  return [ruleLine(w, 'top'), rowLine(head, w, align), ...rows.map((r) => rowLine(r, w, align)), ruleLine(w, 'bottom')].join('\n');
}
