import { describe, expect, it } from 'vitest';
import { parseFormula, safeParseFormula } from '../../src/formula-parser/parse.js';
import { flattenFormula } from '../../src/formula/flatten.js';
import { hillFormula } from '../../src/formula/hill.js';

/** Hill formula of a parsed input: the easiest way to see what the parser understood. */
const hill = (s: string, o = {}) => {
  const t = parseFormula(s, o);
  return hillFormula(flattenFormula(t), t.charge);
};

describe('formula language', () => {
  it.each([
    // IUPAC Red Book 2005 notation (IR-4): hydrates and addition compounds with a centred dot and a multiplier per component
    ['CuSO4·5H2O', 'CuH10O9S'],
    ['Na2CO3·10H2O', 'CH20Na2O13'],
    ['2CaSO4·H2O', 'Ca2H2O9S2'],
    ['CaSO4·0.5H2O', 'CaHO4.5S'],
    ['Na2SO4·10H2O', 'H20Na2O14S'],
    ['CuSO4*5H2O', 'CuH10O9S'],
    ['CuSO4.5H2O', 'CuH10O9S'],
    ['CuSO4 · 5 H2O', 'CuH10O9S'],
    ['8H2S·46H2O', 'H108O46S8'],
  ])('reads the addition compound %s', (input, expected) => {
    expect(hill(input)).toBe(expected);
  });

  it.each([
    ['K4[Fe(CN)6]', 'C6FeK4N6'],
    ['[Co(NH3)6]Cl3', 'Cl3CoH18N6'],
    ['Ca3(PO4)2', 'Ca3O8P2'],
    ['{[Cu(NH3)4](H2O)2}SO4', 'CuH16N4O6S'],
    ['Al2(SO4)3·18H2O', 'Al2H36O30S3'],
    ['(NH4)2Fe(SO4)2·6H2O', 'FeH20N2O14S2'],
  ])('reads nested brackets of three kinds: %s', (input, expected) => {
    expect(hill(input)).toBe(expected);
  });

  it.each([
    ['CH3(CH2)16COOH', 'C18H36O2'], // stearic acid
    ['CH3COOH', 'C2H4O2'],
    ['(CH3)3COH', 'C4H10O'],
    ['C6H5CH2OH', 'C7H8O'],
  ])('reads the condensed structural formula %s', (input, expected) => {
    expect(hill(input)).toBe(expected);
  });

  it.each([
    ['SO4^2-', -2, 'O4S^2-'],
    ['NH4^+', 1, 'H4N^+'],
    ['[Fe(CN)6]^4-', -4, 'C6FeN6^4-'],
    ['[Fe(CN)6]^-4', -4, 'C6FeN6^4-'],
    ['SO₄²⁻', -2, 'O4S^2-'],
    ['Fe³⁺', 3, 'Fe^3+'],
    ['Cl-', -1, 'Cl^-'],
    ['OH−', -1, 'HO^-'],
    ['Na+', 1, 'Na^+'],
  ])('reads the charge of %s', (input, charge, expected) => {
    expect(parseFormula(input).charge).toBe(charge);
    expect(hill(input)).toBe(expected);
  });

  it.each([
    ['[13C]H4', '[13C]H4'],
    ['¹³CO2', '[13C]O2'],
    ['CDCl3', 'CDCl3'],
    ['D2O', 'D2O'],
    ['T2O', 'T2O'],
    ['CH3[2H]', 'CH3D'],
    ['[15N]H4Cl', 'ClH4[15N]'],
    ['C[13C]H6', 'C[13C]H6'],
  ])('reads the isotope labels in %s', (input, expected) => {
    expect(hill(input)).toBe(expected);
  });

  it('reads Unicode subscripts', () => {
    expect(hill('H₂O')).toBe('H2O');
    expect(hill('C₆H₁₂O₆')).toBe('C6H12O6');
  });

  it('reads decimal counts of non-stoichiometric solids', () => {
    expect(hill('Fe0.95O')).toBe('Fe0.95O');
    expect(hill('YBa2Cu3O6.95')).toBe('Ba2Cu3O6.95Y');
    expect(hill('La1.85Sr0.15CuO4')).toBe('CuLa1.85O4Sr0.15');
  });

  it('says how it read an ambiguous dot', () => {
    const t = parseFormula('CuSO4.5H2O');
    expect(t.notes.map((n) => n.code)).toEqual(['DOT_AS_ADDITION']);
    expect(parseFormula('CuSO4·5H2O').notes).toEqual([]);
  });

  it('reads all 118 element symbols', async () => {
    const { ELEMENTS } = await import('../../src/elements/element-table.js');
    for (const e of ELEMENTS) expect(hill(`${e.symbol}2`, { abbreviations: 'none' })).toBe(`${e.symbol}2`);
    // by default too, except Ac and Ts, which are also acetyl and tosyl and take a note when alone
    for (const e of ELEMENTS) expect(hill(`${e.symbol}2`)).toBe(`${e.symbol}2`);
  });

  it('reads every abbreviation when asked, abbreviations winning over clashing symbols', () => {
    expect(hill('Me3SiCl', { abbreviations: true })).toBe('C3H9ClSi');
    expect(hill('PhCOOH', { abbreviations: true })).toBe('C7H6O2');
    expect(hill('AcOH', { abbreviations: true })).toBe('C2H4O2'); // acetic acid, not actinium hydroxide
    expect(hill('Ac2O3', { abbreviations: 'none' })).toBe('Ac2O3'); // actinium oxide when only elements are read
    expect(() => hill('Ac2O3')).toThrow(/actinium/); // by default the reading must be settled
    expect(hill('BocNHMe', { abbreviations: true })).toBe('C6H13NO2');
    expect(hill('TsCl', { abbreviations: true })).toBe('C7H7ClO2S');
    expect(hill('tBuOH', { abbreviations: true })).toBe('C4H10O');
    expect(hill('Np', { abbreviations: true })).toBe('Np'); // neptunium either way
    expect(parseFormula('Pr2O3', { abbreviations: true }).notes.map((n) => n.code)).toEqual(['ABBREVIATION_CLASH']);
    expect(parseFormula('Me3SiCl', { abbreviations: true }).notes.map((n) => n.message)).toEqual(["'Me' is read as methyl (CH3)"]);
  });

  it('notes a likely slip of case between Co and CO, but not in cobalt compounds', () => {
    expect(parseFormula('CH3Co').notes.map((n) => n.code)).toEqual(['CASE_CHECK']);
    expect(parseFormula('Co2').notes.map((n) => n.message)).toEqual(["'Co' is read as cobalt; if you meant the two atoms, write 'CO'"]);
    expect(parseFormula('No2').notes.map((n) => n.code)).toEqual(['CASE_CHECK']);
    for (const f of ['Co', 'CoCl2', 'CoCl2·6H2O', 'NiSO4·6H2O', 'Co(C5H5)2', '[Co(NH3)6]Cl3', 'Co2(CO)8']) expect(parseFormula(f).notes).toEqual([]);
  });

  it('offers a non-throwing entry point', () => {
    const ok = safeParseFormula('H2O');
    expect(ok.success).toBe(true);
    const bad = safeParseFormula('H2Q');
    expect(bad.success).toBe(false);
    if (!bad.success) expect(bad.error.first.code).toBe('UNKNOWN_ELEMENT');
  });
});

describe('abbreviation table', () => {
  it('every abbreviation expands to a plain formula', async () => {
    const { ABBREVIATIONS } = await import('../../src/formula-parser/abbreviations.js');
    const { fastParse } = await import('../../src/formula-parser/fast-path.js');
    for (const [name, a] of Object.entries(ABBREVIATIONS)) expect(fastParse(a.formula), name).not.toBeNull();
  });
});
