import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { displayMeasured, roundToSigFigs } from '../../src/sigfig/round.js';

describe('rounding', () => {
  it.each([
    // source: OpenStax Chemistry 2e §1.5, rounding examples (from memory)
    ['31.57', 2, '32'],
    ['8.1927', 3, '8.19'],
    ['0.0217', 2, '0.022'],
    ['0.06651', 3, '0.0665'],
    ['0.08731', 2, '0.087'],
  ])('%s to %i significant figures is %s', (v, n, expected) => {
    expect(roundToSigFigs(new Decimal(v), n).toString()).toBe(expected);
  });

  it('rounds a 5 with nothing after it to the even digit by default (ASTM E29; ISO 80000-1 Annex B rule A)', () => {
    // source: ASTM E29 rounding method / ISO 80000-1 Annex B: 2.45 → 2.4, 2.55 → 2.6, 2.35 → 2.4 (from memory)
    expect(roundToSigFigs(new Decimal('2.45'), 2).toString()).toBe('2.4');
    expect(roundToSigFigs(new Decimal('2.55'), 2).toString()).toBe('2.6');
    expect(roundToSigFigs(new Decimal('2.35'), 2).toString()).toBe('2.4');
    expect(roundToSigFigs(new Decimal('2.451'), 2).toString()).toBe('2.5'); // more than half: up
  });

  it('rounds half up on request', () => {
    expect(roundToSigFigs(new Decimal('2.45'), 2, 'half-up').toString()).toBe('2.5');
  });

  it('works on decimal digits, not binary floats', () => {
    // 1.005 is 1.00499999… as a double; as written it is exactly halfway
    expect(roundToSigFigs(new Decimal('1.005'), 3).toFixed(2)).toBe('1.00');
    expect(roundToSigFigs(new Decimal('1.015'), 3).toFixed(2)).toBe('1.02');
  });

  it('is idempotent', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e9, max: 1e9, noNaN: true }), fc.integer({ min: 1, max: 12 }), (x, n) => {
        const once = roundToSigFigs(new Decimal(x), n);
        expect(roundToSigFigs(once, n).eq(once)).toBe(true);
      }),
    );
  });

  it('shows ambiguous trailing zeros in scientific notation', () => {
    // source: OpenStax Chemistry 2e §1.5 (3,527 to two significant figures is 3.5 × 10³), from memory
    expect(displayMeasured({ value: new Decimal('3527'), lsd: 2 }).text).toBe('3.5 × 10³');
    expect(displayMeasured({ value: new Decimal('1300'), lsd: 0 }).text).toBe('1.300 × 10³');
    expect(displayMeasured({ value: new Decimal('2437'), lsd: 0 }).text).toBe('2437');
    expect(displayMeasured({ value: new Decimal('0.000012'), lsd: -6 }).text).toBe('1.2 × 10⁻⁵');
    expect(displayMeasured({ value: new Decimal('18.0152'), lsd: -3 }).text).toBe('18.015');
  });
});
