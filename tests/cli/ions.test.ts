import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus ion', () => {
  it('prints the m/z, the error and the HRMS line', () => {
    const r = pondus(['ion', 'C15H15NO2', '--adduct', '[M+H]+', '--found', '242.1172']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('C15H16NO2^+   m/z 242.1176  (charge 1+)');
    expect(r.stdout).toContain('error -1.5 ppm (-0.4 mDa)');
    expect(r.stdout).toContain('HRMS (ESI) m/z: [M + H]+ calcd for C15H16NO2 242.1176; found 242.1172.');
    expect(r.stdout).not.toMatch(/\u001b\[/);
  });

  it('writes JSON with numbers, exact text beside them, and notes as {code, message}', () => {
    const [j] = jsonLines(pondus(['ion', '--json', 'C14H15NO3S^-']).stdout);
    expect(j.input).toBe('C14H15NO3S^-');
    expect(j.ion).toBeNull();
    expect(typeof j.mz).toBe('number');
    expect(j.mzExact.startsWith('277.07781309')).toBe(true);
    expect(j.oddElectron).toBe(true);
    expect(j.notes[0].code).toBe('CHARGED_FORMULA');
  });

  it('reads a batch of FORMULA ION FOUND lines, in order, with a bad line in place', () => {
    const r = pondus(['ion', '--json', '-'], 'C15H15NO2 [M+H]+ 242.1172\nC6H6 [M+Q]+\n[C6H12O6+Na]+ 203.0524\nC6H12O6 [M + Na]+\n');
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out.map((o) => o.input)).toEqual(['C15H15NO2 [M+H]+ 242.1172', 'C6H6 [M+Q]+', '[C6H12O6+Na]+ 203.0524', 'C6H12O6 [M + Na]+']);
    expect(out[0].formula).toBe('C15H15NO2');
    expect(out[0].errorPpm).toBe(-1.5);
    expect(out[1]).toMatchObject({ line: 2, error: { code: 'UNKNOWN_ELEMENT', column: 4 } });
    expect(out[2].reportLine).toBe('HRMS (ESI) m/z: [M + Na]+ calcd for C6H12NaO6 203.0526; found 203.0524.');
    expect(out[3].ion).toBe('[M+Na]+');
    expect(r.stderr).toContain('1 of 4 inputs failed (line 2)');
  });

  it('checks a lab sheet of compounds, ions and found m/z', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pondus-ion-'));
    const sheet = join(dir, 'hrms.csv');
    writeFileSync(sheet, 'id,formula,ion,found\nJK-1,C15H15NO2,[M+H]+,242.1172\nJK-2,C14H15NO3S,[M-H]-,276.0702\nJK-3,C6H6,,\n');
    const r = pondus(['ion', '--sheet', sheet, '--json']);
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out[0]).toMatchObject({ id: 'JK-1', input: 'C15H15NO2', errorPpm: -1.5 });
    expect(out[1]).toMatchObject({ id: 'JK-2', errorPpm: 0.8, errorMDa: 0.2 });
    expect(out[2]).toMatchObject({ line: 4, error: { code: 'BAD_ION' } });
    const csv = pondus(['ion', '--sheet', sheet, '--csv']).stdout.split('\n');
    expect(csv[0]).toBe('input,line,id,formula,ion,ionFormula,charge,mz,calculated,found,errorPpm,errorMDa,reportLine,notes,error,message');
    expect(csv[1]).toContain(',JK-1,C15H15NO2,[M+H]+,C15H16NO2^+,1,242.117555173229,242.1176,242.1172,-1.5,-0.4,');
  });

  it('takes the ionisation and refuses conflicting or missing inputs', () => {
    expect(pondus(['ion', 'C8H10N4O2', '--adduct', '[M+H]+', '--found', '195.0875', '--ionisation', 'APCI']).stdout).toContain('HRMS (APCI) m/z: [M + H]+ calcd for C8H11N4O2 195.0877; found 195.0875.');
    expect(pondus(['ion', 'C6H6', 'C7H8', '--adduct', '[M+H]+', '--found', '79.05']).status).toBe(2);
    const both = pondus(['ion', 'C14H15NO3S^-', '--adduct', '[M-H]-']);
    expect(both.status).toBe(1);
    expect(both.stderr).toContain('error ION_CONFLICT');
    const unbracketed = pondus(['ion', 'C6H6', '--adduct', 'M+H+']);
    expect(unbracketed.stderr).toContain('error BAD_ION');
    expect(unbracketed.stderr).toContain('hint: write [M+H+]');
    expect(pondus(['ion', 'C6H6', '--adduct', '[M+H]+', '--decimals', 'x']).status).toBe(2);
  });
});

describe('pondus pattern', () => {
  it('draws the Br2 triplet in the terminal, plain in a pipe', () => {
    const r = pondus(['pattern', 'Br2']);
    expect(r.status).toBe(0);
    const rows = r.stdout.split('\n');
    expect(rows.find((l) => l.startsWith('157.8367'))).toMatch(/^157\.8367 +51\.4 +M +█{20}▌$/);
    expect(rows.find((l) => l.startsWith('159.8346'))).toMatch(/100\.0 +M\+2 +█{40}$/);
    expect(r.stdout).not.toMatch(/\u001b\[/);
    expect(pondus(['pattern', 'Br2'], undefined, { NO_COLOR: '', FORCE_COLOR: '1' }).stdout).toMatch(/\u001b\[36m█/);
  });

  it('writes JSON, and the fine structure at a resolving power', () => {
    const [j] = jsonLines(pondus(['pattern', '--json', 'C15H15NO2', '--adduct', '[M+H]+', '--resolution', '60k']).stdout);
    expect(j).toMatchObject({ ion: '[M+H]+', speciesFormula: 'C15H16NO2^+', kind: 'fine', resolvingPower: 60000, charge: 1 });
    expect(j.peaks.filter((p: { shift: number }) => p.shift === 1).map((p: { label: string }) => p.label)).toEqual(['[15N]', '[13C]']);
    expect(j.monoisotopicMzExact.startsWith('242.11755517')).toBe(true);
    const merged = jsonLines(pondus(['pattern', '--json', 'C15H15NO2', '--adduct', '[M+H]+', '--resolution', '20000']).stdout)[0];
    expect(merged.peaks.filter((p: { shift: number }) => p.shift === 1)).toHaveLength(1);
  });

  it('writes an SVG file', () => {
    const dir = mkdtempSync(join(tmpdir(), 'pondus-svg-'));
    const file = join(dir, 'pd.svg');
    const r = pondus(['pattern', 'C36H30Cl2P2Pd', '--adduct', '[M-Cl]+', '--svg', file]);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain(`picture written to ${file}`);
    const svg = readFileSync(file, 'utf8');
    expect(svg.match(/<line class="peak"/g)!.length).toBe(13);
    expect(pondus(['pattern', 'Br2', 'Cl2', '--svg', file]).status).toBe(2);
  });

  it('reads lines from standard input, one pattern each, with CSV columns per peak', () => {
    const r = pondus(['pattern', '--csv', '-'], 'Cl2\nC6H6 [M+H]+\nXx\n');
    expect(r.status).toBe(1);
    const rows = r.stdout.trim().split('\n');
    expect(rows).toHaveLength(4);
    expect(rows[0].startsWith('input,line,formula,ion,speciesFormula,charge,kind,resolvingPower,coverage,monoisotopicMz,averageMz,mz1,relative1,')).toBe(true);
    expect(rows[1]).toMatch(/^Cl2,1,Cl2,,Cl2,0,aggregated,,1,69\.937705388,/);
    expect(rows[2]).toMatch(/^C6H6 \[M\+H\]\+,2,C6H6,\[M\+H\]\+,C6H7\^\+,1,/);
    expect(rows[3]).toContain('UNKNOWN_ELEMENT');
  });

  it('refuses bad options and too large patterns', () => {
    expect(pondus(['pattern', 'C6H6', '--resolution', 'fast']).status).toBe(2);
    expect(pondus(['pattern', 'C6H6', '--fine', '--resolution', '1000']).status).toBe(2);
    expect(pondus(['pattern', 'C6H6', '--coverage', '99']).status).toBe(2);
    const big = pondus(['pattern', 'C100000000']);
    expect(big.status).toBe(1);
    expect(big.stderr).toContain('error PATTERN_TOO_LARGE');
  });
});
