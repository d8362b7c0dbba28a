/**
 * The one serialiser of `pondus gravimetric`: the JSON object of a plain gravimetric result. The
 * CLI prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import type { NoteJson } from '../mass/mass-json.js';
import { exact } from '../sigfig/measured.js';
import { multiply, quantity, type Quantity } from '../sigfig/quantity.js';
import { reportedAmountJson, type ReportedAmountJson } from '../sigfig/amount-json.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import { unitOf } from '../sigfig/units.js';
import type { GravimetricResult } from './gravimetric.js';
import { speciesText } from './species.js';

/** The JSON row of a gravimetric result (before the CLI writer's `line`). */
export interface GravimetricJson {
  /** The analyte as given. */
  input: string;
  /** The analyte, normalised (as written, never in Hill order). */
  analyte: string;
  /** The weighed form, normalised. */
  weighed: string;
  analyteHill: string;
  weighedHill: string;
  /** The element the factor rests on. */
  element: string;
  /** The gravimetric factor, unrounded. */
  factor: number;
  /** The factor to its reported figures. */
  factorDisplay: string;
  /** The analyte in the weighed form (a result, in g), with --mass. */
  analyteMass: ReportedAmountJson | null;
  /** The analyte's mass fraction in the sample (a result; value a fraction, shown in %), with --sample. */
  massPercent: ReportedAmountJson | null;
  notes: NoteJson[];
}

/** A percent held as a pure number (14.18) as the same quantity in '%' (value 0.1418): an exact factor, so the figures stay. */
function percentQuantity(q: Quantity): Quantity {
  return multiply(q, quantity(exact(1), unitOf('%')));
}

/**
 * The JSON object `pondus gravimetric --json` writes for one result.
 *
 * @param r - a result of `gravimetric`.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row: factor, the analyte mass and the mass percent as result amounts (null when not asked for), and the notes.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a gravimetric result or `rounding` not a rounding mode.
 * @example
 * const row = gravimetricJson(gravimetric('Cl', 'AgCl', { weighedMass: '0.2866 g', sampleMass: '0.5000 g' }))
 * row.analyteMass.display // '0.07089 g'
 * row.massPercent.value // 0.14178…
 * row.massPercent.display // '14.18 %'
 * row.massPercent.unit // ''
 */
export function gravimetricJson(r: GravimetricResult, rounding: RoundingMode = 'half-even'): GravimetricJson {
  return {
    input: r.analyte,
    analyte: speciesText(r.factor.sought),
    weighed: speciesText(r.factor.given),
    analyteHill: r.factor.sought.formula,
    weighedHill: r.factor.given.formula,
    element: r.factor.element,
    factor: r.factor.factor.toNumber(),
    factorDisplay: displayMeasured(r.factor.reported, rounding).text,
    analyteMass: r.analyteMass ? reportedAmountJson(r.analyteMass, 'result', 'g', rounding) : null,
    massPercent: r.massPercent ? reportedAmountJson(percentQuantity(r.massPercent), 'result', '%', rounding) : null,
    notes: notesJson(r.notes),
  };
}
