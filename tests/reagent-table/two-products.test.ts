// The amount obtained is of one product: with two products, the first gets the yield and the
// second says it has none; a procedure file with two products reads back as written.
import { describe, expect, it } from 'vitest';
import { readProcedure, reagentTable, writeProcedure } from '../../src/index.js';

// a scenario of our own: aspirin from salicylic acid and acetic anhydride, acetic acid the co-product
const specs = [
  { role: 'reference' as const, reagent: 'C7H6O3', amount: '2.00 g' },
  { role: 'reagent' as const, reagent: 'C4H6O3', amount: '3.0 equiv' },
  { role: 'product' as const, reagent: 'C9H8O4' },
  { role: 'product' as const, reagent: 'C2H4O2' },
];
const options = { equation: 'C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2', actual: '2.10 g' };

describe('a table with two products and an amount obtained', () => {
  it('gives the yield of the first product only, with a note on each product row', () => {
    const t = reagentTable(specs, options);
    const [aspirin, acetic] = t.rows.filter((r) => r.role === 'product');
    // source: OpenStax Chemistry 2e molar masses: C7H6O3 138.12, C9H8O4 180.16 g/mol;
    // 2.00 g / 138.12 × 180.16 = 2.609 g theoretical, 2.10 / 2.609 = 80.5 %
    expect(aspirin.percentYield?.display).toBe('80.5 %');
    expect(aspirin.notes.map((n) => n.code)).toContain('YIELD_OF_FIRST_PRODUCT');
    expect(acetic.percentYield).toBeNull();
    expect(acetic.notes.map((n) => n.code)).toContain('YIELD_OF_FIRST_PRODUCT');
  });

  it('a table with one product has no such note', () => {
    const t = reagentTable(specs.slice(0, 3), options);
    expect(t.rows[2].notes.map((n) => n.code)).not.toContain('YIELD_OF_FIRST_PRODUCT');
  });

  it('writes the amount obtained on the first product row only, and reads it back', () => {
    const text = writeProcedure(specs, options);
    const back = readProcedure(text);
    expect(back.options.actual).toBe('2.10 g');
    expect(back.specs.map((s) => s.reagent)).toEqual(specs.map((s) => s.reagent));
  });
});
