import { describe, expect, it } from 'vitest';
import { errorCode } from '../support/error-code.js';
import { mixtureComposition, mixtureJson, splitEntries } from '../../src/composition/mixture.js';
import { PondusError } from '../../src/errors/pondus-error.js';

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
    expect(mixtureJson(r).notes[0]).toMatch(/^PmCl3: promethium/);
  });
});
