/**
 * The one serialiser of `pondus potency`: the JSON object of a plain potency result. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import { instructionJson, massUnitFor } from '../sigfig/instruction.js';
import type { RoundingMode } from '../sigfig/round.js';
import { POTENCY_CAUTION } from './caution.js';
import type { PotencyResult } from './potency.js';

/**
 * The JSON object `pondus potency --json` writes for one result: the as-is potency in the unit
 * given and in the other (% or µg/mg), and the mass to weigh for a need (an instruction).
 *
 * @param r - a result of `potency`.
 * @param input - the input text as given (the potency).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @param need - the amount of active needed as given (null when not asked for).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a potency result, `input` not a string, `rounding` not a rounding mode or `need` not a string.
 * @example
 * potencyJson(potency('98.5 %'), '98.5 %').asIsAlso.display // '985 µg/mg'
 */
export function potencyJson(r: PotencyResult, input: string, rounding: RoundingMode = 'half-even', need: string | null = null): Record<string, unknown> {
  const given = r.given.unit?.symbol ?? '%';
  return {
    input,
    basis: r.basis,
    asIs: amount(r.asIs, 'result', given, rounding),
    asIsAlso: amount(r.asIs, 'result', given === '%' ? 'µg/mg' : '%', rounding),
    need: need?.trim() ?? null,
    weigh: r.weigh ? instructionJson(r.weigh, massUnitFor(r.weigh.quantity), rounding) : null,
    rounding,
    notes: notesJson(r.notes),
    caution: POTENCY_CAUTION,
  };
}
