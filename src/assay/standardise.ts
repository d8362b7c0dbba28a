/**
 * Standardising a titrant against a weighed primary standard (potassium
 * hydrogen phthalate for a base, sodium carbonate or tris for an acid): its
 * molarity from the standard's mass, purity and molar mass, the mole ratio of
 * the reaction, and the titre less any blank. A result from measurements, so
 * it keeps their significant figures.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS, VOLUME } from '../calc/measure.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';
import { noteHydrateWater } from './hydrate-note.js';
import { readPositive, readShare } from './read-quantity.js';
import { readMoleRatio, type MoleRatio } from './stoichiometric-ratio.js';

export interface StandardiseOptions extends MassOptions {
  /** Mass of primary standard weighed: '0.5105 g'. */
  mass: string;
  /** Titre: '24.95 mL'. */
  volume: string;
  /** Blank titre, subtracted: '0.03 mL'. */
  blank?: string;
  /** Mole ratio standard:titrant ('1:2' for Na2CO3 with HCl to CO2); 1:1 assumed with a note. */
  ratio?: string;
  /** Assay of the standard: '99.95 %'; taken as 100 % with a note when not given. */
  purity?: string;
}

export interface StandardiseResult {
  standard: MassDetail;
  mass: Quantity;
  purity: Quantity | null;
  titre: Quantity;
  blank: Quantity | null;
  netTitre: Quantity;
  ratio: MoleRatio;
  /** Moles of standard titrated. */
  moles: Quantity;
  /** The titrant's molarity, mol/L. */
  molarity: Quantity;
  notes: Note[];
}

/**
 * The molarity of a titrant from a primary-standard titration.
 *
 * @param standardText - the primary standard's formula: 'KHC8H4O4', 'Na2CO3'.
 * @param o - the mass weighed and the titre (required); blank, mole ratio, certified purity, atomic-weight options.
 * @returns the moles of standard, the net titre and the titrant's molarity (results), with notes (purity or ratio assumed, blank).
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_AMOUNT for a purity above 100 % or a titre less blank that is not positive; BAD_OPTION for a mole ratio not written A:B; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' })
 * displayQuantity(r.molarity, 'M').text // '0.1002 M'
 */
export function standardise(standardText: string, o: StandardiseOptions): StandardiseResult {
  const notes: Note[] = [];
  const standard = formulaMassDetail(standardText, o);
  for (const n of standard.notes) notes.push(n);
  noteHydrateWater(standard, notes);
  const mass = readPositive(o.mass, [MASS], 'the mass of standard', notes);
  const titre = readPositive(o.volume, [VOLUME], 'the titre', notes);
  const blank = o.blank === undefined ? null : readPositive(o.blank, [VOLUME], 'the blank titre', notes, true);
  let purity: Quantity | null = null;
  if (o.purity !== undefined) {
    purity = readShare(o.purity, 'the purity of the standard', notes, { bare: 'fraction', note: 'PURITY_AS_FRACTION' });
    notes.push({ code: 'PURITY_APPLIED', message: `the standard's assay ${displayQuantity(purity, '%').text} applied to its mass` });
  } else {
    notes.push({ code: 'PURITY_ASSUMED', message: 'the standard is taken as 100 % pure; give `purity` with its certified assay', options: ['purity'] });
  }
  const ratio = readMoleRatio(o.ratio, standard.input, 'titrant', notes);
  let netTitre = titre;
  const v = (q: Quantity) => displayQuantity(q, 'mL').text;
  if (blank) {
    netTitre = subtract(titre, blank);
    notes.push({ code: 'BLANK_SUBTRACTED', message: `blank ${v(blank)} subtracted from the titre ${v(titre)}: ${v(netTitre)}` });
    if (netTitre.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the titre less the blank is not positive (${v(netTitre)})` });
  } else {
    notes.push({ code: 'NO_BLANK', message: 'no blank given: the titre is used as read' });
  }
  const pure = purity ? multiply(mass, purity) : mass;
  const moles = divide(pure, quantity(reportedMolarMass(standard), unitOf('g/mol')));
  const molarity = divide(divide(moles, ratio.factor), netTitre);
  return { standard, mass, purity, titre, blank, netTitre, ratio, moles, molarity, notes };
}
