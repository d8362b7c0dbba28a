/**
 * The JSON rows of `dilute`: one step (C1·V1 = C2·V2, or the concentration made from a volume
 * taken), a serial dilution plan, and a dilution by mass. The inputs are echoed as written
 * (`written` of each result); volumes and masses to take are instructions at working precision,
 * a concentration made is a result (sigfig/instruction.ts).
 */
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { instructionJson, massUnitFor, resultJson, volumeUnitFor, type AmountJson } from '../sigfig/instruction.js';
import type { RoundingMode } from '../sigfig/round.js';
import { BENCH_CAUTION } from './caution.js';
import type { DilutionResult } from './dilution.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { SeriesResult, SeriesStep } from './dilution-series.js';
import type { MassDilutionResult } from './mass-dilution.js';

/** The JSON row of a one-step dilution. */
export interface DilutionJson {
  /** The stock concentration as written. */
  input: string;
  /** The target concentration as written, or null when only the volume taken was given. */
  target: string | null;
  /** The final volume as written. */
  finalVolume: string;
  /** The stock to take (an instruction), with a target. */
  stockVolume: AmountJson | null;
  /** The solvent to make up with, about (an instruction), with a target. */
  solventVolume: AmountJson | null;
  /** The dilution factor. */
  factor: number;
  /** The volume of stock taken as written, or null. */
  taken: string | null;
  /** The concentration made from the volume taken (a result), or null. */
  made: AmountJson | null;
  notes: NoteJson[];
  caution: string;
}

/** The concentration made, in the stock's unit; in equivalents, the number with the unit as written. */
function madeJson(r: DilutionResult, made: Quantity, rounding: RoundingMode): AmountJson {
  const j = resultJson(made, r.madeUnit === null ? r.stock.unit?.symbol : null, rounding);
  return r.madeUnit === null ? j : { ...j, unit: r.madeUnit, display: `${j.display} ${r.madeUnit}`, displayUnit: r.madeUnit };
}

/**
 * The JSON row of a one-step dilution (`pondus dilute STOCK --to … --volume … --json`, or `--taken`).
 *
 * @param r - a result of `dilute`.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the stock, target, final volume and volume taken as written, the stock and solvent volumes (instructions), the dilution factor, the concentration made (a result), the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a dilution result or `rounding` not a rounding mode.
 * @example
 * dilutionJson(dilute('1.00 M', '0.100 M', '250.0 mL')).stockVolume.display // '25.00 mL'
 * dilutionJson(dilute('1.00 M', undefined, '250.0 mL', '25.00 mL')).made.display // '0.100 M'
 */
export function dilutionJson(r: DilutionResult, rounding: RoundingMode = 'half-even'): DilutionJson {
  return {
    input: r.written.stock,
    target: r.written.target,
    finalVolume: r.written.volume,
    stockVolume: r.stockVolume ? instructionJson(r.stockVolume, volumeUnitFor(r.stockVolume.quantity, r.finalVolume.unit), rounding) : null,
    solventVolume: r.solventVolume ? instructionJson(r.solventVolume, r.finalVolume.unit?.symbol, rounding) : null,
    factor: r.factor.value.toNumber(),
    taken: r.written.taken,
    made: r.made ? madeJson(r, r.made, rounding) : null,
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

/** One step of a serial dilution plan, in its JSON row. */
export interface SeriesStepJson {
  /** 1-based step number. */
  step: number;
  /** This step's dilution factor. */
  factor: number;
  /** The previous solution (the stock, for step 1) to take: an instruction. */
  take: AmountJson;
  /** The diluent to add, about: an instruction. */
  diluent: AmountJson;
  /** The concentration after this step (nominal), or null without a stock concentration. */
  concentration: AmountJson | null;
  /** The dilution from the stock so far. */
  cumulative: number;
}

/** The JSON row of a serial dilution plan. */
export interface SeriesJson {
  /** The stock concentration as written, or the dilution factor when no stock was given. */
  input: string | null;
  /** The target as written, or null when a factor was given. */
  target: string | null;
  /** The overall dilution factor. */
  factor: number;
  /** The volume of each step as written. */
  volume: string;
  /** The smallest transfer, in µL ('100.0 µL'). */
  minTransfer: string;
  /** The largest factor of one step. */
  maxStep: number;
  steps: SeriesStepJson[];
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a serial dilution plan (`pondus dilute STOCK --to … --series --volume … --json`).
 *
 * @param r - a result of `dilutionSeries`.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the stock (or factor), target and step volume as written, the overall factor, the smallest transfer and largest step, each step's factor, transfer and diluent (instructions), concentration and cumulative factor, the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a serial dilution plan or `rounding` not a rounding mode.
 * @example
 * const plan = seriesJson(dilutionSeries({ stock: '1000 µg/mL', target: '1.000 µg/mL', volume: '10.00 mL' }))
 * plan.steps.map((s) => s.take.display) // ['100.0 µL', '1.000 mL']
 */
export function seriesJson(r: SeriesResult, rounding: RoundingMode = 'half-even'): SeriesJson {
  const steps: SeriesStepJson[] = [];
  for (const s of r.steps) steps.push(seriesStepJson(r, s, rounding));
  return {
    input: r.written.stock ?? r.written.factor,
    target: r.written.target,
    factor: r.factor.toNumber(),
    volume: r.written.volume,
    minTransfer: instructionJson({ kind: 'instruction', quantity: r.minTransfer, textbookSigFigs: null, inputs: [] }, 'µL', rounding).display,
    maxStep: r.maxStep.toNumber(),
    steps,
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}

function seriesStepJson(r: SeriesResult, s: SeriesStep, rounding: RoundingMode): SeriesStepJson {
  return {
    step: s.step,
    factor: s.factor.toNumber(),
    take: instructionJson(s.take, volumeUnitFor(s.take.quantity, r.volume.unit), rounding),
    diluent: instructionJson(s.diluent, r.volume.unit?.symbol, rounding),
    concentration: s.concentration ? instructionJson(s.concentration, r.stock?.unit?.symbol, rounding) : null,
    cumulative: s.cumulative.toNumber(),
  };
}

/** The JSON row of a dilution by mass. */
export interface MassDilutionJson {
  /** The content of the stronger material as written. */
  input: string;
  /** The target content as written. */
  target: string;
  /** The total mass to make, as written. */
  total: string;
  /** The stronger material to weigh: an instruction. */
  take: AmountJson;
  /** The diluent (base, filler) to weigh: an instruction. */
  diluent: AmountJson;
  /** The dilution factor, stock ÷ target. */
  factor: number;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a dilution by mass (`pondus dilute CONTENT --to … --mass TOTAL --json`).
 *
 * @param r - a result of `diluteByMass`.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the contents and total as written, the masses of material and diluent to weigh (instructions), the dilution factor, the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a dilution by mass or `rounding` not a rounding mode.
 * @example
 * massDilutionJson(diluteByMass('10 % w/w', '2.5 % w/w', '60.0 g')).take.display // '15.00 g'
 */
export function massDilutionJson(r: MassDilutionResult, rounding: RoundingMode = 'half-even'): MassDilutionJson {
  return {
    input: r.written.stock,
    target: r.written.target,
    total: r.written.total,
    take: instructionJson(r.take, massUnitFor(r.take.quantity), rounding),
    diluent: instructionJson(r.diluent, massUnitFor(r.diluent.quantity), rounding),
    factor: r.factor.value.toNumber(),
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}
