/**
 * A note when a formula carries water of crystallisation, so a result based on
 * its molar mass says that the water was counted.
 */
import type { Note } from '../errors/issue.js';
import type { MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { displayMeasured } from '../sigfig/round.js';
import { flattenFormula } from '../formula/flatten.js';
import { toDecimal } from '../formula/amount.js';
import type { ComponentNode } from '../formula-parser/tree.js';

/**
 * Moles of water of crystallisation per formula unit: components after the first that are whole multiples of H2O.
 *
 * @param m - a detailed mass result (from formulaMassDetail).
 * @returns the moles of water of crystallisation per formula unit (0 for none).
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * hydrateWater(formulaMassDetail('CaCl2·2H2O')) // 2
 */
export function hydrateWater(m: MassDetail): number {
  let water = 0;
  m.tree.components.slice(1).forEach((c: ComponentNode) => {
    water += waterIn(c);
  });
  return water;
}

/**
 * The moles of water a component of a formula is, with its multiplier (5 for `5H2O`), or 0 when it
 * is not water.
 *
 * @example
 * waterIn(parseFormula('CuSO4·5H2O').components[1]) // 5
 * waterIn(parseFormula('CuSO4·5H2O').components[0]) // 0
 */
export function waterIn(c: ComponentNode): number {
  const counts = flattenFormula({ kind: 'formula', input: '', components: [c], charge: 0, notes: [] });
  const h = counts.get('H');
  const o = counts.get('O');
  return counts.size === 2 && h !== undefined && o !== undefined && toDecimal(h).eq(toDecimal(o).times(2)) ? toDecimal(o).toNumber() : 0;
}

/**
 * Adds a HYDRATE_WATER_COUNTED note when the formula holds water of crystallisation.
 *
 * @example
 * const notes = []
 * noteHydrateWater(formulaMassDetail('MgSO4·7H2O'), notes)
 * notes[0].code // 'HYDRATE_WATER_COUNTED'
 */
export function noteHydrateWater(m: MassDetail, notes: Note[]): void {
  const w = hydrateWater(m);
  if (w > 0) notes.push({ code: 'HYDRATE_WATER_COUNTED', message: `the molar mass of ${m.input} counts its ${w} H2O of crystallisation (M = ${displayMeasured(reportedMolarMass(m)).text} g/mol); write the anhydrous formula for a result on the anhydrous substance` });
}

