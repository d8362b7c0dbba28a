/**
 * How a quantity is reported: converted to a unit (its own, a requested one, or
 * the base unit of its dimension), rounded once to its significant figures.
 */
import { Decimal } from '../exact/decimal.js';
import { fail } from '../errors/pondus-error.js';
import { typedIssue } from '../errors/message.js';
import type { Quantity } from './quantity.js';
import { displayMeasured, type RoundingMode } from './round.js';
import { baseUnitText, inUnitOf, sameDims, unitOf, type Unit } from './units.js';

export interface QuantityDisplay {
  /** The reported figure then the unit: '6.24 g'. */
  text: string;
  /** The reported figure alone: '6.24'. */
  figure: string;
  /** The unrounded value in the reported unit. */
  value: Decimal;
  /** The rounded value in the reported unit. */
  rounded: Decimal;
  /** Significant figures of the reported figure; 0 when it rounds to zero (see belowPrecision); null when exact. */
  sigFigs: number | null;
  /** Unit symbol ('' for a pure number). */
  unit: string;
  /** Power of ten of the last digit shown, in the reported unit (null when exact). */
  lsd: number | null;
  /** True when a measured value rounds to zero: it is smaller than the precision of the data. */
  belowPrecision: boolean;
}

/**
 * The unit a quantity is reported in: the one asked for, else its own, else the base unit of its dimension.
 *
 * @param q - a quantity.
 * @param wanted - the unit asked for, as a symbol or a unit; null or left out for none.
 * @returns the unit to report in, or null for a pure number or a dimension without a unit symbol.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `q` is not a Quantity or `wanted` is not a unit, a string or null.
 * @example
 * reportUnit(quantity(readNumber('0.250'), unitOf('L')), 'mL')?.symbol // 'mL'
 */
export function reportUnit(q: Quantity, wanted?: string | Unit | null): Unit | null {
  if (wanted) {
    const u = typeof wanted === 'string' ? unitOf(wanted) : wanted;
    if (!sameDims(u.dims, q.dims)) throw fail(typedIssue({ code: 'INCOMPATIBLE_UNITS', operation: 'convert', first: null, firstDimension: baseUnitText(q.dims) || null, second: u.symbol, secondDimension: baseUnitText(u.dims) || null }));
    return u;
  }
  if (q.unit && sameDims(q.unit.dims, q.dims)) return q.unit;
  const base = baseUnitText(q.dims);
  if (base === '') return null;
  try {
    return unitOf(base);
  } catch {
    return null;
  }
}

/**
 * Reports a quantity in a unit, rounded once.
 *
 * @param q - a quantity.
 * @param wanted - the unit to report in, as a symbol or a unit; by default its own unit, else the base unit.
 * @param rounding - 'half-even' (default) or 'half-up'.
 * @returns the text ('0.250 g'), the figure alone, the unrounded and rounded values in that unit, the significant figures, the unit symbol, the last digit's position and whether it rounds to zero.
 * @throws PondusError: UNKNOWN_UNIT for an unknown symbol; INCOMPATIBLE_UNITS when `wanted` is of another dimension; BAD_ARGUMENT when `q` is not a Quantity, `wanted` not a unit, a string or null, or `rounding` not a rounding mode.
 * @example
 * displayQuantity(measure('250. mg'), 'g').text // '0.250 g'
 */
export function displayQuantity(q: Quantity, wanted?: string | Unit | null, rounding: RoundingMode = 'half-even'): QuantityDisplay {
  const unit = reportUnit(q, wanted);
  const exp10 = unit ? unit.exp10 : 0;
  const value = inUnitOf(q.value, unit);
  const lsd = q.lsd === null ? null : q.lsd - exp10;
  const d = displayMeasured(q.sigFigs !== undefined && lsd !== null ? { value, lsd, sigFigs: q.sigFigs } : { value, lsd }, rounding);
  const unitText = unit ? unit.symbol : baseUnitText(q.dims);
  return { text: unitText ? `${d.text} ${unitText}` : d.text, figure: d.text, value, rounded: d.value, sigFigs: d.sigFigs, unit: unitText, lsd: d.lsd, belowPrecision: d.belowPrecision };
}
