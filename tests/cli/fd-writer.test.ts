import { closeSync, openSync, readFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FdWriter, plainOutput, type OutStream } from '../../src/cli/output/fd-writer.js';
import { Sink } from '../../src/cli/output/sink.js';

/** A stand-in for Node's stream: it keeps what it is given. */
function keeper(): OutStream & { got: string[] } {
  const got: string[] = [];
  return { got, write: (chunk, done) => { got.push(Buffer.from(chunk).toString()); done?.(); return true; } };
}

describe('plain writes to standard output', () => {
  it('write every byte to a file, through the sink, and say a file takes plain writes', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'pondus-fd-')), 'out.txt');
    const fd = openSync(file, 'w');
    expect(plainOutput(fd)).toBe(true);
    const sink = new Sink(new FdWriter(fd, () => keeper(), (e) => { throw e; }));
    const rows = Array.from({ length: 20_000 }, (_, i) => `{"line":${i + 1},"input":"H2O·${'₂'.repeat(i % 5)}"}\n`);
    for (const r of rows) sink.write(r);
    sink.push();
    closeSync(fd);
    expect(readFileSync(file, 'utf8')).toBe(rows.join(''));
  });
  it('hand the rest, and everything after, to the stream when a write would wait, in order', () => {
    const stream = keeper();
    let calls = 0;
    // the first call takes 3 bytes, the second finds the pipe full
    const fake = (_fd: number, bytes: Uint8Array) => {
      calls++;
      if (calls === 1) return Math.min(3, bytes.length);
      throw Object.assign(new Error('EAGAIN'), { code: 'EAGAIN' });
    };
    const w = new FdWriter(99, () => stream, (e) => { throw e; }, fake);
    let done = 0;
    w.write('abcdef', () => done++);
    w.write('ghi', () => done++);
    expect(stream.got.join('')).toBe('defghi');
    expect(done).toBe(2);
    expect(calls).toBe(2);
  });
  it('give a write that fails for good (a closed pipe, a full disk) to the error handler', () => {
    const seen: string[] = [];
    const fake = () => {
      throw Object.assign(new Error('EPIPE'), { code: 'EPIPE' });
    };
    new FdWriter(99, () => keeper(), (e) => seen.push(e.code!), fake).write('x');
    expect(seen).toEqual(['EPIPE']);
  });
});
