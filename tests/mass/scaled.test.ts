import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scaledToJson, scaledToString, toScaled } from '../../src/exact/scaled.js';
import { Decimal } from '../../src/exact/decimal.js';

describe('scaled integers', () => {
  it('print exactly', () => {
    expect(scaledToString(18015000000000)).toBe('18.015');
    expect(scaledToString(toScaled('0.000548579909'))).toBe('0.000548579909');
    expect(scaledToString(-toScaled('12.5'))).toBe('-12.5');
    expect(scaledToString(toScaled('7'))).toBe('7');
  });

  it('print as the same JSON text as the nearest double', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }), (n) => {
        expect(scaledToJson(n)).toBe(JSON.stringify(n / 1e12));
        expect(new Decimal(scaledToString(n)).times(1e12).toFixed()).toBe(String(n));
      }),
      { numRuns: 5000 },
    );
  });

  it('print the exact decimal, without trailing zeros, for every kind of fraction', () => {
    // fractions whose last nonzero digit falls in any of the four three-digit groups, and whole numbers, negative too
    const n = fc.oneof(
      fc.integer({ min: -Number.MAX_SAFE_INTEGER, max: Number.MAX_SAFE_INTEGER }),
      fc.tuple(fc.integer({ min: 0, max: 9_000_000 }), fc.integer({ min: 0, max: 12 })).map(([a, z]) => a * 10 ** z).filter(Number.isSafeInteger),
    );
    fc.assert(
      fc.property(n, (v) => {
        expect(scaledToString(v)).toBe(new Decimal(v).div(1e12).toFixed());
      }),
      { numRuns: 20000 },
    );
    expect(scaledToString(1)).toBe('0.000000000001');
    expect(scaledToString(1_000_000)).toBe('0.000001');
    expect(scaledToString(100_000_000_000)).toBe('0.1');
    expect(scaledToString(12_000_001_000_000)).toBe('12.000001');
  });
});
