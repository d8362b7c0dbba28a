/**
 * The molar mass as a measured number: each atomic weight carries the
 * precision it is tabulated to, counts are exact, and the sum keeps the
 * fewest decimal places (OpenStax Chemistry 2e §1.5). So NaCl reports as
 * 58.44 g/mol (Cl 35.45 limits it), water as 18.015 g/mol.
 */
import { plus, times, exact, type Measured } from '../sigfig/measured.js';
import { readNumber } from '../sigfig/read-number.js';
import { toDecimal } from '../formula/amount.js';
import type { MassResult } from './formula-mass.js';

/**
 * The molar mass with its precision from the tabulated atomic weights.
 *
 * @example
 * displayMeasured(reportedMolarMass(formulaMass('NaCl'))).text // '58.44'
 */
export function reportedMolarMass(r: MassResult): Measured {
  let acc: Measured = exact(0);
  for (const c of r.contributions) {
    const w: Measured = c.atom.noStandardWeight && c.massNumber === null
      ? { value: toDecimal(Number(c.atomicWeight)), lsd: 0 }
      : readNumber(c.atomicWeight);
    acc = plus(acc, times(w, exact(toDecimal(c.count))));
  }
  return { value: r.molarMass, lsd: acc.lsd };
}
