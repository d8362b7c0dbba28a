import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formulaMass } from '../../src/mass/formula-mass.js';
import { massJsonLine } from '../../src/mass/mass-json.js';
import { plainMassJsonLine } from '../../src/mass/plain-mass-json.js';

/** The hot path must give the general path's text exactly, or decline. */
function agree(input: string): boolean {
  const fast = plainMassJsonLine(input);
  if (fast === null) return false;
  expect(fast).toBe(massJsonLine(formulaMass(input)));
  return true;
}

describe('the mass JSON hot path', () => {
  it('agrees with the general path on plain formulas, and takes them', () => {
    const el = fc.constantFrom('C', 'H', 'N', 'O', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Pt', 'U', 'Si', 'B', 'I', 'F', 'Zn');
    const part = fc.tuple(el, fc.integer({ min: 1, max: 30 })).map(([e, n]) => (n === 1 ? e : `${e}${n}`));
    const plain: fc.Arbitrary<string> = fc.letrec((tie) => ({
      body: fc.array(fc.oneof({ weight: 4, arbitrary: part }, { weight: 1, arbitrary: fc.tuple(tie('body') as fc.Arbitrary<string>, fc.integer({ min: 1, max: 9 })).map(([b, n]) => `(${b})${n}`) }), { minLength: 1, maxLength: 5 }).map((a) => a.join('')),
    })).body as fc.Arbitrary<string>;
    let taken = 0;
    fc.assert(
      fc.property(plain, fc.option(fc.tuple(fc.integer({ min: 1, max: 6 }), plain)), (a, hydrate) => {
        const f = hydrate ? `${a}·${hydrate[0]}${hydrate[1]}` : a;
        if (agree(f)) taken++;
      }),
      { numRuns: 2000 },
    );
    expect(taken).toBeGreaterThan(300); // heavy formulas (past about 9,000 g/mol) go the Decimal way
  });

  it('takes nearly all of a realistic batch (the benchmark generator), and agrees on every line', async () => {
    // @ts-expect-error: a plain JavaScript module of the benchmark
    const { generateFormulas } = await import('../../bench/generate-formulas.mjs');
    let taken = 0;
    const all = [...generateFormulas(3000, 99)] as string[];
    for (const f of all) if (agree(f)) taken++;
    expect(taken / all.length).toBeGreaterThan(0.9);
  });

  it('declines what has notes, charges, isotopes, decimals or errors', () => {
    for (const f of ['Co2', 'TcO4', 'SO4^2-', '[13C]H4', 'D2O', 'Fe0.95O', 'CuSO4.5H2O', 'Xx', 'H0', '', 'C999999999(C999999999)9999']) {
      expect(plainMassJsonLine(f)).toBeNull();
    }
  });

  it('gives the figures of the contract', () => {
    // AME2020 and CIAAW, as in formula-mass.test.ts
    expect(JSON.parse(plainMassJsonLine('H2O')!)).toEqual({ input: 'H2O', formula: 'H2O', molarMass: 18.015, monoisotopicMass: 18.010564683056, nominalMass: 18, charge: 0 });
  });
});

describe('the hot path declines readings that carry a note or need settling', () => {
  it.each(['Pd(PPh3)4', 'Cp*2Fe', 'CaSO4.0.5H2O', 'CaSO4·½H2O', 'Zn(s)', 'PrCl3', 'NpO2', 'AcOH', 'THF', 'NBS', 'CuSO4.5H2O'])('%s', (f) => {
    expect(plainMassJsonLine(f)).toBeNull();
  });
});
