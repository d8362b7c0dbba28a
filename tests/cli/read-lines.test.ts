import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readLineBatches } from '../../src/cli/input/read-lines.js';

async function collect(chunks: string[]): Promise<string[][]> {
  async function* source() {
    for (const c of chunks) yield c;
  }
  const out: string[][] = [];
  for await (const b of readLineBatches(source())) out.push(b);
  return out;
}

/** A text or byte string cut into chunks of the given lengths, the rest in a last chunk. */
function cutInto<T extends { length: number }>(whole: T, cuts: readonly number[], piece: (from: number, to: number) => T): T[] {
  const chunks: T[] = [];
  let at = 0;
  for (const c of cuts) {
    chunks.push(piece(at, Math.min(whole.length, at + c)));
    at = Math.min(whole.length, at + c);
  }
  chunks.push(piece(at, whole.length));
  return chunks;
}

describe('reading lines in batches', () => {
  it('gives every line once, in order, however the input is cut into chunks', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(fc.string({ maxLength: 8 }).map((s) => s.replace(/[\r\n]/g, '')), { maxLength: 1500 }), fc.array(fc.integer({ min: 1, max: 4000 }), { maxLength: 6 }), async (lines, cuts) => {
        const text = lines.map((l) => l + '\n').join('');
        const chunks = cutInto(text, cuts, (from, to) => text.slice(from, to));
        const batches = await collect(chunks);
        expect(batches.flat()).toEqual(lines);
        for (const b of batches) expect(b.length).toBeLessThanOrEqual(512);
      }),
      { numRuns: 100 },
    );
  });

  it('handles CRLF, a byte-order mark and a last line without a newline', async () => {
    expect((await collect(['\ufeffH2O\r\nNa', 'Cl\r\n\r\nXx'])).flat()).toEqual(['H2O', 'NaCl', '', 'Xx']);
  });

  it('reads a lone CR as a line end (old Mac files), however the input is cut into chunks', async () => {
    expect((await collect(['H2O\rNaCl\rCO2'])).flat()).toEqual(['H2O', 'NaCl', 'CO2']);
    expect((await collect(['H2O\r', '\nNaCl\r', 'CO2\r'])).flat()).toEqual(['H2O', 'NaCl', 'CO2']);
    expect((await collect(['a\r\r', 'b'])).flat()).toEqual(['a', '', 'b']);
    await fc.assert(
      fc.asyncProperty(
        // non-empty lines: after a CR, an empty line ended by LF would read as one CRLF
        fc.array(fc.tuple(fc.string({ minLength: 1, maxLength: 6 }).map((s) => s.replace(/[\r\n]/g, 'x')), fc.constantFrom('\n', '\r\n', '\r')), { maxLength: 1200 }),
        fc.array(fc.integer({ min: 1, max: 3000 }), { maxLength: 6 }),
        async (lines, cuts) => {
          const text = lines.map(([l, end]) => l + end).join('');
          const chunks = cutInto(text, cuts, (from, to) => text.slice(from, to));
          const batches = await collect(chunks);
          expect(batches.flat()).toEqual(lines.map(([l]) => l));
          for (const b of batches) expect(b.length).toBeLessThanOrEqual(512);
        },
      ),
      { numRuns: 100 },
    );
  });

  it('reads byte chunks cut anywhere, through multi-byte characters too, as the same lines', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(fc.tuple(fc.string({ unit: fc.constantFrom('C', 'H', '2', '·', '₂', 'é', '𝐀', ' ') , maxLength: 12 }), fc.constantFrom('\n', '\r\n', '\r')), { maxLength: 3000 }),
        fc.array(fc.integer({ min: 1, max: 20000 }), { maxLength: 6 }),
        fc.boolean(),
        async (lines, cuts, bom) => {
          // a line that is empty after a CR would read as part of a CRLF: give each line a character
          const rows = lines.map(([l, end]) => [l === '' ? 'x' : l, end] as const);
          const bytes = Buffer.from((bom ? '\ufeff' : '') + rows.map(([l, end]) => l + end).join(''), 'utf8');
          const chunks = cutInto(bytes, cuts, (from, to) => bytes.subarray(from, to));
          async function* source() {
            for (const c of chunks) yield c;
          }
          const out: string[] = [];
          for await (const b of readLineBatches(source())) {
            expect(b.length).toBeLessThanOrEqual(512);
            out.push(...b);
          }
          expect(out).toEqual(rows.map(([l]) => l));
        },
      ),
      { numRuns: 150 },
    );
  });

  it('decodes a byte chunk without any line end, and a last line without one', async () => {
    const bytes = Buffer.from('C6H12O6\nH₂', 'utf8');
    async function* source() {
      yield bytes.subarray(0, 4);
      yield bytes.subarray(4, bytes.length - 1); // the line end, and the subscript cut after its first two bytes
      yield bytes.subarray(bytes.length - 1);
    }
    const out: string[] = [];
    for await (const b of readLineBatches(source())) out.push(...b);
    expect(out).toEqual(['C6H12O6', 'H₂']);
  });
});
