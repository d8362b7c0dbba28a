// Failed rows in JSON and CSV: `line` first, every issue listed, a sheet row named as its ok rows
// name it, and the CSV `line` column filled. (Sheet values are demonstration values.)
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

const DIR = mkdtempSync(join(tmpdir(), 'pondus-error-rows-'));
afterAll(() => rmSync(DIR, { recursive: true, force: true }));
const sheet = (name: string, text: string) => {
  writeFileSync(join(DIR, name), text);
  return join(DIR, name);
};

/** A CSV line split into cells (no quoted commas in the rows these tests read). */
const cells = (line: string) => line.split(',');

describe('JSON error rows', () => {
  it('mass --json XxQq: line first, error the first issue, errors both', () => {
    const r = pondus(['mass', '--json', 'XxQq']);
    expect(r.status).toBe(1);
    const [row] = jsonLines(r.stdout);
    expect(Object.keys(row)).toEqual(['line', 'input', 'error', 'errors']);
    expect(row.line).toBe(1);
    expect(row.input).toBe('XxQq');
    expect(row.error).toEqual({ code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 });
    expect(row.errors.map((e: { code: string; column: number }) => [e.code, e.column])).toEqual([['UNKNOWN_ELEMENT', 1], ['UNKNOWN_ELEMENT', 3]]);
  });

  it('ok and error rows of one batch start with line alike', () => {
    const rows = jsonLines(pondus(['mass', '--json', 'H2O', 'Ca(OH2', 'NaCl']).stdout);
    expect(rows.map((r) => Object.keys(r)[0])).toEqual(['line', 'line', 'line']);
    expect(rows.map((r) => r.line)).toEqual([1, 2, 3]);
  });
});

describe('CSV error rows', () => {
  it('mass --csv XxQq: the first code in the error cell; every issue with its code and column in the message cell', () => {
    const lines = pondus(['mass', '--csv', 'XxQq']).stdout.trim().split('\n');
    expect(lines[1]).toBe("XxQq,1,,,,,,,UNKNOWN_ELEMENT,UNKNOWN_ELEMENT: unknown element symbol 'Xx' (column 1) | UNKNOWN_ELEMENT: unknown element symbol 'Qq' (column 3)");
  });

  it('one issue: its code alone, and its message with the column it names', () => {
    const lines = pondus(['mass', '--csv', 'H2O', 'Ca(OH2']).stdout.trim().split('\n');
    expect(lines[2]).toBe("Ca(OH2,2,,,,,,,UNCLOSED_GROUP,'(' at column 3 is never closed");
  });

  it('titration --csv: a failed input fills the line column', () => {
    const r = pondus(['titration', 'Qq', 'KHC8H4O4', '--sample', '0.5000 g', '--titrant', '0.1000 M', '--volume', '24.40 mL', '--csv']);
    const [head, bad, good] = r.stdout.trim().split('\n').map(cells);
    const at = head.indexOf('line');
    expect(at).toBeGreaterThan(0);
    expect(bad[at]).toBe('1');
    expect(good[at]).toBe('2');
  });
});

/** Sheets whose second data row fails: its failed row must carry the identification its ok rows carry. */
const SHEETS: [command: string, file: string, keys: string[]][] = [
  ['analysis', sheet('ea.csv', 'id,formula,C,H,N\nS1,C6H6,92.2,7.8,\nS2,XxQq,40,5,\n'), ['id', 'input']],
  ['ion', sheet('ion.csv', 'id,formula,ion,found\nI1,C15H15NO2,[M+H]+,242.1172\nI2,XxQq,[M+H]+,242.1\n'), ['id', 'input']],
  ['empirical', sheet('emp.csv', 'id,C,H,O\nE1,40.00,6.71,53.29\nE2,abc,6.7,1\n'), ['id', 'input']],
  ['prepare', sheet('prep.csv', 'id,reagent,form,purity,density,target,volume\nP-01,sodium chloride,NaCl,99.5 %,,0.100 M,250.0 mL\nP-02,junk,XxQq,,,0.1 M,100 mL\n'), ['input', 'id']],
];

describe('sheet error rows are named as the ok rows of the same sheet are', () => {
  it.each(SHEETS)('%s --sheet: line, then the same identifying keys', (command, file, keys) => {
    const [ok, bad] = jsonLines(pondus([command, '--sheet', file, '--json']).stdout);
    expect(Object.keys(ok).slice(0, keys.length + 1)).toEqual(['line', ...keys]);
    expect(Object.keys(bad)).toEqual(['line', ...keys, 'error', 'errors']);
    expect(bad.line).toBe(3);
    expect(bad.id).toMatch(/^[A-Z]-?[0-9]+$/);
    expect(bad.id.slice(0, 1)).toBe(ok.id.slice(0, 1));
    // the input is the cell the ok rows give as input (for prepare: the row as written)
    if (command === 'prepare') expect(bad.input).toBe('P-02,junk,XxQq,,,0.1 M,100 mL');
    else expect(bad.input).not.toContain(',');
  });

  it('analysis --sheet: the failed row gives the formula cell and the id, in JSON, CSV and the table', () => {
    const file = SHEETS[0][1];
    const [, bad] = jsonLines(pondus(['analysis', '--sheet', file, '--json']).stdout);
    expect([bad.id, bad.input]).toEqual(['S2', 'XxQq']);
    const [head, , row] = pondus(['analysis', '--sheet', file, '--csv']).stdout.trim().split('\n').map(cells);
    expect([row[head.indexOf('input')], row[head.indexOf('id')]]).toEqual(['XxQq', 'S2']);
    const table = pondus(['analysis', '--sheet', file]).stdout;
    expect(table).toMatch(/│ S2 +│ ✗ UNKNOWN_ELEMENT/);
    expect(table).not.toContain('S2,XxQq');
  });
});
