import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { naturalIsotopes } from '../../src/elements/nuclides.js';
import { isotopePattern } from '../../src/isotope-pattern/pattern.js';
import { fineStructure } from '../../src/isotope-pattern/fine-structure.js';
import { resolvePeaks } from '../../src/isotope-pattern/resolve-peaks.js';
import { ionMassDetail } from '../../src/ions/ion-mass.js';
import { errorCode } from '../support/error-code.js';
import { enumerateIsotopologues } from './exact-enumeration.js';

const rel = (f: string, o = {}) => isotopePattern(f, o).peaks.map((p) => p.relative);
const x = (symbol: string, a: number) => Number(naturalIsotopes(symbol).find((i) => i.massNumber === a)!.abundance);

describe('published isotope patterns', () => {
  it('Cl2: M : M+2 : M+4 ≈ 100 : 64 : 10', () => {
    // from memory: the Cl2 cluster of mass-spectrometry textbooks, 100 : 64 : 10 (roughly 9 : 6 : 1)
    const [m, m2, m4] = rel('Cl2');
    expect(m).toBe(100);
    expect(m2).toBeCloseTo(64, 0);
    expect(m4).toBeCloseTo(10, -0.3);
    // and exactly the binomial of the ICE 2013 fractions
    const r = x('Cl', 37) / x('Cl', 35);
    expect(m2).toBeCloseTo(200 * r, 9);
    expect(m4).toBeCloseTo(100 * r * r, 9);
  });

  it('Br2: ≈ 51 : 100 : 49', () => {
    // from memory: the Br2 triplet 1 : 2 : 1, tabulated as 51 : 100 : 49
    const [m, m2, m4] = rel('Br2');
    expect(m).toBeCloseTo(51, 0);
    expect(m2).toBe(100);
    expect(m4).toBeCloseTo(49, 0);
  });

  it('CH2Cl2: 100 : 64 : 10 at M, M+2, M+4, with M+1 from 13C and 2H', () => {
    // from memory: dichloromethane, m/z 84 : 86 : 88 ≈ 100 : 64 : 10
    const p = isotopePattern('CH2Cl2').peaks;
    const at = (shift: number) => p.find((q) => q.shift === shift)!.relative;
    expect(at(0)).toBe(100);
    expect(at(2)).toBeCloseTo(64, 0);
    expect(Math.round(at(4))).toBe(10);
    expect(at(1)).toBeGreaterThan(1.0);
    expect(at(1)).toBeLessThan(1.3);
    expect(at(1)).toBeCloseTo((x('C', 13) / x('C', 12) + (2 * x('H', 2)) / x('H', 1)) * 100, 9);
    expect(p[0].mz).toBeCloseTo(83.9534, 4);
  });

  it('C60: M+1 is about 66 % of M', () => {
    // from memory: buckminsterfullerene, M+1 ≈ 66 % of M (60 × 1.1 %); with the ICE 2013 13C fraction it is 67.2 %
    const [m, m1, m2] = rel('C60');
    expect(m).toBe(100);
    expect(m1).toBeGreaterThan(64);
    expect(m1).toBeLessThan(68);
    expect(m1).toBeCloseTo((60 * x('C', 13) / x('C', 12)) * 100, 9);
    expect(m2).toBeCloseTo(((60 * 59) / 2) * (x('C', 13) / x('C', 12)) ** 2 * 100, 9);
  });

  it('Pd: the atom pattern is the natural composition, with peaks below the monoisotopic mass', () => {
    // source: CIAAW ICE 2013 (Meija et al., Pure Appl. Chem. 88 (2016) 293), Table 1: Pd 102 1.02 %, 104 11.14 %,
    // 105 22.33 %, 106 27.33 %, 108 26.46 %, 110 11.72 %
    const r = isotopePattern('Pd');
    const byA = Object.fromEntries(r.peaks.map((p) => [p.shift + 106, p.abundance * 100]));
    expect(byA[102]).toBeCloseTo(1.02, 2);
    expect(byA[104]).toBeCloseTo(11.14, 2);
    expect(byA[105]).toBeCloseTo(22.33, 2);
    expect(byA[106]).toBeCloseTo(27.33, 2);
    expect(byA[108]).toBeCloseTo(26.46, 2);
    expect(byA[110]).toBeCloseTo(11.72, 2);
    expect(r.notes.map((n) => n.code)).toContain('LIGHTER_ISOTOPES');
    expect(r.peaks[0].shift).toBe(-4);
  });

  it('SnCl2 agrees with exact enumeration', () => {
    const exact = enumerateIsotopologues({ Sn: 1, Cl: 2 });
    const r = isotopePattern('Cl2Sn', { minRelative: 0 });
    for (const p of r.allPeaks) {
      const members = exact.filter((e) => e.nominal === p.shift + 120 + 70);
      const prob = members.reduce((s, e) => s + e.p, 0);
      expect(p.abundance).toBeCloseTo(prob, 12);
      expect(p.mz).toBeCloseTo(members.reduce((s, e) => s + e.p * e.mass, 0) / prob, 9);
    }
  });
});

describe('against exact enumeration', () => {
  const small: Record<string, Record<string, number>> = {
    CH2Cl2: { C: 1, H: 2, Cl: 2 },
    C2H5Br: { C: 2, H: 5, Br: 1 },
    C3H7NO2S: { C: 3, H: 7, N: 1, O: 2, S: 1 },
    Cl2Pd: { Pd: 1, Cl: 2 },
  };
  it.each(Object.keys(small))('%s: aggregated peaks (abundance and centroid)', (f) => {
    const exact = enumerateIsotopologues(small[f]);
    const r = isotopePattern(f, { minRelative: 0 });
    const nominals = [...new Set(exact.map((e) => e.nominal))].sort((a, b) => a - b);
    const kept = nominals.filter((n) => exact.filter((e) => e.nominal === n).reduce((s, e) => s + e.p, 0) > 1e-16);
    expect(r.allPeaks.length).toBe(kept.length);
    r.allPeaks.forEach((p, i) => {
      const members = exact.filter((e) => e.nominal === kept[i]);
      const prob = members.reduce((s, e) => s + e.p, 0);
      // pruning below 1e-16 in the intermediate products bounds the absolute error
      expect(Math.abs(p.abundance - prob)).toBeLessThan(1e-14);
      if (prob > 1e-8) expect(p.mz).toBeCloseTo(members.reduce((s, e) => s + e.p * e.mass, 0) / prob, 9);
    });
  });

  it.each(Object.keys(small))('%s: every isotopologue of the fine structure', (f) => {
    const exact = enumerateIsotopologues(small[f]).sort((a, b) => b.p - a.p);
    const fs = fineStructure(new Map(Object.entries(small[f])), 1);
    expect(fs.isotopologues.length).toBe(exact.length);
    fs.isotopologues.forEach((iso, i) => {
      expect(iso.probability / exact[i].p).toBeCloseTo(1, 9);
    });
    expect(fs.coverage).toBeCloseTo(1, 12);
  });

  it('C3H7NO2S at 99 %: the smallest set of most probable isotopologues', () => {
    const exact = enumerateIsotopologues(small.C3H7NO2S).sort((a, b) => b.p - a.p);
    let n = 0;
    for (let s = 0; s < 0.99; n++) s += exact[n].p;
    const fs = fineStructure(new Map(Object.entries(small.C3H7NO2S)), 0.99);
    expect(fs.isotopologues.length).toBe(n);
    expect(fs.coverage).toBeGreaterThanOrEqual(0.99);
    fs.isotopologues.forEach((iso, i) => expect(iso.mass).toBeCloseTo(exact[i].mass, 9));
  });
});

describe('fine structure at a resolving power', () => {
  // M+1 of C15H16NO2+: 15N at 243.1146 and 13C at 243.1210 (0.0063 apart);
  // FWHM = m/R is 0.0041 at R = 60,000 (resolved) and 0.0122 at R = 20,000 (merged)
  it('keeps 15N and 13C apart at 60,000 and merges them at 20,000', () => {
    const at = (R: number) => isotopePattern('C15H15NO2', { ion: '[M+H]+', resolvingPower: R }).peaks.filter((p) => p.shift === 1);
    const resolved = at(60000);
    expect(resolved.map((p) => p.label)).toEqual(['[15N]', '[13C]']);
    const merged = at(20000);
    expect(merged).toHaveLength(1);
    const sumAbundance = resolved[0].abundance + resolved[1].abundance;
    expect(merged[0].abundance).toBeCloseTo(sumAbundance, 12);
    expect(merged[0].mz).toBeCloseTo((resolved[0].mz * resolved[0].abundance + resolved[1].mz * resolved[1].abundance) / sumAbundance, 9);
  });

  it('merges neighbours closer than m/R into their abundance-weighted centroid', () => {
    const sticks = [
      { mz: 1000, abundance: 3, label: 'a', members: 1 },
      { mz: 1000.009, abundance: 1, label: 'b', members: 1 },
      { mz: 1000.05, abundance: 1, label: 'c', members: 1 },
    ];
    const m = resolvePeaks(sticks, 100000); // FWHM 0.01
    expect(m).toHaveLength(2);
    expect(m[0].mz).toBeCloseTo(1000.00225, 9);
    expect(m[0].label).toBe('a');
    expect(m[0].members).toBe(2);
    expect(resolvePeaks(sticks, 1e6)).toHaveLength(3);
  });
});

describe('ions and labels', () => {
  it("an ion's monoisotopic peak is its m/z, with the electron mass", () => {
    const r = isotopePattern('C15H15NO2', { ion: '[M+H]+' });
    expect(r.monoisotopicMzExact).toBe(ionMassDetail('C15H15NO2', '[M+H]+').mz.toFixed());
    expect(r.monoisotopicMz).toBe(Number(r.monoisotopicMzExact));
    expect(r.peaks[0].mz).toBeCloseTo(ionMassDetail('C15H15NO2', '[M+H]+').mz.toNumber(), 9);
    const two = isotopePattern('C15H15NO2', { ion: '[M+2H]2+' });
    expect(two.peaks[1].mz - two.peaks[0].mz).toBeCloseTo(0.5017, 3);
  });

  it('a labelled atom is its single nuclide', () => {
    const r = isotopePattern('[13C]6H12O6');
    expect(r.peaks[0].shift).toBe(0);
    expect(r.peaks[0].mz).toBeCloseTo(186.0834, 3); // 180.0634 + 6 × 1.0034
    expect(r.peaks[1].relative).toBeLessThan(1); // no 13C left to add: only 2H and 17O
    expect(r.notes.map((n) => n.code)).toContain('LABEL_PURE');
  });

  it('a charged formula alone is the species as written, with the note', () => {
    expect(isotopePattern('C14H15NO3S^-').notes[0].code).toBe('CHARGED_FORMULA');
  });
});

describe('bounded', () => {
  it('refuses a pattern too wide, and a fine structure too large, with estimates', () => {
    expect(errorCode(() => isotopePattern('C100000000'))).toBe('PATTERN_TOO_LARGE');
    expect(errorCode(() => isotopePattern('Sn400', { kind: 'fine', coverage: 0.99999 }))).toBe('PATTERN_TOO_LARGE');
    expect(errorCode(() => isotopePattern('CaSO4·0.5H2O'))).toBe('BAD_COUNT');
    expect(errorCode(() => isotopePattern('C6H6', { coverage: 2 }))).toBe('BAD_OPTION');
    expect(errorCode(() => isotopePattern('C6H6', { resolvingPower: 0 }))).toBe('BAD_OPTION');
  });

  it('computes protein-sized patterns', () => {
    const agg = isotopePattern('C257H383N65O77S6');
    expect(agg.coverage).toBeCloseTo(1, 9);
    const fine = isotopePattern('C100H150N20O30S2', { kind: 'fine', coverage: 0.999 });
    expect(fine.coverage).toBeGreaterThanOrEqual(0.999);
  });
});

describe('properties', () => {
  // elements whose most abundant isotope is also their lightest
  const light = fc.record({
    C: fc.integer({ min: 0, max: 120 }),
    H: fc.integer({ min: 0, max: 200 }),
    N: fc.integer({ min: 0, max: 20 }),
    O: fc.integer({ min: 0, max: 30 }),
    S: fc.integer({ min: 0, max: 4 }),
    Cl: fc.integer({ min: 0, max: 4 }),
    Br: fc.integer({ min: 0, max: 3 }),
    Si: fc.integer({ min: 0, max: 3 }),
    Na: fc.integer({ min: 0, max: 1 }),
  }).map((c) => Object.entries(c).filter(([, n]) => n > 0).map(([s, n]) => `${s}${n}`).join('')).filter((f) => f !== '');
  const withPd = fc.tuple(light, fc.integer({ min: 0, max: 2 }), fc.integer({ min: 0, max: 2 })).map(([f, pd, sn]) => `${f}${pd ? `Pd${pd}` : ''}${sn ? `Sn${sn}` : ''}`);
  const ions = fc.constantFrom(undefined, '[M+H]+', '[M+Na]+', '[M-H]-', '[M+2H]2+', '[M+Cl]-');
  const ok = (f: string, ion: string | undefined) => ion !== '[M-H]-' || /H/.test(f);

  it('abundances sum to 1 (aggregated) or to the coverage (fine)', () => {
    fc.assert(
      fc.property(withPd, light, ions, (f, g, ion) => {
        if (!ok(f, ion) || !ok(g, ion)) return true;
        const agg = isotopePattern(f, { ion, minRelative: 0 });
        const total = agg.allPeaks.reduce((s, p) => s + p.abundance, 0);
        const fine = isotopePattern(g, { ion, kind: 'fine', coverage: 0.99 });
        const fineTotal = fine.allPeaks.reduce((s, p) => s + p.abundance, 0);
        return Math.abs(total - 1) < 1e-9 && fineTotal >= 0.99 - 1e-12 && fineTotal <= 1 + 1e-9;
      }),
      { numRuns: 60 },
    );
  });

  it('the monoisotopic peak is the lightest when each element’s principal isotope is its lightest', () => {
    fc.assert(
      fc.property(light, ions, (f, ion) => {
        if (!ok(f, ion)) return true;
        const r = isotopePattern(f, { ion, minRelative: 0 });
        const shown = r.allPeaks.some((p) => p.shift === 0);
        return !shown || (r.allPeaks[0].shift === 0 && Math.abs(r.allPeaks[0].mz - r.monoisotopicMz) < 1e-9 * r.allPeaks[0].mz);
      }),
      { numRuns: 100 },
    );
  });

  it('the centroid of the whole pattern is the average mass from the isotope data (ICE × AME)', () => {
    fc.assert(
      fc.property(withPd, ions, (f, ion) => {
        if (!ok(f, ion)) return true;
        const r = isotopePattern(f, { ion, minRelative: 0 });
        // the average from the data directly, element by element, with the electrons of the ion
        return Math.abs(r.averageMz - r.isotopeAverageMz) < 1e-10 * r.averageMz;
      }),
      { numRuns: 100 },
    );
  });

  it('the isotope-data average is the independent sum Σ n Σ x m', () => {
    const r = isotopePattern('C2H6O');
    const avg = (s: string) => {
      const iso = naturalIsotopes(s);
      const t = iso.reduce((a, i) => a + Number(i.abundance), 0);
      return iso.reduce((a, i) => a + (Number(i.abundance) / t) * Number(i.mass), 0);
    };
    expect(r.isotopeAverageMz).toBeCloseTo(2 * avg('C') + 6 * avg('H') + avg('O'), 10);
  });

  it('says its average is not the molar mass: CH2Cl2 averages 84.933 here, and its molar mass is 84.927 g/mol', () => {
    // source: CIAAW 2021 standard weights (C 12.011, H 1.008, Cl 35.45) give 84.927; ICE 2013 compositions give more
    const r = isotopePattern('CH2Cl2');
    expect(r.averageMz.toFixed(3)).toBe('84.933');
    expect(r.notes.map((n) => n.code)).toContain('PATTERN_AVERAGE');
  });
});

describe('the result is plain data', () => {
  it('survives JSON and structuredClone unchanged', () => {
    const r = isotopePattern('C15H15NO2', { ion: '[M+H]+', resolvingPower: 60000 });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    expect(typeof r.monoisotopicMz).toBe('number');
    expect(typeof r.monoisotopicMzExact).toBe('string');
  });
});

describe('how the formula was read reaches the pattern', () => {
  it('an abbreviation and a dot between components are named in the notes', () => {
    expect(isotopePattern('Et3N').notes.map((n) => n.code)).toContain('ABBREVIATION');
    expect(isotopePattern('CuSO4.5H2O').notes.map((n) => n.code)).toContain('DOT_AS_ADDITION');
  });
});
