// Sheets (--sheet) are read like standard input: row by row, in bounded memory, only from a regular
// file named directly, up to a stated size, and their content is never echoed in a message.
import { spawn } from 'node:child_process';
import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync, symlinkSync, truncateSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { MAX_SHEET_BYTES } from '../../src/cli/input/sheet-file.js';
import { jsonLines, pondus } from '../cli/run-cli.js';

const dir = mkdtempSync(join(tmpdir(), 'pondus-sheets-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const file = (name: string, text: string) => {
  const p = join(dir, name);
  writeFileSync(p, text);
  return p;
};
// source: invented rows (demo data); the found values are those of examples/ea-lab-sheet.csv
const HEADER = 'id,formula,C,H,N\n';
const ROW = (i: number) => `S-${i},C20H25N3O,72.30,7.91,12.60\n`;

describe('what --sheet refuses', () => {
  it('a device such as /dev/zero, which would be read forever', () => {
    const r = pondus(['analysis', '--sheet', '/dev/zero']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/--sheet \/dev\/zero is not a regular file/);
  });

  it('a directory and a FIFO', () => {
    expect(pondus(['analysis', '--sheet', dir]).stderr).toMatch(/is a directory/);
    const fifo = join(dir, 'fifo.csv');
    // no writer: opening must not wait for one
    try {
      execFileSync('mkfifo', [fifo]);
    } catch {
      return; // no mkfifo on this system
    }
    const r = pondus(['analysis', '--sheet', fifo]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/is not a regular file/);
  });

  it('a symbolic link, instead of following it silently', () => {
    const target = file('target.csv', HEADER + ROW(1));
    const link = join(dir, 'link.csv');
    symlinkSync(target, link);
    const r = pondus(['analysis', '--sheet', link]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/is a symbolic link/);
    expect(pondus(['analysis', '--sheet', target]).status).toBe(0);
  });

  it('a file beyond the stated size', () => {
    const big = file('big.csv', HEADER);
    truncateSync(big, MAX_SHEET_BYTES + 1); // sparse: no disk used
    const r = pondus(['analysis', '--sheet', big]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/sheets are read up to 100 MB/);
  });

  it('a row that never ends (no line end, a quote never closed) past 1 MB', () => {
    const r = pondus(['analysis', '--sheet', '-'], `${HEADER}"${'x'.repeat(1_100_000)}`);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/a row longer than 1 MB/);
  });
});

describe('empty sheets', () => {
  it('a sheet with no rows is refused, not answered with nothing', () => {
    expect(pondus(['analysis', '--sheet', '-'], '')).toMatchObject({ status: 2, stderr: expect.stringMatching(/the sheet is empty/) });
    expect(pondus(['analysis', '--json', '--sheet', '-'], HEADER)).toMatchObject({ status: 2, stderr: expect.stringMatching(/a header and no rows/) });
  });
});

describe('messages never echo the file', () => {
  it('a file that is not a lab sheet: its first line is not shown', () => {
    const p = file('secret.txt', 'token-7f3a9c:hunter2\nmore secret text\n');
    const r = pondus(['analysis', '--sheet', p]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/no 'formula' column \(its header has 1 column\)/);
    expect(r.stdout + r.stderr).not.toMatch(/hunter2|token-7f3a9c|secret text/);
  });

  it('invalid CSV: the line and the problem, not the text', () => {
    const r = pondus(['analysis', '--sheet', '-'], `${HEADER}"S-1"hunter2,C6H6,92.26,7.74,0\n`);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid CSV at line 2: text right after a closing quote/);
    expect(r.stderr).not.toMatch(/hunter2/);
  });
});

describe('sheets are streamed', () => {
  it('every row of a long sheet gets one result, in order, at its own line', () => {
    const rows = Array.from({ length: 1500 }, (_, i) => ROW(i + 1));
    // a blank line and a quoted cell over two lines move the line numbers; rows that fail say their line
    const text = HEADER + rows.slice(0, 700).join('') + '\n' + '"S-x\nsecond line",C9H8O4,60.21,4.42,\n' + 'S-bad,Xx,1,2,3\n' + rows.slice(700).join('') + 'S-last,Qq,1,2,3\n';
    const r = pondus(['analysis', '--json', '--sheet', '-'], text);
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out).toHaveLength(1503);
    expect(out.map((o) => o.id ?? o.input.split(',')[0])).toEqual([...rows.slice(0, 700).map((_, i) => `S-${i + 1}`), 'S-x\nsecond line', 'S-bad', ...rows.slice(700).map((_, i) => `S-${i + 701}`), 'S-last']);
    // header line 1, rows 2–701, blank 702, the two-line cell 703–704, S-bad 705, … S-last 1506
    expect(out[701]).toMatchObject({ line: 705, error: { code: 'UNKNOWN_ELEMENT' } });
    expect(out[1502]).toMatchObject({ line: 1506, error: { code: 'UNKNOWN_ELEMENT' } });
  });

  it('reads CRLF and lone-CR sheets alike', () => {
    const lf = pondus(['analysis', '--json', '--sheet', '-'], HEADER + ROW(1) + ROW(2));
    for (const eol of ['\r\n', '\r']) {
      const r = pondus(['analysis', '--json', '--sheet', '-'], (HEADER + ROW(1) + ROW(2)).replace(/\n/g, eol));
      expect(r.stdout).toBe(lf.stdout);
    }
  });

  it('a CSV error deep in a long sheet stops with the line, after the rows before it', () => {
    const text = HEADER + Array.from({ length: 1200 }, (_, i) => ROW(i + 1)).join('') + '"S-q"x,C6H6,1,2,3\n' + ROW(9999);
    const r = pondus(['analysis', '--json', '--sheet', '-'], text);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/not valid CSV at line 1202: text right after a closing quote/);
    // the batches read before the bad row were computed and written
    const done = r.stdout.trim().split('\n').length;
    expect(done).toBeGreaterThanOrEqual(1000);
    expect(done).toBeLessThan(1200);
  });

  it('a sheet written to standard input row by row is answered row by row', async () => {
    const child = spawn(process.execPath, [join(__dirname, '..', '..', 'bin', 'pondus.cjs'), 'analysis', '--json', '--sheet', '-'], { stdio: ['pipe', 'pipe', 'pipe'] });
    let out = '';
    const wait = (n: number) => new Promise<void>((resolve) => {
      const check = () => (out.split('\n').length - 1 >= n ? resolve() : child.stdout.once('data', (d) => ((out += d), check())));
      check();
    });
    child.stdin.write(HEADER + ROW(1));
    await wait(1);
    child.stdin.write(ROW(2));
    await wait(2);
    child.stdin.end();
    await new Promise((r) => child.on('exit', r));
    expect(jsonLines(out).map((o) => o.id)).toEqual(['S-1', 'S-2']);
  }, 20_000);
});
