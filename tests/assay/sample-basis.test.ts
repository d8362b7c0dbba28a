import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { convertSampleBasis, readBasis } from '../../src/assay/sample-basis.js';
import { checkSpecification, readLimits } from '../../src/assay/specification.js';
import { measure } from '../../src/calc/measure.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { firstIssue } from '../support/error-code.js';

const pct = (q: Parameters<typeof displayQuantity>[0], r: 'half-even' | 'half-up' = 'half-even') => displayQuantity(q, '%', r).text;

describe('results on another basis of the sample', () => {
  it("refuses a result or a content with no unit, with the per cent it may mean", () => {
    // '0.05' read as a fraction was 5 % water, and '99.1' read as a fraction was 9910 %
    expect(firstIssue(() => convertSampleBasis('95.00 %', 'as-is', 'anhydrous', { water: '0.05' })).hint).toBe("for 0.05 per cent write '0.05 %'; for a fraction 0.05 of 1 write '5 %'");
    expect(firstIssue(() => convertSampleBasis('99.1', 'as-is', 'dried', { loss: '0.50 %' })).hint).toBe("for per cent write '99.1 %'");
    expect(firstIssue(() => convertSampleBasis('0.991', 'as-is', 'dried', { loss: '0.50 %' })).hint).toBe("for per cent write '0.991 %'; for a fraction 0.991 of 1 write '99.1 %'");
  });

  it('a bare 0 content is 0 % either way, and is read', () => {
    expect(pct(convertSampleBasis('99.1 %', 'as-is', 'dried', { loss: '0' }).converted)).toBe('99.1 %');
  });

  it('refuses a content that neither basis removes: it would be dropped', () => {
    expect(firstIssue(() => convertSampleBasis('98.5 %', 'as-is', 'dried', { loss: '0.8 %', water: '2.0 %' })).code).toBe('USAGE');
  });

  it('as is → dried: divides by (100 % − loss on drying)', () => {
    // source: definition of "calculated on the dried basis" (USP General Notices 5.60.10 / Ph. Eur. 1.2), from memory;
    // 98.5 % as is with 0.8 % loss on drying is 98.5 / 0.992 = 99.29… %
    const r = convertSampleBasis('98.5 %', 'as-is', 'dried', { loss: '0.8 %' });
    expect(r.converted.value.toNumber()).toBeCloseTo(0.985 / 0.992, 12);
    expect(pct(r.converted)).toBe('99.3 %');
  });

  it('anhydrous (Karl Fischer water) and anhydrous-solvent-free', () => {
    const a = convertSampleBasis('97.62 %', 'as-is', 'anhydrous', { water: '2.35 %' });
    expect(a.converted.value.toNumber()).toBeCloseTo(0.9762 / 0.9765, 12);
    const b = convertSampleBasis('97.62 %', 'as-is', 'anhydrous-solvent-free', { water: '2.35 %', solvent: '0.12 %' });
    expect(b.converted.value.toNumber()).toBeCloseTo(0.9762 / (1 - 0.0235 - 0.0012), 12);
    expect(b.notes.map((n) => n.code)).toEqual(['BASIS_CONVERTED', 'ABOVE_100_PERCENT']);
  });

  it('from one basis to another goes through the as-is value', () => {
    const r = convertSampleBasis('100.4 %', 'anhydrous', 'dried', { water: '0.50 %', loss: '0.30 %' });
    expect(r.converted.value.toNumber()).toBeCloseTo((1.004 * 0.995) / 0.997, 12);
  });

  it('says when the result goes above 100 %, and keeps it (potency on the anhydrous basis can)', () => {
    const r = convertSampleBasis('99.5 %', 'as-is', 'anhydrous', { water: '1.2 %' });
    expect(r.converted.value.gt(1)).toBe(true);
    expect(r.notes.map((n) => n.code)).toContain('ABOVE_100_PERCENT');
  });

  it('refuses a missing content, a content of 100 % and an unknown basis', () => {
    expect(() => convertSampleBasis('99 %', 'as-is', 'dried', {})).toThrow(/`loss`/);
    expect(() => convertSampleBasis('99 %', 'as-is', 'dried', { loss: '100 %' })).toThrow(/below 100/);
    expect(() => readBasis('wet')).toThrow(/unknown basis/);
    expect(readBasis('As is')).toBe('as-is');
  });

  it('property: dried → as is → dried gives the value back; so does anhydrous', () => {
    fc.assert(
      fc.property(fc.integer({ min: 5000, max: 11000 }), fc.integer({ min: 0, max: 2000 }), (v, r) => {
        const value = `${(v / 100).toFixed(2)} %`;
        const content = `${(r / 100).toFixed(2)} %`;
        const there = convertSampleBasis(value, 'as-is', 'dried', { loss: content });
        const back = convertSampleBasis(there.converted, 'dried', 'as-is', { loss: content });
        expect(back.converted.value.minus(v / 10000).abs().lt('1e-40')).toBe(true);
        const a = convertSampleBasis(value, 'as-is', 'anhydrous', { water: content });
        expect(convertSampleBasis(a.converted, 'anhydrous', 'as-is', { water: content }).converted.value.minus(v / 10000).abs().lt('1e-40')).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});

describe('specification check', () => {
  it('rounds to the digits of the limits before comparing, limits included', () => {
    // source: USP General Notices 7.20 (rounding rules: round the observed value to the digits of the limit, then compare), from memory
    expect(checkSpecification(measure('0.97951'), '98.0-102.0').complies).toBe(true); // 97.951 → 98.0
    expect(checkSpecification(measure('0.97949'), '98.0-102.0').complies).toBe(false); // 97.949 → 97.9
    expect(checkSpecification(measure('1.0204'), '98.0–102.0 %').complies).toBe(true); // 102.04 → 102.0
    // a 5 in the first digit dropped rounds up, by default: 99.45 → 99.5 complies with 99.5–100.5
    expect(checkSpecification(measure('0.9945'), '99.5-100.5').complies).toBe(true);
    expect(checkSpecification(measure('0.9945'), '99.5-100.5').notes[0].message).toMatch(/rounded half-up .*USP General Notices 7.20/);
    expect(checkSpecification(measure('0.9945'), '99.5-100.5', 'half-even').notes[0].message).toMatch(/half-even, as asked.*rounds a 5 up/);
    expect(checkSpecification(measure('1.0205'), '98.0-102.0', 'half-up').complies).toBe(false); // 102.05 → 102.1 half up
    expect(checkSpecification(measure('1.0205'), '98.0-102.0', 'half-even').complies).toBe(true); // 102.05 → 102.0 half to even
  });

  it('a result on the dried basis against 98.0–102.0 %', () => {
    const r = convertSampleBasis('97.6 %', 'as-is', 'dried', { loss: '0.55 %' });
    const s = checkSpecification(r.converted, '98.0-102.0', 'half-even', 'the dried');
    expect(s.roundedText).toBe('98.1');
    expect(s.complies).toBe(true);
    expect(s.notes[0].code).toBe('LIMITS_ROUNDING');
    expect(pct(r.converted)).toBe('98.1 %');
  });

  it('says so when the result has fewer figures than the limits are written to', () => {
    // 98.7 % as is with 5 % water: 98.7 × 100 / (100 − 5) = 103.89…; 100 − 5 has its last digit at 1 %
    // (2 figures), so the quotient keeps 2 figures, 1.0 × 10² %: the verdict at 0.1 % reads a digit the
    // data do not give (OpenStax Chemistry 2e §1.5 rules, from memory; USP General Notices 7.20, from memory)
    const r = convertSampleBasis('98.7 %', 'as-is', 'anhydrous', { water: '5 %' });
    expect(pct(r.converted)).toBe('1.0 × 10² %');
    const s = checkSpecification(r.converted, '98.0-102.0', 'half-up', 'the anhydrous');
    expect(s.roundedText).toBe('103.9');
    expect(s.notes.map((n) => n.code)).toContain('RESULT_COARSER_THAN_LIMITS');
    expect(s.notes.find((n) => n.code === 'RESULT_COARSER_THAN_LIMITS')?.message).toContain('nearest 10 %');
    // with the water to 0.1 % the result has 3 figures (104 %), one place coarser than the limits: the
    // limits' digit is then an ordinary guard digit, and no such note
    const fine = convertSampleBasis('98.7 %', 'as-is', 'anhydrous', { water: '5.0 %' });
    expect(checkSpecification(fine.converted, '98.0-102.0').notes.map((n) => n.code)).not.toContain('RESULT_COARSER_THAN_LIMITS');
  });

  it('reads the limits and refuses them backwards', () => {
    expect(readLimits('99 to 101')).toEqual({ low: '99', high: '101', lsd: 0 });
    expect(() => readLimits('102.0-98.0')).toThrow(/above the upper/);
    expect(() => readLimits('about 100')).toThrow(/LOW-HIGH/);
  });
});
