import { describe, expect, it } from 'vitest';
import { composition } from '../../src/composition/element-shares.js';
import { compositionJson } from '../../src/composition/composition-json.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import fc from 'fast-check';
import { Decimal } from '../../src/exact/decimal.js';
import { getAtomData } from '../../src/elements/atom-data.js';
import { ELEMENTS } from '../../src/elements/element-table.js';

const pct = (f: string, o = {}) => Object.fromEntries(composition(f, o).elements.map((e) => [e.symbol, e.massPercent.toFixed(2)]));

describe('percent composition', () => {
  it('water: 11.19 % H, 88.81 % O', () => {
    // from memory: textbook value for water
    expect(pct('H2O')).toEqual({ H: '11.19', O: '88.81' });
  });

  it('aspirin C9H8O4: 60.00 % C, 4.48 % H, 35.52 % O', () => {
    // source: OpenStax Chemistry 2e §3.2 (percent composition of aspirin), from memory
    expect(pct('C9H8O4')).toEqual({ C: '60.00', H: '4.48', O: '35.52' });
  });

  it('ammonia NH3: 82.24 % N', () => {
    // source: OpenStax Chemistry 2e §3.2 (percent composition of ammonia, 82.24 % N), from memory
    expect(pct('NH3').N).toBe('82.24');
  });
});

describe('fraction of a fragment', () => {
  it('water in copper(II) sulfate pentahydrate is 36.08 %', () => {
    // from memory: the classic textbook figure (5 × 18.015 / 249.68)
    const p = composition('CuSO4·5H2O', { part: 'H2O' }).part!;
    expect(p.count).toBe(5);
    expect(p.countedFrom).toBe('written');
    expect(p.massPercent.toFixed(2)).toBe('36.08');
  });

  it('sulfate in sodium sulfate, iron in iron(II) sulfate heptahydrate', () => {
    // from memory: 96.06/142.04 = 67.63 %; 55.845/278.01 = 20.09 % (the iron content of ferrous sulfate supplements)
    expect(composition('Na2SO4', { part: 'SO4' }).part!.massPercent.toFixed(2)).toBe('67.63');
    expect(composition('FeSO4·7H2O', { part: 'Fe' }).part!.massPercent.toFixed(2)).toBe('20.09');
  });

  it('counts a fragment in brackets with the bracket count', () => {
    expect(composition('Fe2(SO4)3', { part: 'SO4' }).part!.count).toBe(3);
    expect(composition('Ca(OH)2', { part: 'OH' }).part!.count).toBe(2);
    expect(composition('(NH4)2SO4', { part: 'NH4' }).part!.count).toBe(2);
  });

  it('falls back to counting from atoms, and says so', () => {
    const r = composition('C6H12O6', { part: 'CO2' });
    expect(r.part!.countedFrom).toBe('atoms');
    expect(r.part!.count).toBe(3);
    expect(r.notes.map((n) => n.code)).toContain('PART_FROM_ATOMS');
  });

  it('refuses a fragment the formula cannot hold', () => {
    expect(() => composition('H2O', { part: 'NaCl' })).toThrow(PondusError);
  });

  it('writes the contract JSON', () => {
    const j = compositionJson(composition('H2O'));
    expect(Object.keys(j)).toEqual(['input', 'formula', 'molarMass', 'elements', 'notes']);
    expect(Object.keys(j.elements[0])).toEqual(['symbol', 'count', 'mass', 'massPercent']);
    expect(j.elements[0]).toMatchObject({ symbol: 'H', count: 2, mass: 2.016 });
  });
});

describe('each element mass as exact text', () => {
  // the texts of count × weight are kept for reuse (composition/element-shares.ts); a kept text must
  // be the one for its own table, kind of atom and count, past the count limit and after the table
  // of kinds starts again
  const exactText = (count: number, weight: string) => new Decimal(count).times(weight).toFixed();
  it('is count × the tabulated weight, for both tables, counts past 4096, and more than 256 kinds of atom', () => {
    const symbols = ['C', 'H', 'N', 'O', 'S', 'Cl', 'Na', 'Fe', 'Br'];
    // every nuclide of the first 40 elements with a mass number within ±8 of twice Z: several hundred kinds
    const nuclides: string[] = [];
    for (let z = 1; z <= 40; z++) {
      const symbol = ELEMENTS[z - 1].symbol;
      for (let a = Math.max(z, 2 * z - 8); a <= 2 * z + 8; a++) if (getAtomData(symbol, a)) nuclides.push(`[${a}${symbol}]`);
    }
    expect(nuclides.length).toBeGreaterThan(300);
    fc.assert(
      fc.property(fc.constantFrom(...symbols, ...nuclides), fc.constantFrom(...symbols), fc.integer({ min: 1, max: 5000 }), fc.constantFrom('standard' as const, 'abridged' as const), (a, b, n, weights) => {
        const r = composition(`${a}${n}${b}${(n % 7) + 1}`, { weights });
        for (const e of r.elements) {
          const m = /^\[?([0-9]*)([A-Z][a-z]?)\]?$/.exec(e.symbol === 'D' ? '[2H]' : e.symbol === 'T' ? '[3H]' : e.symbol)!;
          const d = getAtomData(m[2], m[1] ? Number(m[1]) : null)!;
          expect(e.massExact).toBe(exactText(e.count, d.average[weights].text));
        }
      }),
      { numRuns: 3000 },
    );
  });
});
