// A concentration in ppm or mg/L of a metal salt is often meant of the metal (an element
// standard for AAS or ICP): the reading taken is named, with the mass each other reading needs.
import { describe, expect, it } from 'vitest';
import { prepareSolution } from '../../src/preparation/solution.js';
import { displayInstruction } from '../../src/sigfig/instruction.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { dilute } from '../../src/preparation/dilution.js';

const g = (i: Parameters<typeof displayInstruction>[0] | null) => displayInstruction(i!, 'g').text;

describe('a trace concentration of a metal salt names the reading it took', () => {
  it('1000 ppm Pb(NO3)2 in 1 L: weigh 1.000 g of the salt, and the note gives 1.598 g for 1000 ppm of Pb', () => {
    // source: CIAAW 2021 standard atomic weights, Pb 207.2, N 14.007, O 15.999 → Pb(NO3)2 331.2 g/mol;
    // 1.000 g × 331.2 / 207.2 = 1.598 g (the usual lead nitrate weighing for a 1000 mg/L Pb standard, from memory)
    const r = prepareSolution('Pb(NO3)2', { concentration: '1000. ppm', volume: '1.000 L' });
    expect(g(r.mass)).toBe('1.000 g');
    const note = r.notes.find((n) => n.code === 'CONCENTRATION_OF_REAGENT')!;
    expect(note.message).toContain('read as the concentration of Pb(NO3)2 itself');
    expect(note.message).toContain('`as: Pb` (weigh 1.598 g)');
    expect(note.options).toEqual(['as']);
  });

  it('the metal reading, when asked for with as, matches the figure the note offered', () => {
    const r = prepareSolution('Pb(NO3)2', { concentration: '1000. ppm', volume: '1.000 L', as: 'Pb' });
    expect(g(r.mass)).toBe('1.598 g');
    expect(r.notes.some((n) => n.code === 'CONCENTRATION_OF_REAGENT')).toBe(false);
  });

  it('K2Cr2O7 at 1000 mg/L in 100 mL names both metals: Cr 0.2829 g, K 0.3762 g', () => {
    // source: CIAAW 2021, K 39.098, Cr 51.996, O 15.999 → K2Cr2O7 294.18 g/mol;
    // Cr: 0.1000 g × 294.18 / (2 × 51.996) = 0.2829 g; K: 0.1000 g × 294.18 / (2 × 39.098) = 0.3762 g
    const r = prepareSolution('K2Cr2O7', { concentration: '1000. mg/L', volume: '100.0 mL' });
    const note = r.notes.find((n) => n.code === 'CONCENTRATION_OF_REAGENT')!;
    expect(note.message).toContain('`as: Cr` (weigh 0.2829 g)');
    expect(note.message).toContain('`as: K` (weigh 0.3762 g)');
  });

  it('a hydrate: NiCl2·6H2O for 1000 ppm of Ni in 100 mL is 0.4050 g', () => {
    // source: CIAAW 2021, Ni 58.693, Cl 35.45, H 1.008, O 15.999 → NiCl2·6H2O 237.69 g/mol;
    // 0.1000 g × 237.69 / 58.693 = 0.4050 g
    const r = prepareSolution('NiCl2·6H2O', { concentration: '1000. ppm', volume: '100.0 mL' });
    expect(r.notes.find((n) => n.code === 'CONCENTRATION_OF_REAGENT')!.message).toContain('`as: Ni` (weigh 0.4050 g)');
  });

  it('a word after the concentration that the reagent does not hold gets the general hint, naming no species', () => {
    try {
      prepareSolution('NiCl2·6H2O', { concentration: '1000 ppm solution', volume: '100.0 mL' });
      expect.unreachable('a word after the concentration must be refused');
    } catch (e) {
      const issue = (e as PondusError).issues.find((i) => i.code === 'UNKNOWN_UNIT')!;
      expect(issue.hint).toContain('for a concentration of an element or ion the reagent holds, name it with `as`');
      expect(issue.hint).not.toContain('as: ');
    }
  });

  it('every mass in the note is in the unit of the mass to weigh', () => {
    const r = prepareSolution('Pb(NO3)2', { concentration: '1000. ppm', volume: '100.0 mL' });
    expect(r.notes.find((n) => n.code === 'CONCENTRATION_OF_REAGENT')!.message).toMatch(/weigh 100\.0 mg\).*`as: Pb` \(weigh 159\.8 mg\)/);
  });

  it('no such note for a molar target, for a salt with no metal, or for a single element', () => {
    const has = (formula: string, concentration: string) =>
      prepareSolution(formula, { concentration, volume: '100.0 mL' }).notes.some((n) => n.code === 'CONCENTRATION_OF_REAGENT');
    expect(has('Pb(NO3)2', '0.100 M')).toBe(false);
    expect(has('Pb(NO3)2', '10.0 g/L')).toBe(false);
    expect(has('NH4NO3', '1000. ppm')).toBe(false);
    expect(has('C6H12O6', '1000. mg/L')).toBe(false);
  });

  it('a name written after the concentration is refused, with the hint to use as', () => {
    try {
      prepareSolution('NiCl2·6H2O', { concentration: '1000 ppm Ni', volume: '100.0 mL' });
      expect.unreachable('a name after the concentration must be refused');
    } catch (e) {
      expect(e).toBeInstanceOf(PondusError);
      const issue = (e as PondusError).issues.find((i) => i.code === 'UNKNOWN_UNIT')!;
      expect(issue.hint).toContain('for a concentration of Ni itself, which the reagent holds, give `as: Ni`');
      expect(issue.options).toContain('as');
    }
  });
});

describe('ppb targets', () => {
  it('10.0 ppb is read as 10.0 µg/L, with a note, and weighs as the same target in µg/L does', () => {
    const ppb = prepareSolution('Pb(NO3)2', { concentration: '10.0 ppb', volume: '1.000 L' });
    const ugL = prepareSolution('Pb(NO3)2', { concentration: '10.0 µg/L', volume: '1.000 L' });
    expect(displayInstruction(ppb.mass!, 'µg').text).toBe('10.00 µg');
    expect(ppb.mass!.quantity.value.toString()).toBe(ugL.mass!.quantity.value.toString());
    expect(ppb.notes.find((n) => n.code === 'PPB_AS_UG_PER_L')!.message).toContain('ppb is read as µg/L');
  });
});

describe('dilution between ppm or ppb and mass per volume', () => {
  it('1000. ppm to 10.0 µg/L in 100.0 mL: take 1.000 µL (factor 10⁵), the ppm read as mg/L with its note', () => {
    // 1000 mg/L × V1 = 0.0100 mg/L × 100.0 mL → V1 = 1.000 µL (C1·V1 = C2·V2)
    const r = dilute('1000. ppm', '10.0 µg/L', '100.0 mL');
    expect(displayInstruction(r.stockVolume!, 'µL').text).toBe('1.000 µL');
    expect(r.notes.map((n) => n.code)).toContain('PPM_AS_MG_PER_L');
    const b = dilute('1000. mg/L', '50.0 ppb', '100.0 mL');
    expect(displayInstruction(b.stockVolume!, 'µL').text).toBe('5.000 µL');
    expect(b.notes.map((n) => n.code)).toContain('PPB_AS_UG_PER_L');
  });

  it('ppm against a molar concentration stays refused: it needs the molar mass', () => {
    expect(() => dilute('1.00 M', '5 ppm', '100.0 mL')).toThrow(/same kind/);
  });
});

describe('dilution in a unit pondus does not read', () => {
  it('5000 IU/mL to 100 IU/mL in 10.0 mL: take 200.0 µL (C1·V1 = C2·V2 in any one unit), with a note that nothing is converted', () => {
    // 100/5000 × 10.0 mL = 0.200 mL
    const r = dilute('5000 IU/mL', '100 IU/mL', '10.0 mL');
    expect(displayInstruction(r.stockVolume!, 'µL').text).toBe('200.0 µL');
    expect(r.notes.find((n) => n.code === 'UNIT_NOT_CONVERTED')!.message).toContain('IU/mL is not a unit pondus reads');
    expect(displayInstruction(dilute('2.00 mEq/mL', '0.200 mEq/mL', '100.0 mL').stockVolume!, 'mL').text).toBe('10.00 mL');
  });

  it('two different such units, a molality, or a word that is no unit are still refused', () => {
    expect(() => dilute('5000 IU/mL', '100 units/mL', '10.0 mL')).toThrow(/unknown unit or word 'IU\/mL'/);
    expect(() => dilute('2.0 mol/kg', '1.0 mol/kg', '10.0 mL')).toThrow(/unknown unit or word 'mol\/kg'/);
    expect(() => dilute('1.00 Mx', '0.100 Mx', '100.0 mL')).toThrow(/unknown unit/);
  });
});

describe('toxic metal standards get a handling note', () => {
  it('lead nitrate and cadmium nitrate name their hazard; sodium chloride gets none', () => {
    // lead compounds are cumulative poisons; cadmium compounds are IARC Group 1 carcinogens (from memory)
    const note = (f: string) => prepareSolution(f, { concentration: '1000. ppm', volume: '100.0 mL' }).notes.find((n) => n.code === 'REAGENT_HANDLING');
    expect(note('Pb(NO3)2')!.message).toMatch(/^a lead compound: toxic/);
    expect(note('Cd(NO3)2·4H2O')!.message).toMatch(/^a cadmium compound: toxic \(a carcinogen, IARC Group 1/);
    expect(note('NaCl')).toBeUndefined();
    expect(note('CsCl')).toBeUndefined();
  });
});
