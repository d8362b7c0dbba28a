import fc from 'fast-check';
import { Writable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { Sink } from '../../src/cli/output/sink.js';

/** A stream that keeps every chunk as it came, decoded on its own. */
class Chunks extends Writable {
  chunks: string[] = [];
  _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.chunks.push(typeof chunk === 'string' ? chunk : chunk.toString('utf8'));
    done();
  }
}

describe('the output sink', () => {
  it('writes every text once, in order, byte for byte, each chunk holding whole writes', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(
          fc.oneof(
            { arbitrary: fc.string({ maxLength: 40 }), weight: 10 },
            { arbitrary: fc.string({ unit: 'grapheme', maxLength: 300 }), weight: 5 },
            // longer than a buffer holds: written on its own, in order
            { arbitrary: fc.tuple(fc.constantFrom('x', 'é', '₂', '𝐀'), fc.integer({ min: 20000, max: 60000 })).map(([c, n]) => c.repeat(n)), weight: 1 },
          ),
          { maxLength: 300 },
        ),
        fc.array(fc.integer({ min: 0, max: 400 }), { maxLength: 5 }),
        async (texts, flushAt) => {
          const stream = new Chunks();
          const sink = new Sink(stream);
          const at = new Set(flushAt);
          for (let i = 0; i < texts.length; i++) {
            sink.write(texts[i] + '\n');
            if (at.has(i)) await sink.flush();
          }
          await sink.flush(true);
          const got = Buffer.from(stream.chunks.join(''), 'utf8');
          const want = Buffer.from(texts.map((t) => t + '\n').join(''), 'utf8');
          // (compared with Buffer.equals first: toEqual walks megabytes byte by byte, which is most of
          // this test's time, so it runs only to fail with the difference)
          if (!got.equals(want)) expect(got).toEqual(want);
          // no write is cut between two chunks: each chunk ends where a write ends
          for (const c of stream.chunks) expect(c.endsWith('\n')).toBe(true);
        },
      ),
      { numRuns: 25 },
    );
  });

  it('holds small writes until the event loop is idle or a flush, then writes them', async () => {
    const stream = new Chunks();
    const sink = new Sink(stream);
    sink.write('{"input":"H2O"}\n');
    sink.write('{"input":"NaCl"}\n');
    expect(stream.chunks).toEqual([]);
    await new Promise((r) => setImmediate(r));
    await new Promise((r) => setImmediate(r));
    expect(stream.chunks.join('')).toBe('{"input":"H2O"}\n{"input":"NaCl"}\n');
  });
});
