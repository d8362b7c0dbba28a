// Library functions refuse what they cannot answer, instead of a silent reading or a non-finite
// number: each case once gave a wrong or non-finite answer, dropped a value, or an internal error.
import { Decimal } from 'decimal.js';
import { describe, expect, it } from 'vitest';
import * as api from '../../src/index.js';
import { measure } from '../../src/calc/measure.js';

const codeOf = (f: () => unknown): string => {
  try {
    f();
  } catch (e) {
    return e instanceof api.PondusError ? e.first.code : `not a PondusError: ${String(e)}`;
  }
  return 'no error';
};

describe('refusals instead of silent or non-finite answers', () => {
  it('a molar mass written in hexadecimal is refused, not read as 16', () => {
    expect(codeOf(() => api.candidateFormulas({ molarMass: '0x10' }))).toBe('BAD_NUMBER');
    // source: from memory (glucose, C6H12O6, 180.16 g/mol): the plain number still reads
    expect(api.candidateFormulas({ molarMass: '180.16', limit: 50 }).candidates.map((c) => c.formula)).toContain('C6H12O6');
  });

  it('a ppm error against a calculated m/z of zero is refused, not Infinity', () => {
    expect(codeOf(() => api.massError('100.0000', new Decimal(0)))).toBe('BAD_NUMBER');
    expect(api.massError('100.0010', new Decimal('100.0000')).ppm.toNumber()).toBeCloseTo(10, 9);
  });

  it('a resolving power below 1 is refused, not merging every peak into one', () => {
    const sticks = [
      { mz: 100, abundance: 1, label: '', members: 1 },
      { mz: 101, abundance: 0.5, label: '13C', members: 1 },
    ];
    expect(codeOf(() => api.resolvePeaks(sticks, 0))).toBe('BAD_OPTION');
    expect(codeOf(() => api.resolvePeaks(sticks, -5))).toBe('BAD_OPTION');
    expect(api.resolvePeaks(sticks, 1000)).toHaveLength(2);
  });

  it('patterns of atoms refuse unknown keys, part atoms and a coverage outside (0, 1]', () => {
    expect(codeOf(() => api.fineStructure(new Map([['Xx', 1]]), 0.99))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.aggregatedDistribution(new Map([['Xx', 1]])))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.aggregatedDistribution(new Map([['C', 1.5]])))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.fineStructure(new Map([['C', 6]]), 0))).toBe('BAD_OPTION');
    expect(codeOf(() => api.fineStructure(new Map([['C', 6]]), 2))).toBe('BAD_OPTION');
    // source: CIAAW 2013 isotopic abundances (35Cl 0.7576, 37Cl 0.2424): 35Cl2 is 0.7576² = 0.574
    expect(api.aggregatedDistribution(new Map([['Cl', 2]])).p[0]).toBeCloseTo(0.574, 3);
  });
});

describe('refused, not silently read', () => {
  it("a conversion inside a quantity option ('1 g to mL') is refused, not dropped", () => {
    expect(codeOf(() => measure('1 g to mL'))).toBe('BAD_EXPRESSION');
    expect(codeOf(() => measure('1 g to mg'))).toBe('BAD_EXPRESSION');
    expect(measure('25.0 mL of 0.100 M').value.toString()).toBe('0.0025');
  });
  it('a string is not an iterable of atom keys for the written order', () => {
    expect(codeOf(() => api.writtenOrder('CuCl' as never))).toBe('BAD_ARGUMENT');
    // source: IUPAC Red Book 2005 IR-4.4.2.1 (the electropositive element first: CuCl2)
    expect(api.writtenOrder(['Cl', 'Cu'])).toEqual(['Cu', 'Cl']);
  });
  it('a part that is not text, a fractional power, a negative uncertainty, NaN and a line of NaN are refused', () => {
    expect(codeOf(() => api.composition('H2O', { part: 5 } as never))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.power(api.quantity(api.readNumber('4.00'), null), 0.5))).toBe('BAD_NUMBER');
    expect(codeOf(() => api.formatWithUncertainty(new Decimal('1.5'), new Decimal('-0.1')))).toBe('BAD_NUMBER');
    expect(codeOf(() => api.exact(NaN))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.massJsonLine(api.formulaMass('H2O'), NaN))).toBe('BAD_ARGUMENT');
    expect(codeOf(() => api.compositionJsonLine(api.composition('H2O'), 0))).toBe('BAD_ARGUMENT');
    expect(api.massJsonLine(api.formulaMass('H2O'), 3)).toContain('"line":3');
  });
});
