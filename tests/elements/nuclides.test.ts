import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { ELEMENTS } from '../../src/elements/element-table.js';
import { getNuclide, naturalIsotopes, principalIsotope } from '../../src/elements/nuclides.js';

describe('nuclide masses and isotopic compositions', () => {
  it.each([
    // source: AME2020 (Wang et al., Chinese Phys. C 45 (2021) 030003)
    ['H', 1, '1.007825031898'],
    ['H', 2, '2.014101777844'],
    ['C', 12, '12.0000000'],
    ['C', 13, '13.00335483534'],
    ['O', 16, '15.99491461926'],
    ['Cl', 35, '34.968852694'],
    ['Cl', 37, '36.965902573'],
    ['Fe', 56, '55.934935537'],
    ['U', 238, '238.050786936'],
  ])('%s-%i has the AME2020 mass %s u', (symbol, a, mass) => {
    expect(getNuclide(symbol as string, a as number)?.mass).toBe(mass);
  });

  it('finds nuclides outside the natural set in the full AME2020 table', () => {
    // source: AME2020
    expect(getNuclide('C', 16)?.mass).toBe('16.014701255');
    expect(getNuclide('C', 99)).toBeUndefined();
  });

  it('takes the most abundant isotope as the principal one', () => {
    // source: CIAAW ICE 2013 Table 1
    expect(principalIsotope('Cl').massNumber).toBe(35);
    expect(principalIsotope('Br').massNumber).toBe(79);
    expect(principalIsotope('Fe').massNumber).toBe(56);
    expect(principalIsotope('Hg').massNumber).toBe(202);
    expect(principalIsotope('Tc').massNumber).toBe(98); // no natural composition: the flagged longest-lived isotope
  });

  it('natural abundances sum to 1 within their uncertainties for every element that has them', () => {
    for (const e of ELEMENTS) {
      const iso = naturalIsotopes(e.symbol);
      if (iso.length === 0) continue;
      const sum = iso.reduce((a, i) => a.plus(i.abundance), new Decimal(0));
      const u = iso.reduce((a, i) => a.plus(i.uncertainty), new Decimal(0));
      expect(sum.minus(1).abs().lte(u.plus('0.0001')), `${e.symbol}: Σx = ${sum}`).toBe(true);
    }
  });

  it('abundance-weighted nuclide masses reproduce the standard atomic weights (ICE 2013 × AME2020 vs CIAAW 2021)', () => {
    for (const e of ELEMENTS) {
      const iso = naturalIsotopes(e.symbol);
      if (iso.length < 2 || e.standard.kind === 'none') continue;
      // normalised by Σx: the table's fractions need not sum to exactly 1 (indium's sum to 0.9999)
      const sum = iso.reduce((a, i) => a.plus(i.abundance), new Decimal(0));
      const calc = iso.reduce((a, i) => a.plus(new Decimal(i.abundance).times(i.mass)), new Decimal(0)).div(sum);
      const std = e.standard;
      // the ICE 2013 best measurement lies within the interval, or within a small multiple of the stated uncertainty
      const [lo, hi] =
        std.kind === 'interval'
          ? [new Decimal(std.low).minus('0.003'), new Decimal(std.high).plus('0.003')]
          : [new Decimal(std.value).minus(new Decimal(std.uncertainty).times(3).plus('0.002')), new Decimal(std.value).plus(new Decimal(std.uncertainty).times(3).plus('0.002'))];
      expect(calc.gte(lo) && calc.lte(hi), `${e.symbol}: ${calc.toFixed(6)} vs ${JSON.stringify(std)}`).toBe(true);
    }
  });
});
