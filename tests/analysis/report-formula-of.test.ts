import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toSafe } from '../../src/errors/pondus-error.js';
import { reportFormula, reportFormulaOf } from '../../src/analysis/report-formula.js';
import { parseFormula } from '../../src/formula-parser/parse.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';

const element = fc.constantFrom('C', 'H', 'O', 'N', 'S', 'Cl', 'Na', 'Cu', 'Pt', 'D', '[13C]', 'Me', 'Ph', 'Co', 'F');
const count = fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 20 }).map(String));
const part = fc.oneof(
  { weight: 4, arbitrary: fc.tuple(element, count).map(([e, c]) => e + c) },
  { weight: 1, arbitrary: fc.tuple(fc.array(fc.tuple(element, count).map(([e, c]) => e + c), { minLength: 1, maxLength: 3 }), fc.integer({ min: 1, max: 4 })).map(([ps, n]) => `(${ps.join('')})${n}`) },
);
const formula = fc.tuple(fc.constantFrom('', '', '2'), fc.array(part, { minLength: 1, maxLength: 5 }), fc.constantFrom('', '', '·H2O', '·0.5H2O', '·2HCl', '^+', ' ')).map(([m, ps, tail]) => m + ps.join('') + tail);

describe('the report formula from the atom totals', () => {
  it('is the one the formula tree gives, for one component and for several', () => {
    fc.assert(
      fc.property(formula, (f) => {
        const detail = toSafe(() => formulaMassDetail(f));
        if (!detail.success) return;
        expect(reportFormulaOf(detail.data), f).toBe(reportFormula(parseFormula(f)));
      }),
      { numRuns: 3000 },
    );
  });
  it('keeps the written order without carbon and Hill order with it', () => {
    // common practice (IUPAC Red Book 2005 IR-4.4 for the inorganic order)
    expect(reportFormulaOf(formulaMassDetail('H2SO4'))).toBe('H2SO4');
    expect(reportFormulaOf(formulaMassDetail('CH3COOH'))).toBe('C2H4O2');
    expect(reportFormulaOf(formulaMassDetail('NaCl'))).toBe('NaCl');
  });
});
