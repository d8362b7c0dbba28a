import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { reagentTable, type ReagentSpec } from '../../src/reagent-table/table.js';
import { readProcedure, writeProcedure } from '../../src/reagent-table/procedure.js';
import { readRowText } from '../../src/reagent-table/row-text.js';
import { hazardOf, lookUpName } from '../../src/reagent-table/names.js';
import { react } from '../../src/reactions/react.js';
import { errorCode } from '../support/error-code.js';

const aspirin: ReagentSpec[] = [
  { role: 'reference', reagent: 'salicylic acid', amount: '2.00 g' },
  { role: 'reagent', reagent: 'Ac2O', amount: '3.0 equiv', density: '1.08 g/mL' },
  { role: 'catalyst', reagent: 'H2SO4', amount: '5 mol %', solution: '98 % w/w', density: '1.84 g/mL' },
  { role: 'product', reagent: 'aspirin' },
];

describe('the reagent table', () => {
  it('a reagent given in moles is a plan: its mass to weigh and volume to take are instructions', () => {
    // molar mass of bromobenzene C6H5Br 157.010 g/mol (CIAAW standard weights); 5.00 mmol × 157.010 g/mol = 785.05 mg,
    // 0.7850 g at four figures (half to even); 7.50 mmol × 101.193 g/mol = 758.9 mg (arithmetic by hand)
    const t = reagentTable([
      { role: 'reference', reagent: 'PhBr', amount: '5.00 mmol' },
      { role: 'reagent', reagent: 'Et3N', amount: '7.50 mmol', density: '0.726 g/mL' },
    ]);
    const [ref, base] = t.rows;
    expect(ref.mass).toMatchObject({ kind: 'instruction', display: '0.7850 g' });
    expect(ref.amount!.kind).toBe('result');
    expect(base.mass).toMatchObject({ kind: 'instruction', display: '0.7589 g' });
    expect(base.volume!.kind).toBe('instruction');
    // a mass given was weighed: what follows from it is a result
    const weighed = reagentTable([{ role: 'reference', reagent: 'PhBr', amount: '0.785 g' }]);
    expect(weighed.rows[0].mass).toMatchObject({ kind: 'result', display: '0.785 g' });
  });

  it('the aspirin synthesis: equivalents, volume from density, a catalyst left out, the theoretical and percent yield', () => {
    // a common teaching-lab experiment (2.00 g salicylic acid, excess acetic anhydride, a drop of sulfuric acid), from memory;
    // density of acetic anhydride 1.08 g/mL, of 98 % sulfuric acid 1.84 g/mL (CRC Handbook of Chemistry and Physics, from memory)
    const t = reagentTable(aspirin, { actual: '2.10 g', concentration: '0.50 M', solvent: 'toluene' });
    const [ref, ac2o, cat, solvent, product] = t.rows;
    expect(ref.formula).toBe('C7H6O3');
    expect(ref.amount!.display).toBe('14.5 mmol'); // a result: 2.00 g / 138.12 g/mol
    expect(ref.amount!.kind).toBe('result');
    expect(ac2o.amount!.display).toBe('43.44 mmol'); // an instruction: working precision
    expect(ac2o.mass!.display).toBe('4.435 g');
    expect(ac2o.volume!.display).toBe('4.106 mL');
    expect(ac2o.volume!.kind).toBe('instruction');
    expect(cat.equiv).toBe(0.05);
    expect(cat.notes.map((n) => n.code)).toContain('NOT_IN_STOICHIOMETRY');
    expect(cat.notes.map((n) => n.code)).toContain('CAUTION');
    // 0.724 mmol × 98.07 g/mol ÷ 0.98 = 72.45 mg; ÷ 1.84 g/mL = 39.38 µL
    expect(cat.mass!.display).toBe('72.45 mg');
    expect(cat.volume!.display).toBe('39.38 µL');
    expect(solvent.role).toBe('solvent');
    expect(solvent.volume!.display).toBe('28.96 mL'); // 14.48 mmol ÷ 0.50 M
    expect(product.mass!.display).toBe('2.61 g');
    expect(product.mass!.kind).toBe('result');
    expect(product.percentYield!.figure).toBe('80.5');
    expect(t.cautions.at(-1)).toMatch(/risk assessment/);
    expect(t.cautions.some((c) => /concentrated acid/.test(c))).toBe(true);
  });

  it('an organolithium by molarity: the volume to syringe, and a caution to titrate', () => {
    const t = reagentTable([
      { role: 'reference', reagent: 'C6H5Br', amount: '10.0 mmol' },
      { role: 'reagent', reagent: 'n-BuLi', amount: '1.10 equiv', solution: '1.6 M in hexanes' },
    ]);
    const buli = t.rows[1];
    expect(buli.formula).toBe('C4H9Li');
    expect(buli.volume!.display).toBe('6.875 mL'); // 11.0 mmol ÷ 1.6 M
    expect(buli.mass).toBeNull();
    expect(buli.hazard).toBe('pyrophoric');
    expect(t.cautions[0]).toMatch(/titrate the solution before use/);
  });

  it('concentrated hydrochloric acid by mass fraction and density', () => {
    // concentrated HCl: 37 % w/w, d 1.19 g/mL, about 12.1 M (CRC Handbook of Chemistry and Physics, concentrated
    // reagents table, from memory)
    const t = reagentTable([
      { role: 'reference', reagent: 'C6H5NH2', amount: '10.0 mmol' },
      { role: 'reagent', reagent: 'HCl', amount: '1.00 equiv', solution: '37 % w/w', density: '1.19 g/mL' },
    ]);
    const hcl = t.rows[1];
    const molarity = hcl.amount!.value / hcl.volume!.value;
    expect(molarity).toBeCloseTo(12.07, 1);
    expect(hcl.hazard).toBe('concentrated-acid');
  });

  it('a reagent given by its own amount gets its equivalents computed, and one below 1 equiv is flagged', () => {
    const t = reagentTable([
      { role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' },
      { role: 'reagent', reagent: 'Ac2O', amount: '1.00 mL', density: '1.08 g/mL' },
    ]);
    // 1.00 mL × 1.08 g/mL ÷ 102.09 g/mol = 10.6 mmol; ÷ 14.48 mmol = 0.731 equiv
    expect(t.rows[1].equivDisplay).toBe('0.731');
    expect(t.rows[1].notes.map((n) => n.code)).toEqual(['NAME_READ', 'EQUIV_COMPUTED', 'BELOW_ONE_EQUIV']);
  });

  it('purity divides what is weighed, a hydrate form sets the molar mass', () => {
    const t = reagentTable([
      { role: 'reference', reagent: 'C7H6O3', amount: '10.0 mmol' },
      { role: 'reagent', reagent: 'CuSO4', amount: '1.00 equiv', form: 'CuSO4·5H2O', purity: '98.0 %' },
    ]);
    // 10.0 mmol × 249.68 g/mol ÷ 0.980 = 2.548 g
    expect(t.rows[1].mass!.display).toBe('2.548 g');
    expect(t.rows[1].notes.map((n) => n.code)).toContain('WEIGHED_FORM');
  });

  it('takes the product coefficient from the equation', () => {
    const t = reagentTable([{ role: 'reference', reagent: 'Al', amount: '2.70 g' }, { role: 'product', reagent: 'Al2O3' }], { equation: 'Al + O2 -> Al2O3' });
    expect(t.rows[1].equiv).toBe(0.5);
    // 2.70 g / 26.982 g/mol / 2 × 101.96 g/mol = 5.10 g
    expect(t.rows[1].mass!.display).toBe('5.10 g');
  });

  it('refuses what it cannot read, naming the problem', () => {
    const code = (specs: ReagentSpec[]) => errorCode(() => reagentTable(specs));
    expect(code([{ role: 'reagent', reagent: 'Ac2O', amount: '1 equiv' }])).toBe('BAD_RECORD');
    expect(code([{ role: 'reference', reagent: 'C7H6O3', amount: '1.5 equiv' }])).toBe('BAD_AMOUNT');
    expect(code([{ role: 'reference', reagent: 'Ac2O', amount: '2.0 mL' }])).toBe('BAD_AMOUNT');
    expect(code([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }, { role: 'reagent', reagent: 'Ac2O', amount: '1 equiv', solution: '1.6 M', purity: '98 %' }])).toBe('BAD_AMOUNT');
    expect(code([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }, { role: 'reagent', reagent: 'Ac2O', amount: '-1 equiv' }])).toBe('BAD_AMOUNT');
    expect(code([{ role: 'reference', reagent: 'frobnicate', amount: '2.00 g' }])).not.toBeNull();
  });

  it('is plain data', () => {
    const t = reagentTable(aspirin, { actual: '2.10 g' });
    expect(JSON.parse(JSON.stringify(t))).toEqual(t);
    expect(structuredClone(t)).toEqual(t);
  });
});

describe('instructions and results', () => {
  it('a reference or target with few figures: instructions stay at working precision, with a note', () => {
    const t = reagentTable([{ role: 'reference', reagent: 'C7H6O3', amount: '2 g' }, { role: 'reagent', reagent: 'Ac2O', amount: '3 equiv', density: '1.08 g/mL' }, { role: 'product', reagent: 'C9H8O4' }], { concentration: '0.2 M' });
    const [, ac2o, solvent, product] = t.rows;
    expect(ac2o.mass!.sigFigs).toBe(4);
    expect(ac2o.notes.map((n) => n.code)).toContain('WORKING_PRECISION');
    expect(solvent.volume!.display).toBe('72.40 mL');
    expect(solvent.notes.map((n) => n.code)).toContain('WORKING_PRECISION');
    // the theoretical yield is a result: the one figure of 2 g
    expect(product.mass!.display).toBe('3 g');
  });
});

describe('names and hazards', () => {
  it('reads common names and the formula language abbreviations, and says so', () => {
    expect(lookUpName('Acetic anhydride')?.formula).toBe('C4H6O3');
    expect(lookUpName('TEA')?.formula).toBe('C6H15N');
    const t = reagentTable([
      { role: 'reference', reagent: 'C6H5Br', amount: '5.00 mmol' },
      { role: 'reagent', reagent: 'PPh3', amount: '1.0 equiv' },
      { role: 'reagent', reagent: 'Et3N', amount: '2.0 equiv' },
      { role: 'reagent', reagent: 'NaOtBu', amount: '1.4 equiv' },
    ]);
    expect(t.rows.map((r) => r.formula)).toEqual(['C6H5Br', 'C18H15P', 'C6H15N', 'C4H9NaO']);
  });

  it('knows the hazard classes by formula (common practice)', () => {
    expect(hazardOf('MeLi', 'CH3Li')).toBe('pyrophoric');
    expect(hazardOf('EtMgBr', 'C2H5BrMg')).toBe('water-reactive');
    expect(hazardOf('LiAlH4', 'AlH4Li')).toBe('water-reactive');
    expect(hazardOf('HNO3', 'HNO3')).toBe('concentrated-acid');
    expect(hazardOf('NaCl', 'ClNa')).toBeNull();
    expect(hazardOf('BH3', 'BH3')).toBeNull();
  });
});

describe('properties', () => {
  const mass = fc.integer({ min: 100, max: 99999 }).map((n) => `${(n / 100).toFixed(2)} g`);
  const equiv = fc.integer({ min: 1, max: 500 }).map((n) => (n / 100).toFixed(2));
  const purity = fc.integer({ min: 500, max: 1000 }).map((n) => `${(n / 10).toFixed(1)} %`);
  const density = fc.integer({ min: 500, max: 3000 }).map((n) => `${(n / 1000).toFixed(3)} g/mL`);

  it('equivalents × reference mmol = row mmol; mass = mmol × M ÷ purity; volume = mass ÷ density', () => {
    fc.assert(
      fc.property(mass, equiv, purity, density, (m, e, p, d) => {
        const t = reagentTable([
          { role: 'reference', reagent: 'C7H6O3', amount: m },
          { role: 'reagent', reagent: 'C4H6O3', amount: `${e} equiv`, purity: p, density: d },
        ]);
        const [ref, row] = t.rows;
        const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);
        expect(rel(row.amount!.value, Number(e) * ref.amount!.value)).toBeLessThan(1e-12);
        expect(rel(row.mass!.value, (row.amount!.value * row.molarMass!) / (parseFloat(p) / 100))).toBeLessThan(1e-12);
        // mass in g, density in g/mL, volume in L
        expect(rel(row.volume!.value, row.mass!.value / (parseFloat(d) * 1000))).toBeLessThan(1e-12);
      }),
      { numRuns: 150 },
    );
  });

  it('a procedure file reads back as the same table', () => {
    const spec = fc.record({
      reagent: fc.constantFrom('C4H6O3', 'Ac2O', 'PPh3', 'Et3N', 'n-BuLi', 'K2CO3', 'acetic anhydride'),
      amount: fc.oneof(equiv.map((e) => `${e} equiv`), fc.integer({ min: 1, max: 20 }).map((n) => `${n} mol %`)),
      purity: fc.option(purity, { nil: undefined }),
      density: fc.option(density, { nil: undefined }),
    });
    fc.assert(
      fc.property(mass, fc.array(spec, { minLength: 1, maxLength: 5 }), fc.option(fc.constantFrom('0.2 M', '0.50 M'), { nil: undefined }), (m, rows, conc) => {
        const specs: ReagentSpec[] = [
          { role: 'reference', reagent: 'salicylic acid', amount: m },
          ...rows.map((r) => ({ role: 'reagent' as const, ...r })),
          { role: 'product', reagent: 'C9H8O4' },
        ];
        const options = { concentration: conc, solvent: conc ? 'THF' : undefined, actual: '1.00 g' };
        const text = writeProcedure(specs, options);
        const back = readProcedure(text);
        const strip = (s: ReagentSpec[]) => s.map(({ text: _t, ...rest }) => Object.fromEntries(Object.entries(rest).filter(([, v]) => v !== undefined)));
        expect(strip(back.specs)).toEqual(strip(specs));
        const a = reagentTable(specs, options);
        const b = reagentTable(back.specs, back.options);
        expect(b.rows.map(({ input: _i, ...r }) => r)).toEqual(a.rows.map(({ input: _i, ...r }) => r));
        expect(writeProcedure(back.specs, back.options)).toBe(text);
      }),
      { numRuns: 60 },
    );
  });

  it('react and the reagent table agree on the same reaction', () => {
    const cases = [
      { equation: 'C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', ref: 'C7H6O3', other: 'C4H6O3', product: 'C9H8O4' },
      { equation: 'Al + O2 -> Al2O3', ref: 'Al', other: 'O2', product: 'Al2O3' },
      { equation: 'C6H12O6 + 5 C4H6O3 -> C16H22O11 + 5 C2H4O2', ref: 'C6H12O6', other: 'C4H6O3', product: 'C16H22O11' },
    ];
    fc.assert(
      fc.property(fc.constantFrom(...cases), mass, fc.integer({ min: 600, max: 900 }), (c, m, x) => {
        const e = `${x / 100}`; // 6–9 equiv: the reference limits in every case
        const r = react(c.equation, { amounts: [`${c.ref}=${m}`, `${c.other}=${e} equiv`] });
        const t = reagentTable([{ role: 'reference', reagent: c.ref, amount: m }, { role: 'reagent', reagent: c.other, amount: `${e} equiv` }, { role: 'product', reagent: c.product }], { equation: c.equation });
        expect(r.limiting).toBe(c.ref);
        const product = t.rows.find((row) => row.role === 'product')!;
        expect(product.mass!.value).toBeCloseTo(r.products[0].mass!.value, 12);
        expect(product.mass!.display).toBe(r.products[0].mass!.display);
        expect(t.rows[1].amount!.value).toBeCloseTo(r.reactants[1].moles!.value, 15);
      }),
      { numRuns: 60 },
    );
  });
});

describe('rows written as text', () => {
  it('reads REAGENT=AMOUNT and KEY=VALUE entries', () => {
    expect(readRowText('n-BuLi=1.1 equiv, solution=1.6 M in hexanes', 'reagent')).toMatchObject({ reagent: 'n-BuLi', amount: '1.1 equiv', solution: '1.6 M in hexanes' });
    expect(readRowText('HCl=2.0 equiv, solution=37 % w/w, d=1.19', 'reagent')).toMatchObject({ solution: '37 % w/w', density: '1.19' });
    expect(errorCode(() => readRowText('Ac2O=1 equiv, colour=red', 'reagent'))).toBe('BAD_RECORD');
    expect(errorCode(() => readRowText('Ac2O', 'reagent'))).toBe('BAD_RECORD');
    expect(readRowText('4-butylanisole, formula=C11H16O', 'product')).toMatchObject({ reagent: '4-butylanisole', formula: 'C11H16O', amount: '' });
  });

  it('a bare density is read as g/mL, with a note', () => {
    const t = reagentTable([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }, { role: 'reagent', reagent: 'Ac2O', amount: '2.0 equiv', density: '1.08' }]);
    expect(t.rows[1].notes.map((n) => n.code)).toContain('DENSITY_UNIT');
  });
});
