import { describe, expect, it } from 'vitest';
import { conversionFactor } from '../../src/preparation/conversion-factor.js';
import { dilute } from '../../src/preparation/dilution.js';
import { gravimetric } from '../../src/preparation/gravimetric.js';
import { saltFactor } from '../../src/preparation/salt-factor.js';
import { prepareSolution } from '../../src/preparation/solution.js';
import { substituteForm } from '../../src/preparation/substitute.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { displayMeasured } from '../../src/sigfig/round.js';

const g = (q: Parameters<typeof displayQuantity>[0]) => displayQuantity(q, 'g').text;

describe('making up solutions', () => {
  it('grams of NaCl in 0.250 L of a 5.30 M solution: 77.4 g', () => {
    // source: OpenStax Chemistry 2e §3.3, mass of solute in a given volume of solution (from memory)
    expect(g(prepareSolution('NaCl', { concentration: '5.30 M', volume: '0.250 L' }).mass)).toBe('77.4 g');
  });

  it('allows for the hydrate form and the assay', () => {
    const r = prepareSolution('CuSO4·5H2O', { concentration: '0.100 M', volume: '250.0 mL', purity: '98.5 %' });
    expect(g(r.pureMass)).toBe('6.24 g');
    expect(g(r.mass)).toBe('6.34 g');
  });

  it('makes a 1000 mg/L copper standard from the pentahydrate', () => {
    // 1.000 g/L Cu × 0.1000 L × 249.68/63.546 = 0.3929 g (common practice for AAS standards)
    const r = prepareSolution('CuSO4·5H2O', { concentration: '1000. ppm', volume: '100.0 mL', as: 'Cu' });
    expect(g(r.mass)).toBe('0.3929 g');
    expect(r.notes.map((n) => n.code)).toContain('PPM_AS_MG_PER_L');
  });

  it('counts the chloride in calcium chloride', () => {
    const r = prepareSolution('CaCl2·2H2O', { concentration: '0.200 M', volume: '500.0 mL', as: 'Cl' });
    // 0.100 mol Cl⁻ needs 0.0500 mol CaCl2·2H2O × 147.01 g/mol = 7.35 g
    expect(g(r.mass)).toBe('7.35 g');
  });

  it('refuses nonsense', () => {
    expect(() => prepareSolution('NaCl', { concentration: '0.1 g', volume: '1.00 L' })).toThrow(/concentration must be/);
    expect(() => prepareSolution('NaCl', { concentration: '0.100 M', volume: '1.00 L', purity: '120 %' })).toThrow(/purity/);
    expect(() => prepareSolution('NaCl', { concentration: '-0.100 M', volume: '1.00 L' })).toThrow(/positive/);
  });

  it('replaces the anhydrous salt by the pentahydrate', () => {
    const r = substituteForm('CuSO4·5H2O', 'CuSO4', '10.00 g');
    expect(g(r.mass)).toBe('15.64 g');
    expect(r.notes).toEqual([]);
    expect(substituteForm('Na2CO3', 'NaHCO3', '1.00 g').notes.map((n) => n.code)).toEqual(['FORMS_DIFFER']);
  });
});

describe('dilution', () => {
  it('volume of 1.59 M KOH for 5.00 L of 0.100 M: 0.314 L', () => {
    // source: OpenStax Chemistry 2e §3.3, dilution example (from memory)
    expect(displayQuantity(dilute('1.59 M', '0.100 M', '5.00 L').stockVolume).text).toBe('0.314 L');
  });

  it('keeps the unit of the final volume and refuses to concentrate', () => {
    expect(displayQuantity(dilute('1.00 M', '0.100 M', '250.0 mL').stockVolume).text).toBe('25.0 mL');
    expect(() => dilute('0.100 M', '1.00 M', '250.0 mL')).toThrow(/more concentrated/);
    expect(() => dilute('1.00 M', '10.0 g/L', '250.0 mL')).toThrow(/same kind/);
  });
});

describe('gravimetric factors and oxide basis', () => {
  it.each([
    // from memory: handbook tables of gravimetric factors
    ['Fe', 'Fe2O3', '0.6994'],
    ['Cl', 'AgCl', '0.2474'],
    ['SO4', 'BaSO4', '0.4116'],
    ['P2O5', 'Mg2P2O7', '0.6378'],
  ])('%s weighed as %s: %s', (sought, weighed, f) => {
    expect(conversionFactor(sought, weighed).factor.toFixed(4)).toBe(f);
  });

  it.each([
    // source: IFA fertilizer conversion factors (from memory)
    ['P', 'P2O5', '0.4364'],
    ['P2O5', 'P', '2.2914'],
    ['K', 'K2O', '0.8301'],
    ['K2O', 'K', '1.2046'],
    ['Si', 'SiO2', '0.4674'],
  ])('%s from %s: × %s', (to, from, f) => {
    // the published tables use older atomic weights (O 15.9994): agreement to ±1 in the last figure
    expect(conversionFactor(to, from).factor.minus(f).abs().lte('0.0001')).toBe(true);
  });

  it('gives the analyte mass and its mass fraction in the sample', () => {
    const r = gravimetric('Fe', 'Fe2O3', { weighedMass: '0.2345 g', sampleMass: '1.0012 g' });
    expect(displayQuantity(r.analyteMass!, 'g').text).toBe('0.1640 g');
    expect(displayQuantity(r.massPercent!).figure).toBe('16.38');
  });

  it('asks which element when two share several', () => {
    expect(() => conversionFactor('MgO', 'MgCO3')).not.toThrow();
    expect(() => conversionFactor('NaCl', 'KBr')).toThrow(/share no element/);
  });
});

describe('salt and parent', () => {
  it('morphine hydrochloride trihydrate against morphine', () => {
    // M(C17H19NO3·HCl·3H2O) / M(C17H19NO3), both from CIAAW weights (common practice)
    const r = saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3', { parentMass: '10.0 mg' });
    expect(displayMeasured(r.reported).text).toBe('1.3172');
    expect(displayQuantity(r.saltMass!).text).toBe('13.2 mg');
  });

  it('needs the parent written as part of the salt', () => {
    expect(() => saltFactor('C17H20ClNO3', 'C17H19NO3')).toThrow(/not written as a part/);
  });
});
