import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { toSafe } from '../../src/errors/pondus-error.js';
import { flattenFormula } from '../../src/formula/flatten.js';
import { hillFormula } from '../../src/formula/hill.js';
import { parseFormula } from '../../src/formula-parser/parse.js';
import { parseEquation, speciesFormula } from '../../src/reactions/equation.js';

/** What the tree path gives for a species: the Hill formula, the atom totals in order of first appearance, the charge and the notes. */
function byTree(body: string) {
  const tree = parseFormula(body, {});
  const atoms = flattenFormula(tree);
  return { formula: hillFormula(atoms, tree.charge), atoms: [...atoms], charge: tree.charge, notes: tree.notes };
}

const element = fc.constantFrom('C', 'H', 'O', 'N', 'S', 'P', 'Cl', 'Br', 'Na', 'K', 'Ca', 'Fe', 'Cu', 'Mn', 'D', 'Co', 'Ni', 'Ac', 'Xx');
const count = fc.oneof(fc.constant(''), fc.integer({ min: 1, max: 30 }).map(String), fc.constant('0.5'));
const part = fc.oneof(
  { weight: 4, arbitrary: fc.tuple(element, count).map(([e, c]) => e + c) },
  { weight: 1, arbitrary: fc.tuple(fc.array(fc.tuple(element, count).map(([e, c]) => e + c), { minLength: 1, maxLength: 3 }), fc.integer({ min: 1, max: 4 })).map(([ps, n]) => `(${ps.join('')})${n}`) },
);
const charge = fc.constantFrom('', '', '^2+', '^-', '+', '^3-');
const species = fc.tuple(fc.array(part, { minLength: 1, maxLength: 5 }), fc.constantFrom('', '·5H2O', '.H2O', '(aq)'), charge).map(([ps, extra, z]) => ps.join('') + extra + z);

describe('the atoms of a species', () => {
  it('are those of the formula tree, plain or not, with the same Hill formula, charge, notes and errors', () => {
    fc.assert(
      fc.property(species, (body) => {
        const tree = toSafe(() => byTree(body));
        const read = toSafe(() => speciesFormula(body, {}));
        expect(read.success, body).toBe(tree.success);
        if (!read.success || !tree.success) return;
        expect({ ...read.data, atoms: [...read.data.atoms] }, body).toEqual(tree.data);
      }),
      { numRuns: 3000 },
    );
  });
  it('reach the balance the same way', () => {
    // source: from memory (the balanced equation for the reduction of calcium phosphate)
    const eq = parseEquation('Ca3(PO4)2 + SiO2 + C -> CaSiO3 + P4 + CO');
    expect(eq.reactants.map((s) => s.formula)).toEqual(['Ca3O8P2', 'O2Si', 'C']);
    expect([...eq.reactants[0].atoms]).toEqual([['Ca', 3], ['P', 2], ['O', 8]]);
  });
  it('are read again the same way for a species met before, each species with its own atoms', () => {
    // source: from memory (the atoms of water and of carbon dioxide)
    const first = parseEquation('CH4 + O2 -> CO2 + H2O');
    first.products[1].atoms.set('H', 99);
    const again = parseEquation('C2H6 + O2 -> CO2 + H2O');
    expect([...again.products[1].atoms]).toEqual([['H', 2], ['O', 1]]);
    expect(again.products[0].formula).toBe('CO2');
    // a text read plainly before is still read with the abbreviations when they are asked for
    // source: from memory (propyl, C3H7, beside praseodymium, Pr)
    expect(speciesFormula('Pr', {}).formula).toBe('Pr');
    expect(speciesFormula('Pr', { abbreviations: true }).formula).toBe('C3H7');
  });
});

