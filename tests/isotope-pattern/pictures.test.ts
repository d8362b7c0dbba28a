import { describe, expect, it } from 'vitest';
import { isotopePattern } from '../../src/isotope-pattern/pattern.js';
import { patternSvg } from '../../src/isotope-pattern/pattern-svg.js';
import { bar, stickPlot } from '../../src/isotope-pattern/stick-plot.js';

/** Reads the sticks and the axis back from the SVG text. */
function readSvg(svg: string) {
  const attrs = (tag: string) => Object.fromEntries([...tag.matchAll(/([a-z0-9-]+)="([^"]*)"/g)].map((m) => [m[1], m[2]]));
  const peaks = [...svg.matchAll(/<line class="peak"[^>]*>/g)].map((m) => attrs(m[0]));
  const xt = [...svg.matchAll(/<text class="x-tick"[^>]*>/g)].map((m) => attrs(m[0])).map((a) => ({ value: Number(a['data-value']), x: Number(a.x) }));
  const yt = [...svg.matchAll(/<text class="y-tick"[^>]*>/g)].map((m) => attrs(m[0])).map((a) => ({ value: Number(a['data-value']), y: Number(a.y) - 4 }));
  return { peaks, xt, yt };
}

describe('SVG picture', () => {
  it('puts each Br2 peak at its m/z on the axis, heights in proportion', () => {
    const r = isotopePattern('Br2');
    const svg = patternSvg(r);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
    expect(svg.trim().endsWith('</svg>')).toBe(true);
    const { peaks, xt, yt } = readSvg(svg);
    expect(peaks).toHaveLength(3);
    // the axis mapping from two ticks
    const [a, b] = [xt[0], xt[xt.length - 1]];
    const mzAt = (px: number) => a.value + ((px - a.x) / (b.x - a.x)) * (b.value - a.value);
    const base = yt.find((t) => t.value === 0)!.y;
    const full = yt.find((t) => t.value === 100)!.y;
    for (const p of peaks) {
      const expected = r.peaks.find((q) => Math.abs(q.mz - Number(p['data-mz'])) < 1e-9)!;
      expect(mzAt(Number(p.x1))).toBeCloseTo(expected.mz, 1);
      const height = (Number(p.y1) - Number(p.y2)) / (base - full);
      expect(height * 100).toBeCloseTo(expected.relative, 0);
      expect(Number(p.y1)).toBeCloseTo(base, 1);
    }
    // labels on the main peaks, title and axis names
    expect(svg).toContain('>159.8346</text>');
    expect(svg).toContain('relative abundance (%)');
    expect(svg).toContain('>m/z</text>');
    expect(svg).toContain('>Br2</text>');
  });

  it('draws a Pd complex ion with the ion in the title, escaping text', () => {
    const r = isotopePattern('C36H30Cl2P2Pd', { ion: '[M+Na]+' });
    const svg = patternSvg(r);
    const { peaks } = readSvg(svg);
    expect(peaks.length).toBe(r.peaks.length);
    expect(svg).toContain('the [M+Na]+ ion of C36H30Cl2P2Pd');
    expect(patternSvg(r, { title: 'a < b & c' })).toContain('a &lt; b &amp; c');
  });
});

describe('terminal stick plot', () => {
  it('draws bars in eighths of a cell, the largest filling the width', () => {
    expect(bar(2.5)).toBe('██▌');
    expect(bar(0.01)).toBe('▏');
    expect(bar(0)).toBe('');
    const rows = stickPlot(isotopePattern('Br2').peaks, { width: 40 });
    expect(rows[0]).toContain('m/z');
    const cells = rows.slice(1).map((row) => {
      const b = /[█▏▎▍▌▋▊▉]+/.exec(row)![0];
      return [...b].reduce((s, ch) => s + (ch === '█' ? 1 : ' ▏▎▍▌▋▊▉'.indexOf(ch) / 8), 0);
    });
    expect(cells[1]).toBe(40);
    expect(cells[0]).toBeCloseTo(40 * 0.514, 0);
    expect(rows[1]).toContain('M ');
    expect(rows[2]).toContain('M+2');
    expect(rows.join('\n')).not.toMatch(/\u001b\[/);
  });

  it('colours only through the callback and keeps the largest peaks when there are many', () => {
    const r = isotopePattern('C100H150N20O30S2', { kind: 'fine', minRelative: 0 });
    const rows = stickPlot(r.peaks, { maxRows: 10, paint: (s) => `<${s}>` });
    expect(rows).toHaveLength(12);
    expect(rows[11]).toMatch(/smaller peaks not drawn/);
    expect(rows[1]).toMatch(/<[█▏▎▍▌▋▊▉]+>/);
  });
});
