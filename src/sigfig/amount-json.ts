/**
 * The amount shape every JSON row uses for a quantity (see instruction.ts, AmountJson), with the
 * reported figure and the unit it is shown in beside the unrounded value in the base unit.
 */
import type { Quantity } from './quantity.js';
import { displayQuantity } from './display-quantity.js';
import type { RoundingMode } from './round.js';
import { baseUnitText } from './units.js';

/**
 * An amount in JSON: `kind` 'result' (computed from measurements, textbook figures) or
 * 'instruction' (computed from a target); `value` unrounded in the base unit `unit` ('g', 'L',
 * 'mol', 'M'; '' for a pure number or a percentage, given as a fraction: 0.9966 for 99.66 %);
 * `figure` the number as reported, rounded once, in `displayUnit`; `display` the two together;
 * `sigFigs` the figures shown (null for an exact value).
 */
export interface ReportedAmountJson {
  kind: 'instruction' | 'result';
  value: number;
  unit: string;
  display: string;
  sigFigs: number | null;
  figure: string;
  displayUnit: string;
}

/**
 * A quantity as an amount in JSON, shown in a unit and rounded once for the reported figure.
 *
 * @param q - the quantity.
 * @param kind - 'result' or 'instruction'.
 * @param unit - the unit to show it in (the quantity's own unit when omitted).
 * @param rounding - the rounding of the reported figure.
 * @returns the amount object.
 * @example
 * reportedAmountJson(measure('250. mg'), 'result', 'g', 'half-even') // { kind: 'result', value: 0.25, unit: 'g', display: '0.250 g', sigFigs: 3, figure: '0.250', displayUnit: 'g' }
 */
export function reportedAmountJson(q: Quantity, kind: 'instruction' | 'result', unit: string | undefined, rounding: RoundingMode): ReportedAmountJson {
  const d = displayQuantity(q, unit, rounding);
  return { kind, value: q.value.toNumber(), unit: baseUnitText(q.dims), display: d.text, sigFigs: d.sigFigs, figure: d.figure, displayUnit: d.unit };
}
