import { describe, expect, it } from 'vitest';
import { calc } from '../../src/calc/calc.js';
import { Decimal } from '../../src/exact/decimal.js';
import { formulaMassDetail } from '../../src/mass/formula-mass.js';
import { formatWithUncertainty, molarMassUncertainty } from '../../src/mass/uncertainty.js';

const SQRT12 = new Decimal(12).sqrt();

describe('standard uncertainty of a molar mass (van der Veen et al. 2021, rectangular distributions)', () => {
  it('water', () => {
    // source: the van der Veen et al. (Pure Appl. Chem. 93 (2021) 629) method applied by hand to the
    // CIAAW 2021 intervals H [1.00784, 1.00811], O [15.99903, 15.99977]: u = width/√12 per element
    const uH = new Decimal('0.00027').div(SQRT12);
    const uO = new Decimal('0.00074').div(SQRT12);
    const expected = uH.times(2).pow(2).plus(uO.pow(2)).sqrt();
    const r = molarMassUncertainty(formulaMassDetail('H2O'));
    expect(r.value.toString()).toBe('18.01535');
    expect(r.standardUncertainty.minus(expected).abs().lt('1e-20')).toBe(true);
    expect(formatWithUncertainty(r.value, r.standardUncertainty)).toBe('18.01535 ± 0.00026');
  });

  it('sodium chloride: Cl dominates', () => {
    // source: as above, with Na 22.98976928 ± 0.00000002 (u = U/√3) and Cl [35.446, 35.457]
    const r = molarMassUncertainty(formulaMassDetail('NaCl'));
    expect(formatWithUncertainty(r.value, r.standardUncertainty)).toBe('58.4413 ± 0.0032');
  });

  it('copper(II) sulfate pentahydrate and potassium dichromate', () => {
    expect(formatWithUncertainty(...pair('CuSO4·5H2O'))).toBe('249.6878 ± 0.0056');
    // by hand: 2·39.0983 + 2·51.9961 + 7·15.9994 = 294.1846; u² = (2·0.0001/√3)² + (2·0.0006/√3)² + (7·0.00074/√12)²
    const u = new Decimal('0.0002').div(new Decimal(3).sqrt()).pow(2).plus(new Decimal('0.0012').div(new Decimal(3).sqrt()).pow(2)).plus(new Decimal('0.00518').div(SQRT12).pow(2)).sqrt();
    expect(formatWithUncertainty(...pair('K2Cr2O7'))).toBe(formatWithUncertainty(new Decimal('294.1846'), u));
    expect(formatWithUncertainty(...pair('K2Cr2O7'))).toBe('294.1846 ± 0.0017');
  });

  it('is not defined for elements without a standard atomic weight', () => {
    expect(() => molarMassUncertainty(formulaMassDetail('TcO4^-'))).toThrow(/no standard atomic weight/);
  });
});

function pair(f: string): [Decimal, Decimal] {
  const r = molarMassUncertainty(formulaMassDetail(f));
  return [r.value, r.standardUncertainty];
}

describe('± in calculations (GUM, first order)', () => {
  it('adds in quadrature for sums', () => {
    // source: JCGM 100:2008 (GUM) §5.1.2 for a sum of independent inputs
    const r = calc('8.80 ± 0.05 g + 2.10 ± 0.05 g');
    expect(r.uncertainty!.toFixed(6)).toBe(new Decimal('0.0025').plus('0.0025').sqrt().toFixed(6));
    expect(r.display).toBe('10.900 ± 0.071 g');
  });

  it('adds relative uncertainties in quadrature for products', () => {
    const r = calc('2.00 ± 0.02 g / 4.00 ± 0.04 mL to g/mL');
    // relative u: sqrt(0.01² + 0.01²) = 0.014142…; value 0.5
    expect(r.uncertainty!.toFixed(6)).toBe('0.007071');
  });

  it('carries the molar-mass uncertainty into a calculation', () => {
    const r = calc('1.000 ± 0.001 mol * M(NaCl)');
    expect(r.display).toMatch(/^58\.4\d* ± 0\.0\d+ g$/);
  });
});
