import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { milliequivalents } from '../../src/pharmacy/milliequivalents.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

const meqPerMl = (salt: string, c: string) => displayQuantity(milliequivalents(salt, { concentration: c }).equivalents, 'M').value.toNumber();
const codes = (notes: { code: string }[]) => notes.map((n) => n.code);

describe('milliequivalents of a strength (handbook values)', () => {
  it("a target in mmol is a specification: its amount at working precision ('10 mmol' is 10.00 mmol, not 1 × 10¹)", () => {
    const r = milliequivalents('K2HPO4', { mmol: '10 mmol' });
    expect(r.moles.lsd).toBe(-5); // 0.01000 mol: four figures
    // worked by hand: 10.00 mmol × 174.174 g/mol = 1.742 g
    expect(r.mass!.value.toFixed(5)).toBe('1.74174');
  });

  it('10 % potassium chloride is 1.34 mEq/mL', () => {
    // source: the usual handbook figure for KCl concentrate (e.g. hospital formularies: "10 % KCl = 1.34 mmol/mL"), from memory
    expect(meqPerMl('KCl', '10 % w/v')).toBeCloseTo(1.34, 2);
  });

  it('8.4 % sodium bicarbonate is 1.0 mEq/mL', () => {
    // source: labelling of 8.4 % Sodium Bicarbonate Injection ("1 mEq/mL"), from memory
    expect(meqPerMl('NaHCO3', '8.4 %')).toBeCloseTo(1.0, 3);
  });

  it('10 % calcium chloride dihydrate is 1.36 mEq/mL of Ca', () => {
    // source: labelling of 10 % Calcium Chloride Injection (1.36 mEq/mL, 27.2 mg Ca/mL), from memory
    const r = milliequivalents('CaCl2·2H2O', { concentration: '10 %' });
    expect(displayQuantity(r.equivalents, 'M').value.toNumber()).toBeCloseTo(1.36, 2);
    expect(codes(r.notes)).toContain('HYDRATE_WATER_COUNTED');
  });

  it('50 % magnesium sulfate heptahydrate is 4.06 mEq/mL', () => {
    // source: labelling of 50 % Magnesium Sulfate Injection (4.06 mEq/mL), from memory
    expect(meqPerMl('MgSO4·7H2O', '50 %')).toBeCloseTo(4.06, 2);
  });

  it('16.4 % sodium acetate (anhydrous) is 2 mEq/mL', () => {
    // source: labelling of Sodium Acetate Injection 2 mEq/mL (164 mg/mL), from memory
    expect(meqPerMl('CH3COONa', '164 mg/mL')).toBeCloseTo(2.0, 2);
  });

  it('notes every reading: the % read as w/v, the label taken as nominal, the ions, complete dissociation', () => {
    const r = milliequivalents('KCl', { concentration: '10 %' });
    // a nominal strength is exact: no note that the zero of 10 is not significant, beside one that it is exact
    expect(codes(r.notes)).toEqual(['IONS_READ', 'PERCENT_AS_W_V', 'NOMINAL_STRENGTH', 'MEQ_PER_MMOL', 'COMPLETE_DISSOCIATION']);
    expect(r.notes.some((n) => /trailing zeros/.test(n.message))).toBe(false);
    const m = milliequivalents('KCl', { concentration: '10.0 %', measured: true });
    expect(displayQuantity(m.equivalents, 'M').text).toBe('1.34 M');
    expect(codes(m.notes)).toContain('MEASURED_STRENGTH');
    // a measured one keeps the note on its figures
    expect(milliequivalents('KCl', { concentration: '10 %', measured: true }).notes.some((n) => /the trailing zeros of 10 are read as not significant/.test(n.message))).toBe(true);
  });

  it('refuses a % w/w strength (needs the density)', () => {
    expect(() => milliequivalents('KCl', { concentration: '10 % w/w' })).toThrow(/density/);
  });
});

describe('mmol and mEq in a mass, and the mass for a target', () => {
  it('1.000 g of each salt of the brief', () => {
    // mmol = 1000 mg / M; M from the CIAAW standard weights (KCl 74.55, NaHCO3 84.007, CaCl2·2H2O 147.008,
    // MgSO4·7H2O 246.47, K2HPO4 174.17, KH2PO4 136.08, CH3COONa·3H2O 136.079); mEq per mmol: 1, 1, 2, 2, 2, 1, 1 (common practice)
    const cases: [string, number, number][] = [
      ['KCl', 74.55, 1], ['NaHCO3', 84.007, 1], ['CaCl2·2H2O', 147.008, 2], ['MgSO4·7H2O', 246.47, 2],
      ['K2HPO4', 174.17, 2], ['KH2PO4', 136.08, 1], ['CH3COONa·3H2O', 136.079, 1],
    ];
    for (const [salt, M, z] of cases) {
      const r = milliequivalents(salt, { mass: '1.000 g' });
      expect(displayQuantity(r.moles, 'mmol').value.toNumber()).toBeCloseTo(1000 / M, 1);
      expect(r.ions.equivalentsPerMole).toBe(z);
      expect(displayQuantity(r.moles, 'mmol').sigFigs).toBe(4);
    }
  });

  it('1 g of KCl holds 13.4 mEq of K', () => {
    // source: common pharmacy figure "1 g KCl = 13.4 mmol K+", from memory
    const r = milliequivalents('KCl', { mass: '1.00 g' });
    expect(displayQuantity(r.equivalents, 'mmol').text).toBe('13.4 mmol');
  });

  it('the mass of KCl for 40 mEq is an instruction: four figures, and a note on the target', () => {
    const r = milliequivalents('KCl', { meq: '40 mEq' });
    expect(displayQuantity(r.mass!, 'g').text).toBe('2.982 g');
    expect(codes(r.notes)).toContain('TARGET_FEW_FIGURES');
    const ca = milliequivalents('CaCl2·2H2O', { meq: '10.0 mEq' });
    expect(displayQuantity(ca.mass!, 'g').text).toBe('0.7350 g'); // 5.000 mmol × 147.008 g/mol
  });

  it('splits phosphates as written and takes given ions', () => {
    const k2 = milliequivalents('K2HPO4', { mmol: '1.000 mmol' });
    expect(k2.perIon.map((i) => i.ion)).toEqual(['K^+', 'HPO4^2-']);
    expect(k2.ions.particles).toBe(3);
    const g = milliequivalents('K2HPO4', { mass: '1.000 g', ions: '2K^+,HPO4^2-' });
    expect(codes(g.notes)).toContain('IONS_GIVEN');
    expect(() => milliequivalents('K2HPO4', { mass: '1 g', ions: 'K^+,HPO4^2-' })).toThrow(/net charge/);
    expect(() => milliequivalents('C6H12O6', { mass: '1 g' })).toThrow(/`ions`/);
  });

  it('refuses no option or two options', () => {
    expect(() => milliequivalents('KCl', {})).toThrow(/one of/);
    expect(() => milliequivalents('KCl', { mass: '1 g', meq: '2 mEq' })).toThrow(/only one/);
  });

  it('property: mEq = mmol × |charge| for every ion, and the salt’s mEq is its cations’ charge', () => {
    const salts = ['KCl', 'NaHCO3', 'CaCl2·2H2O', 'MgSO4·7H2O', 'K2HPO4', 'KH2PO4', 'CH3COONa', 'Na3C6H5O7', 'AlCl3', 'K3PO4'];
    fc.assert(
      fc.property(fc.constantFrom(...salts), fc.integer({ min: 1, max: 100000 }), (salt, mg) => {
        const r = milliequivalents(salt, { mass: `${mg} mg` });
        for (const i of r.perIon) expect(i.equivalents.value.eq(i.amount.value.times(Math.abs(i.charge)))).toBe(true);
        const cationEq = r.perIon.filter((i) => i.charge > 0).reduce((s, i) => s.plus(i.equivalents.value), r.moles.value.times(0));
        expect(r.equivalents.value.eq(cationEq)).toBe(true);
        expect(r.equivalents.value.eq(r.moles.value.times(r.ions.equivalentsPerMole))).toBe(true);
      }),
      { numRuns: 200 },
    );
  });
});
