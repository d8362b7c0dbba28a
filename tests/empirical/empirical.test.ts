import fc from 'fast-check';
import { errorCode, firstIssue } from '../support/error-code.js';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { candidateFormulas, rdbe } from '../../src/empirical/candidates.js';
import { combustion, combustionDetail } from '../../src/empirical/combustion.js';
import { empirical, empiricalJson } from '../../src/empirical/empirical-formula.js';
import { safeEmpirical } from '../../src/index.js';
import { plausible } from '../../src/empirical/formula-search.js';
import { composition } from '../../src/composition/element-shares.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

describe('empirical formula from measurements', () => {
  it('from percents: C 40.00, H 6.71, O 53.29 is CH2O; with M = 180.16 g/mol, C6H12O6', () => {
    // source: OpenStax Chemistry 2e §3.4 (empirical and molecular formula of glucose), from memory
    const r = empirical('C=40.00 H=6.71 O=53.29', { molarMass: '180.16' });
    expect(r.empirical).toBe('CH2O');
    expect(r.molecular).toBe('C6H12O6');
  });

  it('from element masses: 34.97 g Fe and 15.03 g O is Fe2O3', () => {
    // source: OpenStax Chemistry 2e §3.4 (hematite), from memory
    expect(empirical('Fe=34.97 g O=15.03 g').empirical).toBe('Fe2O3');
  });

  it('with one element by difference, to 100 % or to the sample mass', () => {
    expect(empirical('C=40.00 H=6.71 O=rest').empirical).toBe('CH2O');
    // source: OpenStax Chemistry 2e §3.2, Example 3.9 masses (7.34 g C, 1.85 g H, 2.85 g N in 12.04 g), from memory
    expect(empirical('C=7.34 g H=1.85 g N=rest sample=12.04 g').empirical).toBe('C3H9N');
  });

  it('recovers large formulas and hydrates from percents rounded to 0.01 %', () => {
    for (const f of ['C24H30N2O4S', 'C27H35FN4O5', 'C21H22ClN3O2', 'CuSO4·5H2O', 'Na2B4O7·10H2O', 'C29H31N7O', 'C22H24ClFN4O3']) {
      const c = composition(f);
      // percents computed exactly and rounded: limits at the data's own precision (--tolerance 0.01)
      const r = empirical(c.elements.map((e) => `${e.symbol}=${e.massPercent.toFixed(2)}`).join(' '), { tolerance: 0.01 });
      expect(r.hill).toBe(c.formula);
      // with carbon the written form is the Hill formula; without, IUPAC's electronegativity order
      if (/^C\d/.test(f)) expect(r.empirical).toBe(c.formula);
    }
    // source: IUPAC Red Book 2005 IR-4.4.2.1 (electronegativity order), H after the metals, before the non-metals, as in NaHCO3 (common practice)
    expect(empirical('Na=12.06 B=11.34 H=5.29 O=71.32', { tolerance: 0.01 }).empirical).toBe('Na2H20B4O17');
  });

  it('writes an inorganic empirical formula in electronegativity order, with the Hill formula beside it', () => {
    // source: IUPAC Red Book 2005 IR-4.4.2.1; CuCl2 percents computed from CIAAW weights (Cu 47.27, Cl 52.73)
    const r = empirical('Cu=47.27 Cl=52.73');
    expect(r.empirical).toBe('CuCl2');
    expect(r.hill).toBe('Cl2Cu');
    expect(empiricalJson(r)).toMatchObject({ empirical: 'CuCl2', hill: 'Cl2Cu' });
  });

  it('says when the molar mass is not a near-whole multiple, and handles a range', () => {
    expect(empirical('C=40.00 H=6.71 O=53.29', { molarMass: '100' }).notes.map((n) => n.code)).toEqual(['NOT_A_MULTIPLE']);
    expect(empirical('C=40.00 H=6.71 O=53.29', { molarMass: '170-190' }).molecular).toBe('C6H12O6');
  });

  it('refuses what cannot be a formula', () => {
    const code = (s: string) => errorCode(() => empirical(s));
    expect(code('C=70.00 H=30.00 O=30.00')).toBe('BAD_MEASUREMENT'); // 130 %
    expect(code('C=-5 H=105')).toBe('BAD_MEASUREMENT');
    expect(code('Xq=50 H=50')).toBe('UNKNOWN_ELEMENT');
    expect(code('C=rest H=rest')).toBe('BAD_MEASUREMENT');
    expect(code('C=7.34 g H=rest')).toBe('BAD_MEASUREMENT'); // no sample mass
    expect(code('C=99.99 H=0.01')).toBe('NO_FORMULA_FITS'); // would need hundreds of C per H
  });

  it('percents computed by pondus and rounded to 0.01 % lead back to the empirical formula', () => {
    const gcd = (a: number, b: number): number => (b ? gcd(b, a % b) : a);
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 30 }),
        fc.integer({ min: 0, max: 4 }),
        fc.integer({ min: 0, max: 6 }),
        fc.integer({ min: 0, max: 1 }),
        fc.integer({ min: 0, max: 2 }),
        fc.nat(),
        (c, n, o, s, cl, seed) => {
          const hMax = 2 * c + n + 2 - cl;
          const h = Math.max(1, hMax - 2 * (seed % Math.max(1, Math.floor(hMax / 2))));
          const counts: [string, number][] = [['C', c], ['H', h], ['N', n], ['O', o], ['S', s], ['Cl', cl]].filter(([, k]) => (k as number) > 0) as [string, number][];
          const g = counts.reduce((a, [, k]) => gcd(a, k), 0);
          const reduced = counts.map(([e, k]) => `${e}${k / g}`).join('');
          const expected = formulaMassDetail(reduced).formula;
          const comp = composition(counts.map(([e, k]) => `${e}${k}`).join(''));
          // at the data's own precision; at ±0.3 (the default) C17H36 and C8H17 differ by 0.05 points and the simpler is given
          const r = empirical(comp.elements.map((e) => `${e.symbol}=${e.massPercent.toFixed(2)}`).join(' '), { tolerance: 0.01 });
          // percents to 0.01 cannot tell some large hydrocarbons apart (C29H44 and C31H47 both fit
          // 88.71/11.29 within 0.005): the formula is then the answer or one of the alternatives within the limits
          const found = [r.empirical, ...r.alternatives.map((a) => a.hill)];
          expect(found).toContain(expected);
          if (c <= 12) expect(r.empirical).toBe(expected);
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('combustion analysis', () => {
  it('a trace element from combustion: the note names the percent shortly and no option combustion lacks', () => {
    // invented data: so little water that hydrogen is within the default limit of zero
    const r = combustion({ sample: '2.000 mg', collected: { co2: '6.000 mg', h2o: '0.010 mg' } });
    expect(r.empirical).toBeNull();
    const note = r.notes.find((n) => n.code === 'NO_FORMULA_FITS')!;
    expect(note.message).toMatch(/^H at 0\.05595 % is within the limit/);
    expect(note.message).toContain('tighter tolerance (search the percentages above with `empirical` and `tolerance`)');
    expect(note.message).not.toMatch(/tighter `tolerance`/);
  });

  it('ascorbic acid: CO2 and H2O from a 1.000 g sample give C3H4O3', () => {
    // masses computed by hand for C6H8O6 (1.000 g → 1.499 g CO2, 0.4091 g H2O); the empirical formula of
    // ascorbic acid, C3H4O3: OpenStax Chemistry 2e §3.4, from memory
    const r = combustion({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } });
    expect(r.empirical).toBe('C3H4O3');
    expect(r.elements.map((e) => [e.symbol, e.percentFigure, e.byDifference])).toEqual([
      ['C', '40.91', false],
      ['H', '4.578', false],
      ['O', '54.5', true],
    ]);
    expect(r.sample).toBe('1.000 g');
    expect(r.elements[0].massDisplay).toBe('0.4091 g');
    // the exact figures of the detail form, as text
    const d = combustionDetail({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } });
    expect(r.elements[0].percentExact).toBe(d.elements[0].percent.value.toFixed());
    expect(displayQuantity(d.elements[0].percent).figure).toBe('40.91');
  });

  it('is plain data: JSON and structuredClone keep everything', () => {
    const r = combustion({ sample: '1.000 g', collected: { co2: '1.499 g', h2o: '0.4091 g' } });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    expect(typeof r.elements[0].mass).toBe('number');
  });

  it('nitrogen, sulfur and chlorine from their products', () => {
    // sulfanilamide C6H8N2O2S, 0.2000 g: masses computed by hand (common practice)
    const m = formulaMassDetail('C6H8N2O2S').molarMass.toNumber();
    const n = 0.2 / m;
    const r = combustion({ sample: '0.2000 g', collected: { co2: `${(n * 6 * 44.009).toFixed(4)} g`, h2o: `${(n * 4 * 18.015).toFixed(4)} g`, n2: `${(n * 28.014).toFixed(4)} g`, so2: `${(n * 64.058).toFixed(4)} g` } });
    expect(r.empirical).toBe('C6H8N2O2S');
  });

  it('refuses element masses over the sample mass', () => {
    expect(() => combustion({ sample: '0.1000 g', collected: { co2: '1.000 g' } })).toThrow(/more than the sample/);
  });
});

describe('candidate formulas', () => {
  it.each([
    // source: IUPAC Gold Book, ring-plus-double-bond equivalents (degree of unsaturation); values common practice
    ['C6H6', 4],
    ['C6H12O6', 1],
    ['C5H5N', 4],
    ['CHCl3', 0],
    ['C2H4', 1],
    ['C60', 61],
  ])('RDBE of %s is %i', (f, v) => {
    const counts = new Map([...formulaMassDetail(f).atoms].map(([k, n]) => [k, Number(n)]));
    expect(rdbe(counts)).toBe(v);
  });

  it('finds glucose, caffeine and a drug-sized molecule by accurate mass', () => {
    for (const f of ['C6H12O6', 'C8H10N4O2', 'C20H25N3O']) {
      const mass = formulaMassDetail(f).monoisotopicMass.toFixed(5);
      const r = candidateFormulas({ mass, ppm: 3 });
      expect(r.candidates[0].formula).toBe(formulaMassDetail(f).formula);
    }
  });

  it('narrows the candidates with found percents', () => {
    const mass = formulaMassDetail('C20H25N3O').monoisotopicMass.toFixed(3);
    const wide = candidateFormulas({ mass, ppm: 10 }).candidates.length;
    const r = candidateFormulas({ mass, ppm: 10, found: 'C=74.27,H=7.79,N=12.99' });
    expect(r.candidates.map((c) => c.formula)).toEqual(['C20H25N3O']);
    expect(wide).toBeGreaterThan(1);
  });

  it('filters out implausible formulas (odd-electron, negative RDBE, extreme ratios)', () => {
    const r = candidateFormulas({ mass: '100.0', ppm: 1000, elements: 'C0-10 H0-30 N0-3 O0-4', ratios: 'common' });
    for (const c of r.candidates) {
      expect(c.rdbe).toBeGreaterThanOrEqual(0);
      expect(Number.isInteger(c.rdbe)).toBe(true);
      const h = c.counts.H ?? 0;
      const cc = c.counts.C ?? 0;
      expect(h / cc).toBeLessThanOrEqual(3.1);
    }
  });

  it('needs a mass window', () => {
    expect(() => candidateFormulas({ found: 'C=40.00' })).toThrow(/mass window/);
  });
});

describe('measurement sheets', () => {
  it('turns each row into a measurement set, with sample and molar-mass columns', async () => {
    const { readMeasurementSheet } = await import('../../src/empirical/measurement-sheet.js');
    const rows = readMeasurementSheet('id,C,H,O,N,sample,molar mass\nS1,40.00,6.71,53.29,,,180.16\nS2,7.34 g,1.85 g,,rest,12.04 g,\n');
    expect(rows.map((r) => [r.line, r.id, r.measurements, r.molarMass])).toEqual([
      [2, 'S1', 'C=40.00 H=6.71 O=53.29', '180.16'],
      [3, 'S2', 'C=7.34 g H=1.85 g N=rest sample=12.04 g', undefined],
    ]);
    expect(rows.map((r) => empirical(r.measurements, { molarMass: r.molarMass }).molecular ?? empirical(r.measurements).empirical)).toEqual(['C6H12O6', 'C3H9N']);
  });
});

describe('formulas that cannot exist are never returned', () => {
  it('gives C2H6O, not C100H299O50, for ethanol-like data given to one decimal', () => {
    // C 52.14, H 13.13, O 34.73 % for C2H6O (computed from CIAAW weights); within the ±0.3 of an analysis
    // (common practice) C2H6O fits; at the precision of one decimal alone it does not, and is the closest
    expect(empirical('C=52.1 H=13.1 O=34.8').empirical).toBe('C2H6O');
    const r = safeEmpirical('C=52.1 H=13.1 O=34.8', { tolerance: 0.01 });
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('NO_FORMULA_FITS');
      expect(r.error.first.message).toContain('the closest, C2H6O');
    }
  });

  it('every returned formula of C, H, N, O and halogens has RDBE ≥ 0', () => {
    // source: IUPAC Gold Book, ring-plus-double-bond equivalents
    for (const set of ['C=40.00 H=6.71 O=53.29', 'C=52.14 H=13.13 O=34.73', 'C=85.63 H=14.37', 'C=24.27 H=4.07 Cl=71.66']) {
      const e = empirical(set);
      expect(plausible(Object.keys(e.fit.counts), Object.values(e.fit.counts))).toBe(true);
    }
  });
});

describe('combustion: the products as keys', () => {
  it('reads CO2 and H2O written as formulas, and refuses an unknown product with a PondusError', async () => {
    const { PondusError } = await import('../../src/errors/pondus-error.js');
    // ascorbic acid masses as in the test above (computed by hand)
    expect(combustion({ sample: '1.000 g', collected: { CO2: '1.499 g', H2O: '0.4091 g' } as never }).empirical).toBe('C3H4O3');
    expect(() => combustion({ sample: '1.000 g', collected: { XO2: '1 g' } as never })).toThrow(PondusError);
    expect(() => combustion({ sample: '1.000 g', collected: { co2: 1.499 } as never })).toThrow(PondusError);
    expect(() => combustion({ sample: '1.000 g', collected: null as never })).toThrow(PondusError);
  });
});

describe('percents that do not add up to 100', () => {
  const message = (text: string) => firstIssue(() => empirical(text)).message;
  it('asks for a missing element below 100 %, and for a check of the values above it', () => {
    expect(message('C=40.0 H=6.7 O=43.3')).toMatch(/90 %.*is an element missing/);
    expect(message('C=40.0 H=6.7 O=53.3 N=5.0')).toMatch(/105 %, more than 100 %: check the values/);
    expect(message('C=40.0 H=6.7 O=53.3 N=5.0')).not.toMatch(/missing/);
  });
});

describe('reported residuals', () => {
  it('are the exact decimals’ nearest numbers, not float sums: CH2O from C=40.00 H=6.71 O=53.29', () => {
    // source: CIAAW 2021 conventional weights C 12.011, H 1.008, O 15.999; residual = 100 n w / M − measured
    const r = empirical('C=40.00 H=6.71 O=53.29');
    const M = new Decimal('12.011').plus(new Decimal('1.008').times(2)).plus('15.999');
    expect(r.fit.residuals.C).toBe(new Decimal('1201.1').div(M).minus(40).toNumber());
    expect(r.fit.residuals.O).toBe(new Decimal('1599.9').div(M).minus('53.29').toNumber());
    // from masses, the percents sum to 100 and the two residuals are exact opposites
    const m = empirical('C=1.71 g, H=0.287 g');
    expect(m.fit.residuals.C).toBe(-m.fit.residuals.H);
  });
});

describe('an element written without its value', () => {
  it("'N=28.85 O' points at the O and offers O=rest, not an unknown unit at the 28.85", () => {
    const i = firstIssue(() => empirical('C=49.48 H=5.19 N=28.85 O'));
    expect(i.code).toBe('BAD_MEASUREMENT');
    expect(i.hint).toBe('for O by difference write O=rest');
    expect(empirical('C=49.48 H=5.19 N=28.85 O=rest').empirical).toBe('C4H5N2O'); // caffeine's empirical formula (from memory)
  });
});
