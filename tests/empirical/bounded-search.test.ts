import { describe, expect, it } from 'vitest';
import { empirical } from '../../src/empirical/empirical-formula.js';
import { safeCandidateFormulas, safeEmpirical } from '../../src/index.js';
import { combustion } from '../../src/empirical/combustion.js';
import { composition } from '../../src/composition/element-shares.js';
import { candidateFormulas } from '../../src/empirical/candidates.js';

// Every search answers or refuses within about a second (no timing is asserted here: the refusal
// comes from a count of the work done, so it is the same on any machine).
describe('searches are bounded', () => {
  it('an empirical search over many elements at fine precision is refused, not run for minutes', () => {
    const r = safeEmpirical('C=20 H=5 N=10 O=10 S=10 P=10 Cl=10 Br=10 F=10 Si=5');
    expect(r.success).toBe(false);
    if (!r.success) expect(r.error.first.code).toBe('SEARCH_TOO_LARGE');
  });

  it('ten elements with oxygen by difference answer with the formula (the search cuts what cannot fit)', () => {
    // percents computed from CIAAW 2021 standard atomic weights by the composition module, rounded to 0.01
    const f = 'C20H24BrClFN3O5PS';
    const found = composition(f).elements.filter((e) => e.symbol !== 'O').map((e) => `${e.symbol}=${e.massPercent.toFixed(2)}`).join(' ');
    expect(empirical(`${found} O=rest`).empirical).toBe(f);
  });

  it('names the closest formula when none fits, or says none fits without one', () => {
    const r = safeEmpirical('C=30.5 H=4.1 N=5.2 S=3.3 P=2.2 Cl=4.4 O=rest');
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('NO_FORMULA_FITS');
      expect(r.error.first.message).toMatch(/the closest, C\d+H\d+/);
    }
  });

  it('a candidate window holding millions of formulas is refused with what to narrow', () => {
    // the search of issue 14 that ran for minutes and died out of memory
    const r = safeCandidateFormulas({ mass: '2500.1234', elements: 'C0-200 H0-400 N0-30 O0-40 S0-6 P0-4 F0-10 Cl0-6 Br0-4 I0-3' });
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('SEARCH_TOO_LARGE');
      expect(r.error.first.message).toMatch(/`ppm`/);
    }
  });

  it('an ordinary search still answers', () => {
    const r = safeCandidateFormulas({ mass: '323.19976', ppm: 3 });
    expect(r.success && r.data.candidates.map((c) => c.formula)).toContain('C20H25N3O');
  });

  it('real analysis data give a simple formula, not one of hundreds of atoms', () => {
    // codeine, C18H21NO3: C 72.22, H 7.07, N 4.68 % (CIAAW 2021 weights); found values within ±0.3 (invented data for a demo)
    const e = empirical('C=72.15 H=7.12 N=4.72 O=rest');
    expect(e.empirical).toBe('C18H21NO3');
    expect(e.notes.map((n) => n.code)).not.toContain('LARGE_FORMULA');
    expect(empirical('C=72.15 H=7.12 N=4.72 O=rest', { molarMass: '299.4' }).molecular).toBe('C18H21NO3');
  });
});

describe('molecular formulas from a molar mass', () => {
  it('goes straight to the molecular formula, and points to candidates when the data cannot decide', () => {
    // glucose, C6H12O6: C 40.00, H 6.71 % (OpenStax Chemistry 2e §3.4, from memory); a range of molar masses holds several multiples
    const one = empirical('C=40.0 H=6.7 O=rest', { molarMass: '180' });
    expect(one.molecular).toBe('C6H12O6');
    expect(one.multiple).toBe(6);
    const wide = empirical('C=40.0 H=6.7 O=rest', { molarMass: '170-370' });
    expect(wide.molecular).toBe('C6H12O6');
    const note = wide.notes.find((n) => n.code === 'DATA_CANNOT_DECIDE');
    expect(note?.message).toMatch(/C6H12O6, C7H14O7/);
    expect(note?.message).toContain('`candidateFormulas`');
  });

  it('keeps the limits as tidy numbers', () => {
    expect(empirical('C=72.15 H=7.12 N=4.72 O=rest').limits.O).toBe(0.9);
  });
});

describe('long inputs are refused before any work', () => {
  const spaces = ' '.repeat(100_000);
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (e) {
      return (e as { issues?: { code: string }[] }).issues?.[0]?.code;
    }
    return 'no error';
  };

  it('a measurement set, a sample mass, a product mass, found values and an accurate mass', () => {
    expect(code(() => empirical(`C=1${spaces}x`))).toBe('INPUT_TOO_LONG');
    expect(code(() => combustion({ sample: `1 g${spaces}x`, collected: { co2: '0.2 g' } }))).toBe('INPUT_TOO_LONG');
    expect(code(() => combustion({ sample: '1 g', collected: { co2: `0.2 g${spaces}x` } }))).toBe('INPUT_TOO_LONG');
    expect(code(() => candidateFormulas({ mass: '300.1', found: `C=1${spaces}x` }))).toBe('INPUT_TOO_LONG');
    expect(code(() => candidateFormulas({ mass: `300.1${spaces}` }))).toBe('INPUT_TOO_LONG');
  });

  it('names the length and the limit, and keeps shorter inputs to their own messages', () => {
    expect(() => empirical(`C=1${spaces}x`)).toThrow(/100,004 characters long; the limit is 10,000/);
    // 2000 spaces are within the limit: the reader says what is wrong with the text
    expect(code(() => empirical(`C=1${' '.repeat(2000)}x`))).not.toBe('INPUT_TOO_LONG');
  });
});
