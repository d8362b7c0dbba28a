import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { replicates, splitValues } from '../../src/assay/replicates.js';
import { firstIssue } from '../support/error-code.js';

describe('replicate statistics', () => {
  it("reproduces Harvey's 95 % confidence interval for seven pennies: 3.117 ± 0.047 g", () => {
    // source: Harvey, Analytical Chemistry 2.0 (DePauw), Table 4.11 and Example 4.15: mean 3.117 g, s 0.051 g, t 2.447, ±0.047 g
    const r = replicates('3.080 3.094 3.107 3.056 3.112 3.174 3.198 g');
    expect(r.n).toBe(7);
    expect(r.meanReported).toBe('3.117');
    expect(r.sd.toSignificantDigits(2).toNumber()).toBe(0.051);
    expect(r.t.toFixed(3)).toBe('2.447');
    expect(r.reported).toBe('3.117 ± 0.047 g');
  });

  it("and Harvey's second set: five pennies, mean 3.081 g, s 0.037 g, ±0.046 g at 95 %", () => {
    // source: Harvey, Analytical Chemistry 2.0 (DePauw), Example 4.15, second experiment: mean 3.081 g, s 0.037 g, ±0.046 g;
    // the five masses of Table 4.11 typed from memory
    const r = replicates('3.052, 3.141, 3.083, 3.083, 3.048 g');
    expect(r.meanReported).toBe('3.081');
    expect(r.sd.toSignificantDigits(2).toNumber()).toBe(0.037);
    expect(r.halfWidthReported).toBe('0.046');
  });

  it('RSD is s over the mean, in percent; the 99 % interval is wider than the 90 %', () => {
    const r90 = replicates('99.2 99.5 99.1 99.4 99.3 %', { level: 90 });
    const r99 = replicates('99.2 99.5 99.1 99.4 99.3 %', { level: 99 });
    expect(r90.rsdPercent.toNumber()).toBeCloseTo((r90.sd.toNumber() / r90.mean.value.toNumber()) * 100, 10);
    expect(r99.halfWidth.gt(r90.halfWidth)).toBe(true);
    expect(r90.unit).toBe('%');
  });

  it('rounds the reported value half up when asked (a tie at the last digit kept)', () => {
    // mean 2.225 exactly; half-width 12.706 × 0.0354 / √2 = 0.32 → the mean is kept to 0.01, a tie
    const even = replicates('2.20 2.25', { rounding: 'half-even' });
    const up = replicates('2.20 2.25', { rounding: 'half-up' });
    expect(even.mean.value.toString()).toBe('2.225');
    expect(even.reported).toBe('2.22 ± 0.32');
    expect(up.reported).toBe('2.23 ± 0.32');
  });

  it('notes every reading: the unit applied to all, the t used, no outlier test', () => {
    const r = replicates('99.2, 99.5, 99.1 %');
    expect(r.notes.map((n) => n.code)).toEqual(['UNIT_APPLIED_TO_ALL', 'STUDENT_T', 'REPORTED_TO_UNCERTAINTY', 'NO_OUTLIER_TEST']);
  });

  it('refuses a single value, mixed units and text that is not a number', () => {
    expect(() => replicates('99.2')).toThrow(/at least two/);
    expect(() => replicates('99.2 % 99.1 99.0 %')).toThrow(/some values have a unit/);
    expect(() => replicates('99.2 abc')).toThrow();
    expect(() => replicates('1.0 g 2.0 mL')).toThrow(/value 2/);
    expect(() => splitValues('% 99', [])).toThrow(/not a number/);
  });

  it("refuses a comma between digits with each reading: '99,2' is a decimal comma or two values, never six", () => {
    // read as separators, '99,2 99,5 99,1 %' was six values with a mean of 50.8 %
    const decimal = firstIssue(() => replicates('99,2 99,5 99,1 %'));
    expect(decimal.code).toBe('BAD_NUMBER');
    expect(decimal.hint).toBe('for a decimal comma write 99.2; for separate values put a space after the comma (99, 2)');
    expect(firstIssue(() => replicates('1,234 1,240 1,236 mg')).hint).toContain('for a thousands separator write 1234');
    // a comma after a space, or between values with points, separates them
    expect(replicates('99.2, 99.5, 99.1 %').n).toBe(3);
    expect(replicates('99.2,99.5,99.1 %').meanReported).toBe('99.27');
  });

  it('names the word taken as a unit when the next one is not a number', () => {
    expect(firstIssue(() => replicates('99.2 abc %')).message).toBe("'%' is not a number (or a unit after one; 'abc' was taken as the unit of 99.2)");
  });

  it('property: the mean lies between the extremes and the interval contains it', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 9000, max: 10500 }), { minLength: 2, maxLength: 12 }), (xs) => {
        const r = replicates(xs.map((x) => (x / 100).toFixed(2)).join(' '));
        const m = r.mean.value.toNumber();
        expect(m).toBeGreaterThanOrEqual(Math.min(...xs) / 100 - 1e-12);
        expect(m).toBeLessThanOrEqual(Math.max(...xs) / 100 + 1e-12);
        expect(r.sd.isNeg()).toBe(false);
      }),
      { numRuns: 200 },
    );
  });
});

describe('a list with its units mixed says which values lack one, and which units differ', () => {
  it('two units and a bare value: the units are named', () => {
    const e = firstIssue(() => splitValues('99.42 99.61 mg 99.38 %'));
    expect(e.code).toBe('BAD_MEASUREMENT');
    expect(e.message).toBe('the values are in different units (mg, %) and 99.42 has no unit: write each value in the one unit of the list');
  });

  it('one unit on some values: the bare ones are named', () => {
    const e = firstIssue(() => splitValues('99.42 % 99.61 99.38 % 99.50'));
    expect(e.message).toBe('some values have a unit (%) and 99.61, 99.50 have no unit: write the unit after each value, or once after the last');
  });
});

describe('the note when the interval is written finer than the mean', () => {
  it('names both digits, in the unit of the list', () => {
    // mean of 10.1, 10.2, 10.2 mg is 10.2 mg at the figures of the sum (30.5 mg, 3 figures); the half-width 0.14 mg is written to 0.01 mg
    const r = replicates('10.1 mg 10.2 mg 0.0102 g');
    expect(r.notes.find((n) => n.code === 'INTERVAL_FINER_THAN_DATA')!.message).toBe("the interval, at two significant figures, is written to 0.01 mg, finer than the mean's last significant digit (0.1 mg); the reported value keeps the digit the interval supports");
  });
});
