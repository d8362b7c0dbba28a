import { describe, expect, it } from 'vitest';
import { unitSpellings, unitOf } from '../../src/sigfig/units.js';

describe('a litre written l after the slash', () => {
  // source: SI Brochure, 9th edition, table 8 (l and L are both symbols of the litre)
  it('reads every per-litre and per-millilitre spelling with l as with L', () => {
    for (const s of unitSpellings()) {
      const m = /^(.*\/(?:100 ?)?[mµuμd]?)L$/.exec(s);
      if (!m) continue;
      const lower = unitOf(`${m[1]}l`);
      const upper = unitOf(s);
      expect([lower.symbol, lower.exp10]).toEqual([upper.symbol, upper.exp10]);
    }
  });

  it('reads mmol/l and mmol/ml as mmol/L and mol/L', () => {
    expect(unitOf('mmol/l').symbol).toBe('mmol/L');
    expect(unitOf('mmol/ml').symbol).toBe('mol/L');
    expect(unitOf('µmol/l').symbol).toBe('µM');
    expect(unitOf('µg/ml').symbol).toBe('µg/mL');
  });

  it('reads the exponent spellings with l as with L: mol l-1, mmol l⁻¹, g ml-1, mol l^-1', () => {
    for (const s of unitSpellings()) {
      const m = /^(.*[ ·][mµuμd]?)L(-1|\u207b\u00b9|\^-1|\^\u22121|\u22121)$/.exec(s);
      if (!m) continue;
      const lower = unitOf(`${m[1]}l${m[2]}`);
      const upper = unitOf(s);
      expect([lower.symbol, lower.exp10]).toEqual([upper.symbol, upper.exp10]);
    }
    expect(unitOf('mol l-1').symbol).toBe('mol/L');
    expect(unitOf('mol l^-1').symbol).toBe('mol/L');
  });
});

describe('a density in kg/L', () => {
  // source: SI Brochure, 9th edition, table 8 (1 L = 1 dm³ = 10⁻³ m³): 1 kg/L = 1 g/mL exactly
  it('is the same number in g/mL, with l or L', () => {
    for (const s of ['kg/L', 'kg/l', 'kg L-1', 'kg l-1', 'kg·L⁻¹']) expect([unitOf(s).symbol, unitOf(s).exp10]).toEqual(['g/mL', 3]);
  });
});

describe('micro written with the Greek letter mu', () => {
  // source: Unicode 15.0, U+00B5 MICRO SIGN and U+03BC GREEK SMALL LETTER MU (the SI prefix micro
  // is the Greek letter; keyboards give either)
  it('reads every spelling with the micro sign with the Greek mu as well', () => {
    for (const s of unitSpellings()) {
      if (!s.includes('\u00b5')) continue;
      const greek = unitOf(s.replaceAll('\u00b5', '\u03bc'));
      const micro = unitOf(s);
      expect([greek.symbol, greek.exp10]).toEqual([micro.symbol, micro.exp10]);
    }
    expect(unitOf('\u03bcg/mL').symbol).toBe('µg/mL');
  });
});
