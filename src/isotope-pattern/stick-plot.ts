/**
 * The terminal picture of a pattern: one row per peak, m/z and relative abundance, then a
 * horizontal bar in Unicode block characters (eighths of a cell), scaled so the largest peak
 * fills the width. Plain text; colour only through the `paint` callback the caller passes.
 */
import type { PatternPeak } from './pattern.js';

/** Options for {@link stickPlot}. */
export interface StickPlotOptions {
  /** Cells for the largest peak (default 40). */
  width?: number;
  /** Decimals of m/z (default 4). */
  decimals?: number;
  /** Wraps a bar (to colour it); identity by default. */
  paint?: (bar: string) => string;
  /** Most rows shown, the largest peaks kept (default 40). */
  maxRows?: number;
}

const EIGHTHS = ['', '▏', '▎', '▍', '▌', '▋', '▊', '▉'];

/**
 * A bar of a length in cells, to an eighth of a cell.
 *
 * @example
 * bar(2.5) // '██▌'
 */
export function bar(cells: number): string {
  const eighths = Math.round(cells * 8);
  const whole = Math.floor(eighths / 8);
  const part = eighths % 8;
  const s = '█'.repeat(whole) + EIGHTHS[part];
  return s === '' && cells > 0 ? '▏' : s;
}

/**
 * The rows of the terminal stick plot.
 *
 * @param peaks - the peaks to draw, as in a pattern's listed peaks.
 * @param options - the width of the bars, the decimals of the m/z, whether to colour, and the most rows to show.
 * @returns one line of text for each peak drawn: its m/z, relative height, label and bar.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * stickPlot(isotopePattern('Br2').peaks)[1] // '157.8367    51.4  M     ████████████████████▌'
 */
export function stickPlot(peaks: readonly PatternPeak[], options: StickPlotOptions = {}): string[] {
  const width = options.width ?? 40;
  const decimals = options.decimals ?? 4;
  const paint = options.paint ?? ((s: string) => s);
  let shown = [...peaks];
  const maxRows = options.maxRows ?? 40;
  if (shown.length > maxRows) shown = [...shown].sort((a, b) => b.abundance - a.abundance).slice(0, maxRows).sort((a, b) => a.mz - b.mz);
  const mzWidth = Math.max(...shown.map((p) => p.mz.toFixed(decimals).length), 3);
  const rows = [`${'m/z'.padStart(mzWidth)}  ${'rel. %'.padStart(6)}  peak`];
  for (const p of shown) {
    const tag = p.shift === 0 ? 'M' : `M${p.shift > 0 ? '+' : '-'}${Math.abs(p.shift)}`;
    const label = p.label ? `  ${p.label}` : '';
    rows.push(`${p.mz.toFixed(decimals).padStart(mzWidth)}  ${p.relative.toFixed(1).padStart(6)}  ${tag.padEnd(5)} ${paint(bar((p.relative / 100) * width))}${label}`);
  }
  if (shown.length < peaks.length) rows.push(`(${peaks.length - shown.length} smaller peaks not drawn)`);
  return rows;
}
