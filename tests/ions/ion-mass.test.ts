import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { ionMass, ionMassDetail } from '../../src/ions/ion-mass.js';
import { ionJson } from '../../src/ions/ion-json.js';
import { massError, signedFixed } from '../../src/ions/mass-error.js';
import { readIonNotation } from '../../src/ions/read-ion-notation.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';
import { errorCode } from '../support/error-code.js';

// source: AME2020 (Wang et al., Chinese Phys. C 45 (2021) 030003) atomic masses in u, typed from memory
// (independent of the data files; they agree with them to better than 1e-9 u)
const AME = { H: '1.00782503190', C: '12', N: '14.00307400425', O: '15.99491461926', Na: '22.9897692820', S: '31.9720711744', Cl: '34.968852694' };
// source: CODATA 2018 electron relative atomic mass (Tiesinga et al., Rev. Mod. Phys. 93 (2021) 025010), from memory
const ELECTRON = '0.000548579909065';
const sum = (parts: [keyof typeof AME, number][]) => parts.reduce((m, [s, n]) => m.plus(new Decimal(AME[s]).times(n)), new Decimal(0));

describe('m/z of an ion', () => {
  it('[M+H]+ is M plus a hydrogen atom less an electron', () => {
    const r = ionMassDetail('C15H15NO2', '[M+H]+');
    const expected = sum([['C', 15], ['H', 16], ['N', 1], ['O', 2]]).minus(ELECTRON);
    expect(r.mz.minus(expected).abs().lt(1e-9)).toBe(true);
    expect(r.ionFormula).toBe('C15H16NO2^+');
    expect(r.ionFormulaPlain).toBe('C15H16NO2');
    expect(r.calculatedText).toBe('242.1176');
    expect(r.oddElectron).toBe(false);
  });

  it('[M-H]- and [M+Cl]- add the electron', () => {
    const r = ionMassDetail('C14H15NO3S', '[M−H]−');
    expect(r.mz.minus(sum([['C', 14], ['H', 14], ['N', 1], ['O', 3], ['S', 1]]).plus(ELECTRON)).abs().lt(1e-9)).toBe(true);
    expect(r.ionFormula).toBe('C14H14NO3S^-');
    const cl = ionMassDetail('C6H12O6', '[M+Cl]-');
    expect(cl.ionFormula).toBe('C6H12ClO6^-');
    expect(cl.mz.minus(sum([['C', 6], ['H', 12], ['O', 6], ['Cl', 1]]).plus(ELECTRON)).abs().lt(1e-9)).toBe(true);
  });

  // worked values, from memory: caffeine [M+H]+ 195.0877, glucose [M+Na]+ 203.0526,
  // reserpine [M+H]+ 609.2807 (a common calibrant), [M+HCOO]- of glucose 225.0616
  it.each([
    ['C8H10N4O2', '[M+H]+', '195.0877'],
    ['C6H12O6', '[M+Na]+', '203.0526'],
    ['C33H40N2O9', '[M+H]+', '609.2807'],
    ['C6H12O6', '[M+HCOO]-', '225.0616'],
  ])('%s %s is %s (from memory)', (f, ion, mz) => {
    expect(ionMassDetail(f, ion).calculatedText).toBe(mz);
  });

  it('covers the other adducts of the trade', () => {
    const M = 'C15H15NO2';
    expect(ionMassDetail(M, '[M+Na]+').ionFormula).toBe('C15H15NNaO2^+');
    expect(ionMassDetail(M, '[M+K]+').ionFormula).toBe('C15H15KNO2^+');
    expect(ionMassDetail(M, '[M+Li]+').ionFormula).toBe('C15H15LiNO2^+');
    expect(ionMassDetail(M, '[M+NH4]+').ionFormula).toBe('C15H19N2O2^+');
    expect(ionMassDetail(M, '[M+H-H2O]+').ionFormula).toBe('C15H14NO^+');
    expect(ionMassDetail(M, '[2M+Na]+').ionFormula).toBe('C30H30N2NaO4^+');
    const two = ionMassDetail(M, '[M+2H]2+');
    expect(two.charge).toBe(2);
    expect(two.mz.times(2).minus(two.ionMass).abs().lt(1e-12)).toBe(true);
    const rad = ionMassDetail(M, 'M+•');
    expect(rad.oddElectron).toBe(true);
    expect(rad.mz.minus(rad.neutralMass.minus(ELECTRON)).abs().lt(1e-12)).toBe(true);
    expect(ionMassDetail(M, 'M-.').mz.minus(rad.neutralMass.plus(ELECTRON)).abs().lt(1e-12)).toBe(true);
  });

  it('reads a formula written inside the notation', () => {
    expect(ionMassDetail(null, '[C15H15NO2+H]+').calculatedText).toBe('242.1176');
    expect(errorCode(() => ionMassDetail('C15H15NO2', '[C15H15NO2+H]+'))).toBe('ION_CONFLICT');
    expect(errorCode(() => ionMassDetail(null, '[M+H]+'))).toBe('BAD_ION');
  });

  it('works for labelled formulas', () => {
    const r = ionMassDetail('[13C]6H12O6', '[M+Na]+');
    expect(r.ionFormula).toBe('[13C]6H12NaO6^+');
    expect(r.mz.minus(ionMassDetail('C6H12O6', '[M+Na]+').mz).toNumber()).toBeCloseTo(6 * 1.00335483534, 9);
  });
});

describe('never silent about charges', () => {
  it('refuses a charged formula with an ion', () => {
    expect(errorCode(() => ionMassDetail('C14H15NO3S^-', '[M-H]-'))).toBe('ION_CONFLICT');
  });

  it('reads a charged formula alone as the species as written, naming the radical anion', () => {
    const r = ionMassDetail('C14H15NO3S^-', null);
    expect(r.oddElectron).toBe(true);
    expect(r.notes[0].code).toBe('CHARGED_FORMULA');
    expect(r.notes[0].message).toContain('odd-electron');
    expect(r.notes[0].message).toContain('[M-H]-');
    expect(r.mz.minus(ionMassDetail('C14H15NO3S', '[M-H]-').mz).toNumber()).toBeCloseTo(1.00782503190, 6);
  });

  it('names an even-electron cation as such', () => {
    const r = ionMassDetail('C19H42N^+', null); // cetyltrimethylammonium
    expect(r.oddElectron).toBe(false);
    expect(r.notes[0].message).toContain('even-electron cation');
  });

  it('notes [M]+, unusual charges and radical parity', () => {
    expect(ionMassDetail('C19H42N', '[M]+').notes[0].code).toBe('CHARGE_AS_WRITTEN');
    expect(ionMassDetail('C6H6', '[M+H]-').notes.map((n) => n.code)).toContain('UNUSUAL_CHARGE');
    expect(ionMassDetail('C6H6', '[M+H]+').notes).toEqual([]);
    expect(ionMassDetail('C6H6', '[M+Na-2H]-').notes).toEqual([]);
    expect(ionMassDetail('NO2', 'M+•').notes.map((n) => n.code)).toContain('ELECTRON_PARITY');
  });

  it('points to the most intense peak of the cluster when it is not the monoisotopic one', () => {
    const br = ionMassDetail('Br2', 'M+•');
    expect(br.notes.map((n) => n.code)).toEqual(['MOST_ABUNDANT_PEAK']);
    expect(br.notes[0].message).toContain('M+2 at m/z 159.8341');
    expect(ionMassDetail('C15H15NO2', '[M+H]+').notes).toEqual([]);
  });

  it('notes a formula of several components and refuses neutral formulas without an ion', () => {
    expect(ionMassDetail('C11H15N·HCl', '[M+H]+').notes[0].code).toBe('WHOLE_FORMULA');
    expect(errorCode(() => ionMassDetail('C6H6', null))).toBe('BAD_ION');
    expect(errorCode(() => ionMassDetail('CaSO4·0.5H2O', '[M+H]+'))).toBe('BAD_COUNT');
  });

  it('refuses taking away atoms M does not have, pointing at the term', () => {
    let column: number | undefined;
    try {
      ionMassDetail('C6H6', '[M+H-H2O]+');
    } catch (e) {
      column = (e as { first: { column?: number } }).first.column;
    }
    expect(column).toBe(6);
  });
});

describe('mass error and the report line', () => {
  // common practice; source: Brenton & Godfrey, J. Am. Soc. Mass Spectrom. 21 (2010) 1821 (from memory)
  it('uses (found − calculated)/calculated × 10⁶ (common practice), positive when found is higher', () => {
    const calc = new Decimal('500.0000');
    expect(massError('500.0010', calc).ppm.toNumber()).toBeCloseTo(2, 12);
    expect(massError('499.9990', calc).ppm.toNumber()).toBeCloseTo(-2, 12);
    expect(massError('500.0010', calc).mDa.toNumber()).toBeCloseTo(1, 12);
  });

  it('gives ppm and mDa to one decimal and the journal line', () => {
    const d = ionMassDetail('C15H15NO2', '[M+H]+', { found: '242.1172' });
    // (242.1172 − 242.11755517)/242.11755517 × 10⁶ = −1.467
    expect(signedFixed(d.found!.ppm)).toBe('-1.5');
    expect(signedFixed(d.found!.mDa)).toBe('-0.4');
    const r = ionMass('C15H15NO2', '[M+H]+', { found: '242.1172' });
    expect(r.reportLine).toBe('HRMS (ESI) m/z: [M + H]+ calcd for C15H16NO2 242.1176; found 242.1172.');
    expect(r.found!.ppmExact).toBe(d.found!.ppm.toFixed());
    expect(r.found!.ppm).toBe(d.found!.ppm.toNumber());
    const j = ionJson(r);
    expect(j.errorPpm).toBe(-1.5);
    expect(j.errorMDa).toBe(-0.4);
    expect(typeof j.mz).toBe('number');
    expect(j.mzExact.startsWith('242.1175551')).toBe(true);
  });

  it('takes the ionisation and decimals as options and refuses bad ones', () => {
    expect(ionMassDetail('C6H12O6', '[M+Na]+', { found: '203.05', ionisation: 'APCI', decimals: 2 }).reportLine).toBe('HRMS (APCI) m/z: [M + Na]+ calcd for C6H12NaO6 203.05; found 203.05.');
    expect(errorCode(() => ionMassDetail('C6H12O6', '[M+Na]+', { ionisation: 'E<S>I' }))).toBe('BAD_OPTION');
    expect(errorCode(() => ionMassDetail('C6H12O6', '[M+Na]+', { found: 'abc' }))).toBe('BAD_NUMBER');
    expect(errorCode(() => ionMassDetail('C6H12O6', '[M+Na]+', { found: '-5' }))).toBe('BAD_NUMBER');
  });

  it('notes a found value with few decimals and a large error', () => {
    const few = ionMassDetail('C6H12O6', '[M+Na]+', { found: '203.05' });
    expect(few.notes.map((n) => n.code)).toContain('FEW_DECIMALS');
    const far = ionMassDetail('C6H12O6', '[M+Na]+', { found: '181.0707' });
    expect(far.notes.map((n) => n.code)).toContain('LARGE_MASS_ERROR');
  });
});

describe('property: m/z × |charge| = n·M + adduct − electrons × charge', () => {
  const formula = fc.record({ C: fc.integer({ min: 1, max: 60 }), H: fc.integer({ min: 4, max: 100 }), N: fc.integer({ min: 0, max: 6 }), O: fc.integer({ min: 2, max: 12 }), S: fc.integer({ min: 0, max: 2 }) })
    .map((c) => Object.entries(c).filter(([, n]) => n > 0).map(([s, n]) => `${s}${n}`).join(''));
  const ions = ['[M+H]+', '[M+Na]+', '[M+K]+', '[M+NH4]+', '[M+Li]+', '[M-H]-', '[M+Cl]-', '[M+HCOO]-', '[M+2H]2+', '[M+H-H2O]+', '[2M+Na]+', 'M+•', 'M-•', '[3M+2H]2+'];
  it('holds for random formulas and the adducts of the trade', () => {
    fc.assert(
      fc.property(formula, fc.constantFrom(...ions), (f, ion) => {
        const n = readIonNotation(ion);
        const r = ionMassDetail(f, ion);
        // independently: the mass path of `mass` for M and for each term
        let expected = formulaMassDetail(f).monoisotopicMass.times(n.multiplier);
        for (const t of n.terms) expected = expected.plus(formulaMassDetail(t.text).monoisotopicMass.times(t.sign * t.count));
        expected = expected.minus(new Decimal(ELECTRON).times(n.charge));
        return r.mz.times(Math.abs(r.charge)).minus(expected).abs().lt('1e-12');
      }),
      { numRuns: 300 },
    );
  });
});

describe('the public result is plain data', () => {
  it('survives JSON, spread and structuredClone unchanged: numbers, exact text beside them, a record of atoms', () => {
    const r = ionMass('C15H15NO2', '[M+H]+', { found: '242.1172' });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    expect({ ...r }).toEqual(r);
    expect(r.atoms).toEqual({ C: 15, H: 16, N: 1, O: 2 });
    expect(typeof r.mz).toBe('number');
    // the exact decimal text is the Decimal of the detail form, every digit
    const d = ionMassDetail('C15H15NO2', '[M+H]+');
    expect(r.mzExact).toBe(d.mz.toFixed());
    expect(r.mz).toBe(Number(r.mzExact));
    expect(r.neutralMassExact).toBe(d.neutralMass.toFixed());
    expect(Object.getPrototypeOf(r.atoms)).toBe(Object.prototype);
  });
});

describe('how the formula was read reaches the ion', () => {
  it('an abbreviation and a dot between components are named in the notes, as mass names them', () => {
    for (const [formula, code] of [['Et3N', 'ABBREVIATION'], ['BocNHCH2COOH', 'ABBREVIATION'], ['CuSO4.5H2O', 'DOT_AS_ADDITION']]) {
      const r = ionMass(formula, '[M+H]+');
      expect(r.notes.map((n) => n.code), formula).toContain(code);
      expect(JSON.stringify(ionJson(r)), formula).toContain(code);
    }
  });
});
