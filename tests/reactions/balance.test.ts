import fc from 'fast-check';
import { errorCode } from '../support/error-code.js';
import { describe, expect, it } from 'vitest';
import { balance } from '../../src/reactions/balance.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { toDecimal } from '../../src/formula/amount.js';
import { Decimal } from '../../src/exact/decimal.js';

const coeffs = (e: string) => balance(e).coefficients.map(Number);

describe('balancing', () => {
  it.each([
    // classic textbook equations (OpenStax Chemistry 2e ch. 4 and redox balancing examples), coefficients from memory
    ['C3H8 + O2 -> CO2 + H2O', [1, 5, 3, 4]],
    ['C6H12O6 + O2 = CO2 + H2O', [1, 6, 6, 6]],
    ['Fe^2+ + MnO4^- + H^+ -> Fe^3+ + Mn^2+ + H2O', [5, 1, 8, 5, 1, 4]],
    ['Cr2O7^2- + H^+ + e- -> Cr^3+ + H2O', [1, 14, 6, 2, 7]],
    ['Cu + HNO3 -> Cu(NO3)2 + NO + H2O', [3, 8, 3, 2, 4]],
    ['KMnO4 + HCl -> KCl + MnCl2 + H2O + Cl2', [2, 16, 2, 2, 8, 5]],
    ['MnO4^- + C2O4^2- + H^+ → Mn^2+ + CO2 + H2O', [2, 5, 16, 2, 10, 8]],
    ['Al + O2 -> Al2O3', [4, 3, 2]],
  ])('%s', (e, expected) => {
    expect(coeffs(e)).toEqual(expected);
  });

  it('handles nine species with coefficients in the hundreds', () => {
    // from memory: the classic hexacyanoferrate/permanganate equation
    expect(coeffs('K4Fe(CN)6 + KMnO4 + H2SO4 -> KHSO4 + Fe2(SO4)3 + MnSO4 + HNO3 + CO2 + H2O')).toEqual([10, 122, 299, 162, 5, 122, 60, 60, 188]);
  });

  it('writes the balanced equation and keeps the species as written', () => {
    const r = balance('2H2 + O2 -> 2H2O');
    expect(r.balanced).toBe('2 H2 + O2 → 2 H2O');
    expect(r.species).toEqual(['H2', 'O2', 'H2O']);
    expect(r.notes.map((n) => n.code)).toEqual(['COEFFICIENTS_REPLACED']);
    expect(balance('H2+O2->H2O').balanced).toBe('2 H2 + O2 → 2 H2O');
    expect(balance('Na++Cl-->NaCl').coefficients).toEqual([1n, 1n, 1n]);
  });

  const code = (e: string) => errorCode(() => balance(e));

  it('says when there is no balance, and why', () => {
    expect(code('H2 -> O2')).toBe('NO_BALANCE');
    expect(() => balance('H2 -> O2')).toThrow(/H appears only among the reactants/);
    expect(code('H2O -> H2O2')).toBe('NO_BALANCE');
  });

  it('says when more than one independent balance exists, and shows a basis', () => {
    expect(code('H2 + O2 -> H2O + H2O2')).toBe('NOT_UNIQUE');
    expect(() => balance('C + O2 -> CO + CO2')).toThrow(/\(1\) 2 C \+ O2 → 2 CO; \(2\) C \+ O2 → CO2/);
  });

  it('refuses a species on both sides, and equations without exactly one arrow', () => {
    expect(code('H2O + Na -> NaOH + H2 + H2O')).toBe('BAD_EQUATION');
    expect(code('H2 + O2')).toBe('BAD_EQUATION');
    expect(code('H2 -> O2 -> H2O')).toBe('BAD_EQUATION');
    expect(code('-> H2O')).toBe('BAD_EQUATION');
    expect(code('Xx -> Xx2')).toBe('UNKNOWN_ELEMENT');
  });

  it('rejects 200 species with a clear error (a hang would hit the test timeout)', () => {
    const big = Array.from({ length: 100 }, (_, i) => `C${i + 1}H${2 * i + 4}`).join(' + ') + ' -> ' + Array.from({ length: 100 }, (_, i) => `C${i + 1}H${2 * i + 2}`).join(' + ');
    expect(code(big)).toBe('BAD_EQUATION');
  });

  it('any balance returned conserves every element and the charge', () => {
    const pool = ['H2', 'O2', 'H2O', 'CO2', 'CH4', 'C2H6', 'NH3', 'N2', 'NO', 'NO2', 'HNO3', 'Fe', 'Fe2O3', 'FeO', 'Cu', 'CuO', 'H2SO4', 'SO2', 'S', 'H^+', 'OH^-', 'Fe^2+', 'Fe^3+', 'e-', 'Cl2', 'Cl^-', 'HCl', 'NaCl', 'Na', 'MnO4^-', 'Mn^2+'];
    fc.assert(
      fc.property(fc.uniqueArray(fc.constantFrom(...pool), { minLength: 3, maxLength: 6 }), fc.integer({ min: 1, max: 5 }), (species, cut) => {
        const k = Math.min(cut, species.length - 1);
        const eq = `${species.slice(0, k).join(' + ')} -> ${species.slice(k).join(' + ')}`;
        let r;
        try {
          r = balance(eq);
        } catch (e) {
          expect(e).toBeInstanceOf(PondusError);
          return;
        }
        const all = [...r.equation.reactants, ...r.equation.products];
        const totals = new Map<string, Decimal>();
        let charge = 0n;
        all.forEach((s, i) => {
          const sign = s.side === 'reactant' ? 1 : -1;
          const c = r.coefficients[i];
          expect(c > 0n).toBe(true);
          for (const [key, n] of s.atoms) totals.set(key, (totals.get(key) ?? new Decimal(0)).plus(toDecimal(n).times(String(c)).times(sign)));
          charge += BigInt(sign * s.charge) * c;
        });
        for (const v of totals.values()) expect(v.isZero()).toBe(true);
        expect(charge).toBe(0n);
      }),
      { numRuns: 400 },
    );
  });
});

describe('state symbols in equations', () => {
  it('are set aside, with one note', () => {
    // Zn + 2HCl → ZnCl2 + H2 (OpenStax Chemistry 2e, ch. 4), coefficients from memory
    const r = balance('Zn(s) + HCl(aq) -> ZnCl2(aq) + H2(g)');
    expect(r.coefficients.map(Number)).toEqual([1, 2, 1, 1]);
    expect(r.balanced).toBe('Zn(s) + 2 HCl(aq) → ZnCl2(aq) + H2(g)');
    expect(r.notes.map((n) => n.code)).toEqual(['STATE_SYMBOL']);
    expect(r.notes[0].message).toContain('(s), (aq), (g)');
  });

  it('do not turn (s) into sulfur', () => {
    expect(balance('Zn(s) + S(s) -> ZnS(s)').coefficients.map(Number)).toEqual([1, 1, 1]);
    expect(balance('Fe^3+(aq) + e- -> Fe^2+(aq)').coefficients.map(Number)).toEqual([1, 1, 1]);
    expect(balance('Fe^3+(aq)+e-->Fe^2+(aq)').coefficients.map(Number)).toEqual([1, 1, 1]);
    expect(balance('Zn(s)+HCl(aq)->ZnCl2(aq)+H2(g)').coefficients.map(Number)).toEqual([1, 2, 1, 1]);
  });

  it('carry the notes of the formulas, and refuse a reading that must be settled', () => {
    const r = balance('CuSO4.5H2O -> CuSO4 + H2O');
    expect(r.notes.map((n) => n.code)).toContain('DOT_AS_ADDITION');
    expect(r.notes[0].message).toMatch(/^CuSO4\.5H2O: /);
    expect(() => balance('AcOH + NaOH -> NaOAc + H2O')).toThrow(PondusError);
    expect(balance('AcOH + NaOH -> NaOAc + H2O', { abbreviations: true }).coefficients.map(Number)).toEqual([1, 1, 1, 1]);
    expect(balance('PhCOOH + NaOH -> PhCOONa + H2O').coefficients.map(Number)).toEqual([1, 1, 1, 1]);
  });
});
