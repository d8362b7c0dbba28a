import { describe, expect, it } from 'vitest';
import { calc, calcJson, safeCalc } from '../../src/calc/calc.js';
import { MASS, measure, measureAs, PURE, readQuantity } from '../../src/calc/measure.js';
import type { Note } from '../../src/errors/issue.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { firstIssue } from '../support/error-code.js';

// Rules: OpenStax Chemistry 2e §1.5 (significant figures in calculations; exact numbers,
// including defined quantities, never limit), from memory. Rounding: ASTM E29 (half to even),
// from memory. Each expected figure is worked by hand from those rules.

describe('calc: the figures come from the rounded value', () => {
  it.each([
    // [expression, display, significant figures]
    ['0.9996 * 1.00', '1.00', 3], // 0.9996 → 3 s.f. → 1.00
    ['0.99 * 1.01 g', '1.0 g', 2], // 0.9999 g → 2 s.f. → 1.0 g
    ['0.250 M * 100.0 mL * 39.997 g/mol to g', '1.00 g', 3], // 0.999925 g → 1.00 g
    ['8.30 % * 1.2046', '10.0 %', 3], // 9.99818 % → 10.0 %
    ['99.96 mL * 0.100 M to mol', '0.0100 mol', 3], // 0.009996 mol → 0.0100 mol
    ['9.96 + 0.05', '10.01', 4], // a sum keeps 2 decimals
  ])('%s = %s', (expr, display, sf) => {
    const r = calc(expr);
    expect(r.display).toBe(display);
    expect(r.sigFigs).toBe(sf);
  });

  it('the explanation and the result agree on the figures', () => {
    const r = calc('0.99 * 1.01 g');
    expect(r.steps[0].rule).toContain('fewest significant figures: 2');
    expect(r.sigFigs).toBe(2);
  });
});

const messages = (r: { notes: { message: string }[] }) => r.notes.map((n) => n.message).join('\n');

describe('calc: a result below the precision of the data', () => {
  it('a difference that rounds to zero has no significant figures, and a note says why', () => {
    // 10.0 g − 9.95 g = 0.05 g; the last digit is at 0.1 g, so 0.0 g
    const r = calc('10.0 g - 9.95 g');
    expect(r.display).toBe('0.0 g');
    expect(r.sigFigs).toBe(0);
    expect(messages(r)).toMatch(/the difference \(0\.05 g unrounded\) is below the precision of the data .*0\.1 g/);
    expect(calcJson(r)).toMatchObject({ sigFigs: 0, display: '0.0 g', notes: [{ code: 'BELOW_PRECISION', message: expect.stringContaining('below the precision') }] });
  });

  it('says nothing when the result keeps a figure', () => {
    expect(calc('10.0 g - 9.8 g').notes).toEqual([]);
    expect(calc('10.0 g - 9.95 g', { rounding: 'half-up' }).display).toBe('0.1 g');
  });
});

describe('calc: defined numbers are exact', () => {
  it('the 100 of a percentage does not limit the figures', () => {
    // 5.63 / 8.80 × 100 % = 63.977… % → 3 s.f. → 64.0 %
    const r = calc('5.63 g / 8.80 g * 100 %');
    expect(r.display).toBe('64.0 %');
    expect(r.sigFigs).toBe(3);
    expect(messages(r)).toMatch(/100 % is read as exactly 100 %/);
    expect(messages(r)).not.toMatch(/trailing zeros/);
    expect(r.notes.map((n) => n.code)).toEqual(['EXACT_NUMBER']);
    // written with a decimal point it is a measurement
    expect(calc('100.0 % - 2.35 %').display).toBe('97.6 %');
    expect(calc('100 % - 2.35 %').display).toBe('97.65 %');
  });

  it('other percentages keep their textbook reading', () => {
    // 50 % has an ambiguous trailing zero: 1 significant figure, with a note
    const r = calc('50 % * 2.000');
    expect(r.sigFigs).toBe(1);
    expect(messages(r)).toMatch(/trailing zeros of 50/);
    expect(r.notes.map((n) => n.code)).toEqual(['TRAILING_ZEROS']);
  });

  it('reads per-100 mL units with an exact 100', () => {
    // 2.50 g/100 mL = 25.0 g/L; 250. mg/100 mL × 20.0 mL = 50.0 mg; 0.9 % w/v = 0.9 g per 100 mL (pharmacopoeial)
    expect(calc('2.50 g/100 mL').display).toBe('2.50 g/100 mL');
    expect(calc('2.50 g/100 mL to g/L').display).toBe('25.0 g/L');
    expect(calc('250. mg/100mL * 20.0 mL to mg').display).toBe('50.0 mg');
    expect(calc('0.90 % w/v * 500. mL to g').display).toBe('4.5 g');
    expect(calc('12.0 mg/dL to mg/L').display).toBe('1.20 × 10² mg/L');
    expect(calc('2.50 g/100 mL').notes).toEqual([]);
  });

  it('reads a ratio such as 1:1000 as an exact fraction, with a note', () => {
    // ratio strength 1:1000 = 1 part in 1000 (pharmacy; from memory)
    const r = calc('1:1000');
    expect(r.display).toBe('0.001');
    expect(r.sigFigs).toBeNull();
    expect(r.notes[0]).toMatchObject({ code: 'RATIO' });
    expect(r.notes[0].message).toMatch(/1:1000 is read as the ratio 1\/1000 = 0\.001, exact/);
    expect(calc('1:1000 * 250.0 mL').display).toBe('0.2500 mL');
    // as weight in volume: 1 g in 1000 mL
    expect(calc('1:1000 g/mL * 30.0 mL to mg').display).toBe('30.0 mg');
    // a part written with a decimal point keeps its figures
    expect(calc('1.5:1000').sigFigs).toBe(2);
    expect(() => calc('1:0')).toThrow(/second number/);
  });
});

describe('calc: exact results', () => {
  it('an exact quotient that does not terminate is shown cut, with an ellipsis', () => {
    // 1/3 = 0.333…; 1/8 = 0.125 terminates
    expect(calc('1/3').display).toBe('0.333333333333…');
    expect(calc('1:3').display).toBe('0.333333333333…');
    expect(calc('1/8').display).toBe('0.125');
    expect(calc('1/3').sigFigs).toBeNull();
  });
});

describe('the shared quantity reader', () => {
  it('passes the ambiguous-zeros note to every command that gives it a list', () => {
    const notes: Note[] = [];
    const q = measureAs('1300 mg', [MASS], 'the parent mass', notes);
    expect(displayQuantity(q, 'mg').text).toBe('1.3 × 10³ mg');
    expect(notes).toEqual([{ code: 'MEASUREMENT', message: expect.stringMatching(/^the parent mass: the trailing zeros of 1300 are read as not significant \(2 significant figures\)/) }]);
  });

  it('passes the defined-100 note too', () => {
    const notes: Note[] = [];
    measureAs('100 %', [PURE], 'the purity', notes);
    expect(notes[0].message).toMatch(/^the purity: 100 % is read as exactly 100 %/);
  });

  it('reads the figures of a product as rounded', () => {
    expect(displayQuantity(measure('99.96 mL of 0.100 M'), 'mol').text).toBe('0.0100 mol');
  });
});

describe('calc: notes', () => {
  it('says the same remark once when a number is written twice', () => {
    const r = calc('1300 g - 1300 g');
    expect(r.notes.filter((n) => n.message.includes('trailing zeros of 1300'))).toHaveLength(1);
    expect(r.sigFigs).toBe(0);
  });
});

describe('readQuantity', () => {
  it('returns the reading notes with the quantity', () => {
    const r = readQuantity('1300 mg', [MASS], 'the dose');
    expect(displayQuantity(r.quantity, 'mg').text).toBe('1.3 × 10³ mg');
    expect(r.notes.map((n) => n.message)).toEqual(['the dose: the trailing zeros of 1300 are read as not significant (2 significant figures); write 1300. or use scientific notation if they are']);
    expect(readQuantity('13.0 mg', [MASS], 'the dose').notes).toEqual([]);
    expect(() => readQuantity('13.0 mL', [MASS], 'the dose')).toThrow(/the dose must be a mass/);
  });
});

describe('calc: the JSON row', () => {
  it('always has notes as {code, message}, after the values', () => {
    expect(calcJson(calc('8.80 g + 2.1 g'))).toEqual({ input: '8.80 g + 2.1 g', value: 10.9, rounded: 10.9, display: '10.9 g', sigFigs: 3, unit: 'g', notes: [] });
    const j = calcJson(calc('1300 g * 2'));
    expect(j.notes).toEqual([{ code: 'TRAILING_ZEROS', message: expect.stringContaining('trailing zeros of 1300') }]);
    expect(Object.keys(j).at(-1)).toBe('notes');
  });

  it('keeps the reading notes of a formula mass when an input carries ± (they were dropped)', () => {
    // CuSO4.5H2O: the '.' is read as the addition dot, with a note
    const plain = calc('M(CuSO4.5H2O)');
    const withU = calc('M(CuSO4.5H2O) * 1.000 ± 0.001');
    expect(plain.notes.length).toBeGreaterThan(0);
    expect(withU.notes.map((n) => n.code)).toEqual(plain.notes.map((n) => n.code));
  });
});

describe('calc: numbers JSON cannot carry', () => {
  it('refuses an overflowing or underflowing input or result instead of writing null or 0', () => {
    // 1e309 is beyond the largest double (about 1.8e308, IEEE 754); 1e-400 below the smallest (about 4.9e-324)
    for (const text of ['1e309 g', '1e-400 g', '1e99 g * 1e99 * 1e99 * 1e99', '1e-99 g * 1e-99 * 1e-99 * 1e-99']) {
      expect(safeCalc(text)).toMatchObject({ success: false, error: { issues: [{ code: 'NUMBER_OUT_OF_RANGE' }] } });
    }
  });
});

describe('calc: units written the SI way', () => {
  // source: BIPM SI Brochure, 9th edition (2019), Table 8 (1 L = 1 dm³) and §5.4.3 (a quotient may be
  // written as a product with a negative power, mol·L⁻¹ or mol L⁻¹), from memory. Each figure is
  // worked by hand: a titration's 25.00 cm³ of 0.1000 mol dm⁻³ holds 2.500 × 10⁻³ mol.
  it.each([
    ['0.1000 mol dm⁻³ * 25.00 cm³ to mol', '0.002500 mol'],
    ['0.1000 mol·L⁻¹ * 25.00 mL to mmol', '2.500 mmol'],
    ['2.500 g / 250.0 cm³ to g/L', '10.00 g/L'],
    ['1.840 g·cm⁻³ * 10.00 mL', '18.40 g'],
    ['4.000 g / 40.00 g·mol⁻¹', '0.1000 mol'],
  ])('%s = %s', (expr, display) => {
    expect(calc(expr).display).toBe(display);
  });
});

describe('readers of amounts: a comma in a number', () => {
  it('is refused with both readings, thousands separator and decimal comma', () => {
    const hint = firstIssue(() => measure('1,000 mL', 'the volume')).hint ?? '';
    expect(hint).toContain('write 1000 mL');
    expect(hint).toContain('write 1.000 mL');
  });
});

describe('the unit asked for after to', () => {
  it('is shown in the spelling asked: cm³ and dm³ are mL and L, written as asked', () => {
    // '5 mL to cm3' was shown as 5 mL: the spelling asked for was dropped
    expect(calc('5 mL to cm3').display).toBe('5 cm³');
    expect(calc('5.0 mL to dm3').display).toBe('0.0050 dm³');
    expect(calc('2.50 g/mL to g/cm3').display).toBe('2.50 g/cm³');
    expect(calc('2.0 g to mg').display).toBe('2.0 × 10³ mg');
  });
});

describe('the SI unit of density', () => {
  it('kg/m³ is g/L exactly (SI Brochure, 9th edition): 1080 kg/m3 is 1.08 g/mL', () => {
    // source: SI Brochure 9th ed.: 1 kg/m³ = 10⁻³ g/cm³; common practice for reagent densities
    expect(calc('1080 kg/m3 to g/mL').display).toBe('1.08 g/mL');
    expect(calc('1.08 g/mL to kg/m³').display).toBe('1.08 × 10³ kg/m³');
  });
});

// A strength is written "per N unit": 125 mg/5 mL on an oral liquid's label, 2.00 g/100 g. The N is
// the reference amount the strength is stated for (common practice in labelling; like the defined
// 100 of g/100 mL), so it is exact and the measured amount alone sets the figures.
describe('calc: a strength per a stated amount', () => {
  it.each([
    // [expression, display, significant figures]; worked by hand: 125 mg / 5 mL = 25.0 mg/mL = 25.0 g/L
    ['125 mg/5 mL', '25.0 g/L', 3],
    ['125 mg / 5 mL', '25.0 g/L', 3],
    ['2.00 g / 100 mL', '20.0 g/L', 3], // spaced reads as unspaced g/100 mL does: 3 figures
    ['2.00 g/100 g', '0.0200', 3],
    ['8.80 g / 2 mL to g/mL', '4.40 g/mL', 3],
  ])('%s = %s, with a note naming the reading', (expr, display, sf) => {
    const r = calc(expr);
    expect(r.display).toBe(display);
    expect(r.sigFigs).toBe(sf);
    expect(messages(r)).toMatch(/read as a strength: .* per exactly \d+ (mL|g)/);
    expect(messages(r)).not.toContain('trailing zeros of 100');
  });

  it('a divisor with a decimal point is a measured amount and limits the figures', () => {
    // 125 mg / 5. mL: 5. has 1 significant figure, so 25 mg/mL rounds to 2 × 10¹ g/L
    const r = calc('125 mg / 5. mL');
    expect(r.sigFigs).toBe(1);
    expect(messages(r)).not.toContain('read as a strength');
  });

  it('a quotient of a unitless number, or by an amount of substance, is not a strength', () => {
    expect(messages(calc('125 / 5'))).not.toContain('strength');
    expect(calc('1.00 mol / 2 mol').sigFigs).toBe(1);
  });
});
