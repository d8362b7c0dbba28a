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

  it("--part 2H2O in a formula with no nuclide label is 2 × H2O, with a note", () => {
    // source: CIAAW 2021 weights: 2 × 18.015 / 172.164 = 20.93 % (CaSO4·2H2O)
    const r = pondus(['composition', 'CaSO4·2H2O', '--part', '2H2O']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('20.93 % by mass');
    expect(r.stdout).toContain('read as 2 × H2O');
  });

  it('fails cleanly for a fragment that is not there', () => {
    const r = pondus(['composition', '--part', 'NaCl', 'H2O']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('PART_NOT_IN_FORMULA');
  });

  it('writes CSV in wide form: one X_percent column per element of the first block, and a notes column', () => {
    const r = pondus(['composition', '--csv', '-'], 'H2O\nNaCl\nCuSO4.5H2O\n');
    expect(r.status).toBe(0);
    const [head, ...rows] = r.stdout.trim().split('\n');
    expect(head).toBe('input,line,formula,molarMass,H_percent,Cl_percent,Cu_percent,Na_percent,O_percent,S_percent,notes,error,message');
    expect(rows).toHaveLength(3);
    const water = rows[0].split(',');
    // 2 × 1.008 / 18.015 and 15.999 / 18.015 (CIAAW 2021 conventional weights)
    expect(water[1]).toBe('1');
    expect(Number(water[4]).toFixed(4)).toBe('11.1907');
    expect(Number(water[8]).toFixed(4)).toBe('88.8093');
    expect(water[5]).toBe('0');
    expect(rows[2]).toContain('DOT_AS_ADDITION');
  });

  it('says so in the notes when a later row has an element with no column', () => {
    const lines = ['H2O', ...new Array(600).fill('H2O2'), 'NaCl'];
    const r = pondus(['composition', '--csv', '-'], lines.join('\n') + '\n');
    const rows = r.stdout.trim().split('\n');
    expect(rows[0]).toBe('input,line,formula,molarMass,H_percent,O_percent,notes,error,message');
    expect(rows[rows.length - 1]).toMatch(/^NaCl,602,ClNa,58\.43976928,0,0,"NO_COLUMN: no column for Cl \(60\.66/);
    expect(rows[rows.length - 1]).toContain('--long');
  });

  it('writes CSV in long form with --long: one row per element', () => {
    const r = pondus(['composition', '--csv', '--long', 'H2O', 'NaCl']);
    expect(r.stdout.trim().split('\n')).toEqual([
      'input,line,formula,molarMass,symbol,count,mass,massPercent,notes,error,message',
      'H2O,1,H2O,18.015,H,2,2.016,11.19067443796836,,,',
      'H2O,1,H2O,18.015,O,1,15.999,88.80932556203165,,,',
      'NaCl,2,ClNa,58.43976928,Cl,1,35.45,60.66074598985823,,,',
      'NaCl,2,ClNa,58.43976928,Na,1,22.98976928,39.33925401014177,,,',
    ]);
  });

  it('refuses --long without CSV or TSV (exit 2)', () => {
    expect(pondus(['composition', '--long', 'H2O']).status).toBe(2);
  });

  it('gives every JSON row its line and notes, ok or not', () => {
    const out = jsonLines(pondus(['composition', '--json', '-'], 'H2O\nXx\nCuSO4.5H2O\n').stdout);
    expect(out.map((o) => o.line)).toEqual([1, 2, 3]);
    expect(out[0].notes).toEqual([]);
    expect(out[1].error.code).toBe('UNKNOWN_ELEMENT');
    expect(out[2].notes.map((n: { code: string }) => n.code)).toEqual(['DOT_AS_ADDITION']);
  });

  it('streams a long table under one header', () => {
    const lines = Array.from({ length: 2500 }, (_, i) => `C${i + 1}H4`);
    const r = pondus(['mass', '-'], lines.join('\n') + '\n');
    expect(r.stdout.match(/formula \(Hill\)/g)).toHaveLength(1);
    expect(r.stdout.match(/┌/g)).toHaveLength(1);
    expect(r.stdout.match(/└/g)).toHaveLength(1);
    expect(r.stdout.split('\n').filter((l) => l.startsWith('│ C')).length).toBe(2500);
  });
});
