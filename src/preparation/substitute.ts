/**
 * Using one form of a reagent for another: the pentahydrate for the anhydrous
 * salt, or one hydrate for another. Equal amounts of formula units, so the
 * mass scales with the molar masses.
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { AMOUNT, MASS, measureAs } from '../calc/measure.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, type InputFigures, type Instruction } from '../sigfig/instruction.js';
import { readPurity } from './purity.js';
import { smallMassWarning } from './warnings.js';
import { atomsPastWater } from './past-water.js';
import { formRelation } from './form-relation.js';
import { exact } from '../sigfig/measured.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { sameDims, unitOf } from '../sigfig/units.js';
import { speciesText } from './species.js';

export interface SubstituteResult {
  /** The form in hand. */
  use: MassDetail;
  /** The form the recipe names. */
  instead: MassDetail;
  /** The amount the recipe asks for. */
  asked: Quantity;
  /** Amount of formula units, mol (an instruction). */
  moles: Instruction;
  /** The assay of the form in hand (null when none given). */
  purity: Quantity | null;
  /** Mass of the pure form in hand, g (an instruction). */
  pureMass: Instruction;
  /** Mass of the form in hand to weigh, g, allowing for its assay (an instruction). */
  mass: Instruction;
  notes: Note[];
}

export interface SubstituteOptions extends MassOptions {
  /** The assay of the form in hand, the one weighed: '98.0 %'. The amount asked for is of the pure form named. */
  purity?: string;
}

/**
 * How much of `use` to weigh in place of an amount of `instead` (an
 * instruction, at working precision). An assay given is that of `use`, the
 * form in hand that is weighed; the amount asked for is of pure `instead`.
 *
 * @param use - the formula of the form in hand, the one weighed.
 * @param instead - the formula of the form the amount is asked for in.
 * @param amount - the amount of pure `instead` wanted, as a mass or in moles ('24.65 g').
 * @param options - the purity (assay) of the form in hand, and the mass options.
 * @returns the mass of `use` to weigh (an instruction at working precision), the moles asked for, and the notes.
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); FORMS_UNRELATED when the two are, past water of crystallisation, neither the same salt nor a salt and its free base with a common acid (NaCl for Na2CO3·10H2O, FeCl3 for FeCl2); BAD_AMOUNT for an amount that is not positive or a purity not above 0 and at most 100 %; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayInstruction(substituteForm('MgSO4', 'MgSO4·7H2O', '24.65 g', { purity: '98.0 %' }).mass, 'g').text // '12.28 g'
 */
export function substituteForm(use: string, instead: string, amount: string, options: SubstituteOptions = {}): SubstituteResult {
  const u = formulaMassDetail(use, options);
  const i = formulaMassDetail(instead, options);
  const notes: Note[] = [];
  const asked = measureAs(amount, [MASS, AMOUNT], `the amount of ${instead}`, notes);
  if (asked.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the amount must be positive' });
  const gPerMol = unitOf('g/mol');
  const n = sameDims(asked.dims, MASS) ? divide(asked, quantity(reportedMolarMass(i), gPerMol)) : asked;
  const relation = formRelation(atomsPastWater(u, options), atomsPastWater(i, options));
  if (relation === null) {
    throw fail({
      code: 'FORMS_UNRELATED',
      message: `${speciesText(u)} is not a form of ${speciesText(i)}: past water of crystallisation they are neither the same salt nor a salt and its free base with an acid (HCl, H2SO4, …), so weighing one in place of the other is a different substance, not a different form`,
      hint: `weigh ${i.input.trim()} itself, or one of its hydrates`,
    });
  }
  // formula units of the form in hand for one of the form asked for: a salt of k bases for k of its base, and back
  const k = relation.kind === 'salt' ? relation.basesPerSalt : 1;
  const nUse = k === 1 ? n : relation.kind === 'salt' && relation.salt === 'first' ? divide(n, quantity(exact(k), null)) : multiply(n, quantity(exact(k), null));
  const pm = multiply(nUse, quantity(reportedMolarMass(u), gPerMol));
  let purity: Quantity | null = null;
  const inputs: InputFigures[] = [inputFigures(`the amount of ${instead.trim()}`, amount, asked)];
  if (options.purity !== undefined) {
    purity = readPurity(options.purity, notes);
    inputs.push(inputFigures('the assay', options.purity, purity));
    notes.push({ code: 'PURITY_OF_FORM_WEIGHED', message: `the assay ${options.purity.trim()} is read as that of ${use.trim()}, the form weighed; the ${amount.trim()} of ${instead.trim()} is taken as pure` });
  }
  const moles = instruction(n, inputs);
  const pureMass = instruction(pm, inputs);
  const mass = instruction(purity ? divide(pm, purity) : pm, inputs);
  const few = fewFiguresNote(mass, 'the mass to weigh', null);
  if (few) notes.push(few);
  const small = smallMassWarning(mass.quantity, `the mass to weigh, ${displayInstruction(mass, massUnitFor(mass.quantity)).text},`, 'weigh a larger batch, or make a stock solution');
  if (small) notes.push(small);
  if (relation.kind === 'salt') {
    const [salt, base] = relation.salt === 'first' ? [u, i] : [i, u];
    const holds = `${speciesText(salt)} is ${relation.basesPerSalt === 1 ? '' : `${relation.basesPerSalt} `}${speciesText(base)} with ${relation.acids === 1 ? '' : `${relation.acids} `}${relation.acid}`;
    notes.push({
      code: 'FORMS_DIFFER',
      message: relation.basesPerSalt === 1
        ? `${holds} (a salt and its free base): the substitution keeps equal amounts of formula units`
        : `${holds} per formula unit: the substitution keeps equal amounts of ${speciesText(base)}, so 1 mol of ${speciesText(salt)} stands for ${relation.basesPerSalt} mol of ${speciesText(base)}`,
    });
  }
  notes.unshift(...formulaNotes(u, true), ...formulaNotes(i, true));
  return { use: u, instead: i, asked, moles, purity, pureMass, mass, notes };
}
