import { describe, expect, it } from 'vitest';
import { parseFormula, safeParseFormula } from '../../src/formula-parser/parse.js';
import { formulaMass } from '../../src/mass/formula-mass.js';

// A space never joins two pieces silently: 'H2O 2' is not hydrogen peroxide, and a tab-separated
// registry line 'H2O<tab>NaCl' is not one substance.
describe('spaces inside a formula', () => {
  it.each(['H2O 2', 'H2O NaCl', 'NaCl 2', 'H2O\tNaCl', 'CuSO4 5H2O', 'C6H5 OH'])('%j is refused, pointing at the space', (text) => {
    const r = safeParseFormula(text);
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('SPACE_IN_FORMULA');
      expect(text[r.error.first.column! - 1]).toMatch(/\s/);
    }
  });

  it.each([
    [' H2O ', 'H2O'],
    ['CuSO4 · 5H2O', 'CuH10O9S'],
    ['CuSO4 · 5 H2O', 'CuH10O9S'],
    ['2 H2O', 'H4O2'],
    ['Zn (s)', 'Zn'],
  ])('%j is read (spaces at the ends, beside a dot, after a multiplier, before a state symbol)', (text, hill) => {
    expect(formulaMass(text).formula).toBe(hill);
  });

  it('a space after a decimal count settles that the point is a decimal point', () => {
    expect(formulaMass('Fe2.5 O').formula).toBe('Fe2.5O');
    expect(() => parseFormula('Fe2.5O')).toThrow(); // ambiguous without it
  });
});
