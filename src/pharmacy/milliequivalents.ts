/**
 * Milliequivalents, millimoles and milliosmoles of a salt. For a salt that
 * splits into ions (see salt-ions.ts): mmol = mass ÷ M; mEq = mmol × the
 * total charge of its cations per formula unit (for each ion, mmol of ion ×
 * |charge|); mOsm = mmol × the particles per formula unit, assuming complete
 * dissociation. Three directions:
 *
 * - a weighed mass → mmol, mEq, mOsm: a result, with the mass's figures;
 * - a target mEq or mmol → the mass of salt to weigh: an instruction, at
 *   working precision (four figures at least), with a note when the target has few;
 * - a label strength → mmol/mL, mEq/mL, mEq/L and mOsm/L: the label's nominal
 *   strength is taken as exact (noted) and the result kept at working
 *   precision, unless the strength is marked as measured.
 */
import type { Note } from '../errors/issue.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { AMOUNT, MASS } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { noteHydrateWater } from '../assay/hydrate-note.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { exact } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';
import { saltIons, type SaltIons } from './salt-ions.js';
import type { Strength } from './strength.js';
import { equivalentStrength, molarStrength, type MolarStrength } from './molar-strength.js';
import { EQUIVALENTS_UNITS, readChargeAmount } from './equivalents-unit.js';
import { atWorkingPrecision, noteFewFigures } from './working-precision.js';

export interface MilliequivalentOptions extends MassOptions {
  /** A weighed mass of the salt: '1.500 g'. */
  mass?: string;
  /** A target in milliequivalents: '20 mEq' (or '0.020 Eq'). */
  meq?: string;
  /** A target in millimoles: '10 mmol'. */
  mmol?: string;
  /** A solution strength: '10 % w/v', '2 mg/mL', '0.154 M', or in equivalents: '2 mEq/mL'. */
  concentration?: string;
  /** The strength was measured (keep its significant figures) rather than a label's nominal value. */
  measured?: boolean;
  /** The ions, when the salt is not split automatically: '2K^+,HPO4^2-'. */
  ions?: string;
}

export interface IonAmount {
  ion: string;
  charge: number;
  /** mmol (amount mode), or mmol per mL (strength mode), in base units of mol or mol/L. */
  amount: Quantity;
  /** mEq of this ion (as an amount of charge, stored in mol). */
  equivalents: Quantity;
}

export interface MilliequivalentResult {
  salt: MassDetail;
  ions: SaltIons;
  mode: 'mass' | 'target' | 'strength';
  /** The mass (given, or to weigh), g; null in strength mode. */
  mass: Quantity | null;
  /** Amount of salt (mol) or its molar concentration (mol/L). */
  moles: Quantity;
  /** Equivalents (mol of charge) or equivalents per litre. */
  equivalents: Quantity;
  /** Osmoles or osmoles per litre (complete dissociation). */
  osmoles: Quantity;
  perIon: IonAmount[];
  strength: Strength | null;
  notes: Note[];
}

/**
 * Reads an amount written in mEq/Eq (as an amount of charge, in mol) or in mmol.
 *
 * @param text - an amount of charge: '20 mEq', '0.020 Eq'.
 * @param notes - where notes on reading the number are added.
 * @returns the amount of charge as a Quantity in mol.
 * @throws PondusError: BAD_AMOUNT for a text not written in mEq or Eq, or a value that is not positive; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readEquivalents('20 mEq', []).value.toString() // '0.02'
 */
export function readEquivalents(text: string, notes: Note[]): Quantity {
  return readChargeAmount(text, 'the target', notes);
}

const G_PER_MOL = unitOf('g/mol');

/** A salt's strength not in equivalents; an unknown unit's hint names the equivalents units too, as a salt may be given in them. */
function saltStrength(text: string, M: Quantity, measured: boolean | undefined, notes: Note[]): MolarStrength {
  try {
    return molarStrength(text, M, measured, notes);
  } catch (e) {
    if (!(e instanceof PondusError) || e.first.code !== 'UNKNOWN_UNIT') throw e;
    throw new PondusError(e.issues.map((i, k) => (k === 0 ? { ...i, hint: `${i.hint ? `${i.hint}; ` : ''}a salt's strength also in equivalents: ${EQUIVALENTS_UNITS}` } : i)), e.input);
  }
}

/**
 * mmol, mEq and mOsm of a salt from a mass, a target, or a strength.
 *
 * @param saltText - the salt's formula: 'KCl', 'CaCl2·2H2O'.
 * @param o - exactly one of `mass` (a weighed mass), `meq` or `mmol` (a target) or `concentration` (a strength); `measured` for a measured strength; `ions` when the salt is not split automatically; atomic-weight options.
 * @returns the salt, its ions, the mode, the mass (given or to weigh), moles, equivalents and osmoles (in mol, or mol/L for a strength) and per ion; a mass for a target at working precision.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); USAGE for none or more than one of mass, meq, mmol and concentration; BAD_AMOUNT for a % w/w or v/v strength or an mEq target not written like '20 mEq'; BAD_CHARGE, BAD_OPTION, AMBIGUOUS_CHARGE or PART_NOT_IN_FORMULA when the salt's ions cannot be settled; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = milliequivalents('KCl', { concentration: '10 %' })
 * displayQuantity(r.equivalents, 'M').text // '1.341 M'
 */
export function milliequivalents(saltText: string, o: MilliequivalentOptions): MilliequivalentResult {
  const given = [o.mass, o.meq, o.mmol, o.concentration].filter((x) => x !== undefined).length;
  if (given !== 1) throw fail({ code: 'USAGE', message: given === 0 ? 'give one of `mass`, `meq`, `mmol` or `concentration`' : 'give only one of `mass`, `meq`, `mmol` and `concentration`', options: ['mass', 'meq', 'mmol', 'concentration'] });
  const notes: Note[] = [];
  const salt = formulaMassDetail(saltText, o);
  for (const n of salt.notes) notes.push(n);
  noteHydrateWater(salt, notes);
  const ions = saltIons(salt, o.ions, notes, o);
  const M = quantity(reportedMolarMass(salt), G_PER_MOL);
  const eqPer = quantity(exact(ions.equivalentsPerMole), null);
  const osmPer = quantity(exact(ions.particles), null);
  let mode: MilliequivalentResult['mode'];
  let mass: Quantity | null = null;
  let moles: Quantity;
  let strength: Strength | null = null;
  if (o.mass !== undefined) {
    mode = 'mass';
    mass = readPositive(o.mass, [MASS], 'the mass', notes);
    moles = divide(mass, M);
  } else if (o.concentration !== undefined) {
    mode = 'strength';
    const m = equivalentStrength(o.concentration, salt.input, ions.equivalentsPerMole, o.measured, notes) ?? saltStrength(o.concentration, M, o.measured, notes);
    strength = m.strength;
    moles = m.molarity;
  } else {
    mode = 'target';
    let target: Quantity;
    let text: string;
    if (o.meq !== undefined) {
      text = o.meq;
      const eq = readEquivalents(o.meq, notes);
      moles = divide(eq, eqPer);
      target = eq;
    } else {
      text = o.mmol!;
      moles = readPositive(o.mmol!, [AMOUNT], 'the target', notes);
      target = moles;
    }
    noteFewFigures(target, text, 'the target', notes);
    mass = atWorkingPrecision(multiply(moles, M));
    // the amount for a target is a specification too: at working precision ('10 mmol' is 10.00 mmol, not 1 × 10¹)
    moles = atWorkingPrecision(moles);
  }
  const fix = mode === 'mass' || (mode === 'strength' && o.measured) ? (q: Quantity) => q : atWorkingPrecision;
  const equivalents = fix(multiply(moles, eqPer));
  const osmoles = fix(multiply(moles, osmPer));
  const perIon = ions.ions.map((i) => {
    const amount = fix(multiply(moles, quantity(exact(i.count), null)));
    return { ion: i.ion, charge: i.charge, amount, equivalents: fix(multiply(amount, quantity(exact(Math.abs(i.charge)), null))) };
  });
  notes.push({ code: 'MEQ_PER_MMOL', message: `1 mmol of ${salt.input} = ${ions.equivalentsPerMole} mEq (${ions.ions.map((i) => `${i.count === 1 ? '' : `${i.count} × `}${i.ion}`).join(', ')}) and ${ions.particles} mOsm` });
  notes.push({ code: 'COMPLETE_DISSOCIATION', message: 'milliosmoles assume complete dissociation into the ions named; a measured osmolality is lower' });
  return { salt, ions, mode, mass, moles, equivalents, osmoles, perIon, strength, notes };
}
