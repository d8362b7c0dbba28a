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
});
