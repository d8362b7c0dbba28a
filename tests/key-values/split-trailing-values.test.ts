// splitTrailingValues reads a line backwards in one pass; its definition is the pattern
// `^(.*?)[\s;,]+((?:El=value …)+)$`, which is quadratic on a long run of spaces but exact on short
// lines: the two must agree on every short line.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { splitTrailingValues } from '../../src/key-values/read-key-values.js';

const byPattern = (line: string): [string, string] | null => {
  const m = /^(.*?)[\s;,]+((?:[A-Z][a-z]?\s*[=:]\s*[-+]?[0-9.]+\s*%?[\s,;]*)+)$/.exec(line.trim());
  return m ? [m[1].trim(), m[2].trim()] : null;
};

const piece = fc.constantFrom('C', 'H', 'N', 'O', 'Cl', 'a', '=', ':', ' ', '  ', ',', ';', '\t', '1', '2', '.', '%', '-', '+', '(', ')', 'C=72.30', ' H=7.91');

describe('splitTrailingValues', () => {
  it('agrees with its pattern on short lines', () => {
    fc.assert(
      fc.property(fc.array(piece, { maxLength: 12 }), (parts) => {
        const line = parts.join('');
        expect(splitTrailingValues(line)).toEqual(byPattern(line));
      }),
      { numRuns: 20000 },
    );
  });

  it('splits the usual lines', () => {
    expect(splitTrailingValues('C20H25N3O  C=72.30 H=7.91 N=12.60')).toEqual(['C20H25N3O', 'C=72.30 H=7.91 N=12.60']);
    expect(splitTrailingValues('C6H12O6;C:40.00, H:6.71')).toEqual(['C6H12O6', 'C:40.00, H:6.71']);
    expect(splitTrailingValues('NaCl')).toBeNull();
  });

  it('reads a long line of spaces in one pass (the pattern took seconds)', () => {
    const long = `C6H12O6${' '.repeat(200_000)}x`;
    expect(splitTrailingValues(long)).toBeNull();
    expect(splitTrailingValues(`C6H12O6${' '.repeat(200_000)}C=40.0`)).toEqual(['C6H12O6', 'C=40.0']);
  });
});
