import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fastParse } from '../../src/formula-parser/fast-path.js';
import { parseWithGrammar } from '../../src/formula-parser/parse.js';
import { toSafe } from '../../src/errors/pondus-error.js';

/** The fast path must build exactly the grammar's tree, or decline. */
function agree(input: string): void {
  const fast = fastParse(input);
  if (fast === null) return;
  const full = toSafe(() => parseWithGrammar(input));
  expect(full.success, `fast path accepted ${JSON.stringify(input)} but the grammar rejects it`).toBe(true);
  if (full.success) expect(fast).toEqual(full.data);
}

const pieces = [
  'C', 'H', 'O', 'N', 'Cl', 'Na', 'Co', 'Fe', 'D', 'T', 'Xx', 'c', 'Uue',
  '(', ')', '[', ']', '{', '}', '·', '*', '.', ' ',
  '2', '3', '0', '12', '05', '0.5', '1', '999999999', '1000000000',
  '^2+', '+', '-', '¹³', '₂', '²⁻', '[13C]', '[2H]',
  // what the fast reader now takes as well: subscripts, charges, decimals below one, the shorthand dot, end spaces
  '₁₂', '₀', '^', '^-', '^+2', '^100+', '⁺', '⁻', '³⁺', '0.95', '0.5', '0.1234567', '1.5', '.5H2O', '.10NH3', '.5D2O', '.0', '  ',
  // readings the full parser settles: abbreviations, clashing symbols, names, fractions, state symbols
  'Ph', 'Cp', 'Cp*', 'py', 'Py', 'Ac', 'Ts', 'Pr', 'Np', 'B', 'S', 'I', 'P', 'THF', 'NBS', 'BOC', '½', '1/2', '(s)', '(aq)',
];

const element = fc.constantFrom('C', 'H', 'O', 'N', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Co', 'Pt', 'Uuo', 'Nh');
const count = fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 40 }).map(String));
const formula: fc.Arbitrary<string> = fc.letrec((tie) => ({
  part: fc.oneof(
    { weight: 4, arbitrary: fc.tuple(element, count).map(([e, c]) => e + c) },
    { weight: 1, arbitrary: fc.tuple(fc.constantFrom(['(', ')'], ['[', ']'], ['{', '}']), tie('body'), count).map(([[o, c], b, n]) => `${o}${b}${c}${n}`) },
  ),
  component: fc.tuple(fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 12 }).map(String)), fc.array(tie('part') as fc.Arbitrary<string>, { minLength: 1, maxLength: 4 })).map(([m, ps]) => m + ps.join('')),
  body: fc.array(tie('component') as fc.Arbitrary<string>, { minLength: 1, maxLength: 3 }).chain((cs) => fc.constantFrom('·', '*').map((sep) => cs.join(sep))),
})).body as fc.Arbitrary<string>;

describe('the fast path and the grammar agree', () => {
  it('on well-formed formulas (and the fast path takes most of them)', () => {
    let taken = 0;
    let total = 0;
    fc.assert(
      fc.property(formula, (f) => {
        total++;
        if (fastParse(f)) taken++;
        agree(f);
      }),
      { numRuns: 3000 },
    );
    expect(taken / total).toBeGreaterThan(0.3);
  });

  it('on arbitrary strings built from formula pieces', () => {
    fc.assert(
      fc.property(fc.array(fc.constantFrom(...pieces), { minLength: 1, maxLength: 14 }), (ps) => agree(ps.join(''))),
      { numRuns: 5000 },
    );
  });

  it('on arbitrary Unicode text', () => {
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 20 }), (s) => agree(s)), { numRuns: 2000 });
  });

  it('on the realistic mix: D and T, subscripts, decimal counts, charges, the shorthand dot, end spaces (and takes them)', () => {
    const sub = (n: number) => String(n).replace(/[0-9]/g, (d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]);
    const kinds = fc.oneof(
      fc.tuple(formula, fc.constantFrom('^+', '^-', '^2+', '^3-', '^-2', '^+3', '^12-', '²⁻', '⁺', '³⁺', '-', '+')).map(([f, z]) => f + z),
      formula.map((f) => f.replace(/[0-9]+/g, (d) => sub(Number(d)))),
      fc.tuple(fc.constantFrom('C', 'CH3', 'C6', 'O', 'N'), fc.integer({ min: 1, max: 40 }), fc.constantFrom('D', 'T', 'CD3', 'OD')).map(([a, n, d]) => `${a}${n}${d}`),
      fc.tuple(fc.constantFrom('Fe', 'Ni', 'Co', 'Mn', 'Cu'), fc.integer({ min: 1, max: 999999 })).map(([m, d]) => `${m}0.${d}O`),
      fc.tuple(fc.constantFrom('CuSO4', 'CaSO4', 'MgSO4', 'Na2CO3', 'CaCl2', 'CoCl2'), fc.integer({ min: 1, max: 12 }), fc.constantFrom('H2O', 'D2O', 'NH3', 'H2O2', 'H2Ox')).map(([a, n, w]) => `${a}.${n}${w}`),
      fc.tuple(fc.constantFrom('', ' ', '  '), formula, fc.constantFrom('', ' ', '   ')).map(([a, f, b]) => a + f + b),
      fc.tuple(formula, fc.integer({ min: 1, max: 99 }), fc.constantFrom('.5', '.95', '.950', '.0', '.1234567', '.25', '.')).map(([f, n, d]) => `${f}${n}${d}`),
    );
    let taken = 0;
    let total = 0;
    fc.assert(
      fc.property(kinds, (f) => {
        total++;
        if (fastParse(f)) taken++;
        agree(f);
      }),
      { numRuns: 6000 },
    );
    expect(taken / total).toBeGreaterThan(0.5);
  });

  it('on the examples of the other tests', () => {
    for (const s of ['CuSO4·5H2O', '[13C]H4', 'K4[Fe(CN)6]', 'CH3(CH2)16COOH', 'CH3Co', 'Co2', 'C1234567890', '(((H)))', 'H2O·', '2']) agree(s);
    for (const s of [' H2O ', 'H₂O', 'D2O', 'CDCl3', 'T2O', 'SO4^2-', 'SO4^-2', 'NH4^+', 'Cl-', 'OH-', '(OH)-', 'Fe³⁺', 'SO₄²⁻', 'Fe0.95O', 'CuSO4.5H2O', 'CuSO4.10NH3', 'Co2.6H2O', 'YBa2Cu3O6.95', 'YBa2Cu3O6.125 ']) {
      agree(s);
      expect(fastParse(s), s).not.toBeNull();
    }
  });

  it('on the readings that must be settled, which it leaves to the full parser', () => {
    for (const s of ['NBS', 'NBS2', 'BOC2O', 'NIS', 'PCC', 'PPTS', 'BPY', 'PHEN', 'PrOH', 'PrCl3', 'AcOH', 'TsCl', 'NpO2', 'Cp*2Fe', 'CaSO4·½H2O', 'Zn(s)', 'THF', 'TBSCl']) {
      agree(s);
      expect(fastParse(s), s).toBeNull();
    }
  });
});
