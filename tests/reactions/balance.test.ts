import fc from 'fast-check';
import { errorCode } from '../support/error-code.js';
import { describe, expect, it } from 'vitest';
import { balance, balanceParsed } from '../../src/reactions/balance.js';
import { parseEquation } from '../../src/reactions/equation.js';
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
    expect(r.notes.map((n) => n.code)).toEqual(['BALANCED_AS_WRITTEN']);
    expect(r.balancedAsWritten).toBe(true);
    expect(balance('H2+O2->H2O').balanced).toBe('2 H2 + O2 → 2 H2O');
    expect(balance('Na++Cl-->NaCl').coefficients).toEqual([1, 1, 1]);
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

  it('reads a species on both sides as a catalyst, and refuses equations without exactly one arrow', () => {
    expect(code('H2O + Na -> NaOH + H2 + H2O')).toBe('NO_BALANCE');
    expect(() => balance('H2O + Na -> NaOH + H2 + H2O')).toThrow(/H2O left out of the balance as a catalyst/);
    expect(code('2 H2O + Na -> NaOH + H2 + H2O')).toBe('BAD_EQUATION');
    expect(code('H2O -> H2O')).toBe('BAD_EQUATION');
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
        let b;
        try {
          b = balanceParsed(parseEquation(eq));
        } catch (e) {
          expect(e).toBeInstanceOf(PondusError);
          return;
        }
        const r = b.result;
        const all = [...b.equation.reactants, ...b.equation.products];
        const totals = new Map<string, Decimal>();
        let charge = 0n;
        all.forEach((s, i) => {
          const sign = s.side === 'reactant' ? 1 : -1;
          expect(Number.isInteger(r.coefficients[i])).toBe(true);
          const c = BigInt(r.coefficients[i]);
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

describe('reactions as written', () => {
  // the aspirin synthesis (salicylic acid + acetic anhydride → aspirin + acetic acid), a common
  // teaching-lab experiment, and the peracetylation of glucose to the pentaacetate: from memory
  it.each([
    ['C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', [1, 1, 1, 1]],
    ['1 C7H6O3 + 1 C4H6O3 -> 1 C9H8O4 + 1 C2H4O2', [1, 1, 1, 1]],
    ['C6H12O6 + 5 C4H6O3 -> C16H22O11 + 5 C2H4O2', [1, 5, 1, 5]],
  ])('%s balances as written, though atoms alone do not fix it', (e, expected) => {
    const r = balance(e);
    expect(r.coefficients).toEqual(expected);
    expect(r.balancedAsWritten).toBe(true);
    expect(r.unique).toBe(false);
    expect(r.independentBalances).toBe(2);
    expect(r.settledBy).toBe('as written');
    expect(r.notes.map((n) => n.code)).toEqual(['BALANCED_AS_WRITTEN', 'NOT_UNIQUE_FROM_ATOMS']);
    expect(r.notes[1].message).toMatch(/^not unique from atoms alone: 2 independent balances/);
    expect(r.basis).toHaveLength(2);
  });

  it('uses written coefficients that balance, even when not the smallest', () => {
    const r = balance('4 H2 + 2 O2 -> 4 H2O');
    expect(r.coefficients).toEqual([4, 2, 4]);
    expect(r.unique).toBe(true);
    expect(balance('H2 + 1/2 O2 -> H2O').exactCoefficients).toEqual(['1', '1/2', '1']);
    expect(balance('H2 + 1/2 O2 -> H2O').coefficients).toEqual([1, 0.5, 1]);
  });

  it('replaces written coefficients that do not balance when the balance is unique, with a note', () => {
    const r = balance('3 H2 + O2 -> H2O');
    expect(r.coefficients).toEqual([2, 1, 2]);
    expect(r.balancedAsWritten).toBe(false);
    expect(r.notes.map((n) => n.code)).toEqual(['COEFFICIENTS_REPLACED']);
  });

  it('refuses a non-unique equation whose written coefficients do not balance, showing the balances', () => {
    expect(code2(() => balance('C6H12O6 + 4 C4H6O3 -> C16H22O11 + 5 C2H4O2'))).toBe('NOT_UNIQUE');
    expect(() => balance('C6H12O6 + 4 C4H6O3 -> C16H22O11 + 5 C2H4O2')).toThrow(/The coefficients as written do not balance it/);
  });

  it('lets the user fix chosen coefficients, or take the written ones', () => {
    const r = balance('C6H12O6 + C4H6O3 -> C16H22O11 + C2H4O2', { fix: { C6H12O6: '1', C4H6O3: '5' } });
    expect(r.coefficients).toEqual([1, 5, 1, 5]);
    expect(r.settledBy).toBe('fixed');
    expect(r.unique).toBe(false);
    const w = balance('1 C6H12O6 + 5 C4H6O3 -> C16H22O11 + C2H4O2', { fix: 'written' });
    expect(w.coefficients).toEqual([1, 5, 1, 5]);
    expect(code2(() => balance('C6H12O6 + C4H6O3 -> C16H22O11 + C2H4O2', { fix: { C6H12O6: '1' } }))).toBe('NOT_UNIQUE');
    expect(code2(() => balance('2 H2 + O2 -> 2 H2O', { fix: { H2: '2', H2O: '3' } }))).toBe('NO_BALANCE');
    expect(code2(() => balance('C + O2 -> CO + CO2', { fix: { CO: '1', CO2: '-1' } }))).toBe('BAD_OPTION');
    expect(code2(() => balance('C + O2 -> CO + CO2', { fix: { N2: '1' } }))).toBe('BAD_OPTION');
    expect(code2(() => balance('C + O2 -> CO + CO2', { fix: 'written' }))).toBe('BAD_OPTION');
  });

  it('is plain data: no BigInt, nothing lost by JSON, spread or structuredClone', () => {
    const r = balance('C6H12O6 + 5 C4H6O3 -> C16H22O11 + 5 C2H4O2');
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    expect({ ...r }).toEqual(r);
  });
});

const code2 = (f: () => unknown) => errorCode(f);

describe('catalysts', () => {
  it('a species written on both sides is left out of the balance, with a note', () => {
    // Fischer esterification of acetic acid with ethanol, acid-catalysed (common practice)
    const r = balance('C2H4O2 + C2H6O + H2SO4 -> C4H8O2 + H2O + H2SO4');
    expect(r.balanced).toBe('C2H4O2 + C2H6O → C4H8O2 + H2O');
    expect(r.catalysts).toEqual(['H2SO4']);
    expect(r.notes.map((n) => n.code)).toContain('CATALYST');
  });

  it('a catalyst written on one side is named by an option', () => {
    expect(errorCode(() => balance('C2H4O2 + C2H6O + H2SO4 -> C4H8O2 + H2O'))).toBe('NO_BALANCE');
    const r = balance('C2H4O2 + C2H6O + H2SO4 -> C4H8O2 + H2O', { catalysts: ['H2SO4'] });
    expect(r.coefficients).toEqual([1, 1, 1, 1]);
    expect(errorCode(() => balance('C2H4O2 + C2H6O -> C4H8O2 + H2O', { catalysts: ['Pd'] }))).toBe('BAD_OPTION');
  });
});

describe('a Suzuki coupling written in full', () => {
  // the equation as a synthesis chemist writes it (from memory), the catalyst on both sides
  const eq = 'C7H7BrO + C6H7BO2 + K2CO3 + H2O + Pd(PPh3)4 -> C13H12O + KBr + B(OH)3 + KHCO3 + Pd(PPh3)4';
  it('balances as written, with the catalyst set aside and its reading noted once', () => {
    const r = balance(eq);
    expect(r.coefficients).toEqual([1, 1, 1, 1, 1, 1, 1, 1]);
    expect(r.balancedAsWritten).toBe(true);
    expect(r.catalysts).toEqual(['Pd(PPh3)4']);
    expect(r.notes.filter((n) => n.code === 'ABBREVIATION')).toHaveLength(1);
  });
});
