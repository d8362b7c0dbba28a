/**
 * Solutions from a concentrated liquid reagent (37 % HCl, 96 % H2SO4, 28 %
 * ammonia, 70 % HNO3): its molarity from the mass fraction and the density,
 * and the volume of it to take for a target solution. The instruction is
 * always a volume of the concentrated reagent, never a mass of the solute: a
 * bottle of hydrochloric acid holds a solution, not HCl to weigh.
 */
import { reagentHandlingNote } from './warnings.js';
import { PondusError } from '../errors/pondus-error.js';
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, MOLARITY, VOLUME } from '../calc/measure.js';
import { readPositive, readShare } from '../assay/read-quantity.js';
import { Decimal } from '../exact/decimal.js';
import { formulaMassDetail, type MassOptions, type MassDetail } from '../mass/formula-mass.js';
import { formulaNotes } from '../mass/formula-notes.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { divide, multiply, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { fewFiguresNote, inputFigures, instruction, WORKING_FIGURES, type InputFigures, type Instruction } from '../sigfig/instruction.js';
import { sigFigsOf } from '../sigfig/measured.js';
import { atWorkingPrecision } from '../pharmacy/working-precision.js';
import { sameDims, unitOf } from '../sigfig/units.js';
import { CONCENTRATED_GRADES, type ConcentratedGrade } from './concentrated-grades.js';
import { MIN_TRANSFER_L } from './warnings.js';

export interface ConcentratedOptions extends MassOptions {
  /** Mass fraction of the solute in the concentrated reagent: '37 %', '37 % w/w', '0.37'. */
  fraction: string;
  /** Density of the concentrated reagent: '1.19 g/mL'. Optional for a grade in the table of common grades. */
  density?: string;
  /** Target concentration of the solution to make: '1.00 M', '36.5 g/L'. */
  concentration?: string;
  /** Final volume of the solution to make: '500.0 mL'. */
  volume?: string;
  /** The volume of concentrated reagent actually taken: '41.5 mL'; gives the concentration made (a result). */
  taken?: string;
}

export interface ConcentratedResult {
  reagent: MassDetail;
  /** Mass fraction of the solute, as a fraction of 1. */
  fraction: Quantity;
  /** Density of the concentrated reagent (base unit g/L). */
  density: Quantity;
  /** Where the density came from: given, or the table of common grades. */
  densitySource: 'given' | 'table';
  /** The table entry used or matched, if any. */
  grade: ConcentratedGrade | null;
  /**
   * Molarity of the concentrated reagent, w·ρ/M. The fraction and density are
   * a label's nominal values, so it is shown at working precision (4 figures),
   * with a note; its textbook figures are in `textbookSigFigs`.
   */
  molarity: Quantity;
  /** Figures the textbook rules would give the molarity from the values as written. */
  textbookSigFigs: number;
  /** Mass concentration of the solute in the concentrated reagent, w·ρ (nominal, at working precision). */
  massConcentration: Quantity;
  /** The target concentration (null when only the molarity was asked for). */
  target: Quantity | null;
  volume: Quantity | null;
  /** Volume of the concentrated reagent to take (an instruction). */
  take: Instruction | null;
  /** Dilution factor from the concentrated reagent to the target. */
  factor: Decimal | null;
  /** The volume actually taken. */
  taken: Quantity | null;
  /** The molarity made from the volume taken (a result, with the figures of the volumes and the nominal molarity). */
  made: Quantity | null;
  /** True for the acids (add acid to water). */
  acid: boolean;
  notes: Note[];
}

/** Hill formulas of the concentrated acids the warning about water and acid applies to. */
const ACIDS = new Set(['ClH', 'BrH', 'HI', 'FH', 'H2O4S', 'HNO3', 'H3O4P', 'ClHO4', 'C2H4O2', 'CH2O2']);
/** Hill formulas of the concentrated bases that give off heat or fumes on dilution. */
const BASES = new Set(['H3N', 'H5NO', 'HNaO', 'HKO']);

const G_PER_MOL = unitOf('g/mol');

function readFraction(text: string, notes: Note[]): Quantity {
  const t = text.trim();
  const kind = /%\s*(w\/w|w\/v|v\/v)\s*$/i.exec(t);
  if (kind && kind[1].toLowerCase() !== 'w/w') {
    throw fail({ code: 'BAD_AMOUNT', message: `the strength of a concentrated reagent is a mass fraction (% w/w, as on the label of 37 % HCl); '${t}' is % ${kind[1].toLowerCase()}` }, text);
  }
  const q = readShare(t, 'the mass fraction', notes, { bare: 'fraction', note: 'FRACTION_AS_DECIMAL' });
  if (q.unit && !kind && /%$/.test(t)) notes.push({ code: 'PERCENT_AS_W_W', message: `the strength ${t} of the concentrated reagent is read as % w/w (grams of solute per 100 g of reagent), as on the labels of concentrated acids and bases` });
  return q;
}

function readDensity(text: string, notes: Note[]): Quantity {
  const t = text.trim();
  if (/^[0-9.]+$/.test(t)) {
    const q = readPositive(`${t} g/mL`, [MASS_CONCENTRATION], 'the density', notes);
    notes.push({ code: 'DENSITY_AS_G_PER_ML', message: `the density ${t} has no unit: read as ${t} g/mL (a relative density, specific gravity, is the same number to the figures a label gives)` });
    return q;
  }
  return readPositive(t, [MASS_CONCENTRATION], 'the density', notes);
}

/**
 * The molarity of a concentrated reagent, and the volume of it to take for a
 * target solution (an instruction, at working precision).
 *
 * @param reagentText - the formula of the concentrated reagent ('HCl').
 * @param options - its mass fraction as on the label (fraction, required), its density, the target concentration and final volume (for the volume to take), or the volume taken (for the concentration made), and the mass options.
 * @returns the reagent's molarity and mass concentration, the volume to take (an instruction at working precision) when a target is given, the concentration made from a volume taken, the handling of an acid, and the notes (with the cautions).
 * @throws PondusError: a formula that cannot be read (the formula language's codes: UNKNOWN_ELEMENT, UNEXPECTED_CHARACTER, UNCLOSED_GROUP, AMBIGUOUS_READING, …); BAD_OPTION for no mass fraction, no density for a grade not in the table, or a target concentration, final volume and volume taken that do not go together; BAD_AMOUNT for a strength that is not a mass fraction or is above 100 %, a density above any aqueous reagent, a target not weaker than the reagent, or a volume to take or taken not less than the final volume; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * displayResult(concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL' }).molarity, 'M').text // '12.08 M'
 * displayInstruction(concentratedReagent('HCl', { fraction: '37 %', density: '1.19 g/mL', concentration: '1.00 M', volume: '500.0 mL' }).take, 'mL').text // '41.40 mL'
 */
export function concentratedReagent(reagentText: string, options: ConcentratedOptions): ConcentratedResult {
  const notes: Note[] = [];
  if (typeof options.fraction !== 'string') throw new PondusError([{ code: 'BAD_OPTION', message: "give the reagent's mass fraction, as on its label (fraction: '37 %')" }]);
  const reagent = formulaMassDetail(reagentText, options);
  const fraction = readFraction(options.fraction, notes);
  const grade = CONCENTRATED_GRADES.find((g) => g.formula === reagent.formula && new Decimal(g.percent).div(100).eq(fraction.value)) ?? null;
  let density: Quantity;
  let densitySource: 'given' | 'table';
  if (options.density !== undefined) {
    density = readDensity(options.density, notes);
    densitySource = 'given';
    if (density.value.gt(3000)) throw fail({ code: 'BAD_AMOUNT', message: `a density of ${options.density.trim()} is more than any aqueous reagent has: check the value and its unit (g/mL)` }, options.density);
  } else if (grade) {
    density = readPositive(`${grade.density} g/mL`, [MASS_CONCENTRATION], 'the density', notes);
    densitySource = 'table';
    notes.push({ code: 'DENSITY_FROM_TABLE', message: `density ${grade.density} g/mL for ${grade.percent} % ${grade.name}, ${grade.source}; the label or certificate of your bottle decides (give \`density\`)`, options: ['density'] });
  } else {
    const known = CONCENTRATED_GRADES.filter((g) => g.formula === reagent.formula).map((g) => `${g.percent} % (${g.density} g/mL)`);
    throw fail({
      code: 'BAD_OPTION',
      message: `give the density of ${reagent.input.trim()} at ${options.fraction.trim()}, from the label or certificate of the bottle (\`density: '… g/mL'\`)${known.length ? `; the table of common grades has ${reagent.input} at ${known.join(', ')} only` : ''}`,
      options: ['density'],
    });
  }
  if (reagent.formula === 'H3N') notes.push({ code: 'AMMONIA_AS_NH3', message: 'the mass fraction is read as of NH3, as the labels of ammonia solution give it (28–30 % NH3); a label in % NH4OH counts more mass per mole: write NH4OH for that reading' });
  if (reagent.formula === 'H5NO') notes.push({ code: 'AMMONIA_AS_NH4OH', message: 'the mass fraction is read as of NH4OH, as written; most labels of ammonia solution give % NH3 (28–30 % NH3 is about 56–58 % NH4OH): write NH3 for that reading' });

  const reagentM = quantity(reportedMolarMass(reagent), G_PER_MOL);
  const massConcentration = multiply(fraction, density);
  massConcentration.unit = unitOf('g/L');
  const molarityRaw = divide(massConcentration, reagentM);
  const textbookSigFigs = sigFigsOf(molarityRaw);
  const molarity = atWorkingPrecision(molarityRaw);
  molarity.unit = unitOf('M');
  const massConc = atWorkingPrecision(massConcentration);
  massConc.unit = unitOf('g/L');
  notes.push({ code: 'LABEL_NOMINAL', message: `the mass fraction ${options.fraction.trim()} and the density are label values, taken as nominal: the molarity is shown to ${WORKING_FIGURES} figures, which does not make it more exact than the label` });
  const acid = ACIDS.has(reagent.formula);
  if (acid) {
    notes.push({ code: 'ADD_ACID_TO_WATER', message: `add the concentrated acid slowly to water, never water to the acid (common practice)${reagent.formula === 'H2O4S' ? '; sulfuric acid gives off much heat: add it in portions, with stirring and cooling' : ''}; make up to the mark only when the solution is back at room temperature` });
  } else if (BASES.has(reagent.formula)) {
    notes.push({ code: 'ADD_SLOWLY', message: 'add the concentrated reagent slowly to most of the water, in a fume hood (common practice); make up to the mark only when the solution is back at room temperature' });
  }
  const handling = reagentHandlingNote(reagent.formula);
  if (handling) notes.push(handling);

  let target: Quantity | null = null;
  let volume: Quantity | null = null;
  let take: Instruction | null = null;
  let factor: Decimal | null = null;
  if (options.concentration !== undefined && options.volume === undefined) {
    throw fail({ code: 'BAD_OPTION', message: 'the volume to take needs both the target concentration and the final volume' });
  }
  if (options.volume !== undefined && options.concentration === undefined && options.taken === undefined) {
    throw fail({ code: 'BAD_OPTION', message: 'a final volume needs the target concentration (for the volume to take) or the volume taken (for the concentration made)' });
  }
  if (options.volume !== undefined && options.concentration === undefined) volume = readPositive(options.volume, [VOLUME], 'the final volume', notes);
  if (options.concentration !== undefined && options.volume !== undefined) {
    target = readPositive(options.concentration, [MOLARITY, MASS_CONCENTRATION], 'the target concentration', notes);
    volume = readPositive(options.volume, [VOLUME], 'the final volume', notes);
    const targetMolar = sameDims(target.dims, MOLARITY) ? target : divide(target, reagentM);
    if (targetMolar.value.gte(molarity.value)) {
      throw fail({ code: 'BAD_AMOUNT', message: `the target ${options.concentration.trim()} is not weaker than the concentrated reagent (${molarity.value.toSignificantDigits(4).toFixed()} M): a dilution cannot get there` });
    }
    const inputs: InputFigures[] = [
      inputFigures('the target', options.concentration, target),
      inputFigures('the final volume', options.volume, volume),
      inputFigures('the mass fraction', options.fraction, fraction),
      inputFigures('the density', options.density ?? `${grade!.density} g/mL`, density),
    ];
    const v = divide(multiply(targetMolar, volume), molarityRaw);
    v.unit = volume.unit;
    take = instruction(v, inputs);
    factor = molarity.value.div(targetMolar.value);
    const few = fewFiguresNote(take, 'the volume to take', `the solution made is ${options.concentration.trim()}`);
    if (few) notes.push(few);
    if (v.value.lt(MIN_TRANSFER_L)) {
      notes.push({ code: 'SERIAL_DILUTION', message: 'the volume of concentrated reagent to take is below 100 µL: transfers that small magnify the volumetric error (common practice); make a larger volume, or an intermediate dilution first' });
    }
    const water = subtract(volume, v);
    if (water.value.lte(0)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume to take is the whole final volume' });
  }
  let taken: Quantity | null = null;
  let made: Quantity | null = null;
  if (options.taken !== undefined) {
    if (options.volume === undefined) throw fail({ code: 'BAD_OPTION', message: 'the concentration made from the volume taken needs the final volume' });
    taken = readPositive(options.taken, [VOLUME], 'the volume taken', notes);
    if (taken.value.gte(volume!.value)) throw fail({ code: 'BAD_AMOUNT', message: 'the volume taken is not less than the final volume' });
    made = divide(multiply(molarity, taken), volume!);
    made.unit = unitOf('M');
    notes.push({ code: 'MADE_FROM_TAKEN', message: `the concentration made is computed from the volume taken, ${options.taken.trim()}, and the nominal molarity of the reagent: a result, with the figures of the volumes` });
  }
  notes.unshift(...formulaNotes(reagent, true));
  return { taken, made, reagent, fraction, density, densitySource, grade, molarity, textbookSigFigs, massConcentration: massConc, target, volume, take, factor, acid, notes };
}
