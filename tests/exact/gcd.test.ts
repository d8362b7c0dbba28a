// The one gcd/lcm, of numbers and of BigInts (arithmetic facts: common practice).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { gcd, lcm } from '../../src/exact/gcd.js';

describe('gcd and lcm', () => {
  it('known values', () => {
    expect(gcd(12, 18)).toBe(6);
    expect(gcd(-12, 18)).toBe(6);
    expect(gcd(0, 7)).toBe(7);
    expect(gcd(0, 0)).toBe(0);
    expect(gcd(12n, 18n)).toBe(6n);
    expect(gcd(2n ** 80n * 3n, 2n ** 70n * 9n)).toBe(2n ** 70n * 3n);
    expect(lcm(4, 6)).toBe(12);
    expect(lcm(4n, 6n)).toBe(12n);
  });

  it('numbers and BigInts agree, and the gcd divides both', () => {
    fc.assert(
      fc.property(fc.integer({ min: -1e9, max: 1e9 }), fc.integer({ min: -1e9, max: 1e9 }), (a, b) => {
        const g = gcd(a, b);
        expect(BigInt(g)).toBe(gcd(BigInt(a), BigInt(b)));
        if (g !== 0) expect([a % g === 0, b % g === 0]).toEqual([true, true]);
      }),
    );
  });

  it('refuses mixed kinds and non-integers with BAD_NUMBER', () => {
    for (const f of [() => gcd(1.5, 2), () => gcd(4 as never, 6n as never), () => gcd(Number.NaN, 1), () => lcm(2 as never, 3n as never)]) {
      try {
        f();
        expect.unreachable();
      } catch (e) {
        expect(e).toBeInstanceOf(PondusError);
        expect((e as PondusError).first.code).toBe('BAD_NUMBER');
      }
    }
  });
});
