import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calc } from '../../src/calc/calc.js';
import { Decimal } from '../../src/exact/decimal.js';
import { exact, sigFigsOf, times } from '../../src/sigfig/measured.js';
import { readNumber } from '../../src/sigfig/read-number.js';

const show = (e: string) => calc(e).display;

describe('arithmetic by the textbook rules', () => {
  it('sums keep the fewest decimal places', () => {
    // source: OpenStax Chemistry 2e §1.5 (rule); examples computed by the rule
    expect(show('1.0023 g + 4.383 g')).toBe('5.385 g');
    expect(show('8.80 g + 2.1 g')).toBe('10.9 g');
    expect(show('10.0 mL - 2.25 mL')).toBe('7.8 mL');
  });

  it('products and quotients keep the fewest significant figures', () => {
    // source: OpenStax Chemistry 2e §1.5 (0.6238 × 6.6 = 4.1; 421.5 ÷ 3.2 = 1.3 × 10²), from memory
    expect(show('0.6238 * 6.6')).toBe('4.1');
    expect(show('421.5 / 3.2')).toBe('1.3 × 10²');
  });

  it('rounds once at the end, keeping guard digits inside a chain', () => {
    // rounding 1.2 + 3.456 = 4.656 to 4.7 first would give 9.4; with guard digits 4.656 × 2.00 = 9.312 → 9.3
    expect(show('(1.2 + 3.456) * 2.00')).toBe('9.3');
    // 2.35 × 1.00 then ÷ 1.00: one rounding, half to even, at the end
    expect(calc('4.5 / 2.0').display).toBe('2.2');
    expect(calc('4.5 / 2.0', { rounding: 'half-up' }).display).toBe('2.3');
  });

  it('exact numbers never limit precision', () => {
    expect(show('2 * 1.008')).toBe('2.016');
    expect(show('5.00 g / 250.0 g * 100')).toBe('2.00');
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 10_000 }), fc.integer({ min: 1, max: 99999 }), fc.integer({ min: 1, max: 5 }), (n, mant, dp) => {
        const x = readNumber(`${mant}.${'0'.repeat(dp - 1)}1`);
        expect(sigFigsOf(times(x, exact(n)))).toBe(sigFigsOf(x));
      }),
    );
  });

  it('multiplies with units and formula masses', () => {
    // 0.100 mol/L × 0.2500 L × 249.68 g/mol = 6.242 g → 6.24 g (3 s.f. from 0.100 M); common practice example
    expect(show('0.100 M * 250.0 mL * M(CuSO4·5H2O) to g')).toBe('6.24 g');
    expect(show('5.00 g / M(NaCl)')).toBe('0.0856 mol');
    expect(show('10.0 g / 250.0 mL to g/L')).toBe('40.0 g/L');
    expect(show('M(H2O)')).toBe('18.015 g/mol');
  });

  it('converts units without changing precision, both ways', () => {
    expect(show('250. mg to g')).toBe('0.250 g');
    expect(show('0.00340 L to mL')).toBe('3.40 mL');
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 99999 }), fc.integer({ min: 0, max: 4 }), fc.constantFrom(['g', 'mg'], ['L', 'mL'], ['mol', 'mmol'], ['M', 'mM']), (m, dp, [big, small]) => {
        const text = dp ? `${(m / 10 ** dp).toFixed(dp)}` : `${m}.`;
        const down = calc(`${text} ${big} to ${small}`);
        const back = calc(`${down.value.toFixed()} ${small} to ${big}`);
        expect(down.sigFigs).toBe(sigFigsOf(readNumber(text)));
        expect(back.value.eq(new Decimal(text))).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('refuses to add incompatible dimensions', () => {
    expect(() => calc('5.0 g + 2.0 mL')).toThrow(/cannot add a mass \(g\) and a volume \(L\)/);
    expect(() => calc('5.0 g to mL')).toThrow(/not convertible/);
  });

  it('notes ambiguous trailing zeros', () => {
    const r = calc('1300 g');
    expect(r.display).toBe('1.3 × 10³ g');
    expect(r.notes[0].message).toMatch(/not significant/);
  });
});
