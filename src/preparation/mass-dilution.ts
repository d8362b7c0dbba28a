/**
 * Dilution on a mass basis, for a solid (a trituration) or a semisolid (a
 * cream or ointment let down with its base): the mass of the stronger
 * material to take for a total mass of a weaker one, and the mass of diluent
 * (masses add up exactly, unlike volumes).
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { refuseNotWeaker } from './dilution.js';
import { MASS, PURE } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { divide, multiply, subtract, type Quantity } from '../sigfig/quantity.js';
import { fewFiguresNote, inputFigures, instruction, type Instruction } from '../sigfig/instruction.js';
import { smallMassWarning } from './warnings.js';

export interface MassDilutionResult {
  stock: Quantity;
  target: Quantity;
  total: Quantity;
  /** Mass of the stronger material to take (an instruction). */
  take: Instruction;
  /** Mass of diluent (base, filler) to add (an instruction). */
  diluent: Instruction;
  /** The dilution factor, stock ÷ target. */
  factor: Quantity;
  written: { stock: string; target: string; total: string };
  notes: Note[];
}

function readContent(text: string, what: string, notes: Note[]): Quantity {
  const t = text.trim();
  const kind = /%\s*(w\/w|w\/v|v\/v)\s*$/i.exec(t);
  if (kind && kind[1].toLowerCase() !== 'w/w') {
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `${what} '${t}' is per volume; a dilution by mass needs contents by mass (% w/w, mg/g, mg/kg)` }, text);
  }
  const q = readPositive(t, [PURE], what, notes);
  if (!q.unit) throw fail({ code: 'BAD_AMOUNT', message: `${what} needs a unit: % w/w, mg/g, µg/g or mg/kg; got '${t}'` }, text);
  if (q.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `${what} is more than 100 %: '${t}'` }, text);
  if (!kind && /%$/.test(t)) notes.push({ code: 'PERCENT_AS_W_W', message: `${what}: % is read as % w/w (grams per 100 g), as a dilution by mass needs` });
  return q;
}

/**
 * A dilution by mass: how much of the stronger material and of the diluent to weigh.
 *
 * @param stockText - the content of the stronger material, by mass (% w/w, mg/g, µg/g, mg/kg).
 * @param targetText - the target content, by mass.
 * @param totalText - the total mass to make.
 * @returns the masses of the stronger material and of the diluent to weigh (instructions at working precision), and the notes.
 * @throws PondusError: INCOMPATIBLE_UNITS for a content per volume; BAD_AMOUNT for a content without a unit or above 100 %, a target not weaker than the stronger material, or a total mass that is not positive; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayInstruction(diluteByMass('10 % w/w', '2.5 % w/w', '60.0 g').take, 'g').text // '15.00 g'
 */
export function diluteByMass(stockText: string, targetText: string, totalText: string): MassDilutionResult {
  const notes: Note[] = [];
  const stock = readContent(stockText, 'the stronger material', notes);
  const target = readContent(targetText, 'the target', notes);
  refuseNotWeaker(stock.value, target.value, 'the stronger material');
  const total = readPositive(totalText, [MASS], 'the total mass', notes);
  const inputs = [inputFigures('the stronger material', stockText, stock), inputFigures('the target', targetText, target), inputFigures('the total mass', totalText, total)];
  const m1 = divide(multiply(target, total), stock);
  m1.unit = total.unit;
  const take = instruction(m1, inputs);
  const diluent = instruction(subtract(total, m1), inputs);
  const factor = divide(stock, target);
  const few = fewFiguresNote(take, 'the mass to take', `the mixture made is ${targetText.trim()}`);
  if (few) notes.push(few);
  const small = smallMassWarning(m1, 'the mass of the stronger material', 'make an intermediate trituration (geometric dilution) first');
  if (small) notes.push(small);
  notes.push({ code: 'GEOMETRIC_DILUTION', message: 'mix by geometric dilution: the stronger material with an equal mass of diluent, then double the portion each time until all the diluent is in (common practice)' });
  return { stock, target, total, take, diluent, factor, written: { stock: stockText.trim(), target: targetText.trim(), total: totalText.trim() }, notes };
}
