import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonNumber, numberText } from '../../src/exact/json-number.js';

describe('the JSON text of a number', () => {
  it('is String(value) for every finite double: masses, percents, counts, tiny and huge values', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(numberText(x)).toBe(String(x));
      }),
      { numRuns: 20000 },
    );
    for (const x of [0, -0, 1, 100, 18.015, 11.190674437968359, 1e-7, 1e21, 5e-324, Number.MAX_VALUE]) expect(numberText(x)).toBe(String(x));
  });

  it('is null for a number JSON cannot hold, as JSON.stringify writes it', () => {
    expect(numberText(Number.NaN)).toBe('null');
    expect(numberText(Number.POSITIVE_INFINITY)).toBe('null');
  });

  it('from an exact decimal, is the shortest text of its nearest double', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }), fc.integer({ min: 0, max: 15 }), (n, decimals) => {
        const digits = String(n).padStart(decimals + 1, '0');
        const exact = decimals === 0 ? digits : `${digits.slice(0, digits.length - decimals)}.${digits.slice(digits.length - decimals)}`.replace(/\.?0+$/, '');
        const value = Number(exact);
        expect(jsonNumber(value, exact)).toBe(JSON.stringify(value));
      }),
      { numRuns: 20000 },
    );
  });
});
