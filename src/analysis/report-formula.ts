/**
 * A formula as a report writes it: each component of an addition compound on its own, with its
 * multiplier, joined by '·' — `C11H15N·C2HF3O2·0.5H2O`. A component with carbon is in Hill order;
 * a component without carbon keeps the element order as written (HCl, H2SO4, CuSO4, not ClH,
 * H2O4S, CuO4S), the way inorganic formulas are printed (common practice; IUPAC Red Book 2005
 * IR-4.4 puts the electropositive part first, which is how such formulas are usually written).
 */
import { flattenFormula } from '../formula/flatten.js';
import { hillFormula, hillOrder } from '../formula/hill.js';
import type { FormulaTree } from '../formula-parser/tree.js';

const hasCarbon = (keys: Iterable<string>) => {
  for (const k of keys) if (/^[0-9]*C$/.test(k)) return true;
  return false;
};

/**
 * One component's formula: Hill order with carbon, as written without.
 *
 * @example
 * componentText(parseFormula('HCl'))           // 'HCl'
 * componentText(parseFormula('CF3COOH'))       // 'C2HF3O2'
 */
export function componentText(tree: FormulaTree): string {
  const atoms = flattenFormula(tree);
  return hillFormula(atoms, 0, hasCarbon(atoms.keys()) ? hillOrder(atoms.keys()) : [...atoms.keys()]);
}

/**
 * The formula of a compound as a report line writes it, component by component.
 *
 * @example
 * reportFormula(parseFormula('C11H15N·CF3COOH·0.5H2O')) // 'C11H15N·C2HF3O2·0.5H2O'
 * reportFormula(parseFormula('C17H19NO3·HCl·3H2O'))    // 'C17H19NO3·HCl·3H2O'
 */
export function reportFormula(tree: FormulaTree): string {
  return tree.components
    .map((c) => {
      const one: FormulaTree = { ...tree, components: [{ ...c, multiplier: null }], charge: 0 };
      const m = c.multiplier && c.multiplier.text !== '1' ? c.multiplier.text : '';
      return m + componentText(one);
    })
    .join('·');
}
