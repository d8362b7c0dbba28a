/**
 * Potency of a drug substance as weighed: a certificate gives it in µg/mg or
 * in % (as is, or on the anhydrous or dried basis, where it may exceed 100 %
 * against a reference standard); the potency as is, and the mass of powder
 * that holds a required amount of active (an instruction, at working
 * precision).
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS, PURE } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { unusedContents, convertSampleBasis, type SampleBasis, type SampleContent } from '../assay/sample-basis.js';
import { divide, type Quantity } from '../sigfig/quantity.js';
import { fewFiguresNote, inputFigures, instruction, type Instruction } from '../sigfig/instruction.js';
import { smallMassWarning } from '../preparation/warnings.js';

export interface PotencyOptions extends SampleContent {
  /** The basis the potency is given on: 'as-is' (the default, with a note), 'anhydrous', 'dried', 'solvent-free'. */
  basis?: SampleBasis;
  /** A mass of active needed: '500 mg'; gives the mass of powder to weigh. */
  need?: string;
}

export interface PotencyResult {
  /** The potency as given (a fraction of 1). */
  given: Quantity;
  basis: SampleBasis;
  /** The potency of the material as weighed (a result, with the figures of the certificate). */
  asIs: Quantity;
  /** The mass of active needed. */
  need: Quantity | null;
  /** The mass of powder to weigh (an instruction). */
  weigh: Instruction | null;
  notes: Note[];
}

/**
 * The potency as is, and the mass of powder for a required amount of active.
 *
 * @param text - the potency: '950. µg/mg', '101.2 %'.
 * @param options - the `basis` it is given on (with `water`, `loss` or `solvent`), and `need`, an amount of active to weigh for.
 * @returns the potency as is (a result) and, with `need`, the mass to weigh (an instruction at working precision).
 * @throws PondusError: a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_AMOUNT for a potency without a unit, above 100 % as is, or above 100 % once converted; USAGE for a water, loss or solvent content the basis does not use; the codes of the basis conversion (USAGE, BAD_AMOUNT); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayQuantity(potency('101.2 %', { basis: 'anhydrous', water: '4.8 %' }).asIs, '%').text // '96.3 %'
 * displayInstruction(potency('950. µg/mg', { need: '500. mg' }).weigh, 'mg').text // '526.3 mg'
 */
export function potency(text: string, options: PotencyOptions = {}): PotencyResult {
  const notes: Note[] = [];
  const given = readPositive(text, [PURE], 'the potency', notes);
  if (!given.unit) throw fail({ code: 'BAD_AMOUNT', message: `the potency needs a unit: µg/mg, mg/g or %; got '${text.trim()}'` }, text);
  const basis = options.basis ?? 'as-is';
  if (options.basis === undefined) notes.push({ code: 'POTENCY_AS_IS', message: `the potency ${text.trim()} is read as is (of the material as weighed); give \`basis: anhydrous\` (with \`water\`) or \`basis: dried\` (with \`loss\`) if the certificate gives it on that basis`, options: ['basis', 'water', 'loss'] });
  let asIs = given;
  if (basis === 'as-is') {
    const unused = unusedContents(options);
    if (unused.length) throw fail({ code: 'USAGE', message: `${unused.map((k) => `\`${k}\``).join(' and ')} would be ignored for a potency as is: leave ${unused.length === 1 ? 'it' : 'them'} out, or give the \`basis\` the potency is on`, options: [...unused, 'basis'] });
    if (given.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `a potency as is cannot exceed 100 % (1000 µg/mg): '${text.trim()}'; if the certificate gives it on the anhydrous or dried basis, say so (\`basis: anhydrous\` \`water: …\`)`, options: ['basis', 'water'] }, text);
  } else {
    const c = convertSampleBasis(given, basis, 'as-is', options);
    asIs = c.converted;
    notes.push(...c.notes.filter((n) => n.code !== 'ABOVE_100_PERCENT'));
    if (given.value.gt(1)) notes.push({ code: 'ABOVE_100_PERCENT', message: `the potency on the ${basis} basis is above 100 % (${text.trim()}): possible against a reference standard, within the method's uncertainty; the material as weighed is below it` });
    if (asIs.value.gt(1)) throw fail({ code: 'BAD_AMOUNT', message: `the potency as is comes out above 100 %: check the potency, its basis and the ${basis === 'dried' ? 'loss on drying' : 'water or solvent content'}` });
  }
  asIs.unit = given.unit;
  let need: Quantity | null = null;
  let weigh: Instruction | null = null;
  if (options.need !== undefined) {
    need = readPositive(options.need, [MASS], 'the amount of active needed', notes);
    const m = divide(need, asIs);
    m.unit = need.unit;
    weigh = instruction(m, [inputFigures('the amount needed', options.need, need), inputFigures('the potency', text, given)]);
    const few = fewFiguresNote(weigh, 'the mass to weigh', null);
    if (few) notes.push(few);
    const small = smallMassWarning(m, `the mass to weigh, ${m.value.times(1000).toSignificantDigits(4).toFixed()} mg,`, 'weigh a larger amount and take an aliquot of a solution or trituration');
    if (small) notes.push(small);
  }
  return { given, basis, asIs, need, weigh, notes };
}
