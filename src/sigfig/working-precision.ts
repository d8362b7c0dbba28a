/**
 * Working precision for instructions. A result computed from measurements
 * keeps the textbook figures (display-quantity.ts). An instruction computed
 * from a target — a mass to weigh, a volume to take — is not a measurement: a
 * target of 0.1 M is a specification, and rounding the mass to weigh to one
 * figure ("weigh 1 g") would be absurd. An instruction is shown to at least 4
 * significant figures (more when the data carry more), optionally never finer
 * than what the instrument can read (0.1 mg on an analytical balance).
 */
import { Decimal } from '../exact/decimal.js';
import { msd, sigFigsOf } from './measured.js';
import type { Quantity } from './quantity.js';
import { displayMeasured, type RoundingMode } from './round.js';
import { baseUnitText, type Unit } from './units.js';
import { reportUnit, type QuantityDisplay } from './display-quantity.js';

/** Least significant figures of an instruction. */
export const WORKING_SIG_FIGS = 4;

export interface WorkingPrecisionOptions {
  /** The unit to report in: as for displayQuantity (asked, else the quantity's own, else the base unit). */
  unit?: string | Unit | null;
  /** Rounding of the shown figure: half-to-even (default) or half-up. */
  rounding?: RoundingMode;
  /** Least significant figures shown (default 4). */
  minSigFigs?: number;
  /**
   * The finest step worth showing, as a quantity of the same kind (for
   * example 0.1 mg, the readability of an analytical balance, or 1 mL for a
   * graduated cylinder): digits finer than its leading digit are not shown.
   */
  readability?: Quantity;
}

export interface WorkingDisplay extends QuantityDisplay {
  /**
   * Significant figures the computation itself supports (the textbook count),
   * null when exact; `sigFigs` is what is shown.
   */
  dataSigFigs: number | null;
  /** True when more figures are shown than the data support (a target with few figures). */
  beyondData: boolean;
  /** A plain-English note when `beyondData`, else null. */
  note: string | null;
}

/**
 * Shows an instruction (an amount to act on) at working precision: at least
 * `minSigFigs` (4) significant figures, more when the data support more, never
 * finer than `readability` when it is given. When more figures are shown than
 * the data support, `note` says so. The figures are counted on the rounded
 * value, as everywhere: a carry into the next power of ten moves the last digit
 * up (9.99996 g at 4 figures is 10.00 g).
 *
 * @example
 * // 0.1 M × 250 mL × 58.44 g/mol: the data have 1 figure, the instruction 4
 * displayInstruction(measure('0.1 M * 250 mL * 58.44 g/mol'), { unit: 'g' }).text // '1.461 g'
 * displayInstruction(measure('0.01317 g'), { unit: 'mg', readability: measure('0.1 mg') }).text // '13.2 mg'
 */
export function displayInstruction(q: Quantity, options: WorkingPrecisionOptions = {}): WorkingDisplay {
  const unit = reportUnit(q, options.unit);
  const exp10 = unit ? unit.exp10 : 0;
  const value = q.value.div(new Decimal(10).pow(exp10));
  const min = options.minSigFigs ?? WORKING_SIG_FIGS;
  const data = q.lsd === null ? Infinity : sigFigsOf(q);
  const n = Math.max(min, data === Infinity ? min : data);
  let d = displayMeasured(value.isZero() ? { value, lsd: -(min - 1) } : { value, lsd: msd(value) - n + 1, sigFigs: n }, options.rounding);
  if (options.readability && !options.readability.value.isZero() && !value.isZero()) {
    const finest = msd(options.readability.value) - exp10;
    if (d.lsd !== null && d.lsd < finest) {
      d = displayMeasured({ value, lsd: finest }, options.rounding);
    }
  }
  const unitText = unit ? unit.symbol : baseUnitText(q.dims);
  const dataSigFigs = data === Infinity ? null : data;
  const beyondData = dataSigFigs !== null && (d.sigFigs ?? 0) > dataSigFigs;
  const note = beyondData
    ? `shown to working precision (${d.sigFigs} significant figures) as an amount to use; the data it comes from have ${dataSigFigs} significant figure${dataSigFigs === 1 ? '' : 's'}, so it is not a result known to that precision`
    : null;
  return {
    text: unitText ? `${d.text} ${unitText}` : d.text,
    figure: d.text,
    value,
    rounded: d.value,
    sigFigs: d.sigFigs,
    unit: unitText,
    lsd: d.lsd,
    belowPrecision: d.belowPrecision,
    dataSigFigs,
    beyondData,
    note,
  };
}
