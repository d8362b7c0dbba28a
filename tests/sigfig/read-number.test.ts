import { describe, expect, it } from 'vitest';
import { sigFigsOf } from '../../src/sigfig/measured.js';
import { readNumber } from '../../src/sigfig/read-number.js';
import { PondusError } from '../../src/errors/pondus-error.js';

describe('significant figures as written', () => {
  it.each([
    // source: OpenStax Chemistry 2e §1.5 (counting rules; examples from memory)
    ['8.80', 3, false],
    ['0.00340', 3, false],
    ['250.', 3, false],
    ['2.50e2', 3, false],
    ['1300', 2, true],
    ['1300.', 4, false],
    ['1.300e3', 4, false],
    ['0.0120', 3, false],
    ['100.0', 4, false],
    ['1005', 4, false],
    ['6.022e23', 4, false],
    ['0.5', 1, false],
    ['10', 1, true],
  ])('%s has %i significant figures (ambiguous: %s)', (text, n, ambiguous) => {
    const r = readNumber(text);
    expect(sigFigsOf(r)).toBe(n);
    expect(r.ambiguous).toBe(ambiguous);
  });

  it('keeps the value exactly', () => {
    expect(readNumber('2.50e2').value.toString()).toBe('250');
    expect(readNumber('0.1').value.plus(readNumber('0.2').value).toString()).toBe('0.3');
  });

  it('rejects what is not a number, and absurd exponents', () => {
    for (const t of ['', 'abc', '1.2.3', '--1', 'e5']) expect(() => readNumber(t)).toThrow(PondusError);
    expect(() => readNumber('1e999999')).toThrow(/out of range/);
  });
});
