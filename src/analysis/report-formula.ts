/**
 * A formula as a report writes it: each component of an addition compound on its own, with its
 * multiplier, joined by '·' — `C11H15N·C2HF3O2·0.5H2O`. A component with carbon is in Hill order;
 * a component without carbon keeps the element order as written (HCl, H2SO4, CuSO4, not ClH,
 * H2O4S, CuO4S), the way inorganic formulas are printed (common practice; IUPAC Red Book 2005
 * IR-4.4 puts the electropositive part first, which is how such formulas are usually written).
 */
import { ATOMS } from '../elements/atom-data.js';
import { flattenFormula, type AtomVector } from '../formula/flatten.js';
import { formatFormula, hillFormula, hillOrder } from '../formula/hill.js';
import type { FormulaTree } from '../formula-parser/tree.js';
import type { MassDetail } from '../mass/formula-mass.js';

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

/** Text that is one component with no multiplier: it starts with a capital and has only letters, digits and brackets. */
const ONE_COMPONENT = /^\s*[A-Z][A-Za-z0-9()[\]{}]*\s*$/;

/**
 * The report formula of a detailed mass result. A formula of one component with no multiplier is
 * written from its atom totals (Hill order with carbon, the order of first appearance without),
 * with no tree needed; any other goes through {@link reportFormula}.
 *
 * @example
 * reportFormulaOf(formulaMassDetail('H2SO4'))             // 'H2SO4'
 * reportFormulaOf(formulaMassDetail('C17H19NO3·HCl·3H2O')) // 'C17H19NO3·HCl·3H2O'
 */
export function reportFormulaOf(m: MassDetail): string {
  if (m.charge !== 0 || !ONE_COMPONENT.test(m.input)) return reportFormula(m.tree);
  return vectorText(m.vector);
}

function vectorText(v: AtomVector): string {
  const carbon = v.ids.some((id) => ATOMS.data[id].symbol === 'C');
  const order = carbon ? v.ids : v.seen;
  const at = carbon ? v.counts : v.seen.map((id) => v.counts[v.ids.indexOf(id)]);
  return formatFormula(order.map((id) => ATOMS.data[id].label), at, 0);
}
