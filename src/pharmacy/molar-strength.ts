/**
 * A label strength as an amount concentration (mol/L) of a solute of known
 * molar mass: '0.9 %' (read as % w/v), '84 g/L', '0.154 M'. The one step
 * that `meq --concentration` and each solute of `osmolarity` share. A label's
 * nominal strength is taken as exact and the result kept at working
 * precision (noted); a measured strength keeps its significant figures.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';
import { isChargePerVolume, readChargePerVolume } from './equivalents-unit.js';
import { readStrength, type Strength } from './strength.js';
import { atWorkingPrecision } from './working-precision.js';

/** A strength read, and the solute's amount concentration it gives. */
export interface MolarStrength {
  strength: Strength;
  /** The solute's amount concentration, mol/L (at working precision unless measured). */
  molarity: Quantity;
}

/**
 * The amount concentration of a solute from a strength, with the NOMINAL_STRENGTH or MEASURED_STRENGTH note.
 *
 * @param text - the strength as written: '5 %', '50 g/L', '0.278 M'.
 * @param molarMass - the solute's molar mass, a Quantity in g/mol.
 * @param measured - true for a measured strength (its figures are kept), else a nominal label value.
 * @param notes - where the notes of the reading are added.
 * @returns the strength and the amount concentration, mol/L.
 * @throws PondusError: BAD_AMOUNT for a strength without a unit, a % w/w or v/v strength (it needs a density), or one that is not positive; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const notes = []
 * const m = molarStrength('0.9 %', quantity(exact('58.44'), unitOf('g/mol')), false, notes)
 * displayQuantity(m.molarity, 'mM').text // '154.0 mM'
 * notes.map((n) => n.code) // ['PERCENT_AS_W_V', 'NOMINAL_STRENGTH']
 */
export function molarStrength(text: string, molarMass: Quantity, measured: boolean | undefined, notes: Note[]): MolarStrength {
  const read: Note[] = [];
  const strength = readStrength(text, 'w/v', read, 'the strength');
  // a nominal strength is exact: how many figures its zeros carry does not arise ('10 %' is not 1 figure)
  notes.push(...(measured ? read : read.filter((n) => !/: the trailing zeros of .* are read as not significant/.test(n.message))));
  if (strength.percent === 'w/w' || strength.percent === 'v/v') throw fail({ code: 'BAD_AMOUNT', message: `a % ${strength.percent} strength needs the solution's density to give mmol per mL; give it as % w/v, g/L or M` }, text);
  const q = strength.value;
  // an amount concentration as it is; a percent w/v (a pure fraction of g per mL) as g/L; a mass concentration over M
  const perL = q.dims[1] === 1 ? q : divide(q.dims[0] === 0 ? multiply(q, quantity(exact(1000), unitOf('g/L'))) : q, molarMass);
  notes.push(strengthKindNote(text, measured));
  return { strength, molarity: measured ? perL : atWorkingPrecision(perL) };
}

/** The note saying how a strength is taken: a label's nominal value (exact), or a measured one. */
function strengthKindNote(text: string, measured: boolean | undefined): Note {
  return measured
    ? { code: 'MEASURED_STRENGTH', message: 'the strength is a measured value: the results keep its significant figures' }
    : { code: 'NOMINAL_STRENGTH', message: `the strength '${text.trim()}' is read as a label's nominal value, taken as exact; results keep working precision (4 figures); use \`measured: true\` for a measured strength`, options: ['measured'] };
}

/**
 * Whether a strength is written in equivalents (mEq or Eq per something): what a salt's strength
 * may be given in, and a non-electrolyte's may not.
 *
 * @example
 * isEquivalentsStrength('20 mEq/L') // true
 * isEquivalentsStrength('0.9 %') // false
 */
export function isEquivalentsStrength(text: string): boolean {
  return isChargePerVolume(text);
}

/**
 * The amount concentration of a salt from a strength written in equivalents per volume ('20
 * mEq/L', '2 mEq/mL', as electrolyte solutions are labelled): the strength in mmol of charge per
 * volume over the salt's mEq per mmol, with a note naming that reading and the NOMINAL_STRENGTH
 * or MEASURED_STRENGTH note. A neutral salt carries as many equivalents of cation as of anion, so
 * the one number of mEq per mmol settles it. Null when the text is not in equivalents.
 *
 * @param text - the strength as written: '20 mEq/L'.
 * @param salt - the salt's formula as given, for the note.
 * @param equivalentsPerMole - the salt's mEq per mmol (its cations' total charge per formula unit).
 * @param measured - true for a measured strength (its figures are kept), else a nominal label value.
 * @param notes - where the notes of the reading are added.
 * @returns the strength (as an amount concentration of charge) and the salt's amount concentration, mol/L; null for a text not in mEq or Eq per volume.
 * @throws PondusError: BAD_AMOUNT for equivalents per something other than a volume of solution, or a value that is not positive; a number that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, NUMBER_OUT_OF_RANGE).
 * @example
 * const notes = []
 * const m = equivalentStrength('40 mEq/L', 'CaCl2', 2, false, notes)
 * displayQuantity(m.molarity, 'mM').text // '20.00 mM'
 * notes.map((n) => n.code) // ['EQUIVALENTS_STRENGTH', 'NOMINAL_STRENGTH']
 * equivalentStrength('0.9 %', 'NaCl', 1, false, []) // null
 */
export function equivalentStrength(text: string, salt: string, equivalentsPerMole: number, measured: boolean | undefined, notes: Note[]): MolarStrength | null {
  const read: Note[] = [];
  const m = readChargePerVolume(text, 'the strength', read);
  if (!m) return null;
  const q = m.value;
  const charge: Strength = { value: q, percent: null, defaulted: false };
  if (measured) notes.push(...read);
  const eq = `${equivalentsPerMole} mEq per mmol`;
  notes.push({
    code: 'EQUIVALENTS_STRENGTH',
    message: `the strength '${text.trim()}' is read as ${m.eq} of either ion of ${salt} per ${m.per} (a neutral salt carries as many of its cation as of its anion): at ${eq}, the salt's amount concentration is the strength${equivalentsPerMole === 1 ? '' : ` divided by ${equivalentsPerMole}`}`,
  });
  const perL = divide(q, quantity(exact(equivalentsPerMole), null));
  notes.push(strengthKindNote(text, measured));
  return { strength: charge, molarity: measured ? perL : atWorkingPrecision(perL) };
}
