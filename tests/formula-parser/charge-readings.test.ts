// A bare sign after digits (SO42-, Fe3+, NH4+) is refused, and the hint offers every split of the
// digits into a count and a charge, the likeliest first, each a reading of the same text.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { chargeReadingsHint } from '../../src/errors/message.js';
import { chargeReadings } from '../../src/formula-parser/hints.js';
import { parseFormula, safeParseFormula } from '../../src/formula-parser/parse.js';

function refusal(input: string) {
  try {
    parseFormula(input);
  } catch (e) {
    if (e instanceof PondusError) return e.first;
    throw e;
  }
  throw new Error(`expected ${input} to be refused`);
}

/** The formulas a hint offers, in its order. */
const offered = (hint: string) => [...hint.matchAll(/(\S+) \((?:count [0-9.]+, )?charge [0-9]+[+-]\)/g)].map((m) => m[1]);

describe('the readings of a bare sign after digits', () => {
  it.each([
    // source: the common ions as chemists write them (IUPAC Red Book ion notation, from memory)
    ['SO42-', ['SO4^2-', 'SO42^-', 'SO^42-']], // sulfate
    ['NH4+', ['NH4^+', 'NH^4+']], // ammonium
    ['Fe3+', ['Fe^3+', 'Fe3^+']], // iron(III)
    ['Cu2+', ['Cu^2+', 'Cu2^+']], // copper(II)
    ['N3-', ['N^3-', 'N3^-']], // nitride first, azide second: both are real ions, so the text is refused
    ['NO3-', ['NO3^-', 'NO^3-']], // nitrate
    ['Hg22+', ['Hg2^2+', 'Hg22^+', 'Hg^22+']], // mercury(I)
    ['PO43-', ['PO4^3-', 'PO43^-', 'PO^43-']], // phosphate
    ['Fe(CN)64-', ['Fe(CN)6^4-', 'Fe(CN)64^-', 'Fe(CN)^64-']], // hexacyanoferrate(II)
  ])('%s: %j, the likeliest first', (input, readings) => {
    const i = refusal(input);
    expect(i.code).toBe('AMBIGUOUS_CHARGE');
    expect(offered(i.hint!)).toEqual(readings);
  });

  it('never offers a count of 1 first: nobody writes that count (common practice)', () => {
    expect(chargeReadings('12', true, false, 99)[0]).toEqual({ count: '12', charge: '' });
    expect(chargeReadings('12', false, false, 99)[0]).toEqual({ count: '12', charge: '' });
    expect(chargeReadings('22', false, false, 99)[0]).toEqual({ count: '2', charge: '2' }); // Hg2^2+
  });

  it('says what each reading means', () => {
    expect(refusal('SO42-').hint).toBe('write SO4^2- (count 4, charge 2-), SO42^- (count 42, charge 1-) or SO^42- (charge 42-)');
    expect(refusal('Fe3+').hint).toBe('write Fe^3+ (charge 3+) or Fe3^+ (count 3, charge 1+)');
  });

  it('keeps a decimal count whole, and offers no split that the formula language refuses', () => {
    // common practice: a count has no leading zero, and a charge of 0 or of more than 99 is not read
    expect(offered(refusal('C2.53+').hint!)).toEqual(['C2.5^3+', 'C2.53^+']);
    expect(offered(refusal('C60-').hint!)).toEqual(['C60^-', 'C^60-']);
    expect(chargeReadings('102', false, false, 99)).toEqual([
      { count: '10', charge: '2' },
      { count: '102', charge: '' },
    ]);
  });

  it('never proposes another substance: every reading is the same text with a caret added, and reads', () => {
    // common practice: a hint offers readings of what was written, never a different formula
    const head = fc.constantFrom('SO', 'NH', 'Fe', 'Hg', 'C6H5O', 'Fe(CN)', 'Cr2O', 'H2O.Fe', 'C2.');
    fc.assert(
      fc.property(head, fc.stringMatching(/^[1-9][0-9]{0,2}$/), fc.constantFrom('+', '-'), (h, digits, sign) => {
        const input = `${h}${digits}${sign}`;
        const r = safeParseFormula(input);
        if (r.success) return;
        const i = r.error.issues.find((x) => x.code === 'AMBIGUOUS_CHARGE');
        if (!i) return;
        const readings = offered(i.hint!);
        expect(readings.length).toBeGreaterThan(0);
        for (const reading of readings) {
          expect(reading.replace('^', '')).toBe(input);
          expect(safeParseFormula(reading).success, reading).toBe(true);
        }
        expect(new Set(readings).size).toBe(readings.length);
      }),
      { numRuns: 300 },
    );
  });

  it('renders the readings it is given, in their order', () => {
    expect(chargeReadingsHint('Fe', '+', [{ count: '', charge: '3' }])).toBe('write Fe^3+ (charge 3+)');
  });
});
