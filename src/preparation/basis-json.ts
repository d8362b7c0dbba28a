/**
 * The one serialiser of `pondus basis`: the JSON object of a plain basis conversion. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import type { NoteJson } from '../mass/mass-json.js';
import { reportedAmountJson, type ReportedAmountJson } from '../sigfig/amount-json.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import type { BasisResult } from './basis.js';
import { speciesText } from './species.js';

/** The JSON row of a basis conversion (before the CLI writer's `line`). */
export interface BasisJson {
  /** The basis converted from, as given. */
  input: string;
  /** The basis converted from, normalised (as written). */
  from: string;
  /** The basis converted to, normalised. */
  to: string;
  fromHill: string;
  toHill: string;
  /** The conversion factor, unrounded. */
  factor: number;
  /** The factor to its reported figures. */
  factorDisplay: string;
  /** The value given (--value) as read, in its own unit; null when only the factor was asked for. */
  value: ReportedAmountJson | null;
  /** The value on the other basis (a result, in the unit of the value given). */
  converted: ReportedAmountJson | null;
  notes: NoteJson[];
}

/**
 * The JSON object `pondus basis --json` writes for one result.
 *
 * @param r - a result of `convertBasis`.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row: the factor, the value given and the converted value as result amounts (percentages as fractions, shown in %), and the notes.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a basis result or `rounding` not a rounding mode.
 * @example
 * const row = basisJson(convertBasis('P2O5', 'P', { value: '12.5 %' }))
 * row.value // { kind: 'result', value: 0.125, unit: '', display: '12.5 %', sigFigs: 3, figure: '12.5', displayUnit: '%' }
 * row.converted.value // 0.05455…
 * row.converted.display // '5.46 %'
 */
export function basisJson(r: BasisResult, rounding: RoundingMode = 'half-even'): BasisJson {
  return {
    input: r.factor.given.input,
    from: speciesText(r.factor.given),
    to: speciesText(r.factor.sought),
    fromHill: r.factor.given.formula,
    toHill: r.factor.sought.formula,
    factor: r.factor.factor.toNumber(),
    factorDisplay: displayMeasured(r.factor.reported, rounding).text,
    value: r.value ? reportedAmountJson(r.value, 'result', undefined, rounding) : null,
    converted: r.converted ? reportedAmountJson(r.converted, 'result', undefined, rounding) : null,
    notes: notesJson(r.notes),
  };
}
