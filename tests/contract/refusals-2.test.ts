// More refusals where a value was once dropped or read some other way without a word.
import { describe, expect, it } from 'vitest';
import { Decimal } from 'decimal.js';
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
