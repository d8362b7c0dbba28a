import { describe, expect, it } from 'vitest';
import { saltFactor } from '../../src/preparation/salt-factor.js';
import { displayInstruction } from '../../src/sigfig/instruction.js';
import { formulaMassDetail, formulaMassDetail as formulaMass } from '../../src/mass/formula-mass.js';

describe('salt forms of acidic drugs: parent less H plus the metal', () => {
  it('naproxen sodium: 220 mg carries about 200 mg of naproxen', () => {
    // source: OTC label "naproxen sodium 220 mg (naproxen 200 mg)" (from memory); M 252.24 and 230.26 g/mol
    const r = saltFactor('C14H13NaO3', 'C14H14O3', { parentMass: '200. mg' });
    expect(r.form).toBe('metal');
    expect(r.metalSalt).toMatchObject({ metal: 'Na', metalCount: 1, hydrogensReplaced: 1, water: '0' });
    expect(r.factor.toNumber()).toBeCloseTo(252.22 / 230.26, 3);
    expect(displayInstruction(r.saltMass!, 'mg').text).toBe('219.1 mg');
    expect(r.notes.map((n) => n.code)).toContain('METAL_SALT');
  });

  it('losartan potassium and diclofenac sodium: M(salt)/M(parent)', () => {
    // source: molar masses 461.01 / 422.92 (losartan potassium / losartan) and 318.13 / 296.15 (diclofenac sodium / diclofenac), from memory
    expect(saltFactor('C22H22ClKN6O', 'C22H23ClN6O').factor.toNumber()).toBeCloseTo(461.0 / 422.91, 3);
    expect(saltFactor('C14H10Cl2NNaO2', 'C14H11Cl2NO2').factor.toNumber()).toBeCloseTo(318.13 / 296.15, 3);
  });

  it('a calcium salt takes two parents; its hydrate water is set aside (atorvastatin calcium trihydrate)', () => {
    // source: atorvastatin calcium trihydrate (C33H34FN2O5)2Ca·3H2O, M 1209.4; atorvastatin C33H35FN2O5, M 558.6 (from memory)
    const r = saltFactor('(C33H34FN2O5)2Ca·3H2O', 'C33H35FN2O5', { parentMass: '10.0 mg' });
    expect(r.perSalt.toNumber()).toBe(2);
    expect(r.metalSalt).toMatchObject({ metal: 'Ca', charge: 2, metalCount: 1, water: '3' });
    const expected = formulaMassDetail('(C33H34FN2O5)2Ca·3H2O').molarMass.div(formulaMassDetail('C33H35FN2O5').molarMass.times(2));
    expect(r.factor.eq(expected)).toBe(true);
    expect(displayInstruction(r.saltMass!, 'mg').text).toBe('10.82 mg');
  });

  it('a disodium salt of a diprotic acid: two H replaced on one parent', () => {
    // disodium hydrogen phosphate from phosphoric acid: Na2HPO4 / H3PO4 = 141.96 / 97.99 (molar masses from the standard atomic weights)
    const r = saltFactor('Na2HPO4', 'H3PO4');
    expect(r.metalSalt).toMatchObject({ metal: 'Na', metalCount: 2, hydrogensReplaced: 2 });
    expect(r.perSalt.toNumber()).toBe(1);
  });

  it('the parent·acid form still works, and a formula that is neither is refused', () => {
    expect(saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3').form).toBe('addition');
    expect(() => saltFactor('C14H13NaO3', 'C14H12O3')).toThrow(/neither/);
    expect(() => saltFactor('C14H13NaO3·C2H6O', 'C14H14O3')).toThrow(/neither/); // an ethanol solvate is not water
  });
});
