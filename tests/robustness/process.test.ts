// The process itself: answers as each line comes, keeps what it computed when interrupted, says what
// went wrong with its standard input and output. These spawn bin/pondus.cjs (npm test builds first).
import { spawn, spawnSync } from 'node:child_process';
import { closeSync, existsSync, openSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';

const BIN = join(__dirname, '..', '..', 'bin', 'pondus.cjs');
const env = { ...process.env, NO_COLOR: '1' };

/** Starts pondus with piped stdin/stdout; `lines()` gives the complete output lines so far. */
function start(args: string[]) {
  const child = spawn(process.execPath, [BIN, ...args], { stdio: ['pipe', 'pipe', 'pipe'], env });
  let out = '';
  let err = '';
  const waiters: (() => void)[] = [];
  child.stdout.setEncoding('utf8').on('data', (d: string) => {
    out += d;
    waiters.splice(0).forEach((w) => w());
  });
  child.stderr.setEncoding('utf8').on('data', (d: string) => (err += d));
  const exited = new Promise<{ code: number | null; signal: NodeJS.Signals | null }>((resolve) => child.on('exit', (code, signal) => resolve({ code, signal })));
  const lines = () => out.split('\n').slice(0, -1);
  /** Waits until `n` complete lines are out (the test's own timeout fails it otherwise). */
  const untilLines = async (n: number) => {
    while (lines().length < n) await new Promise<void>((r) => waiters.push(r));
  };
  return { child, lines, untilLines, exited, stderr: () => err };
}

describe('answers as the input comes', () => {
  it('a co-process that writes one line and waits gets its answer before it writes the next', async () => {
    const p = start(['mass', '--json', '-']);
    p.child.stdin.write('H2O\n');
    await p.untilLines(1);
    expect(JSON.parse(p.lines()[0])).toMatchObject({ input: 'H2O', molarMass: 18.015 });
    p.child.stdin.write('Xx\n');
    await p.untilLines(2);
    expect(JSON.parse(p.lines()[1])).toMatchObject({ input: 'Xx', error: { code: 'UNKNOWN_ELEMENT' } });
    p.child.stdin.write('NaCl\n');
    await p.untilLines(3);
    p.child.stdin.end();
    expect((await p.exited).code).toBe(1);
    expect(p.lines().map((l) => JSON.parse(l).input)).toEqual(['H2O', 'Xx', 'NaCl']);
  }, 20_000);

  it('an interrupt keeps every result computed before it, and exits 130', async () => {
    const p = start(['calc', '--json', '-']);
    p.child.stdin.write('8.80 g + 2.1 g\n1300 g * 2\n');
    await p.untilLines(2);
    p.child.kill('SIGINT');
    const { code } = await p.exited;
    expect(code).toBe(130);
    expect(p.lines().map((l) => JSON.parse(l).display)).toEqual(['10.9 g', '2.6 × 10³ g']);
  }, 20_000);
});

describe('standard input and output that cannot be used', () => {
  it('refuses standard input that is a directory (exit 2), saying so', () => {
    const fd = openSync(tmpdir(), 'r');
    try {
      const r = spawnSync(process.execPath, [BIN, 'mass', '-'], { stdio: [fd, 'pipe', 'pipe'], encoding: 'utf8', env });
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/standard input is a directory/);
      expect(r.stdout).toBe('');
    } finally {
      closeSync(fd);
    }
  });

  it('refuses a closed standard input (exit 2), saying so', () => {
    // a closed descriptor 0: the shell's <&-
    const r = spawnSync('sh', ['-c', `"${process.execPath}" "${BIN}" mass - <&-`], { encoding: 'utf8', env });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/standard input is closed/);
  });

  it.runIf(existsSync('/dev/full'))('says that the disk is full, not that pondus failed inside', () => {
    const fd = openSync('/dev/full', 'w');
    try {
      const r = spawnSync(process.execPath, [BIN, 'mass', '--json', 'H2O'], { stdio: ['ignore', fd, 'pipe'], encoding: 'utf8', env });
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(/cannot write the output: no space left on the device \(ENOSPC\)/);
      expect(r.stderr).not.toMatch(/internal error/);
    } finally {
      closeSync(fd);
    }
  });

  it('reads a file with lone CR line endings as lines', () => {
    const r = spawnSync(process.execPath, [BIN, 'mass', '--json', '-'], { input: 'H2O\rNaCl\rCO2\r', encoding: 'utf8', env });
    expect(r.status).toBe(0);
    expect(r.stdout.trim().split('\n').map((l) => JSON.parse(l).input)).toEqual(['H2O', 'NaCl', 'CO2']);
  });
});
