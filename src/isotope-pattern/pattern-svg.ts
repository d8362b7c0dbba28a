/**
 * An isotope pattern as an SVG picture: a stick for each peak over an m/z axis, relative
 * abundance (0–100 % of the largest peak) up the side, the main peaks labelled with their m/z.
 * Each stick is a `<line class="peak">` carrying `data-mz` and `data-relative`; each axis tick
 * a `<text>` with `data-value`, so the picture can be read back by a program.
 */
import type { PatternResult } from './pattern.js';

/** Options for {@link patternSvg}. */
export interface SvgOptions {
  width?: number;
  height?: number;
  /** How many of the largest peaks get an m/z label (default 8). */
  labels?: number;
  /** Decimals of the m/z labels (default 4). */
  decimals?: number;
  /** A title; by default the formula, the ion and the kind of pattern. */
  title?: string;
}

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const num = (x: number) => String(Math.round(x * 100) / 100);

/** Tick values 1, 2 or 5 × 10^k apart covering [lo, hi], about `count` of them. */
function ticks(lo: number, hi: number, count: number): number[] {
  const raw = (hi - lo) / count;
  const mag = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((f) => f * mag).find((s) => s >= raw) ?? 10 * mag;
  const out: number[] = [];
  for (let v = Math.ceil(lo / step) * step; v <= hi + step * 1e-9; v += step) out.push(Number(v.toPrecision(12)));
  return out;
}

/**
 * Draws the pattern's listed peaks as an SVG document (text).
 *
 * @param r - a result of {@link isotopePattern}.
 * @param options - the width and height, whether peaks are labelled, the decimals of the m/z, and a title.
 * @returns the SVG document as text.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * patternSvg(isotopePattern('Br2')).startsWith('<svg') // true
 */
export function patternSvg(r: PatternResult, options: SvgOptions = {}): string {
  const W = options.width ?? 720;
  const H = options.height ?? 420;
  const decimals = options.decimals ?? 4;
  const left = 72;
  const right = 24;
  const top = 64;
  const bottom = 64;
  const peaks = r.peaks;
  const lo = Math.min(...peaks.map((p) => p.mz));
  const hi = Math.max(...peaks.map((p) => p.mz));
  const span = Math.max(hi - lo, 2 / (Math.abs(r.charge) || 1));
  const x0 = lo - span * 0.08;
  const x1 = hi + span * 0.08;
  const plotW = W - left - right;
  const plotH = H - top - bottom;
  const x = (mz: number) => left + ((mz - x0) / (x1 - x0)) * plotW;
  const y = (rel: number) => top + plotH - (rel / 100) * plotH;
  const kind = r.kind === 'aggregated' ? 'aggregated pattern (one peak per nominal mass)' : r.resolvingPower !== null ? `fine structure at resolving power ${r.resolvingPower.toLocaleString('en-US')} (FWHM = m/R)` : 'fine structure (every isotopologue apart)';
  const title = options.title ?? (r.ion ? `${r.speciesFormula}, the ${r.ion} ion of ${r.formula}` : r.speciesFormula);
  const out: string[] = [];
  out.push(`<svg xmlns="http://www.w3.org/2000/svg" width="${W}" height="${H}" viewBox="0 0 ${W} ${H}" font-family="Helvetica, Arial, sans-serif" font-size="12">`);
  out.push(`<rect x="0" y="0" width="${W}" height="${H}" fill="#ffffff"/>`);
  out.push(`<text class="title" x="${left}" y="24" font-size="16" font-weight="bold" fill="#222">${esc(title)}</text>`);
  out.push(`<text class="subtitle" x="${left}" y="44" fill="#555">${esc(`${kind}; m/z${r.charge !== 0 ? ' with the electron mass accounted for' : ' (neutral molecule: mass in u)'}`)}</text>`);
  // grid and y axis
  for (const v of [0, 25, 50, 75, 100]) {
    out.push(`<line class="grid" x1="${left}" y1="${num(y(v))}" x2="${W - right}" y2="${num(y(v))}" stroke="#e6e6e6" stroke-width="1"/>`);
    out.push(`<text class="y-tick" data-value="${v}" x="${left - 8}" y="${num(y(v) + 4)}" text-anchor="end" fill="#444">${v}</text>`);
  }
  out.push(`<line class="axis" x1="${left}" y1="${top}" x2="${left}" y2="${top + plotH}" stroke="#333" stroke-width="1"/>`);
  out.push(`<line class="axis" x1="${left}" y1="${top + plotH}" x2="${W - right}" y2="${top + plotH}" stroke="#333" stroke-width="1"/>`);
  // x ticks
  const xt = ticks(x0, x1, 6);
  const tickDecimals = Math.max(0, ...xt.map((v) => (String(v).split('.')[1] ?? '').length));
  for (const v of xt) {
    out.push(`<line class="x-tick-mark" x1="${num(x(v))}" y1="${top + plotH}" x2="${num(x(v))}" y2="${top + plotH + 5}" stroke="#333" stroke-width="1"/>`);
    out.push(`<text class="x-tick" data-value="${v}" x="${num(x(v))}" y="${top + plotH + 19}" text-anchor="middle" fill="#444">${v.toFixed(tickDecimals)}</text>`);
  }
  out.push(`<text class="x-label" x="${left + plotW / 2}" y="${H - 16}" text-anchor="middle" fill="#222" font-style="italic">m/z</text>`);
  out.push(`<text class="y-label" x="18" y="${top + plotH / 2}" text-anchor="middle" fill="#222" transform="rotate(-90 18 ${top + plotH / 2})">relative abundance (%)</text>`);
  // sticks, smallest first so the large ones draw on top
  for (const p of [...peaks].sort((a, b) => a.relative - b.relative)) {
    const colour = p.shift === 0 ? '#b03a2e' : '#1f4e79';
    out.push(`<line class="peak" data-mz="${p.mz}" data-relative="${p.relative}" x1="${num(x(p.mz))}" y1="${num(y(0))}" x2="${num(x(p.mz))}" y2="${num(y(p.relative))}" stroke="${colour}" stroke-width="2.5" stroke-linecap="butt"/>`);
  }
  // labels on the largest peaks
  const labelled = [...peaks].sort((a, b) => b.relative - a.relative).slice(0, options.labels ?? 8).filter((p) => p.relative >= 2);
  const placed: number[] = [];
  for (const p of labelled) {
    if (placed.some((px) => Math.abs(px - x(p.mz)) < 58)) continue;
    placed.push(x(p.mz));
    out.push(`<text class="peak-label" data-mz="${p.mz}" x="${num(x(p.mz))}" y="${num(y(p.relative) - 6)}" text-anchor="middle" fill="#222" font-size="11">${p.mz.toFixed(decimals)}</text>`);
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}
