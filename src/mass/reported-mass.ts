/**
 * The molar mass as a measured number: each atomic weight carries the
 * precision it is tabulated to, and the sum keeps the fewest decimal places
 * (OpenStax Chemistry 2e §1.5). A count is exact and stands for repeated
 * addition, so n × 35.45 keeps two decimals (as chemists write molar masses)
 * rather than four significant figures. So NaCl reports as 58.44 g/mol
 * (Cl 35.45 limits it), water as 18.015 g/mol.
 */
import { ATOMS } from '../elements/atom-data.js';
import type { Measured } from '../sigfig/measured.js';
import { readNumber } from '../sigfig/read-number.js';
import type { MassDetail } from './formula-mass.js';

/**
 * The molar mass with its precision from the tabulated atomic weights.
 *
 * @param r - a detailed mass result (from formulaMassDetail).
 * @returns the molar mass as a Measured whose last significant decimal place is the coarsest of the atomic weights used (0 for a mass number standing in for a weight).
 * @throws PondusError: BAD_ARGUMENT when `r` is not a detailed mass result.
 * @example
 * displayMeasured(reportedMolarMass(formulaMassDetail('NaCl'))).text // '58.44'
 */
export function reportedMolarMass(r: MassDetail): Measured {
  let lsd: number | null = null;
  // the atoms of the contributions, read from the dense tables without making the per-atom masses
  for (const id of r.vector.ids) {
    const atom = ATOMS.data[id];
    // a mass number standing in for an atomic weight is good to the unit
    const w = atom.noStandardWeight && atom.massNumber === null ? 0 : readNumber(atom.average[r.weights].text).lsd!;
    lsd = lsd === null ? w : Math.max(lsd, w);
  }
  return { value: r.molarMass, lsd };
}
