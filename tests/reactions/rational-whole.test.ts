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

describe('a fraction as the nearest float', () => {
  // the float division of two safe integers is correctly rounded (IEEE 754 §4.3), as is the
  // 50-digit quotient read as a float: the two must agree, and past the safe integers the
  // decimal route is taken
  const big = (n: bigint, d: bigint) => new Decimal(n.toString()).div(d.toString()).toNumber();
  it('agrees with the 50-digit decimal quotient for safe and for large numerators and denominators', () => {
    fc.assert(
      fc.property(fc.bigInt({ min: -(2n ** 60n), max: 2n ** 60n }), fc.bigInt({ min: 1n, max: 2n ** 60n }), (n, d) => {
        const r = Rational.of(n, d);
        return Object.is(r.toNumber(), big(r.num, r.den)) || (r.num === 0n && r.toNumber() === 0);
      }),
      { numRuns: 3000 },
    );
    fc.assert(
      fc.property(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 1000 }), (n, d) => {
        const r = Rational.of(BigInt(n), BigInt(d));
        return r.toNumber() === big(r.num, r.den);
      }),
    );
  });
});
