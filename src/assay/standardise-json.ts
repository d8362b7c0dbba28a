/**
 * The one serialiser of `pondus standardise`: the JSON object of a plain standardisation. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { BENCH_CAUTION } from '../preparation/caution.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import type { RoundingMode } from '../sigfig/round.js';
import type { StandardiseResult } from './standardise.js';

/**
 * The JSON object `pondus standardise --json` writes for one primary standard: the moles of
 * standard, the net titre and the titrant's molarity, each a result amount.
 *
 * @param r - a result of `standardise`.
 * @param input - the input text as given (the primary standard).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a standardisation result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * standardiseJson(standardise('KHC8H4O4', { mass: '0.5105 g', volume: '24.95 mL' }), 'KHC8H4O4').molarity.display // '0.1002 M'
 */
export function standardiseJson(r: StandardiseResult, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  return {
    input,
    standard: r.standard.formula,
    molarMass: r.standard.molarMass.toNumber(),
    ratio: r.ratio.text,
    moles: amount(r.moles, 'result', 'mmol', rounding),
    netTitre: amount(r.netTitre, 'result', 'mL', rounding),
    molarity: amount(r.molarity, 'result', 'M', rounding),
    rounding,
    notes: notesJson(r.notes),
    caution: BENCH_CAUTION,
  };
}
