import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toSafe } from '../../src/errors/pondus-error.js';
import { atomVector } from '../../src/formula/flatten.js';
import { plainVector } from '../../src/formula/plain-vector.js';
import { parseFormula, parseWithGrammar } from '../../src/formula-parser/parse.js';

/** The plain reader must give exactly the grammar's atom totals and charge, with no notes, or decline. */
function agree(input: string): boolean {
  const plain = plainVector(input);
  if (plain === null) return false;
  const full = toSafe(() => parseWithGrammar(input));
  expect(full.success, `the plain reader took ${JSON.stringify(input)} but the grammar rejects it`).toBe(true);
  if (!full.success) return true;
  expect(full.data.notes, `the grammar has notes for ${JSON.stringify(input)}`).toEqual([]);
  expect(plain.charge, input).toBe(full.data.charge);
  expect(plain.vector, input).toEqual(atomVector(full.data));
  // and the default reading (fast tree path first) reads it the same way, with no notes either
  expect(parseFormula(input).notes).toEqual([]);
  return true;
}

const sub = (s: string) => s.replace(/[0-9]/g, (d) => '₀₁₂₃₄₅₆₇₈₉'[Number(d)]);
/** Formulas from these symbols and counts, with brackets (some mismatched when `bad`) and addition dots. */
function formulas(symbols: string[], counts: string[], bad: boolean): fc.Arbitrary<string> {
  const element = fc.constantFrom(...symbols);
  const count = fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 40 }).map(String), fc.constantFrom(...counts));
  const brackets: [string, string][] = [['(', ')'], ['[', ']'], ['{', '}'], ...(bad ? ([['(', ']']] as [string, string][]) : [])];
  return fc.letrec((tie) => ({
    part: fc.oneof(
      { weight: 4, arbitrary: fc.tuple(element, count).map(([e, c]) => e + c) },
      { weight: 1, arbitrary: fc.tuple(fc.constantFrom(...brackets), tie('body'), count).map(([[o, c], b, n]) => `${o}${b}${c}${n}`) },
    ),
    component: fc.tuple(fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 12 }).map(String)), fc.array(tie('part') as fc.Arbitrary<string>, { minLength: 1, maxLength: 4 })).map(([m, ps]) => m + ps.join('')),
    body: fc.array(tie('component') as fc.Arbitrary<string>, { minLength: 1, maxLength: 3 }).chain((cs) => fc.constantFrom('·', '*').map((sep) => cs.join(sep))),
  })).body as fc.Arbitrary<string>;
}
const plainFormula = formulas(['C', 'H', 'O', 'N', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Pt', 'D', 'T', 'Tc', 'Co', 'Ni', 'Cs'], ['1', '999'], false);
const anyFormula = formulas(['C', 'H', 'O', 'N', 'Cl', 'Co', 'D', 'Uuo', 'Nh', 'Ac', 'Xx'], ['0', '01', '999999999', '1000000000'], true);

const pieces = ['C', 'H', 'O', 'Cl', 'Co', 'D', 'T', 'Ac', 'c', '(', ')', '[', ']', '{', '}', '·', '*', '.', ' ', '2', '0', '12', '0.5', '₂', '₀', '²', '^', '^2+', '^-', '+', '-', '⁻', '³⁺', '[13C]', 'THF', 'Ph', '5H2O', '.5H2O'];

describe('the plain reader and the grammar agree', () => {
  it('on generated formulas, with charges, subscripts and end spaces (and the reader takes most of them)', () => {
    const kinds = fc.oneof(
      plainFormula,
      fc.tuple(plainFormula, fc.constantFrom('^+', '^-', '^2+', '^3-', '^-2', '^+3', '^12-', '^100+', '²⁻', '⁺', '³⁺', '-', '+')).map(([f, z]) => f + z),
      plainFormula.map(sub),
      fc.tuple(fc.constantFrom('', ' ', '  '), plainFormula, fc.constantFrom('', ' ', '   ')).map(([a, f, b]) => a + f + b),
    );
    let taken = 0;
    let total = 0;
    fc.assert(
      fc.property(kinds, (f) => {
        total++;
        if (agree(f)) taken++;
      }),
      { numRuns: 3000 },
    );
    expect(taken / total).toBeGreaterThan(0.4);
  });

  it('on generated formulas with unknown symbols, clashing readings, bad counts and mismatched brackets', () => {
    fc.assert(fc.property(anyFormula, (f) => void agree(f)), { numRuns: 3000 });
  });

  it('on arbitrary strings built from formula pieces', () => {
    fc.assert(fc.property(fc.array(fc.constantFrom(...pieces), { minLength: 1, maxLength: 14 }), (ps) => void agree(ps.join(''))), { numRuns: 5000 });
  });

  it('on arbitrary Unicode text', () => {
    fc.assert(fc.property(fc.string({ unit: 'grapheme', maxLength: 20 }), (s) => void agree(s)), { numRuns: 2000 });
  });

  it('takes the everyday plain formulas', () => {
    // source: molar masses aside, these are the formulas of common practice: a salt hydrate written
    // with the addition dot, a complex ion, heavy water, subscripts, ions with written charges
    for (const s of ['H2O', 'CuSO4·5H2O', 'K4[Fe(CN)6]', 'CH3(CH2)16COOH', 'D2O', 'CDCl3', 'H₂O', 'SO4^2-', 'SO₄²⁻', 'Fe³⁺', 'Cl-', '(OH)-', ' NaCl ', '{[Pt(NH3)4]Cl2}', '[Co(NH3)6]Cl3', 'Co(OH)2', 'NiCl2·6H2O']) {
      expect(agree(s), s).toBe(true);
    }
  });

  it('declines what has a note or a reading to settle, so the tree path gives it', () => {
    for (const s of ['CuSO4.5H2O', 'Fe0.95O', 'YBa2Cu3O6.95', 'Co2', 'CH3Co', 'CoCl2', 'Ni', 'THF', 'NBS2', 'AcOH', 'PrCl3', 'NpO2', '[13C]H4', 'Ph3P', 'Zn(s)', 'NH4+', 'C01', 'H1000000000', '(((', 'H2O ·']) {
      expect(plainVector(s), s).toBeNull();
    }
  });

  it('declines counts past 10^12 atoms, which the tree path refuses', () => {
    expect(plainVector('(((C999999999)999999999)2)')).toBeNull();
    expect(toSafe(() => atomVector(parseFormula('(((C999999999)999999999)2)'))).success).toBe(false);
  });
});
