/**
 * The names of a solution's solutes that `osmolarity` reads, besides formulas: only dextrose's,
 * because its name alone is a trap. Dextrose comes anhydrous (C6H12O6, 180.16 g/mol) and as the
 * monohydrate (C6H12O6·H2O, 198.17 g/mol), the dextrose hydrous that dextrose injections are
 * labelled in (source: labelling of 5% Dextrose Injection USP, "dextrose monohydrate, 5 g" per
 * 100 mL, 252 mOsmol/L calc); the two readings differ by about 10 % in mOsm/L. A name that says
 * which form is read as that form, with a note; 'dextrose' or 'glucose' alone is refused with both
 * readings. Every other solute is written as its formula.
 */

/** A reading of a solute's name: its formula and what the name was read as. */
export interface SoluteReading {
  formula: string;
  /** The form, in words: 'dextrose monohydrate (dextrose hydrous)'. */
  name: string;
}

/** What a solute's name stands for: one reading, or two when the name does not say which form. */
export type SoluteName = { kind: 'read'; reading: SoluteReading } | { kind: 'ambiguous'; readings: SoluteReading[] };

const MONOHYDRATE: SoluteReading = { formula: 'C6H12O6·H2O', name: 'dextrose monohydrate (dextrose hydrous)' };
const ANHYDROUS: SoluteReading = { formula: 'C6H12O6', name: 'anhydrous dextrose' };

/** Names of one form, by lower-case spelling with single spaces (common practice). */
const NAMED: Readonly<Record<string, SoluteReading>> = Object.freeze({
  'dextrose monohydrate': MONOHYDRATE,
  'dextrose hydrous': MONOHYDRATE,
  'hydrous dextrose': MONOHYDRATE,
  'glucose monohydrate': MONOHYDRATE,
  'd-glucose monohydrate': MONOHYDRATE,
  'anhydrous dextrose': ANHYDROUS,
  'dextrose anhydrous': ANHYDROUS,
  'anhydrous glucose': ANHYDROUS,
  'glucose anhydrous': ANHYDROUS,
  'anhydrous d-glucose': ANHYDROUS,
});

/** Names that could be either form. */
const EITHER = new Set(['dextrose', 'glucose', 'd-glucose']);

/**
 * What a solute written by name stands for, or null when the text is to be read as a formula.
 *
 * @param text - the solute as written: 'dextrose monohydrate', 'dextrose', 'NaCl'.
 * @returns the form the name says, both forms for a name that does not say which, or null for a text that is not such a name.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * soluteName('Dextrose monohydrate') // { kind: 'read', reading: { formula: 'C6H12O6·H2O', name: 'dextrose monohydrate (dextrose hydrous)' } }
 * soluteName('dextrose')?.kind // 'ambiguous'
 * soluteName('C6H12O6') // null
 */
export function soluteName(text: string): SoluteName | null {
  const key = text.trim().toLowerCase().replace(/\s+/g, ' ');
  if (EITHER.has(key)) return { kind: 'ambiguous', readings: [MONOHYDRATE, ANHYDROUS] };
  return Object.hasOwn(NAMED, key) ? { kind: 'read', reading: NAMED[key] } : null;
}
