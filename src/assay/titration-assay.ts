/**
 * A titration assay: the percentage of an analyte in a weighed sample from the
 * titrant's molarity and the titre (less a blank), the mole ratio of the
 * reaction and the analyte's molar mass. A back-titration (residual
 * titration) takes the excess reagent added, or a blank titre of the reagent
 * alone, and titrates what is left. Significant figures follow the
 * measurements (OpenStax Chemistry 2e §1.5): the difference of titres keeps
 * the fewest decimals, the products and quotient the fewest figures.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { AMOUNT, MASS, MOLARITY, VOLUME } from '../calc/measure.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';
import { noteHydrateWater } from './hydrate-note.js';
import { readPositive } from './read-quantity.js';
import { readMoleRatio, type MoleRatio } from './stoichiometric-ratio.js';

export interface TitrationAssayOptions extends MassOptions {
  /** Mass of sample taken: '0.5012 g'. */
  sample: string;
  /** Molarity of the titrant: '0.1000 M'. */
  titrant: string;
  /** Titre, the volume of titrant used on the sample: '24.85 mL'. */
  volume: string;
  /** Blank titre: subtracted from the titre (direct), or the titre of the reagent alone (back-titration). */
  blank?: string;
  /** Mole ratio analyte:titrant (direct) or analyte:reagent (back-titration); 1:1 assumed with a note. */
  ratio?: string;
  /** Back-titration: the excess reagent added, as an amount: '50.00 mL of 0.1000 M' or '5.000 mmol'. */
  added?: string;
  /** Back-titration: mole ratio reagent:titrant; 1:1 assumed with a note. */
  reagentRatio?: string;
  /** Back-titration with a blank titre instead of a known amount added. */
  back?: boolean;
}

export interface TitrationAssayResult {
  analyte: MassDetail;
  kind: 'direct' | 'back';
  sample: Quantity;
  titrant: Quantity;
  titre: Quantity;
  blank: Quantity | null;
  /** Titre less blank (direct), or blank less titre (back-titration with a blank). */
  netTitre: Quantity;
  ratio: MoleRatio;
  reagentRatio: MoleRatio | null;
  /** Excess reagent added (back-titration), mol. */
  added: Quantity | null;
  /** Moles of analyte found. */
  moles: Quantity;
  /** Mass of analyte found, g. */
  mass: Quantity;
  /** Assay as a fraction of the sample (a pure number; show it with unit '%'). */
  assay: Quantity;
  notes: Note[];
}

const G_PER_MOL = unitOf('g/mol');

/**
 * The % assay of a sample by titration.
 *
 * @param analyteText - the analyte's formula: 'KHC8H4O4'.
 * @param o - the sample mass, titrant molarity and titre (required); blank, mole ratio, back-titration (`added`, `reagentRatio`, `back`), atomic-weight options.
 * @returns the net titre, moles of analyte, analyte mass and % assay (results, with the figures of the measurements), the kind of titration and the notes (ratio assumed, blank).
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_AMOUNT for a titre less blank that is not positive or a back-titration where nothing reacted; BAD_OPTION for a mole ratio not written A:B; USAGE for options that conflict (`added` with a blank, `reagentRatio` without a back-titration); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = titrationAssay('KHC8H4O4', { sample: '0.5000 g', titrant: '0.1000 M', volume: '24.40 mL' })
 * displayQuantity(r.assay, '%').text // '99.66 %'
 */
export function titrationAssay(analyteText: string, o: TitrationAssayOptions): TitrationAssayResult {
  const notes: Note[] = [];
  const analyte = formulaMassDetail(analyteText, o);
  for (const n of analyte.notes) notes.push(n);
  noteHydrateWater(analyte, notes);
  const sample = readPositive(o.sample, [MASS], 'the sample mass', notes);
  const titrant = readPositive(o.titrant, [MOLARITY], 'the titrant molarity', notes);
  const titre = readPositive(o.volume, [VOLUME], 'the titre', notes, true);
  const blank = o.blank === undefined ? null : readPositive(o.blank, [VOLUME], 'the blank titre', notes, true);
  const back = o.back || o.added !== undefined;
  let netTitre: Quantity;
  let moles: Quantity;
  let ratio: MoleRatio;
  let reagentRatio: MoleRatio | null = null;
  let added: Quantity | null = null;
  const v = (q: Quantity) => displayQuantity(q, 'mL').text;
  if (!back) {
    if (o.reagentRatio !== undefined) throw fail({ code: 'USAGE', message: '`reagentRatio` belongs to a back-titration: give `added` or `back` too', options: ['reagentRatio', 'added', 'back'] });
    ratio = readMoleRatio(o.ratio, analyte.input, 'titrant', notes);
    if (blank) {
      netTitre = subtract(titre, blank);
      notes.push({ code: 'BLANK_SUBTRACTED', message: `blank ${v(blank)} subtracted from the titre ${v(titre)}: ${v(netTitre)}` });
    } else {
      netTitre = titre;
      notes.push({ code: 'NO_BLANK', message: 'no blank given: the titre is used as read' });
    }
    if (netTitre.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: `the titre less the blank is not positive (${v(netTitre)})` });
    moles = multiply(multiply(titrant, netTitre), ratio.factor);
  } else {
    ratio = readMoleRatio(o.ratio, analyte.input, 'reagent', notes);
    reagentRatio = readMoleRatio(o.reagentRatio, 'reagent', 'titrant', notes, 'reagentRatio');
    if (o.added !== undefined && blank) throw fail({ code: 'USAGE', message: 'a back-titration takes either `added` (the excess reagent) or `blank` (the titre of the reagent alone), not both', options: ['added', 'blank'] });
    if (o.added !== undefined) {
      added = readPositive(o.added, [AMOUNT], 'the reagent added', notes);
      const left = multiply(multiply(titrant, titre), reagentRatio.factor);
      netTitre = titre;
      const reacted = subtract(added, left);
      notes.push({ code: 'BACK_TITRATION', message: `back-titration: reagent added ${displayQuantity(added, 'mmol').text}, left over ${displayQuantity(left, 'mmol').text} (from the titre), reacted ${displayQuantity(reacted, 'mmol').text}` });
      if (reacted.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the reagent left over is not less than the reagent added: nothing reacted with the sample' });
      moles = multiply(reacted, ratio.factor);
    } else {
      if (!blank) throw fail({ code: 'USAGE', message: 'a back-titration needs `added` (the excess reagent, e.g. `added: "50.00 mL of 0.5000 M"`) or `blank` (the titre of the reagent alone)', options: ['added', 'blank'] });
      netTitre = subtract(blank, titre);
      notes.push({ code: 'BLANK_DIFFERENCE', message: `back-titration against a blank: blank ${v(blank)} less the sample titre ${v(titre)} = ${v(netTitre)}` });
      if (netTitre.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'in a back-titration the blank titre must exceed the sample titre' });
      moles = multiply(multiply(multiply(titrant, netTitre), reagentRatio.factor), ratio.factor);
    }
  }
  const M = quantity(reportedMolarMass(analyte), G_PER_MOL);
  const mass = multiply(moles, M);
  const assay = divide(mass, sample);
  if (assay.value.gt(1.1)) notes.push({ code: 'ASSAY_ABOVE_100', message: `the assay comes to ${displayQuantity(assay, '%').text} of the sample: check the ratio, the molarity and the masses` });
  return { analyte, kind: back ? 'back' : 'direct', sample, titrant, titre, blank, netTitre, ratio, reagentRatio, added, moles, mass, assay, notes };
}
