import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { analysis } from '../../src/analysis/check.js';
import { Decimal } from '../../src/exact/decimal.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';

// the calculated percents are rounded once to 2 decimals; floating point decides it away from a
// half-way point, so every figure must equal the exact quotient rounded (half-even and half-up)
const exactPercent = (formula: string, symbol: string, mode: 'half-even' | 'half-up') => {
  const m = formulaMassDetail(formula);
  const part = m.contributions.filter((c) => c.symbol === symbol).reduce((s, c) => s.plus(c.mass), new Decimal(0));
  return part.div(m.molarMass).times(100).toDecimalPlaces(2, mode === 'half-up' ? Decimal.ROUND_HALF_UP : Decimal.ROUND_HALF_EVEN).toNumber();
};

describe('calculated percents', () => {
  it('equal the exact quotient rounded to 2 decimals', () => {
    const formula = fc.tuple(fc.integer({ min: 1, max: 80 }), fc.integer({ min: 0, max: 160 }), fc.integer({ min: 0, max: 10 }), fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 4 })).map(([c, h, n, o, s]) => `C${c}${h ? `H${h}` : ''}${n ? `N${n}` : ''}${o ? `O${o}` : ''}${s ? `S${s}` : ''}`);
    fc.assert(
      fc.property(formula, fc.constantFrom('half-even' as const, 'half-up' as const), (f, rounding) => {
        const r = analysis(f, 'C=50.00', { rounding });
        return r.calculated.C === exactPercent(f, 'C', rounding);
      }),
      { numRuns: 300 },
    );
  });

  it('glucose: C 40.00, H 6.71 (computed from CIAAW 2021 standard atomic weights)', () => {
    // source: CIAAW standard atomic weights 2021 (C 12.011, H 1.008, O 15.999): C6H12O6 = 180.156 g/mol
    const r = analysis('C6H12O6', 'C=40.00,H=6.71');
    expect(r.calculated).toEqual({ C: 40, H: 6.71 });
  });
});
