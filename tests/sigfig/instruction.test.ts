import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { measure } from '../../src/calc/measure.js';
import { Decimal } from '../../src/exact/decimal.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, volumeUnitFor, WORKING_FIGURES } from '../../src/sigfig/instruction.js';
import { dilutionWarning, over100Warning, smallMassWarning } from '../../src/preparation/warnings.js';
import { unitOf } from '../../src/sigfig/units.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

const digits = (figure: string) => figure.replace(/ × 10.*$/, '').replace(/[^0-9]/g, '').replace(/^0+/, '').length;

describe('instructions at working precision', () => {
  it('shows four figures from a one-figure target, and the figures come from the rounded value', () => {
    const q = measure('0.99996 g * 1', 'x');
    q.lsd = -1; // one figure, as from a one-figure target
    q.sigFigs = 1;
    const ins = instruction(q, []);
    expect(ins.textbookSigFigs).toBe(1);
    expect(displayInstruction(ins, 'g').text).toBe('1.000 g'); // 0.99996 to 4 figures, not 1.0000
  });

  it('never shows fewer than four figures, nor more than the data carry beyond four', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999_999 }), fc.integer({ min: -9, max: 3 }), fc.integer({ min: 1, max: 8 }), (mantissa, exp, sf) => {
        const value = new Decimal(mantissa).times(new Decimal(10).pow(exp));
        const q = measure(`${value.toFixed()} g`, 'x');
        q.lsd = value.e - sf + 1; // sf figures by the textbook rules
        q.sigFigs = sf;
        const d = displayInstruction(instruction(q, []), 'g');
        expect(d.sigFigs).toBe(Math.max(WORKING_FIGURES, sf));
        expect(digits(d.figure)).toBe(Math.max(WORKING_FIGURES, sf));
      }),
    );
  });

  it('notes a target with fewer than three figures, not a three-figure one', () => {
    const one = instruction(measure('1.461 g', 'x'), [inputFigures('the target', '0.1 M', measure('0.1 M'))]);
    expect(fewFiguresNote(one, 'the mass to weigh', 'the solution made is 0.1 M')!.message).toContain('the target 0.1 M has 1 significant figure');
    const three = instruction(measure('1.461 g', 'x'), [inputFigures('the target', '0.100 M', measure('0.100 M'))]);
    expect(fewFiguresNote(three, 'the mass to weigh', null)).toBeNull();
  });

  it('chooses a unit that reads well', () => {
    expect(massUnitFor(measure('1.461 g'))).toBe('g');
    expect(massUnitFor(measure('0.3929 g'))).toBe('g');
    expect(massUnitFor(measure('0.04988 g'))).toBe('mg');
    expect(massUnitFor(measure('0.00001578 g'))).toBe('µg');
    expect(volumeUnitFor(measure('0.0500 mL'), unitOf('mL'))).toBe('µL');
    expect(volumeUnitFor(measure('334.4 mL'), unitOf('mL'))).toBe('mL');
    expect(volumeUnitFor(measure('0.3145 L'), unitOf('L'))).toBe('mL');
  });
});

describe('warnings', () => {
  it('a mass below 10 mg (common practice)', () => {
    expect(smallMassWarning(measure('9.99 mg'), '9.99 mg')?.code).toBe('MASS_TOO_SMALL');
    expect(smallMassWarning(measure('10.0 mg'), '10.0 mg')).toBeNull();
  });

  it('a one-step dilution above 1:100 or with a transfer below 100 µL (common practice)', () => {
    expect(dilutionWarning(measure('1.00 mL'), new Decimal(100), '1.000 mL')).toBeNull();
    expect(dilutionWarning(measure('100. µL'), new Decimal(10), '100.0 µL')).toBeNull();
    expect(dilutionWarning(measure('99 µL'), new Decimal(10), '99.00 µL')!.message).toMatch(/larger final volume/);
    expect(dilutionWarning(measure('1.00 mL'), new Decimal(100000), '1.000 mL')!.message).toContain('1:100, then 1:100, then 1:10');
  });

  it('a percentage over 100', () => {
    expect(over100Warning(new Decimal('100.0'), 'x', 'check')).toBeNull();
    expect(over100Warning(new Decimal('100.04'), 'x', 'check')?.code).toBe('RESULT_OVER_100');
  });
});

// Policy (pondus): an amount to act on computed from a target keeps working precision, at
// least 4 significant figures (common practice); a result keeps the textbook figures
// (OpenStax Chemistry 2e §1.5, from memory).
describe('instructions against results, through the calculator', () => {
  it('shows a mass to weigh to 4 figures when the target has fewer', () => {
    // NaCl for 0.1 M in 250 mL: 0.1 × 0.250 × 58.44 = 1.461 g (M(NaCl) = 58.44 g/mol, CIAAW weights)
    const q = measure('0.1 M * 250 mL * M(NaCl)');
    expect(displayQuantity(q, 'g').text).toBe('1 g'); // the textbook figure of a result
    const d = displayInstruction(instruction(q, []), 'g');
    expect(d.text).toBe('1.461 g');
    expect(d.sigFigs).toBe(4);
  });

  it('keeps more figures when the data carry more', () => {
    // 0.100000 M × 250.000 mL × 58.4400 g/mol = 1.46100 g: 6 figures in every factor
    expect(displayInstruction(instruction(measure('0.100000 M * 250.000 mL * 58.4400 g/mol'), []), 'g').text).toBe('1.46100 g');
  });

  it('counts figures on the rounded value (a carry does not add one)', () => {
    expect(displayInstruction(instruction(measure('9.99996 g * 2.0'), []), 'g').text).toBe('20.00 g');
    expect(displayInstruction(instruction(measure('0.99996 g * 1.0'), []), 'g').text).toBe('1.000 g');
  });

  it('rounds half up on request', () => {
    expect(displayInstruction(instruction(measure('1.23450 g * 1.0'), []), 'g').text).toBe('1.234 g');
    expect(displayInstruction(instruction(measure('1.23450 g * 1.0'), []), 'g', 'half-up').text).toBe('1.235 g');
  });

  it('always shows at least the working figures and never fewer than the data', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 999_999 }), fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 8 }), (m, dp, n) => {
        const text = `${(m / 10 ** dp).toFixed(dp)}${dp === 0 ? '.' : ''}`;
        const q = measure(`${text} g * 1.${'0'.repeat(n - 1)}`);
        const d = displayInstruction(instruction(q, []), 'g');
        const data = Math.min(n, displayQuantity(measure(`${text} g`), 'g').sigFigs!);
        expect(d.sigFigs).toBe(Math.max(WORKING_FIGURES, data));
      }),
      { numRuns: 300 },
    );
  });
});
