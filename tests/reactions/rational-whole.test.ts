import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Decimal } from '../../src/exact/decimal.js';
import { nullSpace, Rational, rationalNullSpace, smallestIntegers, smallestWholeBalance, wholeEchelon, wholeNullSpace } from '../../src/reactions/rational.js';

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

describe('the null space on plain numbers', () => {
  const r = (n: number | bigint) => Rational.of(BigInt(n));
  const text = (b: Rational[][] | null) => b?.map((v) => v.map(String));
  it('is the null space over the fractions, for small and for large whole entries', () => {
    const entry = fc.oneof({ weight: 6, arbitrary: fc.integer({ min: -12, max: 12 }) }, { weight: 1, arbitrary: fc.integer({ min: -(2 ** 40), max: 2 ** 40 }) }, { weight: 3, arbitrary: fc.constant(0) });
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 9 }), fc.array(entry, { minLength: 63, maxLength: 63 }), (rows, cols, xs) => {
        const m = Array.from({ length: rows }, (_, i) => Array.from({ length: cols }, (_, j) => r(xs[i * 9 + j])));
        const whole = wholeNullSpace(m, cols);
        // entries past 2^31 take the fractions' route
        if (m.some((row) => row.some((x) => x.num >= 2n ** 31n || x.num <= -(2n ** 31n)))) expect(whole).toBeNull();
        if (whole !== null) expect(text(whole)).toEqual(text(rationalNullSpace(m, cols)));
        expect(text(nullSpace(m, cols))).toEqual(text(rationalNullSpace(m, cols)));
      }),
      { numRuns: 3000 },
    );
  });
  it('leaves a matrix with a fraction, or one whose elimination grows past the safe integers, to the fractions', () => {
    expect(wholeNullSpace([[Rational.of(1n, 2n), r(1)]], 2)).toBeNull();
    // entries near 2^30: the first elimination step multiplies two of them
    const big = 2 ** 30 - 3;
    expect(wholeNullSpace([[r(big), r(big - 1), r(5)], [r(big - 7), r(3), r(big)]], 3)).toBeNull();
    expect(text(nullSpace([[r(big), r(big - 1), r(5)], [r(big - 7), r(3), r(big)]], 3))).toEqual(text(rationalNullSpace([[r(big), r(big - 1), r(5)], [r(big - 7), r(3), r(big)]], 3)));
    // source: from memory (2 H2 + O2 -> 2 H2O: rows H and O, the products negative)
    expect(text(nullSpace([[r(2), r(0), r(-2)], [r(0), r(2), r(-1)]], 3))).toEqual([['1', '1/2', '1']]);
  });
  it('scales a one-dimensional null space to the smallest whole numbers as the fractions do', () => {
    const entry = fc.oneof({ weight: 6, arbitrary: fc.integer({ min: -12, max: 12 }) }, { weight: 1, arbitrary: fc.integer({ min: -(2 ** 20), max: 2 ** 20 }) }, { weight: 3, arbitrary: fc.constant(0) });
    let compared = 0;
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 9 }), fc.array(entry, { minLength: 63, maxLength: 63 }), (rows, cols, xs) => {
        const plain = Array.from({ length: rows }, (_, i) => Array.from({ length: cols }, (_, j) => xs[i * 9 + j]));
        const exact = rationalNullSpace(plain.map((row) => row.map(r)), cols);
        const e = wholeEchelon(plain.map((row) => row.slice()), cols);
        const small = e && smallestWholeBalance(e, cols);
        if (exact.length !== 1) expect(small).toBeNull();
        else if (small !== null) {
          compared++;
          expect(small.map(String)).toEqual(smallestIntegers(exact[0]).map(String));
        }
      }),
      { numRuns: 3000 },
    );
    expect(compared).toBeGreaterThan(100);
  });
});
