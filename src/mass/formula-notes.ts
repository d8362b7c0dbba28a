/**
 * The notes a formula's reading carries (a '.' read as the addition dot, an abbreviation
 * expanded, a state symbol set aside, an element with no standard atomic weight), for commands
 * that compute with the formula: every reading reaches their results too.
 */
import type { Note } from '../errors/issue.js';
import type { MassDetail } from './formula-mass.js';

/** Notes about the nominal mass matter only where the nominal mass is shown. */
const MASS_ONLY = new Set(['NON_INTEGER_COUNTS']);

/**
 * The reading notes of a formula; with `named`, each message starts with the formula as written,
 * for results that involve several formulas.
 *
 * @param m the formula's mass result
 * @param named whether to name the formula in each message
 * @returns the notes, in order
 * @example
 * formulaNotes(formulaMassDetail('CaSO4.0.5H2O'), true)[0].message // "CaSO4.0.5H2O: '.' at column 6 is read as the addition dot: CaSO4·0.5H2O"
 */
export function formulaNotes(m: MassDetail, named = false): Note[] {
  return m.notes.filter((n) => !MASS_ONLY.has(n.code)).map((n) => (named ? { ...n, message: `${m.input}: ${n.message}` } : n));
}
