/**
 * The charge each common adduct term usually brings to an ion (common practice of
 * electrospray and chemical ionisation): a proton or an alkali cation +1, a halide or a
 * carboxylate -1, a neutral solvent 0. Taking a term away reverses its charge ([M-H]- loses a
 * proton). Used only to notice an unusual combination of terms and written charge, never to
 * change the charge written.
 */

/** Usual charge by the term's Hill formula. */
export const USUAL_CHARGE: Readonly<Record<string, number>> = Object.freeze({
  H: 1,
  Li: 1,
  Na: 1,
  K: 1,
  Rb: 1,
  Cs: 1,
  Ag: 1,
  H4N: 1, // NH4
  Mg: 2,
  Ca: 2,
  Cl: -1,
  Br: -1,
  I: -1,
  CHO2: -1, // HCOO
  C2H3O2: -1, // CH3COO
  C2F3O2: -1, // CF3COO
  H2O: 0,
  H3N: 0, // NH3
  CH4O: 0, // CH3OH
  C2H3N: 0, // CH3CN
  C2H6O: 0, // C2H5OH
  CH2O2: 0, // HCOOH
  C2H4O2: 0, // CH3COOH
  C2H6OS: 0, // DMSO
  CO2: 0,
});

/**
 * The charge the terms of an ion usually give, or null when a term is not in the table.
 *
 * @example
 * usualCharge([{ sign: 1, count: 2, formula: 'H' }])                                // 2
 * usualCharge([{ sign: 1, count: 1, formula: 'H' }, { sign: -1, count: 1, formula: 'H2O' }]) // 1
 */
export function usualCharge(terms: readonly { sign: 1 | -1; count: number; formula: string }[]): number | null {
  let z = 0;
  for (const t of terms) {
    const q = USUAL_CHARGE[t.formula];
    if (q === undefined) return null;
    z += t.sign * t.count * q;
  }
  return z;
}
