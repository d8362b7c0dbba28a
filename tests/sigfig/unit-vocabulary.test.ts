import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Decimal } from '../../src/exact/decimal.js';
import * as measureModule from '../../src/calc/measure.js';
import { measure } from '../../src/calc/measure.js';
import { readMeasurements } from '../../src/empirical/measurements.js';
import { sigFigsOf } from '../../src/sigfig/measured.js';
import { readNumber } from '../../src/sigfig/read-number.js';
import { firstIssue } from '../support/error-code.js';
import * as units from '../../src/sigfig/units.js';
import { AMOUNT, MASS, MASS_CONCENTRATION, MOLAR_MASS, MOLARITY, PURE, unitSpellings, VOLUME, pow10, sameDims, unitFactor, unitOf } from '../../src/sigfig/units.js';

describe('one unit vocabulary', () => {
  it('the readers of amounts take their dimensions from it (the same objects, not copies)', () => {
    expect(measureModule.MASS).toBe(units.MASS);
    expect(measureModule.AMOUNT).toBe(units.AMOUNT);
    expect(measureModule.VOLUME).toBe(units.VOLUME);
    expect(measureModule.MOLARITY).toBe(units.MOLARITY);
    expect(measureModule.MASS_CONCENTRATION).toBe(units.MASS_CONCENTRATION);
    expect(measureModule.PURE).toBe(units.PURE);
  });

  it('each unit has the dimension of its kind', () => {
    expect(unitOf('mg').dims).toBe(MASS);
    expect(unitOf('µmol').dims).toBe(AMOUNT);
    expect(unitOf('mL').dims).toBe(VOLUME);
    expect(unitOf('mM').dims).toBe(MOLARITY);
    expect(unitOf('mg/dL').dims).toBe(MASS_CONCENTRATION);
    expect(unitOf('g/mol').dims).toBe(MOLAR_MASS);
    expect(unitOf('ppm').dims).toBe(PURE);
  });

  it('reads the cubic decimetre as the litre and the cubic centimetre as the millilitre, and the SI product spellings', () => {
    // source: BIPM SI Brochure, 9th edition (2019), Table 8: litre, 1 L = 1 dm³ = 10^-3 m³ (so 1 mL = 1 cm³)
    for (const [spelling, symbol] of [['dm³', 'L'], ['dm3', 'L'], ['cm³', 'mL'], ['cm3', 'mL'], ['mol/dm³', 'mol/L'], ['mol dm⁻³', 'mol/L'], ['mol dm-3', 'mol/L'], ['mol·dm⁻³', 'mol/L'], ['g/cm³', 'g/mL'], ['g·cm⁻³', 'g/mL'], ['g/dm³', 'g/L']]) {
      expect(unitOf(spelling).symbol, spelling).toBe(symbol);
    }
    // the SI way of writing a quotient, as a product with a negative power (SI Brochure §5.4.3, from memory)
    for (const [spelling, symbol] of [['mol·L⁻¹', 'mol/L'], ['mol L⁻¹', 'mol/L'], ['mmol·L⁻¹', 'mmol/L'], ['g·L⁻¹', 'g/L'], ['mg·L⁻¹', 'mg/L'], ['g·mL⁻¹', 'g/mL'], ['mg·mL⁻¹', 'mg/mL'], ['g·mol⁻¹', 'g/mol']]) {
      expect(unitOf(spelling).symbol, spelling).toBe(symbol);
    }
  });

  it('factors are exact powers of ten (SI prefixes, BIPM SI Brochure 9th ed. Table 7)', () => {
    // source: BIPM SI Brochure, 9th edition (2019), Table 7: milli 10^-3, micro 10^-6, nano 10^-9, kilo 10^3
    expect(unitFactor(unitOf('mg')).toString()).toBe('0.001');
    expect(unitFactor(unitOf('µL')).toString()).toBe('0.000001');
    expect(unitFactor(unitOf('ng')).toFixed()).toBe('0.000000001');
    expect(unitFactor(unitOf('kg')).toString()).toBe('1000');
    // common practice: g/dL = 10 g/L; % w/v = g per 100 mL = 10 g/L
    expect(unitFactor(unitOf('g/dL')).toString()).toBe('10');
    expect(unitFactor(unitOf('% w/v')).toString()).toBe('10');
    expect(unitFactor(null).toString()).toBe('1');
    for (const s of unitSpellings()) {
      const u = unitOf(s);
      expect(unitFactor(u).eq(new Decimal(10).pow(u.exp10))).toBe(true);
    }
  });

  it('pow10 agrees with Decimal for every exponent, made once', () => {
    fc.assert(fc.property(fc.integer({ min: -400, max: 400 }), (n) => pow10(n).eq(new Decimal(10).pow(n)) && pow10(n) === pow10(n)));
  });

  it('measurement sets check a mass by the same dimension', () => {
    expect(readMeasurements('Fe=34.97 g O=15.03 g').kind).toBe('mass');
    expect(() => readMeasurements('Fe=34.97 mL O=15.03 g')).toThrow(/give a mass/);
    expect(() => readMeasurements('C=1.0 g sample=2.0 mol')).toThrow(/the sample must be a mass/);
    expect(sameDims(unitOf('kg').dims, MASS)).toBe(true);
  });
});

describe('a quantity read twice', () => {
  it('gives the same value and notes each time, and a change to one result does not reach the next', () => {
    const n1: { code: string; message: string }[] = [];
    const a = measure('1300 mg', 'the dose', n1);
    a.unit = unitOf('g');
    a.grad.set(7, new Decimal(1));
    const n2: { code: string; message: string }[] = [];
    const b = measure('1300 mg', 'the mass', n2);
    expect(b.unit?.symbol).toBe('mg');
    expect(b.grad.size).toBe(0);
    expect(b.value.toString()).toBe('1.3');
    expect(n1[0].message.startsWith('the dose: the trailing zeros of 1300')).toBe(true);
    expect(n2[0].message.startsWith('the mass: the trailing zeros of 1300')).toBe(true);
  });
});

describe('figures of a number as read', () => {
  // the short way (no digit below the last significant one) must agree with rounding at that digit
  const roundedFigures = (m: { value: Decimal; lsd: number }) => {
    const f = new Decimal(10).pow(m.lsd);
    const r = m.value.div(f).toDecimalPlaces(0, Decimal.ROUND_HALF_UP).times(f);
    return Math.max(1, (r.isZero() ? m.value : r).abs().e - m.lsd + 1);
  };
  it('agrees with rounding at the last digit, and the value is exact as written', () => {
    const text = fc.tuple(fc.stringMatching(/^[0-9]{1,12}$/), fc.option(fc.stringMatching(/^[0-9]{0,12}$/)), fc.option(fc.integer({ min: -60, max: 60 }))).map(([i, f, e]) => `${i}${f === null ? '' : `.${f}`}${e === null ? '' : `e${e}`}`);
    fc.assert(
      fc.property(text, (t) => {
        const n = readNumber(t);
        const expected = new Decimal(t.replace(/\.(e|$)/, '$1'));
        if (!n.value.eq(expected)) return false;
        return n.value.isZero() || sigFigsOf(n) === roundedFigures({ value: n.value, lsd: n.lsd! });
      }),
    );
  });
  it('keeps the textbook counts (OpenStax Chemistry 2e §1.5, examples from memory)', () => {
    expect(sigFigsOf(readNumber('0.00340'))).toBe(3);
    expect(sigFigsOf(readNumber('1300'))).toBe(2);
    expect(sigFigsOf(readNumber('2.50e2'))).toBe(3);
    expect(sigFigsOf({ value: new Decimal('9.9996'), lsd: -3 })).toBe(5);
  });
});

describe('the spellings of concentration units in print', () => {
  // source: SI Brochure, 9th edition (BIPM 2019), §5.4.6: mol L⁻¹ and mol/L are the same unit, and
  // 1 mmol/mL = 1 mol/L, 1 µmol/mL = 1 mmol/L, 1 ng/mL = 1 µg/L exactly (prefixes are powers of ten)
  const inBase = (text: string) => measure(text).value.toString();
  it('negative exponents written with a hyphen or a minus sign, and a unit over a thousandth of the volume', () => {
    for (const [a, b] of [['0.100 mol L-1', '0.100 mol/L'], ['0.100 mol dm−3', '0.100 mol/L'], ['0.100 mmol/mL', '0.100 mol/L'], ['2.50 µmol/mL', '2.50 mmol/L'], ['5.0 ng/mL', '5.0 µg/L'], ['5.0 µg/L', '0.0050 mg/L'], ['50. nM', '0.050 µM'], ['250 µl', '250 µL'], ['250 μl', '0.250 mL'], ['1.19 g mL-1', '1.19 g/mL'], ['0.100 mol L^-1', '0.100 mol/L'], ['1.19 g cm^-3', '1.19 g/mL']]) {
      expect(inBase(a), `${a} = ${b}`).toBe(inBase(b));
    }
  });

  it('units of the trade that are not amounts are refused with the reason, not a list', () => {
    const hint = (text: string) => firstIssue(() => measure(text)).hint ?? '';
    expect(hint('0.1 N')).toMatch(/^normality \(N\) depends on the reaction/);
    expect(hint('20 mEq/L')).toMatch(/^equivalents depend on the charge/);
    expect(hint('5000 IU')).toMatch(/^biological units/);
    expect(hint('2.0 mol/kg')).toMatch(/^a molality/);
  });

  it('two units side by side that make no unit of the table are one unknown unit, not a unit missing its number', () => {
    const issue = firstIssue(() => measure('2.0 mmol/g'));
    expect(issue.code).toBe('UNKNOWN_UNIT');
    expect([issue.column, issue.length]).toEqual([5, 6]);
  });
});
