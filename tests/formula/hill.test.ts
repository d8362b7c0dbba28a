import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parseFormula } from '../../src/formula-parser/parse.js';
import { flattenFormula } from '../../src/formula/flatten.js';
import { hillFormula } from '../../src/formula/hill.js';

const hill = (s: string) => {
  const t = parseFormula(s);
  return hillFormula(flattenFormula(t), t.charge);
};

describe('Hill order', () => {
  it.each([
    // source: Hill, J. Am. Chem. Soc. 22 (1900) 478 and IUPAC Red Book 2005 IR-4.7 (the ordering rule); the examples are common practice
    ['CH3CH2OH', 'C2H6O'],
    ['CBr4', 'CBr4'],
    ['CHCl3', 'CHCl3'],
    ['C2H5Br', 'C2H5Br'],
    ['HCl', 'ClH'],
    ['H2SO4', 'H2O4S'],
    ['NaCl', 'ClNa'],
    ['NH3', 'H3N'],
    ['KMnO4', 'KMnO4'],
    ['NaHCO3', 'CHNaO3'],
    ['Fe2(SO4)3', 'Fe2O12S3'],
  ])('%s → %s', (input, expected) => {
    expect(hill(input)).toBe(expected);
  });

  it('puts nuclides right after their element, D and T with hydrogen', () => {
    expect(hill('[13C]H3CH2OD')).toBe('C[13C]H5DO');
    expect(hill('ND3')).toBe('D3N');
    expect(hill('[37Cl]Cl')).toBe('Cl[37Cl]');
  });

  it('round-trips: the Hill formula parses back to the same atoms', () => {
    const el = fc.constantFrom('C', 'H', 'N', 'O', 'S', 'Cl', 'Na', 'Fe', 'Pt', 'Br', 'Si', 'B');
    fc.assert(
      fc.property(fc.array(fc.tuple(el, fc.integer({ min: 1, max: 99 })), { minLength: 1, maxLength: 6 }), (pairs) => {
        const text = pairs.map(([e, n]) => e + n).join('');
        const once = hill(text);
        expect(hill(once)).toBe(once);
        expect(flattenFormula(parseFormula(once))).toEqual(
          new Map([...flattenFormula(parseFormula(text))].sort()).size === 0 ? new Map() : flattenFormula(parseFormula(once)),
        );
        const a = [...flattenFormula(parseFormula(text))].sort();
        const b = [...flattenFormula(parseFormula(once))].sort();
        expect(b).toEqual(a);
      }),
      { numRuns: 500 },
    );
  });
});
