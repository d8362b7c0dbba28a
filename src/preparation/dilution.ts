/**
 * Dilution, C1·V1 = C2·V2: the volume of stock to take for a final volume of
 * a weaker solution (an instruction, at working precision), and from the
 * volume actually taken, the concentration made (a result).
 */
import type { Issue, Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import type { Decimal } from '../exact/decimal.js';
import { typedIssue } from '../errors/message.js';
import { MASS_CONCENTRATION, MOLARITY, PURE, VOLUME, measureAs } from '../calc/measure.js';
import { partsPerAsMassPerVolume } from './parts-per.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { baseUnitText, notReadHint, pow10, sameDims } from '../sigfig/units.js';
import { exact } from '../sigfig/measured.js';
import { isChargePerVolume, readChargePerVolume } from '../pharmacy/equivalents-unit.js';
import { checkInputLength } from '../errors/input-length.js';
import { MAX_EXPRESSION_LENGTH } from '../calc/parse-expression.js';
import { displayInstruction, fewFiguresNote, inputFigures, instruction, volumeUnitFor, type Instruction } from '../sigfig/instruction.js';
import { dilutionWarning } from './warnings.js';

export interface DilutionOptions {
  /** The target concentration: '0.100 M'. Optional when `taken` is given. */
  target?: string;
  /** The final volume: '250.0 mL'. */
  volume: string;
  /** The volume of stock actually taken: '25.00 mL'. Gives the concentration made (a result). */
  taken?: string;
}

export interface DilutionResult {
  stock: Quantity;
  /** The target concentration (null when only the volume taken was given). */
  target: Quantity | null;
  finalVolume: Quantity;
  /** Volume of stock to take (an instruction). */
  stockVolume: Instruction | null;
  /** Volume of solvent to make up with (approximately: volumes need not be additive); an instruction. */
  solventVolume: Instruction | null;
  /** The dilution factor C1/C2 (for the target), or V2/V1 (for the volume taken). */
  factor: Quantity;
  /** The volume of stock actually taken. */
  taken: Quantity | null;
  /** The concentration made from the volume taken (a result). */
  made: Quantity | null;
  /**
   * The unit `made` is stated in when the vocabulary has none for it: the stock's equivalents unit
   * as written ('mEq/mL'), `made` then being the number in that unit; null otherwise.
   */
  madeUnit: string | null;
  /** The inputs as written. */
  written: { stock: string; target: string | null; volume: string; taken: string | null };
  notes: Note[];
}

/** From this molarity (mol/L) a stock is taken as concentrated (concentrated HCl is about 12 M, H2SO4 18 M): common practice. */
const CONCENTRATED_MOLARITY = 5;

const PERCENT_KIND = /%\s*(w\/v|v\/v)?\s*$/i;

/**
 * A strength in % with no kind is read as per volume (% w/v or % v/v, one kind for both): a
 * C1·V1 = C2·V2 dilution needs that, and a label strength by mass (37 % HCl is % w/w) is not it.
 * Two kinds written that differ are refused.
 */
function percentReading(stockText: string, targetText: string | undefined, notes: Note[]): void {
  const kinds = [stockText, targetText].map((t) => (t === undefined ? undefined : PERCENT_KIND.exec(t.trim())));
  const [s, t] = kinds;
  if (s?.[1] && t?.[1] && s[1].toLowerCase() !== t[1].toLowerCase()) {
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `the stock is % ${s[1].toLowerCase()} and the target % ${t[1].toLowerCase()}: a dilution needs one kind for both` }, stockText);
  }
  const bare = [s, t].filter((k) => k && !k[1]);
  if (bare.length === 0) return;
  const kind = s?.[1] ?? t?.[1];
  // % w/v is a mass per volume, a bare % a share: the two cannot be set against each other
  if (kind && kind.toLowerCase() === 'w/v') {
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `one strength is % w/v and the other a bare %: write % w/v after both (or % v/v after both)` }, stockText);
  }
  notes.push({
    code: 'PERCENT_PER_VOLUME',
    message: `% is read as ${kind ? `% ${kind.toLowerCase()}, as the other strength is written` : 'a strength per volume (% w/v or % v/v, the same for stock and target)'}, as C1·V1 = C2·V2 needs; a label strength by mass, such as 37 % HCl (% w/w), is not one: use \`concentratedReagent\` with its density, or \`diluteByMass\``,
    functions: ['concentratedReagent', 'diluteByMass'],
  });
}

/**
 * The stock volume for a dilution.
 *
 * @param stockText - the stock concentration (M, g/L, % w/v, % v/v, …).
 * @param targetText - the target concentration, of the same kind as the stock, or undefined when only the volume taken is given.
 * @param volumeText - the final volume made up to.
 * @param takenText - the volume of stock actually taken, for the concentration made (a result).
 * @returns the stock and solvent volumes (instructions at working precision) when a target is given, the concentration made from the volume taken when one is given, the factor and the notes.
 * @throws PondusError: INCOMPATIBLE_UNITS for a content by mass (% w/w, mg/kg, …) or stock and target of different kinds; BAD_OPTION for neither a target nor a volume taken; BAD_AMOUNT for a concentration or volume that is not positive, a target above the stock or equal to it (a factor of 1 is no dilution), or a volume taken that is not positive or is more than the final volume; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayInstruction(dilute('1.00 M', '0.100 M', '250.0 mL').stockVolume).text // '25.00 mL'
 */
export function dilute(stockText: string, targetText: string | undefined, volumeText: string, takenText?: string): DilutionResult {
  const kinds = [MOLARITY, MASS_CONCENTRATION, PURE];
  const notes: Note[] = [];
  for (const t of [stockText, targetText]) {
    if (t !== undefined && /(%\s*w\/w|mg\/kg|mg\/g|µg\/g|µg\/mg|ug\/g)\s*$/i.test(t.trim())) {
      throw fail({ code: 'INCOMPATIBLE_UNITS', message: `'${t.trim()}' is a content by mass: made up to a volume, a dilution needs strengths per volume (M, g/L, % w/v, % v/v) or the densities; to let down a solid or semisolid by mass, give \`mass\` (the total) instead of \`volume\``, options: ['mass', 'volume'] }, t);
    }
  }
  const opaque = targetText !== undefined ? sameUnreadUnit(stockText, targetText) : null;
  if (opaque) {
    notes.push({ code: 'UNIT_NOT_CONVERTED', message: `${opaque.unit} is not a unit pondus reads, but the stock and the target are both in it: the dilution factor is their ratio, as C1·V1 = C2·V2 holds in any one unit; nothing is converted` });
  }
  // equivalents per volume (2 mEq/mL to 20 mEq/L): like strengths, read as amounts of charge per volume
  const charge = opaque ? null : chargeStrengths(stockText, targetText, notes);
  let stock = charge ? charge.stock : measureAs(opaque ? opaque.stock : stockText, kinds, 'the stock concentration', notes);
  percentReading(stockText, targetText, notes);
  if (targetText === undefined && takenText === undefined) throw fail({ code: 'BAD_OPTION', message: 'give the target concentration, or the volume of stock taken (or both)' });
  let target = charge ? charge.target : targetText !== undefined ? measureAs(opaque ? opaque.target : targetText, kinds, 'the target concentration', notes) : null;
  // ppm or ppb against a mass per volume (1000 ppm to 10.0 µg/L): the fraction read as mg/L or µg/L, with its note
  if (target && sameDims(stock.dims, PURE) && sameDims(target.dims, MASS_CONCENTRATION)) stock = partsPerAsMassPerVolume(stock, stockText, notes)?.conc ?? stock;
  if (target && sameDims(target.dims, PURE) && sameDims(stock.dims, MASS_CONCENTRATION)) target = partsPerAsMassPerVolume(target, targetText!, notes)?.conc ?? target;
  if (target && !sameDims(stock.dims, target.dims)) throw fail(kindsDiffer(stock, target));
  const finalVolume = measureAs(volumeText, [VOLUME], 'the final volume', notes);
  if (stock.value.lte(0) || (target && target.value.lte(0)) || finalVolume.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'concentrations and volume must be positive' });
  if (target) refuseNotWeaker(stock.value, target.value, 'the stock');
  if (!charge && sameDims(stock.dims, MOLARITY) && stock.value.gte(CONCENTRATED_MOLARITY)) {
    notes.push({ code: 'CONCENTRATED_STOCK', message: `the stock, ${stockText.trim()}, is concentrated: if it is an acid or a base, wear eye and hand protection, work in a fume hood, and add it slowly to most of the water (acid to water, never water to acid), cooling, before making up to volume (common practice); follow its SDS` });
  }

  let stockVolume: Instruction | null = null;
  let solventVolume: Instruction | null = null;
  let factor: Quantity | null = null;
  if (target) {
    const inputs = [inputFigures('the stock', stockText, stock), inputFigures('the target', targetText!, target), inputFigures('the final volume', volumeText, finalVolume)];
    const v1 = divide(multiply(target, finalVolume), stock);
    v1.unit = finalVolume.unit;
    stockVolume = instruction(v1, inputs);
    solventVolume = instruction(subtract(finalVolume, v1), inputs);
    factor = divide(stock, target);
    const few = fewFiguresNote(stockVolume, 'the volume to take', `the solution made is ${targetText!.trim()}`);
    if (few) notes.push(few);
    const shown = displayInstruction(stockVolume, volumeUnitFor(v1, finalVolume.unit)).text;
    const w = dilutionWarning(v1, factor.value, shown);
    if (w) notes.push(w);
  }
  let taken: Quantity | null = null;
  let made: Quantity | null = null;
  let madeUnit: string | null = null;
  if (takenText !== undefined) {
    taken = measureAs(takenText, [VOLUME], 'the volume taken', notes);
    if (taken.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume taken must be positive' });
    if (taken.value.gt(finalVolume.value)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume taken is more than the final volume' });
    made = divide(multiply(stock, taken), finalVolume);
    made.unit = stock.unit;
    // in equivalents: the number in the stock's unit as written, as for a unit carried through unconverted
    if (charge) {
      made = multiply(made, quantity(exact(pow10(charge.toWritten)), null));
      // a number in the stock's equivalents unit, which only the written unit names: not a molarity
      made = { ...made, dims: PURE, unit: null };
      madeUnit = charge.unitText;
    }
    if (!factor) factor = divide(finalVolume, taken);
    notes.push({ code: 'MADE_FROM_TAKEN', message: `the concentration made is computed from the volume taken, ${takenText.trim()}: a result, with the figures of the measurements` });
  }
  const written = { stock: stockText.trim(), target: targetText?.trim() ?? null, volume: volumeText.trim(), taken: takenText?.trim() ?? null };
  return { stock, target, finalVolume, stockVolume, solventVolume, factor: factor!, taken, made, madeUnit, written, notes };
}

/**
 * A stock and a target in equivalents per volume ('2 mEq/mL' to '20 mEq/L', '20 meq/l'), read as
 * amounts of charge per volume (held in mol/L) with a note; null when neither is in equivalents.
 * One in equivalents and the other in mol or g is refused: the conversion needs the salt's charge.
 */
function chargeStrengths(stockText: string, targetText: string | undefined, notes: Note[]): { stock: Quantity; target: Quantity | null; toWritten: number; unitText: string } | null {
  // a text past the limit is refused before either is looked at, naming which it is
  checkInputLength(stockText, 'the stock concentration', MAX_EXPRESSION_LENGTH);
  if (targetText !== undefined) checkInputLength(targetText, 'the target concentration', MAX_EXPRESSION_LENGTH);
  const s = isChargePerVolume(stockText);
  const t = targetText !== undefined && isChargePerVolume(targetText);
  if (!s && !t) return null;
  if (targetText !== undefined && s !== t) {
    const [eq, other] = s ? [stockText, targetText] : [targetText, stockText];
    throw fail({ code: 'INCOMPATIBLE_UNITS', message: `the ${s ? 'stock' : 'target'}, '${eq.trim()}', is in equivalents and the ${s ? 'target' : 'stock'}, '${other.trim()}', is not: equivalents and moles or grams convert only through the salt's charge (mEq per mmol); give both in equivalents, or convert one first with \`milliequivalents\``, functions: ['milliequivalents'] }, s ? targetText : stockText);
  }
  const stock = readChargePerVolume(stockText, 'the stock concentration', notes)!;
  const target = targetText !== undefined ? readChargePerVolume(targetText, 'the target concentration', notes)! : null;
  notes.push({ code: 'EQUIVALENTS_DILUTED', message: `the stock${target ? ' and the target are' : ' is'} read in equivalents per volume (${stock.eq}/${stock.per}${target ? `, ${target.eq}/${target.per}` : ''}): the dilution factor is the ratio of the two amounts of charge per volume, for whatever salt it is` });
  return { stock: stock.value, target: target?.value ?? null, toWritten: stock.toWritten, unitText: `${stock.eq}/${stock.per}` };
}

/**
 * The numbers of a stock and a target written in one and the same unit that pondus does not read
 * (5000 IU/mL to 100 IU/mL, 2.00 mEq/mL to 0.200 mEq/mL), or null: a dilution needs only their
 * ratio, so the unit is carried through unconverted.
 */
function sameUnreadUnit(stockText: string, targetText: string): { unit: string; stock: string; target: string } | null {
  const split = (t: string) => /^\s*([-+]?(?:[0-9]+\.?[0-9]*|\.[0-9]+)(?:[eE][-+]?[0-9]+)?)\s*([A-Za-zµμ][A-Za-zµμ/ ]*?)\s*$/.exec(t);
  const a = split(stockText);
  const b = split(targetText);
  if (!a || !b || a[2] !== b[2]) return null;
  // only the units of the trade pondus names as not read (normality, equivalents, biological units);
  // a molality does not scale with the volume, and a slip of the keyboard is still refused
  const unit = a[2].replace(/\s+/g, '');
  return notReadHint(unit) !== undefined && !/\/kg$/.test(unit) ? { unit: a[2], stock: a[1], target: b[1] } : null;
}

/**
 * Refuses a target that is not weaker than the stock: a stronger one cannot be reached by diluting,
 * and the same concentration (a dilution factor of 1) is no dilution at all.
 *
 * @param stock - the value of the stock concentration (or content).
 * @param target - the value of the target, in the same unit.
 * @param stockName - the words for the stock in the message ('the stock', 'the stronger material').
 * @returns nothing when the target is weaker.
 * @throws PondusError: BAD_AMOUNT for a target above the stock, or equal to it.
 * @example
 * refuseNotWeaker(new Decimal(1), new Decimal('0.1'), 'the stock') // undefined
 */
export function refuseNotWeaker(stock: Decimal, target: Decimal, stockName: string): void {
  if (target.gt(stock)) throw fail({ code: 'BAD_AMOUNT', message: `the target is more concentrated than ${stockName}: a dilution cannot get there` });
  if (target.eq(stock)) throw fail({ code: 'BAD_AMOUNT', message: `the target is the concentration of ${stockName} itself (a dilution factor of 1): there is nothing to dilute; use ${stockName} as it is` });
}

/**
 * The issue of a stock and a target concentration of different kinds (one molar, one per volume), with both dimensions.
 *
 * @example
 * kindsDiffer(measure('1.0 M'), measure('5 g/L')).message // 'the stock and target concentrations must be of the same kind (both molar, both mass per volume, or both %)'
 */
export function kindsDiffer(stock: Quantity, target: Quantity): Issue {
  return typedIssue({ code: 'INCOMPATIBLE_UNITS', operation: 'dilute', first: 'stock', firstDimension: baseUnitText(stock.dims) || null, second: 'target', secondDimension: baseUnitText(target.dims) || null });
}
