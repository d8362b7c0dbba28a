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

/** The base unit of an amount shown under a label: mEq and mOsm are amounts of charge and of particles, held in mol. */
function baseUnit(q: Quantity, label: string | undefined): string {
  const base = baseUnitText(q.dims);
  const of = label === undefined ? null : /Eq/.test(label) ? 'Eq' : /Osm/.test(label) ? 'Osm' : null;
  if (of === null) return base;
  return base === 'mol' ? of : base === 'M' ? `${of}/L` : base;
}

/**
 * A quantity as an amount in JSON, shown in a unit (or under a label: 'mEq' for mmol of charge),
 * rounded once for the reported figure.
 *
 * @param q - the quantity.
 * @param kind - 'result' or 'instruction'.
 * @param unit - the unit to show it in (the quantity's own unit when omitted).
 * @param rounding - the rounding of the reported figure.
 * @param label - what to show in place of the unit symbol ('mEq' for mmol of charge; the unit unless given).
 * @returns the amount object.
 * @example
 * reportedAmountJson(measure('250. mg'), 'result', 'g', 'half-even') // { kind: 'result', value: 0.25, unit: 'g', display: '0.250 g', sigFigs: 3, figure: '0.250', displayUnit: 'g' }
 * reportedAmountJson(measure('20.0 mmol'), 'result', 'mmol', 'half-even', 'mEq').unit // 'Eq'
 */
export function reportedAmountJson(q: Quantity, kind: 'instruction' | 'result', unit: string | undefined, rounding: RoundingMode, label = unit): ReportedAmountJson {
  const d = displayQuantity(q, unit, rounding);
  const shown = label ?? d.unit;
  return { kind, value: q.value.toNumber(), unit: baseUnit(q, label), display: shown ? `${d.figure} ${shown}` : d.figure, sigFigs: d.sigFigs, figure: d.figure, displayUnit: shown };
}
