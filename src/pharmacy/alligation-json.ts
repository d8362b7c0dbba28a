/**
 * The one serialiser of `pondus alligation`: the JSON object of a plain alligation result. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import { displayQuantity } from '../sigfig/display-quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import type { AlligationResult } from './alligation.js';
import { PHARMACY_CAUTION } from './caution.js';
import { atWorkingPrecision } from './working-precision.js';

/**
 * The unit the amounts of an alligation are given in: the total's, or g (by mass) and mL (by volume).
 *
 * @param r - a result of `alligation`.
 * @returns a unit symbol.
 * @example
 * alligationUnit(alligation('10 %', { higher: '20 %', lower: '5 %', by: 'mass' })) // 'g'
 */
export function alligationUnit(r: AlligationResult): string {
  return r.total?.unit?.symbol ?? (r.by === 'mass' ? 'g' : 'mL');
}

/**
 * The JSON object `pondus alligation --json` writes for one target: the parts, the fraction of the
 * higher strength, and the total and the two amounts to take (instructions).
 *
 * @param r - a result of `alligation`.
 * @param input - the input text as given (the target strength).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not an alligation result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * const row = alligationJson(alligation('10 %', { higher: '20 %', lower: '5 %', total: '300 g' }), '10 %')
 * row.higher.display // '100.0 g'
 * row.higherParts // 5
 */
export function alligationJson(r: AlligationResult, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  const unit = alligationUnit(r);
  const sUnit = r.target.value.unit?.symbol;
  const parts = (q: AlligationResult['higherParts']) => displayQuantity({ ...q, lsd: null }, sUnit, rounding).value.toNumber();
  return {
    input,
    by: r.by,
    higherParts: parts(r.higherParts),
    lowerParts: parts(r.lowerParts),
    higherFraction: r.higherFraction.value.toNumber(),
    total: r.total ? amount(atWorkingPrecision({ ...r.total, lsd: null }), 'instruction', unit, rounding) : null,
    higher: r.higherAmount ? amount(r.higherAmount, 'instruction', unit, rounding) : null,
    lower: r.lowerAmount ? amount(r.lowerAmount, 'instruction', unit, rounding) : null,
    rounding,
    notes: notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}
