import { describe, expect, it } from 'vitest';
import { errorCode } from '../support/error-code.js';
import { empirical, empiricalJson } from '../../src/empirical/empirical-formula.js';
import { readMeasurements } from '../../src/empirical/measurements.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';
import { Decimal } from '../../src/exact/decimal.js';

/** Oxide mass percents of a formula written as a sum of oxides, to two decimals (computed with pondus's own weights). */
function oxidePercents(oxides: [string, number][]): string {
  const masses = oxides.map(([f, n]) => formulaMassDetail(f).molarMass.times(n));
  const total = masses.reduce((a, b) => a.plus(b), new Decimal(0));
  return oxides.map(([f], i) => `${f}=${masses[i].div(total).times(100).toFixed(2)}`).join(' ');
}

describe('compound (oxide) keys', () => {
  it('forsterite: MgO 57.30, SiO2 42.70 gives Mg2SiO4', () => {
    // source: ideal forsterite composition MgO 57.30 %, SiO2 42.70 % (mineral-database listing, from memory)
    const r = empirical('MgO=57.30 SiO2=42.70');
    // written in IUPAC's electronegativity order (Red Book 2005 IR-4.4.2.1), the Hill formula beside it
    expect(r.empirical).toBe('Mg2SiO4');
    expect(r.hill).toBe('Mg2O4Si');
    expect(r.notes.map((n) => n.code)).toContain('COMPOUND_CONVERTED');
    const j = empiricalJson(r);
    expect(j.conversions!.map((c) => c.key)).toEqual(['MgO', 'SiO2']);
    expect(j.conversions![0].elements.Mg + j.conversions![0].elements.O).toBeCloseTo(57.3, 10);
    expect(empiricalJson(empirical('C=40.00 H=6.71 O=53.29')).conversions).toBeUndefined();
  });

  it('albite: Na2O 11.82, Al2O3 19.44, SiO2 68.74 gives NaAlSi3O8 (round trip)', () => {
    // computed here from the standard atomic weights (½Na2O·½Al2O3·3SiO2), as a round trip
    expect(oxidePercents([['Na2O', 0.5], ['Al2O3', 0.5], ['SiO2', 3]])).toBe('Na2O=11.82 Al2O3=19.44 SiO2=68.74');
    const albite = empirical('Na2O=11.82 Al2O3=19.44 SiO2=68.74');
    expect(albite.empirical).toBe('NaAlSi3O8');
    expect(albite.hill).toBe('AlNaO8Si3');
  });

  it.each([
    // round trips: oxide sums of mineral formulas (formulas from memory; percents computed here)
    ['KAlSi3O8', [['K2O', 0.5], ['Al2O3', 0.5], ['SiO2', 3]]],
    ['CaAl2Si2O8', [['CaO', 1], ['Al2O3', 1], ['SiO2', 2]]],
    ['CaMgSi2O6', [['CaO', 1], ['MgO', 1], ['SiO2', 2]]],
    ['Fe2SiO4', [['FeO', 2], ['SiO2', 1]]],
    ['Al2SiO5', [['Al2O3', 1], ['SiO2', 1]]],
  ] as [string, [string, number][]][])('%s from its oxide percents', (formula, oxides) => {
    // the mineral formula as mineralogists write it is IUPAC's electronegativity order (Red Book 2005 IR-4.4.2.1)
    const r = empirical(oxidePercents(oxides));
    expect(r.empirical).toBe(formula);
    expect(r.hill).toBe(formulaMassDetail(formula).formula);
  });

  it('splits each oxide by its mass shares, and scales the limits with the share', () => {
    const m = readMeasurements('MgO=57.30 SiO2=42.70');
    const mg = m.elements.find((e) => e.symbol === 'Mg')!;
    const mgo = formulaMassDetail('MgO');
    const share = mgo.contributions[0].mass.div(mgo.molarMass);
    expect(mg.value!.toFixed(10)).toBe(new Decimal('57.30').times(share).toFixed(10));
    // half a unit of 57.30 (0.005) times the Mg share of MgO
    expect(mg.halfUnit.toFixed(10)).toBe(new Decimal('0.005').times(share).toFixed(10));
    // O is reached from both oxides: the values and their half-units add
    const o = m.elements.find((e) => e.symbol === 'O')!;
    expect(o.value!.plus(mg.value!).plus(m.elements.find((e) => e.symbol === 'Si')!.value!).toFixed(10)).toBe('100.0000000000');
    expect(o.halfUnit.gt(new Decimal('0.004'))).toBe(true);
  });

  it('an oxide analysis of Fe2O3 alone gives Fe2O3; O=rest adds the difference to the oxides’ oxygen, with a note', () => {
    expect(empirical('Fe2O3=100.0').empirical).toBe('Fe2O3');
    const r = empirical('Fe2O3=69.94 O=rest');
    const o = r.percents.O;
    const fe2o3 = formulaMassDetail('Fe2O3');
    const oShare = fe2o3.contributions.find((c) => c.symbol === 'O')!.mass.div(fe2o3.molarMass).toNumber();
    expect(o).toBeCloseTo(30.06 + 69.94 * oShare, 6);
    expect(r.notes.map((n) => n.code)).toEqual(expect.arrayContaining(['BY_DIFFERENCE', 'COMPOUND_CONVERTED', 'DIFFERENCE_ADDED']));
    // the old reading (the key's last element, O at 100 %) is gone
    expect(r.empirical).not.toBe('O');
  });

  it('Na2O=40.00 Cl=60.00 is read as sodium oxide plus chlorine, not as O and Cl', () => {
    const r = empirical('Na2O=40.00 Cl=60.00');
    expect(Object.keys(r.fit.counts).sort()).toEqual(['Cl', 'Na', 'O']);
  });

  it('masses of oxides work like percents', () => {
    expect(empirical('MgO=0.5730 g SiO2=0.4270 g').empirical).toBe('Mg2SiO4');
  });

  it('refuses keys that are not element symbols or formulas, ions, isotopes and oxides by difference', () => {
    const code = (s: string) => errorCode(() => empirical(s));
    expect(code('Xq=50 H=50')).toBe('UNKNOWN_ELEMENT');
    expect(code('foo=50 H=50')).toBe('BAD_MEASUREMENT');
    expect(code('SO4^2-=50 Na=50')).toBe('BAD_MEASUREMENT');
    expect(code('[13C]O2=50 O=50')).toBe('BAD_MEASUREMENT');
    expect(code('MgO=57.30 SiO2=rest')).toBe('BAD_MEASUREMENT');
    try {
      empirical('H=50 Zzz2O=50');
    } catch (e) {
      expect((e as { first: { column: number; message: string } }).first.column).toBe(6);
      expect((e as { first: { message: string } }).first.message).toContain('neither an element symbol nor a formula');
    }
  });

  it('warns when percents add up to more than 100.5 %', () => {
    // C5H12O2 (C 57.66, H 11.62, O 30.72 %, computed here) written rounded up to whole percents: 101 %
    const r = empirical('C=58 H=12 O=31');
    expect(r.empirical).toBe('C5H12O2');
    expect(r.notes.map((n) => n.code)).toContain('SUM_OVER_100');
  });
});
