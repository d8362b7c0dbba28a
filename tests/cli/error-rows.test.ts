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
    expect(Object.keys(row)).toEqual(['line', 'input', 'error', 'errors', 'notes']);
    expect(row.notes).toEqual([]);
    expect(row.line).toBe(1);
    expect(row.input).toBe('XxQq');
    expect(row.error).toEqual({ code: 'UNKNOWN_ELEMENT', message: "unknown element symbol 'Xx'", column: 1 });
    expect(row.errors.map((e: { code: string; column: number }) => [e.code, e.column])).toEqual([['UNKNOWN_ELEMENT', 1], ['UNKNOWN_ELEMENT', 3]]);
  });

  it('a failed row keeps the notes made before it failed: the dot read as the addition dot', () => {
    // source: PRODUCT.md's rule that every row carries its notes; the dot is read as in Na2CO3·10H2O (common practice)
    const [row] = jsonLines(pondus(['mass', '--json', 'Na2CO3.10H2O.Xx']).stdout);
    expect(row.error.code).toBe('UNKNOWN_ELEMENT');
    expect(row.notes.map((n: { code: string }) => n.code)).toEqual(['DOT_AS_ADDITION']);
    expect(row.notes[0].message).toContain("'.' at column 7 is read as the addition dot");
    const [state] = jsonLines(pondus(['mass', '--json', 'Xx(aq)']).stdout);
    expect(state.notes.map((n: { code: string }) => n.code)).toEqual(['STATE_SYMBOL']);
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

  it('one issue: its code alone, and its message with its column once, at the end', () => {
    const lines = pondus(['mass', '--csv', 'H2O', 'Ca(OH2']).stdout.trim().split('\n');
    expect(lines[2]).toBe("Ca(OH2,2,,,,,,,UNCLOSED_GROUP,'(' is never closed (column 3)");
  });

  it('several issues: each with its column once, at the end of its message', () => {
    const lines = pondus(['mass', '--csv', 'Xy(Qq']).stdout.trim().split('\n');
    expect(lines[1]).toBe("Xy(Qq,1,,,,,,,UNKNOWN_ELEMENT,UNKNOWN_ELEMENT: unknown element symbol 'Xy' (column 1) | UNCLOSED_GROUP: '(' is never closed (column 3) | UNKNOWN_ELEMENT: unknown element symbol 'Qq' (column 4)");
    const mismatched = pondus(['mass', '--csv', 'K4[Fe(CN)6)']).stdout.trim().split('\n')[1];
    expect(mismatched.endsWith("')' closes '[' from column 3; expected ']' (column 11)")).toBe(true);
  });

  it('the hint follows the message, in CSV and TSV, its options named as flags', () => {
    const [, acoh, so4] = pondus(['mass', '--csv', 'AcOH', 'SO4-2']).stdout.trim().split('\n');
    expect(acoh).toContain('(column 1); hint: to read Ac as acetyl, read abbreviations with --abbreviations;');
    expect(so4).toContain('(column 4); hint: for a charge of 2−, write SO4^2-');
    const tsv = pondus(['mass', '--tsv', 'SO42-']).stdout.trim().split('\n')[1].split('\t');
    expect(tsv[tsv.length - 1]).toContain('; hint: write SO4^2- (count 4, charge 2-)');
  });

  it('a failed row keeps its notes in the notes column', () => {
    const [head, row] = pondus(['mass', '--tsv', 'Na2CO3.10H2O.Xx']).stdout.trim().split('\n').map((l) => l.split('\t'));
    expect(row[head.indexOf('notes')]).toMatch(/^DOT_AS_ADDITION: '\.' at column 7 is read as the addition dot/);
    expect(row[head.indexOf('error')]).toBe('UNKNOWN_ELEMENT');
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
    expect(Object.keys(bad)).toEqual(['line', ...keys, 'error', 'errors', 'notes']);
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
