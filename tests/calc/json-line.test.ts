import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calc, calcJson, calcJsonLine } from '../../src/calc/calc.js';
import { decimalToNumber } from '../../src/calc/to-number.js';
import { Decimal } from '../../src/exact/decimal.js';

// The float of a decimal is its correctly rounded nearest (IEEE 754 §5.12.2, from memory), which
// reading its text gives; the short way must give the very same float, sign of zero included.
describe('a Decimal as its nearest float', () => {
  const digits = fc.oneof(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 10, max: 22 }), fc.integer({ min: 23, max: 50 }));
  const decimal = fc.tuple(fc.constantFrom('', '-'), digits, fc.integer({ min: -60, max: 60 }), fc.nat()).map(([sign, n, exp, seed]) => {
    let s = '';
    let x = seed;
    for (let i = 0; i < n; i++) {
      s += String((x = (x * 1103515245 + 12345) % 2147483648) % 10);
      if (i === 0 && s === '0') s = '1';
    }
    // some with trailing zeros, as sums and conversions leave them
    if (seed % 3 === 0) s += '000';
    return new Decimal(`${sign}${s}e${exp}`);
  });
  it('is what toNumber gives', () => {
    fc.assert(
      fc.property(decimal, (d) => Object.is(decimalToNumber(d), d.toNumber())),
      { numRuns: 20000 },
    );
  });
  it('is what toNumber gives for results of arithmetic and for zero', () => {
    fc.assert(
      fc.property(decimal, decimal, (a, b) => {
        for (const d of [a.times(b), a.plus(b), a.minus(b), b.isZero() ? a : a.div(b), a.minus(a), a.neg().minus(a.neg())]) {
          if (!Object.is(decimalToNumber(d), d.toNumber())) return false;
        }
        return true;
      }),
      { numRuns: 5000 },
    );
    expect(Object.is(decimalToNumber(new Decimal('-0')), -0)).toBe(true);
    expect(decimalToNumber(new Decimal(Infinity))).toBe(Infinity);
    // source: from memory (0.1 + 0.2 is not 0.3 in floats, but the decimal 0.3 is the float 0.3)
    expect(decimalToNumber(new Decimal('0.1').plus('0.2'))).toBe(0.3);
  });
});

describe('the JSON line of a calc result', () => {
  it('is the text of its JSON object, with and without a line number', () => {
    for (const expr of ['8.80 g + 2.1 g', '0.100 M * 250.0 mL * M(CuSO4·5H2O) to g', '8.80 ± 0.05 g + 2.10 ± 0.05 g', '1300 mg to g', '1/3', '10.0 g - 9.95 g', '125 mg/5 mL', '"x" ', '2 * 3']) {
      let r;
      try {
        r = calc(expr);
      } catch {
        continue;
      }
      expect(calcJsonLine(r)).toBe(JSON.stringify(calcJson(r)));
      expect(calcJsonLine(r, 7)).toBe(`{"line":7,${JSON.stringify(calcJson(r)).slice(1)}`);
    }
  });
  it('has no steps when none are asked for, and the same figures', () => {
    const with_ = calc('0.99 * 1.01 g');
    const without = calc('0.99 * 1.01 g', { steps: false });
    expect(with_.steps.length).toBe(1);
    expect(without.steps).toEqual([]);
    expect(calcJsonLine(without)).toBe(calcJsonLine(with_));
  });
});
