/**
 * Salt/parent conversion: the factor between a salt form of a compound and the
 * parent (free base or free acid), and the salt mass that carries a given mass
 * of parent.
 */
import { formulaNotes } from '../mass/formula-notes.js';
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, massUnitFor, type Instruction } from '../sigfig/instruction.js';
import { smallMassWarning } from './warnings.js';
import { MASS, measureAs } from '../calc/measure.js';
import { partShare } from '../composition/part-share.js';
import { Decimal } from '../exact/decimal.js';
import { toDecimal } from '../formula/amount.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { dividedBy, exact, times, type Measured } from '../sigfig/measured.js';
import { divide, multiply, quantity, type Quantity } from '../sigfig/quantity.js';

export interface SaltFactorResult {
  salt: MassDetail;
  parent: MassDetail;
  /** Parent units per salt formula unit. */
  perSalt: Decimal;
  /** M(salt) / (n · M(parent)): grams of salt per gram of parent. */
  factor: Decimal;
  reported: Measured;
  /** The dose of parent asked about. */
  dose: Quantity | null;
  /** Salt mass carrying the dose of parent, g (an instruction, at working precision). */
  saltMass: Instruction | null;
  /** The salt mass given. */
  saltGiven: Quantity | null;
  /** Parent mass carried by the salt mass given, g (a result). */
  parentMass: Quantity | null;
  notes: Note[];
}

export interface SaltOptions extends MassOptions {
  /** A mass of parent (a dose): the salt mass that carries it is an instruction. */
  parentMass?: string;
  /** A mass of salt: the parent mass it carries is a result. */
  saltMass?: string;
}

/**
 * The salt/parent factor, and conversions of masses either way: the salt mass
 * for a dose of parent (an instruction), the parent carried by a salt mass (a
 * result).
 *
 * @example
 * saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3').factor.toFixed(4) // '1.3172'
 */
export function saltFactor(saltText: string, parentText: string, options: SaltOptions = {}): SaltFactorResult {
  const notes: Note[] = [];
  const salt = formulaMassDetail(saltText, options);
  const parent = formulaMassDetail(parentText, options);
  const share = partShare(salt, parentText, options);
  const perSalt = toDecimal(share.count);
  if (share.countedFrom !== 'written') throw fail({ code: 'BAD_OPTION', message: `${parent.formula} is not written as a part of ${saltText}; write the salt as parent·acid (e.g. C17H19NO3·HCl)` });
  const factor = salt.molarMass.div(parent.molarMass.times(perSalt));
  const reported = dividedBy(reportedMolarMass(salt), times(reportedMolarMass(parent), exact(perSalt)));
  let dose: Quantity | null = null;
  let saltMass: Instruction | null = null;
  let saltGiven: Quantity | null = null;
  let parentMass: Quantity | null = null;
  if (options.parentMass !== undefined) {
    dose = measureAs(options.parentMass, [MASS], 'the dose', notes);
    if (dose.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the dose must be positive' });
    const m = multiply(dose, quantity(reported, null));
    m.unit = dose.unit;
    saltMass = instruction(m, [inputFigures('the dose', options.parentMass, dose)]);
    const few = fewFiguresNote(saltMass, 'the salt mass', `the dose given is ${options.parentMass.trim()} of parent`);
    if (few) notes.push(few);
    const small = smallMassWarning(m, `the salt mass, ${displayInstruction(saltMass, massUnitFor(m)).text},`, 'if it is to be weighed, weigh a larger amount and take an aliquot of a solution or trituration');
    if (small) notes.push(small);
  }
  if (options.saltMass !== undefined) {
    saltGiven = measureAs(options.saltMass, [MASS], 'the salt mass', notes);
    if (saltGiven.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the salt mass must be positive' });
    parentMass = divide(saltGiven, quantity(reported, null));
    parentMass.unit = saltGiven.unit;
  }
  notes.unshift(...formulaNotes(salt, true), ...formulaNotes(parent, true));
  return { salt, parent, perSalt, factor, reported, dose, saltMass, saltGiven, parentMass, notes };
}

/** Non-throwing {@link saltFactor}. */
export function safeSaltFactor(salt: string, parent: string, options: SaltOptions = {}): SafeResult<SaltFactorResult> {
  return toSafe(() => saltFactor(salt, parent, options));
}
