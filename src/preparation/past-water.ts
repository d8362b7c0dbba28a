/**
 * The atoms of a reagent past its water of crystallisation: what two forms of one salt share
 * (CuSO4 in CuSO4·5H2O), and what a table of anhydrous figures is keyed by.
 */
import { partShare } from '../composition/part-share.js';
import { toDecimal } from '../formula/amount.js';
import type { MassDetail, MassOptions } from '../mass/formula-mass.js';

/**
 * The atom counts of a reagent without the water written in its formula as water of
 * crystallisation ('·5H2O'), as exact decimal texts; water written any other way stays.
 *
 * @param m - the reagent, as read by formulaMassDetail.
 * @param options - the mass options it was read with.
 * @returns each element's count past that water (elements left with none are dropped).
 * @example
 * [...atomsPastWater(formulaMassDetail('CuSO4·5H2O'))] // [['Cu', '1'], ['S', '1'], ['O', '4']]
 */
export function atomsPastWater(m: MassDetail, options: MassOptions = {}): Map<string, string> {
  let water = 0;
  // water of crystallisation is written after a joining dot ('·', '*', '.'): without one there is none to look for
  if (/[·*.∙•⋅]/.test(m.input)) {
    try {
      const w = partShare(m, 'H2O', options);
      if (w.countedFrom === 'written') water = toDecimal(w.count).toNumber();
    } catch {
      water = 0;
    }
  }
  const out = new Map<string, string>();
  for (const [k, n] of m.atoms) {
    const left = toDecimal(n).minus(k === 'H' ? 2 * water : k === 'O' ? water : 0);
    if (!left.isZero()) out.set(k, left.toFixed());
  }
  return out;
}
