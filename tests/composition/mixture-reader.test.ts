import { describe, expect, it } from 'vitest';
import { errorCode } from '../support/error-code.js';
import { mixtureComposition, mixtureJson, splitEntries } from '../../src/composition/mixture.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { noteMessages } from '../support/notes.js';
import { displayMeasured } from '../../src/sigfig/round.js';

describe('mixtures through the one KEY=VALUE reader', () => {
  it('reads commas, semicolons and spaces between components', () => {
    expect(splitEntries('NaCl=5.00 g; KCl=3.00 g')).toEqual(['NaCl=5.00 g', 'KCl=3.00 g']);
    // source: OpenStax Chemistry 2e, Example 3.9 (7.34 g C, 1.85 g H, 2.85 g N), from memory
    const r = mixtureComposition('C=7.34 g H=1.85 g N=2.85 g');
    expect(mixtureJson(r).components.map((c) => c.massPercentDisplay)).toEqual(['61.0', '15.4', '23.7']);
  });

  it('points at the value that lacks a unit, and refuses a component given twice', () => {
    try {
      mixtureComposition('NaCl=5.00 g, KCl=3.00');
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(PondusError);
      expect((e as PondusError).first.column).toBe(18);
    }
    expect(errorCode(() => mixtureComposition('NaCl=1.00 g NaCl=2.00 g'))).toBe('BAD_AMOUNT');
  });

  it('rounds reported figures half-even by default, half-up on request', () => {
    // 1.0 g in 8.0 g is exactly 12.5 %, reported to two figures
    const r = mixtureComposition('NaCl=1.0 g, KCl=7.0 g');
    expect(mixtureJson(r).components[0].massPercentDisplay).toBe('12');
    expect(mixtureJson(r, 'half-up').components[0].massPercentDisplay).toBe('13');
  });

  it('carries the notes of the component formulas', () => {
    // promethium has no standard atomic weight (CIAAW): the formula's note must reach the mixture
    const r = mixtureComposition('PmCl3=1.00 g, NaCl=1.00 g');
    expect(r.notes.map((n) => n.code)).toEqual(['NO_STANDARD_WEIGHT']);
    expect(noteMessages(mixtureJson(r))[0]).toMatch(/^PmCl3: promethium/);
    expect(mixtureJson(r).notes[0].code).toBe('NO_STANDARD_WEIGHT');
  });
});

describe('named components, the total and the rest', () => {
  const codes = (r: { notes: { code: string }[] }) => r.notes.map((n) => n.code);

  it('a 320.0 mg tablet of 250.0 mg paracetamol, the rest filler: 78.12 % and 21.9 %', () => {
    // 250.0 ÷ 320.0 = 78.125 % (half-even 78.12); 70.0 mg filler by difference (invented tablet, arithmetic only)
    const r = mixtureComposition('C8H9NO2=250.0 mg, filler=rest, total=320.0 mg');
    expect(r.components.map((c) => displayMeasured(c.massPercent).text)).toEqual(['78.12', '21.9']);
    expect(r.components[1]).toMatchObject({ name: 'filler', formula: null, basis: 'rest' });
    expect(codes(r)).toEqual(expect.arrayContaining(['NAMED_COMPONENT', 'BY_DIFFERENCE', 'ELEMENTS_OF_FORMULAS']));
    // elements only for the paracetamol: C is 63.56 % of C8H9NO2 (from the standard atomic weights), so 49.66 % of the tablet
    const c = r.elements.find((e) => e.name === 'C')!;
    expect(displayMeasured(c.massPercent).text).toBe('49.66');
    expect(r.elements.map((e) => e.name)).toEqual(['C', 'H', 'N', 'O']);
  });

  it('a sample mass without rest: percents of the sample, and the mass not named', () => {
    const r = mixtureComposition('NaCl=2.00 g, lactose=5.00 g, sample=8.00 g');
    expect(displayMeasured(r.components[0].massPercent).text).toBe('25.0');
    expect(r.unaccounted && displayMeasured(r.unaccounted.mass).text).toBe('1.00');
    expect(codes(r)).toContain('UNACCOUNTED');
  });

  it('a known solvent name is a named component with the formula to write offered', () => {
    const r = mixtureComposition('NaCl=1.00 g, benzene=1.00 g');
    expect(r.notes.find((n) => n.code === 'NAMED_COMPONENT')!.message).toContain('write C6H6');
  });

  it('refuses: rest without a total, two rests, components heavier than the total, a mistyped formula', () => {
    expect(() => mixtureComposition('C8H9NO2=250.0 mg, filler=rest')).toThrow(/needs the total/);
    expect(() => mixtureComposition('starch=rest, filler=rest, total=1.00 g')).toThrow(/only one/);
    expect(() => mixtureComposition('NaCl=2.00 g, lactose=5.00 g, total=6.00 g')).toThrow(/weigh more/);
    expect(errorCode(() => mixtureComposition('NaCL=5.00 g, KCl=3.00 g'))).toBe('UNKNOWN_ELEMENT');
    expect(() => mixtureComposition('lactose=2 mmol, NaCl=1 g')).toThrow(/needs a formula/);
  });
});
