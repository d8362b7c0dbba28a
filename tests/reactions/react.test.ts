import { describe, expect, it } from 'vitest';
import { react } from '../../src/reactions/react.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

describe('limiting reagent, yields and excess', () => {
  it('silicon nitride from 2.00 g Si and 1.50 g N2: silicon limits', () => {
    // source: OpenStax Chemistry 2e §4.4, identifying the limiting reactant (3 Si + 2 N2 → Si3N4), from memory
    const r = react('Si + N2 -> Si3N4', { amounts: ['Si=2.00 g', 'N2=1.50 g'] });
    expect(r.balanced).toBe('3 Si + 2 N2 → Si3N4');
    expect(r.limiting).toBe('Si');
    // by the rules: 2.00 g / 28.085 g/mol / 3 × 140.283 g/mol = 3.33 g
    expect(displayQuantity(r.products[0].mass!, 'g').text).toBe('3.33 g');
  });

  it('hydrogen and oxygen: excess left and percent yield', () => {
    const r = react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'], actual: 'H2O=15.0 g' });
    expect(r.limiting).toBe('O2');
    expect(displayQuantity(r.products[0].moles!, 'mol').text).toBe('1.00 mol');
    expect(displayQuantity(r.products[0].mass!, 'g').text).toBe('18.0 g');
    expect(displayQuantity(r.excess[0].moles, 'mol').text).toBe('0.98 mol');
    expect(displayQuantity(r.percentYield!.percent).figure).toBe('83.3');
  });

  it('takes amounts as volume × concentration and as moles', () => {
    const r = react('NaOH + HCl -> NaCl + H2O', { amounts: ['HCl=25.0 mL of 0.100 M', 'NaOH=0.00300 mol'] });
    expect(r.limiting).toBe('HCl');
    expect(displayQuantity(r.excess[0].moles, 'mol').text).toBe('0.00050 mol');
  });

  it('notes reactants taken to be in excess and yields over 100 %', () => {
    const r = react('C3H8 + O2 -> CO2 + H2O', { amounts: ['C3H8=44.1 g'], actual: 'CO2=140. g' });
    expect(r.notes.map((n) => n.code)).toEqual(['ASSUMED_EXCESS', 'YIELD_OVER_100']);
  });

  it('refuses amounts of products, unknown species and non-amounts', () => {
    expect(() => react('H2 + O2 -> H2O', { amounts: ['H2O=1.0 g'] })).toThrow(/is a product/);
    expect(() => react('H2 + O2 -> H2O', { amounts: ['N2=1.0 g'] })).toThrow(/not a species/);
    expect(() => react('H2 + O2 -> H2O', { amounts: ['H2=1.0 mL'] })).toThrow(/must be a mass or an amount of substance/);
    expect(() => react('H2 + O2 -> H2O', { amounts: [] })).toThrow(/at least one reactant/);
  });
});
