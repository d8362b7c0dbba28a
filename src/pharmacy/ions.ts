/**
 * The ions pondus recognises when it splits a salt into the ions it gives in
 * solution: common cations and the anions of pharmacy and the bench, each
 * with its charge (common practice). Phosphates are listed by protonation
 * state as written in the formula (H2PO4⁻, HPO4²⁻, PO4³⁻): the charge of the
 * ion as written, not as it would be at another pH.
 */

export interface IonEntry {
  /** The formula as pondus parses it. */
  formula: string;
  /** A readable name. */
  name: string;
  /** Signed charge. */
  charge: number;
}

export const CATIONS: readonly IonEntry[] = Object.freeze([
  { formula: 'Na', name: 'sodium', charge: 1 },
  { formula: 'K', name: 'potassium', charge: 1 },
  { formula: 'Li', name: 'lithium', charge: 1 },
  { formula: 'NH4', name: 'ammonium', charge: 1 },
  { formula: 'Ca', name: 'calcium', charge: 2 },
  { formula: 'Mg', name: 'magnesium', charge: 2 },
  { formula: 'Zn', name: 'zinc', charge: 2 },
  { formula: 'Ba', name: 'barium', charge: 2 },
  { formula: 'Sr', name: 'strontium', charge: 2 },
  { formula: 'Al', name: 'aluminium', charge: 3 },
]);

export const ANIONS: readonly IonEntry[] = Object.freeze([
  { formula: 'Cl', name: 'chloride', charge: -1 },
  { formula: 'Br', name: 'bromide', charge: -1 },
  { formula: 'I', name: 'iodide', charge: -1 },
  { formula: 'F', name: 'fluoride', charge: -1 },
  { formula: 'NO3', name: 'nitrate', charge: -1 },
  { formula: 'HCO3', name: 'hydrogen carbonate (bicarbonate)', charge: -1 },
  { formula: 'CO3', name: 'carbonate', charge: -2 },
  { formula: 'SO4', name: 'sulfate', charge: -2 },
  { formula: 'H2PO4', name: 'dihydrogen phosphate', charge: -1 },
  { formula: 'HPO4', name: 'hydrogen phosphate', charge: -2 },
  { formula: 'PO4', name: 'phosphate', charge: -3 },
  { formula: 'CH3COO', name: 'acetate', charge: -1 },
  { formula: 'C3H5O3', name: 'lactate', charge: -1 },
  { formula: 'C6H11O7', name: 'gluconate', charge: -1 },
  { formula: 'C6H5O7', name: 'citrate', charge: -3 },
  { formula: 'OH', name: 'hydroxide', charge: -1 },
]);
