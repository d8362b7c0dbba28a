/**
 * Instructions versus results. A result computed from measurements (the
 * concentration actually made, a gravimetric result, a yield) keeps the
 * textbook significant figures. An instruction computed from a target (a mass
 * to weigh, a volume to take, a salt mass for a dose) is a different thing: the
 * target is a specification, not a measurement, so the instruction is shown at
 * working precision — at least {@link WORKING_FIGURES} significant figures, and
 * more when the data carry more — with a note when a target has few figures.
 */
import { Decimal } from '../exact/decimal.js';
import type { Note } from '../errors/issue.js';
import { msd, sigFigsOf } from './measured.js';
import type { Quantity } from './quantity.js';
import { displayQuantity, reportUnit, type QuantityDisplay } from './display-quantity.js';
import { displayMeasured, roundToSigFigs, type RoundingMode } from './round.js';
import { baseUnitText, inUnitOf, sameDims, unitOf, type Unit } from './units.js';

/** Significant figures an instruction is shown to, at the least. */
export const WORKING_FIGURES = 4;

/**
 * An input with fewer figures than this is a target with few figures, and the
 * instruction says so in a note. Three-figure targets (0.100 M, 250. mL) are the
 * usual bench specification and get no note.
 */
export const FEW_FIGURES = 3;

/** An input an instruction was computed from, with the figures it was written to. */
export interface InputFigures {
  /** What it is: 'the target', 'the volume', 'the assay'. */
  what: string;
  /** As written: '0.1 M'. */
  text: string;
  /** Its significant figures (null for an exact number). */
  sigFigs: number | null;
}

/** An amount to act on, computed from a target: shown at working precision. */
export interface Instruction {
  kind: 'instruction';
  /** The full value, with the precision the textbook rules would give it. */
  quantity: Quantity;
  /** Figures the textbook rules give (null when every input is exact). */
  textbookSigFigs: number | null;
  /** The inputs it was computed from. */
  inputs: InputFigures[];
}

/** A value computed from measurements: textbook significant figures. */
export interface Result {
  kind: 'result';
  quantity: Quantity;
}

/** How an amount is shown: the fields of a reported quantity that instructions and results share. */
export type AmountDisplay = Pick<QuantityDisplay, 'text' | 'figure' | 'value' | 'rounded' | 'sigFigs' | 'unit'>;

const figuresOf = (q: Quantity): number | null => (q.lsd === null ? null : sigFigsOf(q));

/**
 * An input's record for an instruction.
 *
 * @example
 * inputFigures('the target', '0.1 M', measure('0.1 M')).sigFigs // 1
 */
export function inputFigures(what: string, text: string, q: Quantity): InputFigures {
  return { what, text: text.trim(), sigFigs: figuresOf(q) };
}

/**
 * Marks a computed quantity as an instruction.
 *
 * @example
 * instruction(measure('1.461 g'), [inputFigures('the target', '0.1 M', measure('0.1 M'))]).kind // 'instruction'
 */
export function instruction(quantity: Quantity, inputs: InputFigures[]): Instruction {
  return { kind: 'instruction', quantity, textbookSigFigs: figuresOf(quantity), inputs };
}

/**
 * Marks a computed quantity as a result (textbook figures).
 *
 * @example
 * result(measure('0.09984 M')).kind // 'result'
 */
export function result(quantity: Quantity): Result {
  return { kind: 'result', quantity };
}

/**
 * The figures an instruction is shown to: the textbook figures, but never fewer than four.
 *
 * @example
 * workingFigures(instruction(measure('1 g'), [])) // 4
 */
export function workingFigures(ins: Instruction): number {
  return Math.max(WORKING_FIGURES, ins.textbookSigFigs ?? WORKING_FIGURES);
}

function show(value: Decimal, n: number | null, unit: Unit | null, q: Quantity, rounding: RoundingMode): AmountDisplay {
  const unitText = unit ? unit.symbol : baseUnitText(q.dims);
  if (n === null) {
    return { text: unitText ? `${value.toFixed()} ${unitText}` : value.toFixed(), figure: value.toFixed(), value, rounded: value, sigFigs: null, unit: unitText };
  }
  // the figures come from the rounded value: 9.9996 to 4 figures is 10.00, not 10.000
  const rounded = roundToSigFigs(value, n, rounding);
  const lsd = msd(rounded) - n + 1;
  const d = displayMeasured({ value: rounded, lsd }, rounding);
  return { text: unitText ? `${d.text} ${unitText}` : d.text, figure: d.text, value, rounded, sigFigs: n, unit: unitText };
}

/**
 * An instruction at working precision, in a unit.
 *
 * @param ins - an instruction (a mass to weigh, a volume to take).
 * @param wanted - the unit to show it in, as a symbol or a unit; by default its own unit, else the base unit.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the text, the figure, the unrounded and rounded values, the figures shown (the textbook figures, at least 4) and the unit.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `ins` is not an instruction, `wanted` not a unit, a string or null, or `rounding` not a rounding mode.
 * @example
 * displayInstruction(prepareSolution('NaCl', { concentration: '0.1 M', volume: '250 mL' }).mass, 'g').text // '1.461 g'
 */
export function displayInstruction(ins: Instruction, wanted?: string | Unit | null, rounding: RoundingMode = 'half-even'): AmountDisplay {
  const unit = reportUnit(ins.quantity, wanted);
  const figures = workingFigures(ins);
  const last = SHOWN.get(ins);
  if (last !== undefined && last.quantity === ins.quantity && last.value === ins.quantity.value && last.figures === figures && last.unit === unit && last.rounding === rounding) return { ...last.display };
  const display = show(inUnitOf(ins.quantity.value, unit), figures, unit, ins.quantity, rounding);
  if (typeof ins === 'object' && ins !== null) SHOWN.set(ins, { quantity: ins.quantity, value: ins.quantity.value, figures, unit, rounding, display });
  return { ...display };
}

/**
 * The last display of each instruction: a command shows the same mass to weigh in a note, then in
 * its table or JSON. Kept with what it was made from, so a changed instruction is shown afresh.
 */
const SHOWN = new WeakMap<Instruction, { quantity: Quantity; value: Decimal; figures: number; unit: Unit | null; rounding: RoundingMode; display: AmountDisplay }>();

/**
 * A result with its textbook figures, in a unit (the sig-fig engine's own display).
 *
 * @param q - a quantity computed from measurements.
 * @param wanted - the unit to show it in, as a symbol or a unit; by default its own unit, else the base unit.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the text, the figure, the unrounded and rounded values, the textbook significant figures and the unit.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `q` is not a Quantity, `wanted` not a unit, a string or null, or `rounding` not a rounding mode.
 * @example
 * displayResult(measure('0.09984 M')).text // '0.09984 M'
 */
export function displayResult(q: Quantity, wanted?: string | Unit | null, rounding: RoundingMode = 'half-even'): AmountDisplay {
  const d = displayQuantity(q, wanted, rounding);
  return { text: d.text, figure: d.figure, value: d.value, rounded: d.rounded, sigFigs: d.sigFigs, unit: d.unit };
}

const TENTH = new Decimal('0.1');
const TEN_THOUSANDTH = new Decimal('0.0001');
const THOUSANDTH = new Decimal('0.001');

/**
 * The unit a mass to weigh reads best in: g from 0.1 g up, mg from 0.1 mg, µg below.
 *
 * @example
 * massUnitFor(measure('0.0499 g')) // 'mg'
 */
export function massUnitFor(q: Quantity): string {
  const g = q.value.abs();
  if (g.gte(TENTH)) return 'g';
  if (g.gte(TEN_THOUSANDTH)) return 'mg';
  return 'µg';
}

/**
 * The unit a volume to take reads best in: the preferred unit, or the next smaller one below 1 of it.
 *
 * @example
 * volumeUnitFor(measure('0.0500 mL'), unitOf('mL')) // 'µL'
 */
export function volumeUnitFor(q: Quantity, preferred: Unit | null): string {
  const u = preferred && sameDims(preferred.dims, q.dims) ? preferred : unitOf('L');
  const inU = inUnitOf(q.value, u);
  if (inU.abs().gte(1) || q.value.isZero()) return u.symbol;
  if (u.symbol === 'L') return inU.abs().gte(THOUSANDTH) ? 'mL' : 'µL';
  if (u.symbol === 'mL') return 'µL';
  return u.symbol;
}

const plural = (n: number) => `${n} significant figure${n === 1 ? '' : 's'}`;

/**
 * The note for an instruction computed from an input with few figures (fewer than {@link FEW_FIGURES}), or null.
 *
 * @example
 * const ins = instruction(measure('1.461 g'), [inputFigures('the target', '0.1 M', measure('0.1 M'))])
 * fewFiguresNote(ins, 'the mass to weigh', 'the solution made')?.code // 'WORKING_PRECISION'
 */
export function fewFiguresNote(ins: Instruction, what: string, outcome: string | null): Note | null {
  const few = ins.inputs.filter((i) => i.sigFigs !== null && i.sigFigs < FEW_FIGURES);
  if (few.length === 0) return null;
  const list = few.map((i) => `${i.what} ${i.text} has ${plural(i.sigFigs!)}`).join(', ');
  const tail = outcome ? `; ${outcome} only as well as ${few.length === 1 ? 'that figure says' : 'those figures say'}` : '';
  return {
    code: 'WORKING_PRECISION',
    message: `${list}: ${what} is given at working precision (${plural(workingFigures(ins))}), not rounded to ${few.length === 1 ? 'its' : 'their'} figures${tail}`,
  };
}

/** The JSON form of an instruction or a result: the unrounded value in the base unit, and the figure shown. */
export interface AmountJson {
  kind: 'instruction' | 'result';
  /** Unrounded, in `unit`. */
  value: number;
  /** The base unit of the value: 'g', 'L', 'M', 'g/L', '' for a pure number. */
  unit: string;
  /** What is shown: '1.461 g' (possibly in another unit, such as mg). */
  display: string;
  /** Significant figures shown. */
  sigFigs: number | null;
  /** For an instruction: the figures the textbook rules would give. */
  textbookSigFigs?: number | null;
  /** The number shown, without its unit: '1.461' (the figure as reported, rounded once). */
  figure: string;
  /** The unit shown in `display`: 'mg', 'mL', 'M', '%' ('' for a pure number). */
  displayUnit: string;
}

/**
 * The JSON of an instruction.
 *
 * @param ins - an instruction (a mass to weigh, a volume to take).
 * @param wanted - the unit of the display text, as a symbol or a unit; by default its own unit, else the base unit.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns `{ kind: 'instruction', value, unit, display, sigFigs, textbookSigFigs, figure, displayUnit }`, the value unrounded in the base unit.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `ins` is not an instruction, `wanted` not a unit, a string or null, or `rounding` not a rounding mode.
 * @example
 * instructionJson(instruction(measure('0.1 M * 250 mL * 58.44 g/mol'), []), 'g').display // '1.461 g'
 */
export function instructionJson(ins: Instruction, wanted?: string | Unit | null, rounding: RoundingMode = 'half-even'): AmountJson {
  const d = displayInstruction(ins, wanted, rounding);
  return { kind: 'instruction', value: ins.quantity.value.toNumber(), unit: baseUnitText(ins.quantity.dims), display: d.text, sigFigs: d.sigFigs, textbookSigFigs: ins.textbookSigFigs, figure: d.figure, displayUnit: d.unit };
}

/**
 * The JSON of a result.
 *
 * @param q - a quantity computed from measurements.
 * @param wanted - the unit of the display text, as a symbol or a unit; by default its own unit, else the base unit.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns `{ kind: 'result', value, unit, display, sigFigs, figure, displayUnit }`, the value unrounded in the base unit.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `q` is not a Quantity, `wanted` not a unit, a string or null, or `rounding` not a rounding mode.
 * @example
 * resultJson(measure('1.4587 g / 58.44 g/mol / 250.0 mL'), 'M').display // '0.09984 M'
 */
export function resultJson(q: Quantity, wanted?: string | Unit | null, rounding: RoundingMode = 'half-even'): AmountJson {
  const d = displayResult(q, wanted, rounding);
  return { kind: 'result', value: q.value.toNumber(), unit: baseUnitText(q.dims), display: d.text, sigFigs: d.sigFigs, figure: d.figure, displayUnit: d.unit };
}
