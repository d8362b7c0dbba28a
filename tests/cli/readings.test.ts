import { noteMessages } from '../support/notes.js';
import { describe, expect, it } from 'vitest';
import { jsonLines, pondus } from './run-cli.js';

describe('readings at the command line', () => {
  it('reads a hemihydrate as written, with the note in the JSON', () => {
    const r = pondus(['mass', '--json', 'CaSO4.0.5H2O', 'CaSO4·½H2O', 'CaSO4·1/2H2O']);
    expect(r.status).toBe(0);
    const out = jsonLines(r.stdout);
    // calcium sulfate hemihydrate 145.14 g/mol (from memory); exact sum of CIAAW 2021 weights 145.1415
    for (const o of out) expect(o.molarMass).toBe(145.1415);
    expect(noteMessages(out[0])).toContain("'.' at column 6 is read as the addition dot: CaSO4·0.5H2O");
  });

  it('refuses thirds with the whole-number form to write', () => {
    const r = pondus(['mass', 'CaSO4·⅓H2O']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('INEXACT_FRACTION');
    expect(r.stderr).toContain('3CaSO4·H2O');
  });

  it('reads Cp* with and without --abbreviations', () => {
    for (const args of [['mass', '--json', '[Cp*RhCl2]2'], ['mass', '--json', '--abbreviations', '[Cp*RhCl2]2']]) {
      const [o] = jsonLines(pondus(args).stdout);
      // [Cp*RhCl2]2, 618.07 g/mol (catalogue value, from memory)
      expect(o.formula).toBe('C20H30Cl4Rh2');
      expect(o.molarMass.toFixed(2)).toBe('618.07');
      expect(noteMessages(o)).toEqual(["'Cp*' is read as pentamethylcyclopentadienyl (C10H15)"]);
    }
  });

  it('refuses readings that must be settled, in place in a batch, and reads them with --abbreviations', () => {
    const r = pondus(['mass', '--json', '-'], 'AcOH\nTHF\nH2O\nTsCl\nPrOH\n');
    expect(r.status).toBe(1);
    const out = jsonLines(r.stdout);
    expect(out.map((o) => o.error?.code ?? o.formula)).toEqual(['AMBIGUOUS_READING', 'AMBIGUOUS_READING', 'H2O', 'AMBIGUOUS_READING', 'AMBIGUOUS_READING']);
    expect(out[0].error.message).toContain('acetic acid');
    expect(out[1].error.hint).toContain('[3H]HF');
    const a = jsonLines(pondus(['mass', '--json', '--abbreviations', 'AcOH', 'THF', 'TsCl', 'PrOH']).stdout);
    // acetic acid C2H4O2, tetrahydrofuran C4H8O, tosyl chloride C7H7ClO2S, 1-propanol C3H8O (common practice)
    expect(a.map((o) => o.formula)).toEqual(['C2H4O2', 'C4H8O', 'C7H7ClO2S', 'C3H8O']);
    expect(a.every((o) => o.notes.length > 0)).toBe(true);
  });

  it('keeps praseodymium and deuterated formulas', () => {
    const out = jsonLines(pondus(['mass', '--json', 'Pr6O11', 'PrCl3', 'CDCl3', 'D2O', '[2H]2O', 'C6D6', 'CD3OD']).stdout);
    expect(out.map((o) => o.formula)).toEqual(['O11Pr6', 'Cl3Pr', 'CDCl3', 'D2O', 'D2O', 'C6D6', 'CD4O']);
  });

  it('reads Ph, tBu, Boc and Cp by default, naming them', () => {
    const out = jsonLines(pondus(['mass', '--json', 'Pd(PPh3)4', 'KOtBu', 'Boc2O', 'Cp2Fe', 'PdCl2(py)2']).stdout);
    // Pd(PPh3)4 1155.59 g/mol, PdCl2(py)2 335.52 g/mol (catalogue values, from memory)
    expect(out[0].molarMass.toFixed(2)).toBe('1155.59');
    expect(out[4].formula).toBe('C10H10Cl2N2Pd');
    expect(out[4].molarMass.toFixed(2)).toBe('335.52');
    expect(out.map((o) => o.notes.length)).toEqual([1, 1, 1, 1, 1]);
  });

  it('gives no hint that changes the substance', () => {
    const r = pondus(['mass', 'PdCl2(Py)2']);
    expect(r.status).toBe(1);
    expect(r.stderr).toContain('AMBIGUOUS_READING');
    expect(r.stderr).not.toContain('PY');
    expect(pondus(['mass', 'h2o']).stderr).toContain("'H2O'");
  });

  it('balances an equation with state symbols', () => {
    const r = pondus(['balance', '--json', 'Zn(s) + HCl(aq) -> ZnCl2(aq) + H2(g)']);
    expect(r.status).toBe(0);
    const [o] = jsonLines(r.stdout);
    expect(o.coefficients).toEqual([1, 2, 1, 1]);
    expect(noteMessages(o)).toEqual(['the state symbols (s), (aq), (g) are set aside: they do not change the balance']);
  });

  it('still finds empirical formulas with praseodymium beside carbon and hydrogen (element symbols written by pondus itself)', () => {
    // invented percentages; within the ±0.3 points of an analysis the simple C11H26Pr2 fits (C 30.02, H 5.95, Pr 64.03 %)
    const r = pondus(['empirical', '--json', 'C=30.00 H=6.00 Pr=64.00']);
    expect(r.status).toBe(0);
    expect(jsonLines(r.stdout)[0].empirical).toBe('C11H26Pr2');
  });
});
