// IUPAC's electronegativity order for generated inorganic formulas (Red Book 2005 IR-4.4.2.1,
// element sequence of Table VI).
import { describe, expect, it } from 'vitest';
import { flattenFormula } from '../../src/formula/flatten.js';
import { hillFormula } from '../../src/formula/hill.js';
import { TABLE_VI_SEQUENCE, writtenFormula, writtenOrder } from '../../src/formula/written-order.js';
import { ELEMENTS } from '../../src/elements/element-table.js';
import { parseFormula } from '../../src/formula-parser/parse.js';

const written = (text: string, options = {}) => {
  const tree = parseFormula(text);
  return writtenFormula(flattenFormula(tree), tree.charge, options);
};

describe('Table VI element sequence', () => {
  it('holds every one of the 118 elements once', () => {
    expect(new Set(TABLE_VI_SEQUENCE).size).toBe(118);
    expect([...TABLE_VI_SEQUENCE].sort()).toEqual(ELEMENTS.map((e) => e.symbol).sort());
  });
  it('runs from F to the noble gases, with H between groups 16 and 15', () => {
    // source: IUPAC Red Book 2005, IR-2.15.3.1 and Table VI
    expect(TABLE_VI_SEQUENCE[0]).toBe('F');
    expect(TABLE_VI_SEQUENCE.indexOf('H')).toBe(TABLE_VI_SEQUENCE.indexOf('Lv') + 1);
    expect(TABLE_VI_SEQUENCE.indexOf('N')).toBe(TABLE_VI_SEQUENCE.indexOf('H') + 1);
    expect(TABLE_VI_SEQUENCE.at(-1)).toBe('Og');
  });
});

describe('written order', () => {
  it("reproduces the Red Book's examples of the sequence", () => {
    // source: IUPAC Red Book 2005, IR-2.15.3.1(a), examples 1–4
    expect(written('Cl2S2')).toBe('S2Cl2');
    expect(written('ClO2')).toBe('O2Cl');
    expect(written('TeH2')).toBe('H2Te');
    expect(written('H3Al')).toBe('AlH3');
  });
  it('writes salts and oxoanions with the electropositive part first', () => {
    // source: IUPAC Red Book 2005, IR-4.4.2.1 with Table VI
    expect(written('Cl2Cu')).toBe('CuCl2');
    expect(hillFormula(flattenFormula(parseFormula('CuCl2')))).toBe('Cl2Cu'); // Hill, for contrast
    expect(written('O4P^3-')).toBe('PO4^3-');
    expect(written('ClNa')).toBe('NaCl');
    expect(written('CuSO4')).toBe('CuSO4');
    expect(written('O3Fe2')).toBe('Fe2O3');
    expect(written('F2Xe')).toBe('XeF2');
    expect(written('ClH4N')).toBe('NH4Cl');
    expect(written('H3N')).toBe('NH3');
    expect(written('F6S')).toBe('SF6');
    expect(written('POCl3')).toBe('POCl3');
    expect(written('SOCl2')).toBe('SOCl2');
    expect(written('K2Cr2O7')).toBe('K2Cr2O7');
  });
  it('writes oxoacids and acid salts with H first after the metals (common practice)', () => {
    expect(written('O4SH2')).toBe('H2SO4');
    expect(written('HNO3')).toBe('HNO3');
    expect(written('H3PO4')).toBe('H3PO4');
    expect(written('HClO4')).toBe('HClO4');
    expect(written('NaHCO3')).toBe('NaHCO3');
    expect(written('KH2PO4')).toBe('KH2PO4');
    expect(written('KClO4')).toBe('KClO4');
    // the plain sequence without the conventions
    expect(written('HNO3', { strict: true })).toBe('NHO3');
    expect(written('KClO4', { strict: true })).toBe('KO4Cl');
    expect(written('H2SO4', { strict: true })).toBe('H2SO4');
  });
  it('writes hydroxides with their OH group', () => {
    expect(written('NaOH')).toBe('NaOH');
    expect(written('CaO2H2')).toBe('Ca(OH)2');
    expect(written('Al(OH)3')).toBe('Al(OH)3');
    expect(written('CaO2H2', { strict: true })).toBe('CaH2O2');
  });
  it('keeps isotope labels and unknown keys, and decimal counts', () => {
    expect(written('[2H]Cl')).toBe('DCl');
    expect(written('[13C]O2')).toBe('[13C]O2');
    expect(writtenOrder(['Cl', 'Xq', 'Na'])).toEqual(['Na', 'Cl', 'Xq']);
    expect(written('CaSO4·0.5H2O')).toBe('CaHSO4.5'); // H after the metal, before S
  });
});
