import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus composition', () => {
  it('prints a table of elements and percents', () => {
    const r = pondus(['composition', 'C9H8O4']);
    expect(r.status).toBe(0);
    // source: OpenStax Chemistry 2e §3.2, aspirin (from memory)
    expect(r.stdout).toMatch(/C\s+│\s+9\s+│\s+108\.099\s+│\s+60\.00/);
  });

  it('reports the share of a fragment with --part', () => {
    const r = pondus(['composition', '--json', '--part', 'H2O', 'CuSO4·5H2O']);
    const j = jsonLines(r.stdout)[0];
    expect(j.part).toMatchObject({ part: 'H2O', count: 5, countedFrom: 'written' });
    expect(j.part.massPercent.toFixed(2)).toBe('36.08');
    expect(j.elements.map((e: { symbol: string }) => e.symbol)).toEqual(['Cu', 'H', 'O', 'S']);
  });

  it('fails cleanly for a fragment that is not there', () => {
    const r = pondus(['composition', '--part', 'NaCl', 'H2O']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('PART_NOT_IN_FORMULA');
  });
});
