import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { measure } from '../../src/calc/measure.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { displayInstruction, WORKING_SIG_FIGS } from '../../src/sigfig/working-precision.js';

// Policy (pondus): an amount to act on computed from a target keeps working precision, at
// least 4 significant figures (common practice); a result keeps the textbook figures
// (OpenStax Chemistry 2e §1.5, from memory).

describe('instructions at working precision', () => {
  it('shows a mass to weigh to 4 figures when the target has fewer', () => {
    // NaCl for 0.1 M in 250 mL: 0.1 × 0.250 × 58.44 = 1.461 g (M(NaCl) = 58.44 g/mol, CIAAW weights)
    const q = measure('0.1 M * 250 mL * M(NaCl)');
    expect(displayQuantity(q, 'g').text).toBe('1 g'); // the textbook figure of a result
    const d = displayInstruction(q, { unit: 'g' });
    expect(d.text).toBe('1.461 g');
    expect(d.sigFigs).toBe(4);
    expect(d.dataSigFigs).toBe(1);
    expect(d.beyondData).toBe(true);
    expect(d.note).toMatch(/working precision \(4 significant figures\).*1 significant figure\b/);
  });

  it('keeps more figures when the data carry more, with no note', () => {
    // 0.100000 M × 250.000 mL × 58.4400 g/mol = 1.46100 g: 6 figures in every factor
    const d = displayInstruction(measure('0.100000 M * 250.000 mL * 58.4400 g/mol'), { unit: 'g' });
    expect(d.text).toBe('1.46100 g');
    expect(d.beyondData).toBe(false);
    expect(d.note).toBeNull();
  });

  it('counts figures on the rounded value (a carry does not add one)', () => {
    // 9.99996 g at 4 figures is 10.00 g, not 10.000 g
    const d = displayInstruction(measure('9.99996 g * 1'), { unit: 'g', minSigFigs: 4 });
    expect(d.text).toBe('9.99996 g');
    expect(displayInstruction(measure('9.99996 g * 2.0'), { unit: 'g' }).text).toBe('20.00 g');
    expect(displayInstruction(measure('0.99996 g * 1.0'), { unit: 'g' }).text).toBe('1.000 g');
  });

  it('never shows digits finer than the readability asked for', () => {
    // 13.17 mg on a balance reading to 0.1 mg: 13.2 mg
    const q = measure('0.01317 g');
    expect(displayInstruction(q, { unit: 'mg' }).text).toBe('13.17 mg');
    expect(displayInstruction(q, { unit: 'mg', readability: measure('0.1 mg') }).text).toBe('13.2 mg');
    // 334.4 mL with a cylinder read to 1 mL: 334 mL
    expect(displayInstruction(measure('473 mL * 70 / 99'), { unit: 'mL', readability: measure('1 mL') }).text).toBe('334 mL');
  });

  it('rounds half up on request', () => {
    expect(displayInstruction(measure('1.23450 g * 1.0'), { unit: 'g' }).text).toBe('1.234 g');
    expect(displayInstruction(measure('1.23450 g * 1.0'), { unit: 'g', rounding: 'half-up' }).text).toBe('1.235 g');
  });

  it('always shows at least the working figures and never fewer than the data', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 8 }), (m, dp, n) => {
        const text = `${(m / 10 ** dp).toFixed(dp)}${dp === 0 ? '.' : ''}`;
        const q = measure(`${text} g * 1.${'0'.repeat(n - 1)}`);
        const d = displayInstruction(q, { unit: 'g' });
        const data = Math.min(n, displayQuantity(measure(`${text} g`), 'g').sigFigs!);
        expect(d.sigFigs).toBe(Math.max(WORKING_SIG_FIGS, data));
        expect(d.beyondData).toBe(data < WORKING_SIG_FIGS);
      }),
      { numRuns: 300 },
    );
  });
});
