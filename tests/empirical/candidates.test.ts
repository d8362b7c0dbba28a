import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { candidateFormulas, candidateScore, RATIO_RANGES, rdbe, readRanges } from '../../src/empirical/candidates.js';
import { safeCandidateFormulas } from '../../src/index.js';
import { candidatesJson } from '../../src/empirical/candidates-json.js';
import { ionMassDetail as ionMass } from '../../src/ions/ion-mass.js';
import { formulaMassDetail, formulaMassDetail as formulaMass } from '../../src/mass/formula-mass.js';

const formulas = (r: ReturnType<typeof candidateFormulas>) => r.candidates.map((c) => c.formula);

describe('candidates: element-ratio ranges (Kind & Fiehn 2007, rule 4)', () => {
  it('holds the paper\'s common and extended ranges', () => {
    // source: Kind T., Fiehn O., BMC Bioinformatics 8 (2007) 105, rule 4 table of element ratios (from memory)
    expect(RATIO_RANGES.common).toEqual({ H: [0.2, 3.1], F: [0, 1.5], Cl: [0, 0.8], Br: [0, 0.8], N: [0, 1.3], O: [0, 1.2], P: [0, 0.3], S: [0, 0.8], Si: [0, 0.5] });
    expect(RATIO_RANGES.extended).toEqual({ H: [0.1, 6], F: [0, 6], Cl: [0, 2], Br: [0, 2], N: [0, 4], O: [0, 3], P: [0, 2], S: [0, 3], Si: [0, 1] });
  });

  it.each([
    // found masses as reported by a user; formulas of the compounds (from memory): O/C 1.5, 1.67, 1.5, above the common 1.2
    ['glucose 6-phosphate', '260.029563', 'C6H13O9P'],
    ['glyphosate', '169.014145', 'C3H8NO5P'],
    ['tartaric acid', '150.016303', 'C4H6O6'],
  ])('finds %s by default (extended ranges) and not with the common ones', (_, mass, formula) => {
    expect(formulas(candidateFormulas({ mass }))).toContain(formula);
    expect(formulas(candidateFormulas({ mass, ratios: 'common' }))).not.toContain(formula);
    expect(formulas(candidateFormulas({ mass, ratios: 'none' }))).toContain(formula);
  });
});

describe('candidates: any element, and ions', () => {
  it.each([
    // monoisotopic masses from AME2020 via formulaMassDetail; compounds (from memory): ferrocene, palladium(II) acetate,
    // phenylboronic acid, tetramethylsilane, sodium acetate
    ['C10H10Fe', 'C0-20 H0-30 Fe0-1'],
    ['C4H6O4Pd', 'C0-10 H0-20 O0-6 Pd0-1'],
    ['C6H7BO2', 'C0-10 H0-20 B0-2 O0-4'],
    ['C4H12Si', 'C0-10 H0-30 Si0-2'],
    ['C2H3NaO2', 'C0-10 H0-20 O0-4 Na0-1'],
  ])('finds %s in the ranges %s', (f, elements) => {
    const mass = formulaMassDetail(f).monoisotopicMass.toFixed(6);
    const r = candidateFormulas({ mass, ppm: 2, elements });
    expect(formulas(r)).toContain(formulaMassDetail(f).formula);
  });

  it('does not judge a formula with a metal of no fixed valence by RDBE, and says so', () => {
    const r = candidateFormulas({ mass: formulaMassDetail('C10H10Fe').monoisotopicMass.toFixed(6), ppm: 2, elements: 'C0-20 H0-30 Fe0-1' });
    const fc10 = r.candidates.find((c) => c.formula === 'C10H10Fe')!;
    expect(fc10.rdbe).toBeNull();
    expect(r.notes.map((n) => n.code)).toContain('RULES_NOT_APPLIED');
    // alkali metals count as monovalent: sodium acetate has one double bond (common practice)
    expect(rdbe({ C: 2, H: 3, Na: 1, O: 2 })).toBe(1);
  });

  it('reads the element ranges of any element, and refuses what is not one', () => {
    expect(readRanges('C0-10 Pd1 B0-2').get('Pd')).toEqual([1, 1]);
    expect(() => readRanges('C0-10 Xx0-1')).toThrow(/not an element symbol/);
    expect(() => readRanges('C0-10 C0-5')).toThrow(/twice/);
  });

  it('takes the m/z of an ion: [M+Na]+, [M-H]-, [M+2H]2+, each m/z as the ion module computes it', () => {
    for (const [f, ion] of [
      ['C6H12O6', '[M+Na]+'],
      ['C9H8O4', '[M-H]-'],
      ['C20H25N3O', '[M+2H]2+'],
      ['C8H10N4O2', '[M+H]+'],
    ]) {
      const expected = ionMass(f, ion);
      const r = candidateFormulas({ mass: expected.mz.toFixed(5), ion, ppm: 3, elements: 'C0-30 H0-60 N0-6 O0-10' });
      const hit = r.candidates.find((c) => c.formula === formulaMassDetail(f).formula);
      expect(hit, `${f} ${ion}`).toBeDefined();
      expect(hit!.mz).toBe(expected.mz.toNumber());
      expect(hit!.ionFormula).toBe(expected.ionFormula);
      expect(r.ion).toBe(expected.notation);
    }
  });

  it('an m/z typed as a neutral mass does not find the compound, and the ion finds it', () => {
    // [C6H12O6+Na]+ 203.05261 (computed from AME2020 masses, electron mass CODATA)
    expect(formulas(candidateFormulas({ mass: '203.05261', ppm: 3, elements: 'C0-20 H0-40 O0-10' }))).not.toContain('C6H12O6');
    expect(formulas(candidateFormulas({ mass: '203.05261', ion: '[M+Na]+', ppm: 3, elements: 'C0-20 H0-40 O0-10' }))[0]).toBe('C6H12O6');
  });
});

describe('candidates: the error sign and the score', () => {
  it('gives ppm as (found − calculated)/calculated × 10⁶ (common practice; Brenton & Godfrey 2010)', () => {
    const calc = formulaMassDetail('C6H12O6').monoisotopicMass; // 180.063388098336 (AME2020)
    const found = calc.times('1.000002').toFixed(6); // 2 ppm above
    const c = candidateFormulas({ mass: found, ppm: 5, elements: 'C0-20 H0-40 O0-10' }).candidates.find((x) => x.formula === 'C6H12O6')!;
    expect(c.ppm).toBeGreaterThan(1.9);
    expect(c.ppm).toBeLessThan(2.1);
  });

  it('scores as the root mean square of the errors over their allowances', () => {
    expect(candidateScore(1.5, 3, null, 0.4)).toBe(0.5);
    expect(candidateScore(0, 3, [0.2, -0.2], 0.4)).toBeCloseTo(Math.sqrt(0.25 / 2), 15);
    expect(candidateScore(3, 3, [0.4], 0.4)).toBe(1);
  });

  it('ranks by the score, with found percents narrowing the list', () => {
    // C20H25N3O and its found values as in the README example (invented data for a demo)
    const mass = formulaMassDetail('C20H25N3O').monoisotopicMass.toFixed(4);
    const r = candidateFormulas({ mass, ppm: 5, found: 'C=74.27,H=7.79,N=12.99' });
    expect(formulas(r)[0]).toBe('C20H25N3O');
    const scores = r.candidates.map((c) => c.score);
    expect([...scores].sort((a, b) => a - b)).toEqual(scores);
    for (const c of r.candidates) expect(c.maxDeviation!).toBeLessThanOrEqual(0.4);
  });

  it('keeps the best `limit` candidates: a short list is the head of a long one', () => {
    const long = candidateFormulas({ mass: '500.2105', ppm: 5, limit: 1000 });
    const short = candidateFormulas({ mass: '500.2105', ppm: 5, limit: 7 });
    expect(long.plausible).toBeGreaterThan(7);
    expect(formulas(short)).toEqual(formulas(long).slice(0, 7));
    expect(short.truncated).toBe(true);
    expect(short.plausible).toBe(long.plausible);
  });
});

describe('candidates: bounded searches', () => {
  it('refuses a search too large to answer in about a second, up front, with an estimate and what to narrow', () => {
    const r = safeCandidateFormulas({ mass: '2500.1234', elements: 'C0-200 H0-400 N0-30 O0-40 S0-6 P0-4 F0-10 Cl0-6 Br0-4 I0-3' });
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('SEARCH_TOO_LARGE');
      expect(r.error.first.message).toMatch(/(would visit about|has more than) [0-9,]+ (formulas|combinations)/);
      expect(r.error.first.message).toMatch(/`ppm`.*`elements`/);
    }
  });

  it('refuses the wide ranges at 1500 Da up front too, with what to narrow', () => {
    const r = safeCandidateFormulas({ mass: '1500.1234', elements: 'C0-120 H0-400 N0-30 O0-40 S0-6 P0-4 F0-10 Cl0-6 Br0-4 I0-3' });
    expect(r.success).toBe(false);
    if (!r.success) {
      expect(r.error.first.code).toBe('SEARCH_TOO_LARGE');
      expect(r.error.first.message).toMatch(/`ppm`.*`elements`.*`found`/);
    }
  });

  it('lists exactly the formulas a brute-force walk of every count finds in the window', () => {
    // an independent check: every combination of counts, its monoisotopic mass from the mass module
    const ranges: [string, number, number][] = [['C', 0, 12], ['H', 0, 24], ['N', 0, 3], ['O', 0, 5], ['S', 0, 1], ['Cl', 0, 2]];
    const mass = '250.0500';
    const ppm = 200;
    const want: string[] = [];
    const walk = (i: number, text: string) => {
      if (i === ranges.length) {
        if (text === '') return;
        const calc = formulaMass(text).monoisotopicMass.toNumber();
        if (Math.abs(((250.05 - calc) / calc) * 1e6) <= ppm && rdbe(formulaMass(text).atoms as Map<string, number>) !== null) want.push(formulaMass(text).formula);
        return;
      }
      const [s, lo, hi] = ranges[i];
      for (let k = lo; k <= hi; k++) walk(i + 1, k === 0 ? text : `${text}${s}${k}`);
    };
    walk(0, '');
    const r = candidateFormulas({ mass, ppm, ratios: 'none', limit: 1000, elements: ranges.map(([s, lo, hi]) => `${s}${lo}-${hi}`).join(' ') });
    // the search also applies the RDBE and SENIOR rules: the brute force's formulas that pass them
    const senior = (f: string) => {
      const atoms = formulaMass(f).atoms as Map<string, number>;
      const v: Record<string, number> = { C: 4, H: 1, N: 3, O: 2, S: 2, Cl: 1 };
      let sum = 0, most = 0, n = 0;
      for (const [s, c] of atoms) {
        sum += Number(c) * v[s];
        most = Math.max(most, v[s]);
        n += Number(c);
      }
      const r2 = rdbe(atoms)!;
      return r2 >= 0 && Number.isInteger(r2) && sum % 2 === 0 && sum >= 2 * most && sum >= 2 * (n - 1);
    };
    expect(r.candidates.map((c) => c.hill).sort()).toEqual(want.filter(senior).sort());
    expect(r.examined).toBe(want.length);
    expect(r.candidates.length).toBeGreaterThan(20);
  });

  it('answers the default ranges with one metal at 1000 Da (the work count stays within the limit)', () => {
    const r = candidateFormulas({ mass: '1000.1234', elements: 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2 Fe0-1' });
    expect(r.candidates.length).toBe(50);
  });
});

describe('candidates: numbers are the exact decimals', () => {
  it('gives C7H16OS2 a molar mass of 180.324, not 180.32399999999998', () => {
    // source: CIAAW 2021 standard atomic weights (C 12.011, H 1.008, O 15.999, S 32.06): 7·12.011 + 16·1.008 + 15.999 + 2·32.06 = 180.324
    const c = candidateFormulas({ mass: '180.06339', ppm: 5, limit: 100 }).candidates.find((x) => x.formula === 'C7H16OS2')!;
    expect(c.molarMass).toBe(180.324);
    expect(JSON.stringify(candidatesJson(candidateFormulas({ mass: '180.06339', ppm: 5, limit: 100 })))).not.toContain('180.32399999999998');
  });

  const formulaArb = fc
    .record({ c: fc.integer({ min: 1, max: 30 }), n: fc.integer({ min: 0, max: 4 }), o: fc.integer({ min: 0, max: 8 }), s: fc.integer({ min: 0, max: 1 }), h: fc.integer({ min: 0, max: 64 }) })
    .map(({ c, n, o, s, h }) => {
      // a hydrogen count that keeps RDBE whole and non-negative, and H/C within the common range
      let hh = Math.min(h, 2 * c + n + 2);
      if ((hh + n) % 2 !== 0) hh = hh > 0 ? hh - 1 : hh + 1;
      hh = Math.max(hh, Math.ceil(0.2 * c) + ((Math.ceil(0.2 * c) + n) % 2));
      return `C${c}H${hh}${n ? `N${n}` : ''}${o ? `O${o}` : ''}${s ? 'S' : ''}`;
    })
    .filter((f) => {
      const m = formulaMassDetail(f);
      const count = (el: string) => Number(m.atoms.get(el) ?? 0);
      const c = count('C');
      // SENIOR's second rule (Kind & Fiehn, BMC Bioinformatics 8 (2007) 105): the valence sum is at
      // least twice the largest valence (C, 4), which takes out CH2 and other fragments
      const valences = 4 * c + count('H') + 3 * count('N') + 2 * count('O') + 2 * count('S');
      return valences >= 8 && count('H') <= 2 * c + count('N') + 2 && count('H') / c <= 3.1 && count('O') / c <= 1.2 && count('N') / c <= 1.3;
    });

  it('property: a formula\'s own monoisotopic mass always returns it among the candidates', () => {
    fc.assert(
      fc.property(formulaArb, (f) => {
        const m = formulaMassDetail(f);
        const r = candidateFormulas({ mass: m.monoisotopicMass.toFixed(6), ppm: 1, limit: 1000, elements: 'C0-30 H0-70 N0-4 O0-8 S0-1' });
        return formulas(r).includes(m.formula);
      }),
      { numRuns: 60 },
    );
  });

  it('property: every mass in the JSON is the shortest double of the exact decimal sum', () => {
    fc.assert(
      fc.property(formulaArb, (f) => {
        const m = formulaMassDetail(f);
        const r = candidateFormulas({ mass: m.monoisotopicMass.toFixed(6), ppm: 1, limit: 1000, elements: 'C0-30 H0-70 N0-4 O0-8 S0-1' });
        const j = JSON.parse(JSON.stringify(candidatesJson(r)));
        return j.candidates.every((c: { formula: string; molarMass: number; monoisotopicMass: number }) => {
          const exact = formulaMassDetail(c.formula);
          return c.molarMass === Number(exact.molarMass.toFixed()) && c.monoisotopicMass === Number(exact.monoisotopicMass.toFixed());
        });
      }),
      { numRuns: 40 },
    );
  });
});

describe('candidates: a measured isotope pattern in the score', () => {
  it('puts the dibromo compound first when its measured pattern is given', async () => {
    const { isotopePattern } = await import('../../src/isotope-pattern/pattern.js');
    const { patternSimilarity, readPeaks } = await import('../../src/empirical/pattern-match.js');
    // 1,4-dibromo-2,5-dimethylbenzene-like C8H8Br2 as [M+H]+; the "measured" peaks are pondus's own
    // aggregated pattern (CIAAW ICE 2013 abundances, AME2020 masses), rounded as a spectrum would print them
    const p = isotopePattern('C8H8Br2', { ion: '[M+H]+' });
    const mono = ionMass('C8H8Br2', '[M+H]+').mz.toFixed(4);
    const peaks = p.peaks.filter((x) => x.relative >= 1).map((x) => `${x.mz.toFixed(4)}:${x.relative.toFixed(1)}`).join(' ');
    const plain = candidateFormulas({ mass: mono, ion: '[M+H]+', ppm: 5, limit: 200 });
    const withPattern = candidateFormulas({ mass: mono, ion: '[M+H]+', ppm: 5, limit: 200, pattern: peaks });
    expect(formulas(withPattern)[0]).toBe('C8H8Br2');
    expect(formulas(plain)[0]).not.toBe('C8H8Br2'); // the mass alone does not single it out
    expect(withPattern.candidates[0].patternSimilarity!).toBeGreaterThan(0.99);
    expect(withPattern.notes.map((n) => n.code)).toContain('PATTERN_COMPARED');
    // Cl2: 35Cl 75.76 %, 37Cl 24.24 % (CIAAW ICE 2013, from memory) give 100 : 64.0 : 10.2
    expect(patternSimilarity(readPeaks('69.9377:100 71.9348:64.0 73.9318:10.2'), new Map([['Cl', 2]]), 69.9377, 1)).toBeGreaterThan(0.99);
    expect(patternSimilarity(readPeaks('69.9377:100 71.9348:5'), new Map([['Cl', 2]]), 69.9377, 1)).toBeLessThan(0.8);
  });

  it('scores the pattern term as (1 − similarity)/0.1', () => {
    expect(candidateScore(null, 5, null, 0.4, 0.95)).toBeCloseTo(0.5, 12);
  });
});

describe('candidates: inorganic formulas are written in electronegativity order', () => {
  it('names CuCl2 and KH2PO4 as chemists write them, with the Hill formula beside', () => {
    // source: IUPAC Red Book 2005 IR-4.4.2.1 (electropositive element first); H of an acid salt after the metal (common practice)
    const cu = candidateFormulas({ mass: formulaMass('CuCl2').monoisotopicMass.toFixed(6), ppm: 2, elements: 'Cu0-1 Cl0-3', ratios: false });
    expect(cu.candidates.map((c) => [c.formula, c.hill])).toEqual([['CuCl2', 'Cl2Cu']]);
    const k = candidateFormulas({ mass: formulaMass('KH2PO4').monoisotopicMass.toFixed(6), ppm: 2, elements: 'K0-1 H0-4 P0-1 O0-4', ratios: false });
    expect(k.candidates.map((c) => [c.formula, c.hill])).toEqual([['KH2PO4', 'H2KO4P']]);
    expect(candidatesJson(k).candidates[0]).toMatchObject({ formula: 'KH2PO4', hill: 'H2KO4P' });
  });

  it('keeps Hill order for a formula with carbon', () => {
    const r = candidateFormulas({ mass: '203.05261', ion: '[M+Na]+', ppm: 3, elements: 'C0-20 H0-40 O0-10' });
    expect(r.candidates[0]).toMatchObject({ formula: 'C6H12O6', hill: 'C6H12O6', ionFormula: 'C6H12NaO6^+', ionHill: 'C6H12NaO6^+' });
  });
});
