/**
 * The conventional written form of a formula pondus generates (an empirical formula, a candidate):
 * Hill order for a formula with carbon (Hill 1900; IUPAC Red Book 2005 IR-4.7), IUPAC's
 * electronegativity order for one without (Red Book 2005 IR-4.4.2.1): Mg2SiO4, not Hill's Mg2O4Si.
 */
import type { AtomCounts } from '../formula/flatten.js';
import { hillFormula } from '../formula/hill.js';
import { writtenFormula } from '../formula/written-order.js';

/** Whether a count key is carbon ('C', '13C'). */
const isCarbon = (key: string) => /^[0-9]*C$/.test(key);

/**
 * A generated formula as a chemist writes it: Hill order with carbon, electronegativity order without.
 *
 * @param counts - atom counts.
 * @param charge - the charge, written after the formula.
 * @returns the formula text.
 * @example
 * conventionalFormula(new Map([['Mg', 2], ['O', 4], ['Si', 1]])) // 'Mg2SiO4'
 * conventionalFormula(new Map([['C', 6], ['H', 12], ['O', 6]])) // 'C6H12O6'
 */
export function conventionalFormula(counts: AtomCounts, charge = 0): string {
  return [...counts.keys()].some(isCarbon) ? hillFormula(counts, charge) : writtenFormula(counts, charge);
}

/**
 * {@link conventionalFormula} of a plain count record.
 *
 * @example
 * conventionalFormulaOf({ Cl: 2, Cu: 1 }) // 'CuCl2'
 */
export function conventionalFormulaOf(counts: Readonly<Record<string, number>>, charge = 0): string {
  return conventionalFormula(new Map(Object.entries(counts).filter(([, n]) => n > 0)), charge);
}
