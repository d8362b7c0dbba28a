import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { composition } from '../../src/composition/element-shares.js';
import { formulaMassDetail, molarMass } from '../../src/mass/formula-mass.js';

const element = fc.constantFrom('C', 'H', 'N', 'O', 'S', 'P', 'F', 'Cl', 'Br', 'I', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Zn', 'Pt', 'Si', 'B', 'U');
const simple = fc.array(fc.tuple(element, fc.integer({ min: 1, max: 60 })), { minLength: 1, maxLength: 6 }).map((ps) => ps.map(([e, n]) => e + n).join(''));

describe('mass properties', () => {
  it('the mass of A·B is the mass of A plus the mass of B', () => {
    fc.assert(
      fc.property(simple, simple, fc.integer({ min: 1, max: 12 }), (a, b, n) => {
        expect(molarMass(`${a}·${n}${b}`).eq(molarMass(a).plus(molarMass(b).times(n)))).toBe(true);
        expect(formulaMassDetail(`${a}·${n}${b}`).monoisotopicMass.eq(formulaMassDetail(a).monoisotopicMass.plus(formulaMassDetail(b).monoisotopicMass.times(n)))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('a bracket multiplies what it holds', () => {
    fc.assert(
      fc.property(simple, fc.integer({ min: 1, max: 50 }), (a, n) => {
        expect(molarMass(`(${a})${n}`).eq(molarMass(a).times(n))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });

  it('mass percents sum to 100', () => {
    fc.assert(
      fc.property(simple, (a) => {
        // each percent is the nearest double to its exact value, so the sum is 100 within a few ulps
        const total = composition(a).elements.reduce((s, e) => s + e.massPercent, 0);
        expect(Math.abs(total - 100)).toBeLessThan(1e-12);
      }),
      { numRuns: 300 },
    );
  });

  it('the fast integer sums and the Decimal sums agree', () => {
    fc.assert(
      fc.property(simple, (a) => {
        // a decimal count of 1.0 forces the Decimal path for the same atoms
        expect(molarMass(`(${a})1.0`).eq(molarMass(a))).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
