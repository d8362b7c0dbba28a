import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { dividedBy, exact, lsdForSigFigs, minus, plus, sigFigsOf, times, withSigFigs } from '../../src/sigfig/measured.js';
import { multiply, power, quantity } from '../../src/sigfig/quantity.js';
import { readNumber as read } from '../../src/sigfig/read-number.js';
import { displayMeasured } from '../../src/sigfig/round.js';
import { unitOf } from '../../src/sigfig/units.js';

// The rules: OpenStax Chemistry 2e §1.5 (products and quotients keep the fewest significant
// figures; sums and differences the fewest decimal places), from memory. Rounding: ASTM E29
// (half to even), from memory. Expected figures below are worked by hand from those rules.

describe('a carry into the next power of ten does not add a figure', () => {
  it('a product limited to 3 figures that rounds up to 1 shows 1.00', () => {
    // 0.9996 (4 s.f.) × 1.00 (3 s.f.) = 0.9996 → 3 s.f. → 1.00
    const p = times(read('0.9996'), read('1.00'));
    expect(sigFigsOf(p)).toBe(3);
    expect(p.lsd).toBe(-2);
    const d = displayMeasured(p);
    expect(d.text).toBe('1.00');
    expect(d.sigFigs).toBe(3);
  });

  it('a product limited to 2 figures that rounds up to 1 shows 1.0', () => {
    // 0.99 (2 s.f.) × 1.01 (3 s.f.) = 0.9999 → 2 s.f. → 1.0
    const d = displayMeasured(times(read('0.99'), read('1.01')));
    expect(d.text).toBe('1.0');
    expect(d.sigFigs).toBe(2);
  });

  it('a quotient that rounds up past 10 re-anchors too', () => {
    // 9.996 / 1.000 (4 s.f. each) = 9.996 → 9.996; 99.97 / 10.0 (3 s.f.) = 9.997 → 10.0
    expect(displayMeasured(dividedBy(read('9.996'), read('1.000'))).text).toBe('9.996');
    expect(displayMeasured(dividedBy(read('99.97'), read('10.0'))).text).toBe('10.0');
    // 999.7 × 1.00 = 999.7 → 3 s.f. → 1.00 × 10³ (not 1000, whose zeros are ambiguous)
    expect(displayMeasured(times(read('999.7'), read('1.00'))).text).toBe('1.00 × 10³');
  });

  it('keeps the figure count through further products (the count is carried, not re-derived)', () => {
    // (0.9996 × 1.00) × 5.000: 3 s.f. throughout; 4.998 → 5.00
    const p = times(times(read('0.9996'), read('1.00')), read('5.000'));
    expect(sigFigsOf(p)).toBe(3);
    expect(displayMeasured(p).text).toBe('5.00');
  });

  it('a sum after a re-anchored product keeps the product’s decimal place as rounded', () => {
    // 0.9996 × 1.00 is 1.00 (last digit 10⁻²); 1.00 + 0.0001 = 1.00
    expect(displayMeasured(plus(times(read('0.9996'), read('1.00')), read('0.0001'))).text).toBe('1.00');
  });

  it('sums keep decimal places: a carry in a sum keeps the place, so the count grows honestly', () => {
    // 9.96 + 0.05 = 10.01 (2 decimals, 4 s.f.)
    const s = plus(read('9.96'), read('0.05'));
    expect(displayMeasured(s).text).toBe('10.01');
    expect(displayMeasured(s).sigFigs).toBe(4);
    // 9.9996 + 0.0000 → 3 decimals → 10.000 (5 s.f., counted on the rounded value)
    const t = plus(read('9.9996'), read('0.000'));
    expect(displayMeasured(t).text).toBe('10.000');
    expect(displayMeasured(t).sigFigs).toBe(5);
    expect(sigFigsOf(t)).toBe(5);
  });

  it('the last-digit position comes from the value as rounded', () => {
    expect(lsdForSigFigs(new Decimal('0.9996'), 3)).toBe(-2);
    expect(lsdForSigFigs(new Decimal('0.9994'), 3)).toBe(-3);
    expect(lsdForSigFigs(new Decimal('-0.9996'), 3)).toBe(-2);
    expect(withSigFigs(new Decimal('2.5'), Infinity)).toEqual({ value: new Decimal('2.5'), lsd: null });
  });

  it('the carry does not depend on the rounding mode (every kept digit is 9, so a tie rounds up in both)', () => {
    // 0.9995 to 3 s.f.: half-even → 1.00 (9 is odd), half-up → 1.00
    const p = times(read('0.9995'), read('1.00'));
    expect(displayMeasured(p, 'half-even').text).toBe('1.00');
    expect(displayMeasured(p, 'half-up').text).toBe('1.00');
    // 0.9985: half-even → 0.998, half-up → 0.999: no carry either way
    const q = times(read('0.9985'), read('1.00'));
    expect(displayMeasured(q, 'half-even').text).toBe('0.998');
    expect(displayMeasured(q, 'half-up').text).toBe('0.999');
  });

  it('quantities keep the count through unit changes and powers', () => {
    // 0.250 M × 100.0 mL × 39.997 g/mol = 0.999925 g → 3 s.f. → 1.00 g (as a result)
    const mol = multiply(quantity(read('0.250'), unitOf('M')), quantity(read('100.0'), unitOf('mL')));
    const g = multiply(mol, quantity(read('39.997'), unitOf('g/mol')));
    expect(displayQuantity(g, 'g').text).toBe('1.00 g');
    expect(displayQuantity(g, 'mg').text).toBe('1.00 × 10³ mg');
    // a power keeps its base's figures: 3.16² = 9.9856 → 3 s.f. → 9.99
    expect(displayQuantity(power(quantity(read('3.16'), null), 2)).text).toBe('9.99');
    // 3.163 ² = 10.004569 → 4 s.f. → 10.00
    expect(displayQuantity(power(quantity(read('3.163'), null), 2)).text).toBe('10.00');
    // 0.99999 × 1.000 = 0.99999 → 4 s.f. → 1.000
    expect(displayQuantity(multiply(quantity(read('0.99999'), null), quantity(read('1.000'), null))).text).toBe('1.000');
  });
});

describe('a result below the precision of the data', () => {
  it('a difference that rounds to zero reports no significant figures', () => {
    // 10.0 − 9.95 = 0.05; last digit at 10⁻¹ → 0.0 (half to even), no significant figure left
    const d = displayMeasured(minus(read('10.0'), read('9.95')));
    expect(d.text).toBe('0.0');
    expect(d.sigFigs).toBe(0);
    expect(d.belowPrecision).toBe(true);
    // half up rounds 0.05 to 0.1: one figure
    const u = displayMeasured(minus(read('10.0'), read('9.95')), 'half-up');
    expect(u.text).toBe('0.1');
    expect(u.sigFigs).toBe(1);
    expect(u.belowPrecision).toBe(false);
  });

  it('a zero read as written has no significant figures either', () => {
    const d = displayMeasured(read('0.00'));
    expect(d.text).toBe('0.00');
    expect(d.sigFigs).toBe(0);
    expect(d.belowPrecision).toBe(true);
    expect(displayMeasured(read('2.0e3')).belowPrecision).toBe(false);
  });

  it('an exact zero is exact', () => {
    expect(displayMeasured(exact(0))).toMatchObject({ text: '0', sigFigs: null, belowPrecision: false });
  });
});
