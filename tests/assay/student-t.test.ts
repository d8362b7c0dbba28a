import { describe, expect, it } from 'vitest';
import { incompleteBeta, logGamma, tCritical, twoSidedP } from '../../src/assay/student-t.js';

// Two-sided critical values of Student's t (90 %, 95 %, 99 %), three decimals, as printed in the
// usual table (NIST/SEMATECH e-Handbook of Statistical Methods, Table 1.4.2.7, laid out by
// upper-tail probability 0.05 / 0.025 / 0.005): from memory.
const TABLE: [number, number, number, number][] = [
  [1, 6.314, 12.706, 63.657], [2, 2.92, 4.303, 9.925], [3, 2.353, 3.182, 5.841], [4, 2.132, 2.776, 4.604],
  [5, 2.015, 2.571, 4.032], [6, 1.943, 2.447, 3.707], [7, 1.895, 2.365, 3.499], [8, 1.86, 2.306, 3.355],
  [9, 1.833, 2.262, 3.25], [10, 1.812, 2.228, 3.169], [11, 1.796, 2.201, 3.106], [12, 1.782, 2.179, 3.055],
  [13, 1.771, 2.16, 3.012], [14, 1.761, 2.145, 2.977], [15, 1.753, 2.131, 2.947], [16, 1.746, 2.12, 2.921],
  [17, 1.74, 2.11, 2.898], [18, 1.734, 2.101, 2.878], [19, 1.729, 2.093, 2.861], [20, 1.725, 2.086, 2.845],
  [21, 1.721, 2.08, 2.831], [22, 1.717, 2.074, 2.819], [23, 1.714, 2.069, 2.807], [24, 1.711, 2.064, 2.797],
  [25, 1.708, 2.06, 2.787], [26, 1.706, 2.056, 2.779], [27, 1.703, 2.052, 2.771], [28, 1.701, 2.048, 2.763],
  [29, 1.699, 2.045, 2.756], [30, 1.697, 2.042, 2.75], [40, 1.684, 2.021, 2.704], [60, 1.671, 2.0, 2.66],
  [120, 1.658, 1.98, 2.617], [Infinity, 1.645, 1.96, 2.576],
];

describe("Student's t from the incomplete beta function", () => {
  it.each(TABLE)('df %s matches the printed table to three decimals', (df, t90, t95, t99) => {
    expect(Math.abs(tCritical(90, df) - t90)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(Math.abs(tCritical(95, df) - t95)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(Math.abs(tCritical(99, df) - t99)).toBeLessThanOrEqual(0.0005 + 1e-9);
  });

  it("matches Harvey's 95 % table too (Analytical Chemistry 2.0, Table 4.15; it prints 3.181 for df 3)", () => {
    // source: Harvey, Analytical Chemistry (DePauw ed.), Table 4.15
    const harvey: [number, number][] = [[1, 12.706], [2, 4.303], [3, 3.181], [6, 2.447], [10, 2.228], [20, 2.086], [100, 1.984], [Infinity, 1.96]];
    for (const [df, t] of harvey) expect(Math.abs(tCritical(95, df) - t)).toBeLessThan(0.0015);
  });

  it('the tail probability at the critical value is the level asked for', () => {
    for (const df of [1, 2, 5, 17, 250]) for (const level of [80, 90, 95, 99, 99.9]) expect(twoSidedP(tCritical(level, df), df)).toBeCloseTo(1 - level / 100, 9);
  });

  it('the building blocks are right: Γ(n) = (n − 1)!, I_x(a, a) at 1/2 is 1/2, I_x(1, 1) = x', () => {
    expect(Math.exp(logGamma(6))).toBeCloseTo(120, 8);
    expect(Math.exp(logGamma(0.5))).toBeCloseTo(Math.sqrt(Math.PI), 10);
    expect(incompleteBeta(0.5, 3.5, 3.5)).toBeCloseTo(0.5, 12);
    expect(incompleteBeta(0.3, 1, 1)).toBeCloseTo(0.3, 12);
  });

  it('t falls as the degrees of freedom grow and rises with the level', () => {
    for (let df = 1; df < 60; df++) expect(tCritical(95, df + 1)).toBeLessThan(tCritical(95, df));
    expect(tCritical(99, 5)).toBeGreaterThan(tCritical(95, 5));
  });

  it('refuses a level outside 50–99.9 % and a fractional df', () => {
    expect(() => tCritical(100, 5)).toThrow(/confidence level/);
    expect(() => tCritical(95, 2.5)).toThrow(/degrees of freedom/);
    expect(() => tCritical(95, 0)).toThrow(/degrees of freedom/);
  });
});
