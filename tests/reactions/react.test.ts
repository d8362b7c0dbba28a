import { describe, expect, it } from 'vitest';
import { react } from '../../src/reactions/react.js';

describe('limiting reagent, yields and excess', () => {
  it('silicon nitride from 2.00 g Si and 1.50 g N2: silicon limits', () => {
    // source: OpenStax Chemistry 2e §4.4, identifying the limiting reactant (3 Si + 2 N2 → Si3N4), from memory
    const r = react('Si + N2 -> Si3N4', { amounts: ['Si=2.00 g', 'N2=1.50 g'] });
    expect(r.balanced).toBe('3 Si + 2 N2 → Si3N4');
    expect(r.limiting).toBe('Si');
    // by the rules: 2.00 g / 28.085 g/mol / 3 × 140.283 g/mol = 3.33 g
    expect(r.products[0].mass!.display).toBe('3.33 g');
  });

  it('hydrogen and oxygen: excess left and percent yield', () => {
    const r = react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'], actual: 'H2O=15.0 g' });
    expect(r.limiting).toBe('O2');
    expect(r.products[0].moles!.display).toBe('1.00 mol');
    expect(r.products[0].mass!.display).toBe('18.0 g');
    expect(r.excess[0].moles.display).toBe('0.98 mol');
    // the mass left of a reactant weighed is the mass given less the mass used, to the masses' decimals: 4.00 g − 2.02 g (worked by hand)
    expect(r.excess[0].mass!.display).toBe('1.98 g');
    expect(r.percentYield!.percent.figure).toBe('83.3');
  });

  it('takes amounts as volume × concentration and as moles', () => {
    const r = react('NaOH + HCl -> NaCl + H2O', { amounts: ['HCl=25.0 mL of 0.100 M', 'NaOH=0.00300 mol'] });
    expect(r.limiting).toBe('HCl');
    expect(r.excess[0].moles.display).toBe('0.00050 mol');
  });

  it('notes reactants taken to be in excess and yields over 100 %', () => {
    const r = react('C3H8 + O2 -> CO2 + H2O', { amounts: ['C3H8=44.1 g'], actual: 'CO2=140. g' });
    expect(r.notes.map((n) => n.code)).toEqual(['ASSUMED_EXCESS', 'YIELD_OVER_100']);
  });

  it('refuses amounts of products, unknown species and non-amounts', () => {
    expect(() => react('H2 + O2 -> H2O', { amounts: ['H2O=1.0 g'] })).toThrow(/is a product/);
    expect(() => react('H2 + O2 -> H2O', { amounts: ['N2=1.0 g'] })).toThrow(/not a species/);
    expect(() => react('H2 + O2 -> H2O', { amounts: ['H2=1.0 mL'] })).toThrow(/needs a density/);
    expect(() => react('H2 + O2 -> H2O', { amounts: ['H2=1.0 M'] })).toThrow(/must be a mass or an amount of substance or a volume/);
    expect(() => react('H2 + O2 -> H2O', { amounts: [] })).toThrow(/at least one reactant/);
  });
});

describe('react on the reagent-table engine', () => {
  it('is plain data: JSON, spread and structuredClone keep everything', () => {
    const r = react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'], actual: 'H2O=15.0 g' });
    expect(JSON.parse(JSON.stringify(r))).toEqual(r);
    expect(structuredClone(r)).toEqual(r);
    expect(typeof r.balance.coefficients[0]).toBe('number');
  });

  it('the teaching-lab aspirin synthesis, written 1:1:1:1, with acetic anhydride by volume and density', () => {
    // the salicylic acid + acetic anhydride synthesis of aspirin (a common teaching-lab experiment), from memory;
    // density of acetic anhydride 1.08 g/mL (CRC Handbook of Chemistry and Physics, from memory)
    const r = react('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', { amounts: ['C7H6O3=2.00 g', 'C4H6O3=5.00 mL, density=1.08 g/mL'] });
    expect(r.balance.balancedAsWritten).toBe(true);
    expect(r.balance.unique).toBe(false);
    expect(r.limiting).toBe('C7H6O3');
    // 2.00 g / 138.12 g/mol × 180.16 g/mol = 2.61 g
    expect(r.products[0].mass!.display).toBe('2.61 g');
  });

  it('reads equivalents of the first reactant given by its own amount', () => {
    const r = react('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', { amounts: ['C7H6O3=2.00 g', 'C4H6O3=0.50 equiv'] });
    expect(r.limiting).toBe('C4H6O3');
    expect(r.notes.map((n) => n.code)).toContain('EQUIV_OF');
    expect(() => react('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', { amounts: ['C4H6O3=1.5 equiv'] })).toThrow(/no reactant is given by its own amount/);
  });

  it('a reactant in equiv or mol as a solution, a liquid or at a purity: what to take of it, at working precision', () => {
    // solution=, density= and purity= on an amount in equiv or mol were dropped: only the neat mass was shown
    const lithiation = 'C6H5Br + C4H9Li -> C6H5Li + C4H9Br';
    const r = react(lithiation, { amounts: ['C6H5Br=5.00 mmol', 'C4H9Li=1.1 equiv, solution=2.5 M in hexanes'] });
    const buli = r.reactants[1];
    // worked by hand: 5.00 mmol × 1.1 = 5.50 mmol; 5.50 mmol / 2.5 mol/L = 2.200 mL
    expect(buli.take).toMatchObject({ volume: { kind: 'instruction', display: '2.200 mL' }, of: 'the solution (2.5 M in hexanes)' });
    // a neat reactant planned in mmol: its mass to weigh, at working precision (5.00 mmol × 157.010 g/mol, rounded half to even)
    expect(r.reactants[0].take?.mass?.display).toBe('0.7850 g');
    // worked by hand: 3.0 × 2.00 g / 138.121 g/mol × 102.089 g/mol = 4.435 g; / 1.08 g/mL = 4.106 mL
    const aspirin = react('C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', { amounts: ['C7H6O3=2.00 g', 'C4H6O3=3.0 equiv, density=1.08 g/mL'] });
    expect(aspirin.reactants[1].take?.volume?.display).toBe('4.106 mL');
    expect(aspirin.reactants[1].take?.mass?.display).toBe('4.435 g');
    // a reactant given by mass is what was weighed: nothing to take
    expect(aspirin.reactants[0].take).toBeNull();
    // a bad solution on an amount in equiv is refused, not dropped
    expect(() => react(lithiation, { amounts: ['C6H5Br=5.00 mmol', 'C4H9Li=1.1 equiv, solution=fast'] })).toThrow();
  });

  it('amounts in the ratio of the equation: a note that all are used up; an equilibrium arrow is named', () => {
    const r = react('N2 + H2 -> NH3', { amounts: ['N2=1.000 mol', 'H2=3.000 mol'] });
    expect(r.notes.map((n) => n.code)).toContain('STOICHIOMETRIC_AMOUNTS');
    expect(react('N2 + 3H2 ⇌ 2NH3', { amounts: ['N2=1.000 mol'] }).notes.map((n) => n.code)).toContain('EQUILIBRIUM_ARROW');
  });

  it('a mass of a solution given by its molarity: its volume from the density, then n = c·V', () => {
    // 30.00 g of 1.000 M HCl at 1.016 g/mL is 29.53 mL, 0.02953 mol (worked by hand); it was read as 30.00 g of HCl, 0.8229 mol
    const r = react('NaOH + HCl -> NaCl + H2O', { amounts: ['NaOH=1.000 g', 'HCl=30.00 g, solution=1.000 M, density=1.016 g/mL'] });
    expect(r.reactants[1].moles!.value).toBeCloseTo(0.02953, 5);
    expect(() => react('NaOH + HCl -> NaCl + H2O', { amounts: ['NaOH=1.000 g', 'HCl=30.00 g, solution=1.000 M'] })).toThrow("needs the solution's density");
  });

  it('percent yield of copper from copper(II) sulfate and excess zinc', () => {
    // source: OpenStax Chemistry 2e §4.4 (Reaction Yields), worked example on percent yield (1.274 g CuSO4, 0.392 g Cu obtained, 77.3 %), from memory
    const r = react('CuSO4 + Zn -> Cu + ZnSO4', { amounts: ['CuSO4=1.274 g'], actual: 'Cu=0.392 g' });
    expect(r.products[0].mass!.display).toBe('0.5072 g');
    expect(r.percentYield!.percent.figure).toBe('77.3');
  });

  it('percent yield of Freon-12 from carbon tetrachloride', () => {
    // source: OpenStax Chemistry 2e §4.4 (Reaction Yields), percent-yield example (32.9 g CCl4, 12.5 g CF2Cl2, 48.3 %), from memory
    const r = react('CCl4 + HF -> CF2Cl2 + HCl', { amounts: ['CCl4=32.9 g'], actual: 'CF2Cl2=12.5 g' });
    expect(r.balanced).toBe('CCl4 + 2 HF → CF2Cl2 + 2 HCl');
    expect(r.percentYield!.percent.figure).toBe('48.3');
  });

  it('fixes the coefficients of chosen species when atoms alone do not', () => {
    expect(() => react('C + O2 -> CO + CO2', { amounts: ['C=12.0 g'] })).toThrow(/more than one independent balance/);
    const r = react('C + O2 -> CO + CO2', { amounts: ['C=12.0 g'], fix: { CO: '2', CO2: '1' } });
    expect(r.balanced).toBe('3 C + 2 O2 → 2 CO + CO2');
  });
});

describe('react with a catalyst', () => {
  it('gives the catalyst its amount from mol % and leaves it out of the stoichiometry', () => {
    const r = react('C7H6O3 + C4H6O3 + H2SO4 -> C9H8O4 + C2H4O2 + H2SO4', { amounts: ['C7H6O3=2.00 g', 'C4H6O3=3.0 equiv', 'H2SO4=5 mol %'] });
    expect(r.catalysts).toHaveLength(1);
    expect(r.catalysts[0].equiv).toBe(0.05);
    // 0.05 × 2.00 g / 138.12 g/mol = 0.724 mmol
    expect(r.catalysts[0].moles!.display).toBe('0.000724 mol');
    expect(r.products[0].mass!.display).toBe('2.61 g');
  });
});
