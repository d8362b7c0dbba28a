/**
 * Serial dilution plans: a large dilution factor split into steps, each a
 * transfer of at least the smallest practical pipette volume made up to the
 * step's final volume, so that a 1:1000 dilution becomes 1:100 then 1:10
 * instead of a 10 µL transfer. Each step's factor is a round number (1, 2,
 * 2.5, 4 or 5 times a power of ten) where it can be, so the transfers are
 * volumes a pipette holds; the steps multiply to the requested factor exactly.
 */
import type { Note } from '../errors/issue.js';
import { fail } from '../errors/pondus-error.js';
import { MASS_CONCENTRATION, MOLARITY, PURE, VOLUME } from '../calc/measure.js';
import { readPositive } from '../assay/read-quantity.js';
import { Decimal } from '../exact/decimal.js';
import { sqrtDecimal } from '../exact/sqrt.js';
import { exact } from '../sigfig/measured.js';
import { divide, quantity, subtract, type Quantity } from '../sigfig/quantity.js';
import { inputFigures, instruction, fewFiguresNote, type InputFigures, type Instruction } from '../sigfig/instruction.js';
import { sameDims } from '../sigfig/units.js';
import { kindsDiffer, refuseNotWeaker } from './dilution.js';
import { MAX_ONE_STEP_FACTOR, MIN_TRANSFER_L } from './warnings.js';

/** Most steps a plan may have (a factor of 10¹² in steps of 100). */
export const MAX_SERIES_STEPS = 6;

export interface SeriesOptions {
  /** The stock concentration: '1000 µg/mL' (or give `factor`). */
  stock?: string;
  /** The final concentration: '1.000 µg/mL'. */
  target?: string;
  /** The overall dilution factor, instead of stock and target: '1000' or '1:1000'. */
  factor?: string;
  /** The final volume of each step: '10.00 mL'. */
  volume: string;
  /** The smallest volume worth pipetting: '100 µL' by default (common practice). */
  minTransfer?: string;
  /** The largest factor in one step: 100 by default (common practice). */
  maxStep?: string;
}

export interface SeriesStep {
  /** 1-based step number. */
  step: number;
  /** This step's dilution factor (exact). */
  factor: Decimal;
  /** Volume of the previous solution (the stock, for step 1) to take: an instruction. */
  take: Instruction;
  /** Volume of diluent, about (volumes need not add up exactly): an instruction. */
  diluent: Instruction;
  /** The concentration after this step (null without a stock concentration): an instruction, nominal. */
  concentration: Instruction | null;
  /** The dilution from the stock so far. */
  cumulative: Decimal;
}

export interface SeriesResult {
  /** The overall factor asked for (exact where it was written so). */
  factor: Decimal;
  stock: Quantity | null;
  target: Quantity | null;
  /** Final volume of each step. */
  volume: Quantity;
  minTransfer: Quantity;
  maxStep: Decimal;
  steps: SeriesStep[];
  written: { stock: string | null; target: string | null; factor: string | null; volume: string };
  notes: Note[];
}

const ROUND_MANTISSAS = ['5', '4', '2.5', '2', '1'];

/** The largest round factor (1, 2, 2.5, 4, 5 × 10ⁿ) not above x (x ≥ 1). */
function roundAtMost(x: Decimal): Decimal {
  const e = Math.floor(Math.log10(x.toNumber()) + 1e-12);
  for (let k = e; k >= 0; k--) {
    for (const m of ROUND_MANTISSAS) {
      const c = new Decimal(m).times(new Decimal(10).pow(k));
      if (c.lte(x) && c.gte(1)) return c;
    }
  }
  return new Decimal(1);
}

/** The smallest round factor not below x. */
function roundAtLeast(x: Decimal): Decimal {
  const e = Math.floor(Math.log10(x.toNumber()) + 1e-12);
  for (let k = e; k <= e + 1; k++) {
    for (const m of [...ROUND_MANTISSAS].reverse()) {
      const c = new Decimal(m).times(new Decimal(10).pow(k));
      if (c.gte(x)) return c;
    }
  }
  return x;
}

/**
 * Splits a dilution factor into steps of at most `maxStep` each, round factors first.
 *
 * @param factor - the overall dilution factor (more than 1).
 * @param maxStep - the largest factor allowed in one step, 2 or more.
 * @returns the factors of the steps, whose product is the overall factor.
 * @throws PondusError: BAD_AMOUNT for a factor that is not more than 1, or a largest step below 2 (no plan could reach the factor); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * planSteps(new Decimal(1000), new Decimal(100)).map(String) // ['100', '10']
 * planSteps(new Decimal(50), new Decimal(100)).map(String) // ['50']
 */
export function planSteps(factor: Decimal, maxStep: Decimal): Decimal[] {
  if (!factor.isFinite() || factor.lte(1)) throw fail({ code: 'BAD_AMOUNT', message: `a dilution factor must be more than 1, not ${factor.toString()}` });
  if (!maxStep.isFinite() || maxStep.lt(2)) throw fail({ code: 'BAD_AMOUNT', message: `the largest factor in one step must be at least 2, not ${maxStep.toString()}: steps of less cannot reach the factor` });
  if (factor.lte(maxStep)) return [factor];
  const big = roundAtMost(maxStep);
  const steps: Decimal[] = [];
  let rest = factor;
  while (rest.gt(maxStep)) {
    steps.push(big);
    rest = rest.div(big);
    if (steps.length > MAX_SERIES_STEPS) break;
  }
  steps.push(rest);
  // the same round factor in every step, where one multiplies to the factor (1:1000 as 1:10 three times)
  const n = steps.length;
  if (n > 1) {
    const even = roundAtLeast(new Decimal(Math.pow(factor.toNumber(), 1 / n)).toSignificantDigits(12));
    if (even.lte(maxStep) && even.pow(n).eq(factor)) return new Array<Decimal>(n).fill(even);
  }
  // a last step below 1:2 is hardly a dilution: share the last two steps more evenly
  if (steps.length > 1 && rest.lt(2)) {
    const p = steps[steps.length - 2].times(rest);
    let a = roundAtLeast(sqrtDecimal(p));
    if (a.gt(maxStep)) a = roundAtMost(maxStep);
    steps.splice(steps.length - 2, 2, a, p.div(a));
  }
  return steps;
}

function readFactor(text: string, notes: Note[]): Decimal {
  const t = text.trim();
  const m = /^1\s*:\s*([0-9]+(?:\.[0-9]+)?)$/.exec(t) ?? /^([0-9]+(?:\.[0-9]+)?)$/.exec(t);
  if (!m) throw fail({ code: 'BAD_AMOUNT', message: `the dilution factor must be a number or a ratio 1:N ('1000' or '1:1000'); got '${t}'` }, text);
  const f = new Decimal(m[1]);
  if (f.lte(1)) throw fail({ code: 'BAD_AMOUNT', message: `a dilution factor must be more than 1: '${t}'` }, text);
  if (f.gt('1e15')) throw fail({ code: 'BAD_AMOUNT', message: `a dilution factor of ${t} is beyond any serial dilution pondus plans (at most 1:10¹⁵)` }, text);
  notes.push({ code: 'FACTOR_AS_TOTAL', message: `1:${f.toFixed()} is read as the total dilution (1 volume of stock in ${f.toFixed()} volumes of final solution), not 1 part plus ${f.toFixed()} parts of diluent` });
  return f;
}

/**
 * A serial dilution plan: the steps, each a transfer made up to the step's volume.
 *
 * @param options - the stock and target concentrations, or the dilution factor ('1000' or '1:1000'); the volume of each step; the smallest transfer (default 100 µL) and the largest factor in one step.
 * @returns the overall factor and the steps, each with its factor, the volume to take (an instruction), the diluent to add and the concentration reached, and the notes.
 * @throws PondusError: BAD_OPTION for both a factor and a target, or neither a factor nor both concentrations; INCOMPATIBLE_UNITS for stock and target of different kinds; BAD_AMOUNT for a factor that cannot be read, is not more than 1 or is beyond 1:10¹⁵, a target not weaker than the stock, a largest step factor below 2, a smallest transfer over half a step's volume, or a plan of too many steps; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const plan = dilutionSeries({ stock: '1000 µg/mL', target: '1.000 µg/mL', volume: '10.00 mL' })
 * plan.steps.map((s) => s.factor.toString()) // ['100', '10']
 * displayInstruction(plan.steps[0].take, 'µL').text // '100.0 µL'
 */
export function dilutionSeries(options: SeriesOptions): SeriesResult {
  const notes: Note[] = [];
  const kinds = [MOLARITY, MASS_CONCENTRATION, PURE];
  let stock: Quantity | null = null;
  let target: Quantity | null = null;
  let factor: Decimal;
  const inputs: InputFigures[] = [];
  if (options.factor !== undefined) {
    if (options.target !== undefined) throw fail({ code: 'BAD_OPTION', message: 'give the dilution factor or the target concentration, not both' });
    factor = readFactor(options.factor, notes);
    if (options.stock !== undefined) stock = readPositive(options.stock, kinds, 'the stock concentration', notes);
  } else {
    if (options.stock === undefined || options.target === undefined) throw fail({ code: 'BAD_OPTION', message: 'give the stock and target concentrations, or the dilution factor' });
    stock = readPositive(options.stock, kinds, 'the stock concentration', notes);
    target = readPositive(options.target, kinds, 'the target concentration', notes);
    if (!sameDims(stock.dims, target.dims)) throw fail(kindsDiffer(stock, target));
    refuseNotWeaker(stock.value, target.value, 'the stock');
    factor = stock.value.div(target.value);
    inputs.push(inputFigures('the stock', options.stock, stock), inputFigures('the target', options.target, target));
  }
  const volume = readPositive(options.volume, [VOLUME], 'the volume of each step', notes);
  inputs.push(inputFigures('the volume', options.volume, volume));
  const minTransfer = readPositive(options.minTransfer ?? '100. µL', [VOLUME], 'the smallest transfer', notes);
  let maxStep = MAX_ONE_STEP_FACTOR;
  if (options.maxStep !== undefined) {
    const t = options.maxStep.trim();
    if (!/^[0-9]+(\.[0-9]+)?$/.test(t) || new Decimal(t).lt(2)) throw fail({ code: 'BAD_AMOUNT', message: `the largest factor in one step must be a number of at least 2: '${t}'` }, options.maxStep);
    maxStep = new Decimal(t);
  }
  const byPipette = volume.value.div(minTransfer.value);
  if (byPipette.lt(2)) throw fail({ code: 'BAD_AMOUNT', message: `the smallest transfer (${options.minTransfer ?? '100 µL'}) is more than half the volume of a step (${options.volume.trim()}): no step could dilute` });
  if (byPipette.lt(maxStep)) maxStep = byPipette;

  const factors = planSteps(factor, maxStep);
  if (factors.length > MAX_SERIES_STEPS) {
    throw fail({ code: 'BAD_AMOUNT', message: `a 1:${factor.toSignificantDigits(6).toFixed()} dilution needs more than ${MAX_SERIES_STEPS} steps of at most 1:${maxStep.toSignificantDigits(4).toFixed()}: use a larger step volume or a smaller transfer` });
  }
  const steps: SeriesStep[] = [];
  let cumulative = new Decimal(1);
  let conc = stock;
  factors.forEach((f, i) => {
    const fq = quantity(exact(f), null);
    const v = divide(volume, fq);
    v.unit = volume.unit;
    const d = subtract(volume, v);
    cumulative = cumulative.times(f);
    let ci: Instruction | null = null;
    if (conc) {
      conc = divide(conc, fq);
      conc.unit = stock!.unit;
      ci = instruction(conc, inputs);
    }
    steps.push({ step: i + 1, factor: f, take: instruction(v, inputs), diluent: instruction(d, inputs), concentration: ci, cumulative });
  });
  if (factors.length > 1) {
    notes.push({ code: 'SERIAL_PLAN', message: `1:${factor.toSignificantDigits(6).toFixed()} in ${factors.length} steps (${factors.map((f) => `1:${f.toSignificantDigits(6).toFixed()}`).join(', then ')}), each transfer at least ${options.minTransfer?.trim() ?? '100 µL'} and each step at most 1:${maxStep.toSignificantDigits(4).toFixed()} (common practice: transfers below 100 µL and one-step factors above 100 magnify the volumetric error)` });
  }
  const few = fewFiguresNote(steps[0].take, 'each volume to take', null);
  if (few) notes.push(few);
  if (minTransfer.value.lt(MIN_TRANSFER_L)) notes.push({ code: 'SMALL_TRANSFER', message: `a smallest transfer below 100 µL (${options.minTransfer!.trim()}) magnifies the volumetric error (common practice)` });
  notes.push({ code: 'MIX_EACH_STEP', message: 'mix each step well before taking the next transfer; use a fresh pipette tip for each step (common practice)' });
  const written = { stock: options.stock?.trim() ?? null, target: options.target?.trim() ?? null, factor: options.factor?.trim() ?? null, volume: options.volume.trim() };
  return { factor, stock, target, volume, minTransfer, maxStep, steps, written, notes };
}
