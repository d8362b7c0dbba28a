import { describe, expect, it } from 'vitest';
import { osmolarity } from '../../src/pharmacy/osmolarity.js';
import { toSafe } from '../../src/errors/pondus-error.js';
import { messageFor } from '../../src/errors/message.js';
import { FLAG_NAMING } from '../../src/errors/render.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

const mOsm = (text: string) => displayQuantity(osmolarity(text).osmolarity, 'mM').value.toNumber();

describe('osmolarity and mEq/L of a solution', () => {
  it('0.9 % sodium chloride is about 308 mOsm/L', () => {
    // source: labelling of 0.9 % Sodium Chloride Injection USP ("308 mOsmol/L (calc)"), from memory
    expect(Math.round(mOsm('NaCl=0.9 %'))).toBe(308);
    expect(displayQuantity(osmolarity('NaCl=0.9 %').osmolarity, 'mM').figure).toBe('308.0');
  });

  it("lactated Ringer's: 273 mOsm/L, Na 130, K 4, Ca 2.7, Cl 109, lactate 28 mEq/L", () => {
    // source: labelling of Lactated Ringer's Injection USP (per 100 mL: NaCl 600 mg, sodium lactate 310 mg, KCl 30 mg,
    // CaCl2·2H2O 20 mg; 273 mOsmol/L calc; Na 130, K 4, Ca 2.7, Cl 109, lactate 28 mEq/L), from memory
    const r = osmolarity('NaCl=0.6 %, CH3CH(OH)COONa=0.31 %, KCl=0.03 %, CaCl2·2H2O=0.02 %');
    expect(Math.round(displayQuantity(r.osmolarity, 'mM').value.toNumber())).toBe(273);
    const eq = Object.fromEntries(r.ions.map((i) => [i.ion, displayQuantity(i.equivalents, 'mM').value.toNumber()]));
    expect(Math.round(eq['Na^+'])).toBe(130);
    expect(Math.round(eq['K^+'])).toBe(4);
    expect(eq['Ca^2+']).toBeCloseTo(2.7, 1);
    expect(Math.round(eq['Cl^-'])).toBe(109);
    expect(Math.round(eq['C3H5O3^-'])).toBe(28);
  });

  it('says it assumes complete dissociation, and reads % as w/v', () => {
    const codes = osmolarity('NaCl=0.9 %').notes.map((n) => n.code);
    expect(codes).toContain('COMPLETE_DISSOCIATION');
    expect(codes).toContain('PERCENT_AS_W_V');
    expect(codes).toContain('NOMINAL_STRENGTH');
  });

  it('a salt giving three particles counts three (CaCl2)', () => {
    const r = osmolarity('CaCl2=1.110 g/L');
    expect(displayQuantity(r.osmolarity, 'mM').value.toNumber()).toBeCloseTo((1.11 / 110.98) * 3000, 2);
  });

  it('refuses a piece without =, naming the salt in errors from inside', () => {
    expect(() => osmolarity('NaCl 0.9 %')).toThrow(/SALT=STRENGTH/);
    expect(() => osmolarity('NaCl=0.9 %, Glucose=5 %')).toThrow(/Glucose/);
    expect(() => osmolarity('')).toThrow();
  });

  it('refuses a solute it cannot split without offering an option the solution list does not have', () => {
    // dextrose is a non-electrolyte (common practice: one particle per molecule), which is not counted yet
    const e = toSafe(() => osmolarity('NaCl=0.9 %, C6H12O6=5 %'));
    expect(e.success).toBe(false);
    if (e.success) return;
    expect(e.error.first.code).toBe('BAD_RECORD');
    expect(e.error.first.column).toBe(13);
    expect(messageFor(e.error.first, FLAG_NAMING)).toMatch(/non-electrolyte such as dextrose; work such a salt on its own with meq and --ions$/);
    expect(messageFor(e.error.first)).toMatch(/with meq and `ions`$/);
  });
});

