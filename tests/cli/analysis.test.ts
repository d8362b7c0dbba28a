import { writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('pondus analysis', () => {
  it('shows calculated, found, deviation, verdict and the report line', () => {
    const r = pondus(['analysis', 'C9H8O4', '--found', 'C=60.21,H=4.42']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('verdict: passes (largest deviation 0.21)');
    expect(r.stdout).toContain('Anal. Calcd for C9H8O4: C, 60.00; H, 4.48. Found: C, 60.21; H, 4.42.');
  });

  it('writes the contract JSON keys, with fits best first', () => {
    const [j] = jsonLines(pondus(['analysis', '--json', 'C20H25N3O', '--found', 'C=72.30,H=7.91,N=12.60', '--solvents', 'water,DCM']).stdout);
    for (const k of ['formula', 'calculated', 'found', 'deviation', 'pass', 'tolerance', 'fits']) expect(j).toHaveProperty(k);
    expect(j.pass).toBe(false);
    expect(j.fits[0]).toMatchObject({ formula: 'C20H25N3O·0.5H2O', pass: true, solvates: [{ formula: 'H2O', name: 'water', amount: 0.5 }] });
    expect(j.fits[0].maxDeviation).toBeCloseTo(0.04, 10);
  });

  it('checks a whole lab sheet, one verdict per compound, and counts the passes', () => {
    const sheet = join(tmpdir(), `pondus-sheet-${process.pid}.csv`);
    writeFileSync(sheet, 'id,formula,C,H,N\nA-1,C9H8O4,60.21,4.42,\nA-2,C20H25N3O,72.30,7.91,12.60\nA-3,C6H6Xx,1,2,\n');
    const r = pondus(['analysis', '--sheet', sheet, '--solvents', 'water']);
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('1 of 3 compounds pass at ±0.40');
    expect(r.stdout).toContain('C20H25N3O·0.5H2O (0.04)');
    expect(r.stderr).toContain("line 4: error UNKNOWN_ELEMENT: unknown element symbol 'Xx'");
    const csv = pondus(['analysis', '--csv', '--sheet', '-'], 'id,formula,C,H\nA-1,C9H8O4,60.21,4.42\n');
    const [head, row] = csv.stdout.split('\n');
    expect(head.startsWith('input,line,id,formula,reportFormula,C_calculated,C_found,C_deviation,H_calculated,H_found,H_deviation,N_calculated')).toBe(true);
    expect(row.startsWith('C9H8O4,2,A-1,C9H8O4,C9H8O4,60.00,60.21,0.21,4.48,4.42,-0.06,,,,')).toBe(true);
  });

  it('reads FORMULA and found values from each line of standard input', () => {
    const out = jsonLines(pondus(['analysis', '--json', '-'], 'C9H8O4 C=60.21 H=4.42\nC6H6 C=95.00\n').stdout);
    expect(out.map((o) => o.pass)).toEqual([true, false]);
  });

  it('gives clear errors for bad found values and unknown solvents', () => {
    expect(pondus(['analysis', 'C6H6', '--found', 'C=101']).stderr).toContain('over 100 %');
    expect(pondus(['analysis', 'C6H6', '--found', 'C=92.26', '--solvents', 'unobtainium']).stderr).toContain("unknown solvent 'unobtainium'");
    expect(pondus(['analysis', 'C6H6', '--found', 'C=92.26,N=1']).stderr).toContain('a found value for N');
    expect(pondus(['analysis', 'C6H6']).status).toBe(2); // no found values: a usage error
  });
});

describe('pondus analysis: report lines as written', () => {
  it('writes the components and reads found values in the journal form', () => {
    const r = pondus(['analysis', 'C11H15N·CF3COOH·0.5H2O', '--found', 'C, 54.77; H, 5.91; N, 4.90']);
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('Anal. Calcd for C11H15N·C2HF3O2·0.5H2O: C, 54.93; H, 6.03; N, 4.93. Found: C, 54.77; H, 5.91; N, 4.90.');
  });

  it('refuses a sheet cell holding two values, and analyses the other rows', () => {
    const r = pondus(['analysis', '--sheet', '-', '--json'], 'id,formula,C,H\nJK-1,C20H25N3O,74.27 N=12.99,7.79\nJK-2,C20H25N3O,74.27,7.79\n');
    expect(r.status).toBe(1);
    const rows = jsonLines(r.stdout);
    expect(rows[0].error.code).toBe('BAD_RECORD');
    expect(rows[0].error.message).toContain('not one value');
    expect(rows[1].pass).toBe(true);
  });
});

describe('pondus analysis: the order of solvate fits', () => {
  // invented found values (a demo compound), chosen so that one- and two-partner fits interleave
  const args = ['analysis', 'C20H25N3O', '--found', 'C=72.10 H=7.80 N=12.40', '--solvents', 'H2O,CH2Cl2'];

  it('lists the fits by largest deviation plus 0.05 per partner, and says so', () => {
    const [r] = jsonLines(pondus([...args, '--json']).stdout) as { fits: { maxDeviation: number; solvates: unknown[] }[] }[];
    const scores = r.fits.map((f) => Math.round((f.maxDeviation + 0.05 * f.solvates.length) * 100));
    expect(scores.length).toBeGreaterThan(2);
    expect([...scores].sort((a, b) => a - b)).toEqual(scores);
    // the raw deviations alone are not in order here: the heading must say how the list is ranked
    expect(r.fits.map((f) => f.maxDeviation)).not.toEqual([...r.fits.map((f) => f.maxDeviation)].sort((a, b) => a - b));
    expect(pondus(args).stdout).toContain('best first: ranked by the largest deviation plus 0.05 per partner');
  });
});
