// The readers' patterns that skip runs of white space give the same answers as the plain patterns,
// which retried every space of a run (quadratic on a long run).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { readKeyValues } from '../../src/key-values/read-key-values.js';
import { measure } from '../../src/calc/measure.js';

const entryStarts = (re: RegExp, text: string) => {
  const starts: number[] = [];
  let m: RegExpExecArray | null;
  re.lastIndex = 0;
  while ((m = re.exec(text)) !== null) {
    starts.push(m.index + m[0].length - m[2].length);
    re.lastIndex = m.index + m[0].length;
  }
  return starts;
};

describe('linear readers', () => {
  it('an entry starts where the plain pattern says, on any text of keys, values, separators and spaces', () => {
    const plain = /(^|[,;]|\s)\s*([^\s=,;]+\s*=)/g;
    const linear = /(^|[,;]|(?<!\s)\s)\s*([^\s=,;]+\s*=)/g;
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('C', 'H', '4', '0', '.', '=', ',', ';', ' ', '  ', '\t'), maxLength: 60 }), (text) => {
        expect(entryStarts(linear, text)).toEqual(entryStarts(plain, text));
      }),
      { numRuns: 2000 },
    );
  });

  it('`of` is read as a product where the plain pattern reads it', () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom('2', 'g', 'of', ' ', '  ', 'o', 'f', '\t'), maxLength: 40 }), (text) => {
        expect(text.replace(/(?<!\s)\s+of\s+/g, ' * ')).toBe(text.replace(/\s+of\s+/g, ' * '));
      }),
      { numRuns: 2000 },
    );
  });

  it('still reads sets and quantities with runs of spaces', () => {
    // source: common practice (a measurement set as typed, with extra spaces)
    expect(readKeyValues('C=40.00     H=6.71 ,   O=rest').map((e) => e.key)).toEqual(['C', 'H', 'O']);
    expect(measure('25.0 mL    of   0.100 M').value.toString()).toBe('0.0025');
    // a value with a long run of spaces in it is one entry (its value is checked by the command)
    expect(readKeyValues('C=1' + ' '.repeat(100_000) + 'x').map((e) => e.key)).toEqual(['C']);
  });
});
