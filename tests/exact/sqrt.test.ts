import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { sqrtDecimal } from '../../src/exact/sqrt.js';

/** A Decimal from up to 50 digits and a power of ten. */
const decimal = fc.tuple(fc.stringMatching(/^[1-9][0-9]{0,49}$/), fc.integer({ min: -120, max: 120 })).map(([d, e]) => new Decimal(`${d}e${e}`));

describe('the square root of a decimal', () => {
  it("is Decimal's own correctly rounded square root, digit for digit", () => {
    fc.assert(
      fc.property(decimal, (x) => {
        expect(sqrtDecimal(x).toString(), x.toString()).toBe(x.sqrt().toString());
      }),
      { numRuns: 5000 },
    );
  });
  it('is exact for squares, and the same for sums of squares such as the uncertainty budgets', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^[1-9][0-9]{0,24}$/), fc.integer({ min: -40, max: 40 }), (d, e) => {
        const r = new Decimal(`${d}e${e}`);
        expect(sqrtDecimal(r.times(r)).eq(r)).toBe(true);
      }),
    );
    fc.assert(
      fc.property(fc.array(decimal, { minLength: 1, maxLength: 4 }), (xs) => {
        const s = xs.reduce((a, x) => a.plus(x.times(x)), new Decimal(0));
        expect(sqrtDecimal(s).toString()).toBe(s.sqrt().toString());
      }),
      { numRuns: 2000 },
    );
  });
  it('gives zero for zero and takes the figures of a textbook root', () => {
    expect(sqrtDecimal(new Decimal(0)).toString()).toBe('0');
    // source: from memory (√2 = 1.41421356237309504880168872420969807856967187537694…)
    expect(sqrtDecimal(new Decimal(2)).toString()).toBe('1.4142135623730950488016887242096980785696718753769');
    expect(sqrtDecimal(new Decimal('0.0049')).toString()).toBe('0.07');
    // a Decimal made from a long text keeps its digits: the root is still Decimal's own
    for (const long of ['2'.repeat(300), `1.${'7'.repeat(400)}`, `9${'0'.repeat(260)}1e-500`]) {
      expect(sqrtDecimal(new Decimal(long)).toString()).toBe(new Decimal(long).sqrt().toString());
    }
  });
});
