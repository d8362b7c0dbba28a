/**
 * Names chemists use for common lab solvents and salt partners, with their
 * formulas (common practice). Any formula may be given instead of a name. The
 * table itself lives with the formula parser (formula-parser/names.ts), which
 * uses the same names in its messages.
 */
import { SOLVENTS } from '../formula-parser/names.js';

export { SOLVENTS };

/**
 * Looks up a solvent by name (any case), or returns null for a name it does not know.
 *
 * @param name - a solvent's name or abbreviation (water, DCM, EtOAc, …), in any case.
 * @returns the solvent's formula and name, or null for a name not in the list.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * solventByName('DCM')?.formula // 'CH2Cl2'
 */
export function solventByName(name: string): { formula: string; name: string } | null {
  const key = name.trim().toLowerCase();
  return Object.hasOwn(SOLVENTS, key) ? SOLVENTS[key] : null;
}
