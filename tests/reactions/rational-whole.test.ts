import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Decimal } from '../../src/exact/decimal.js';
import { Rational } from '../../src/reactions/rational.js';

describe('whole numbers as fractions', () => {
  it('the short way for whole numbers agrees with the fraction of the decimal', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e15 + 1, max: 1e15 - 1 }), fc.constantFrom('', '+'), (n, plus) => {
        const text = n >= 0 ? `${plus}${n}` : String(n);
        const r = Rational.fromDecimal(text);
        const [num, den] = new Decimal(text).toFraction();
        return r.num === BigInt(num.toFixed()) && r.den === BigInt(den.toFixed());
      }),
    );
  });
  it('still reads decimals and refuses what is not a number', () => {
    expect(Rational.fromDecimal('0.95').toString()).toBe('19/20');
    expect(Rational.fromDecimal('0007').toString()).toBe('7');
    expect(() => Rational.fromDecimal('7x')).toThrow();
  });
});
