/**
 * The one serialiser of `pondus osmolarity`: the JSON object of a plain osmolarity result. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { speciesText } from '../preparation/species.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import type { RoundingMode } from '../sigfig/round.js';
import { PHARMACY_CAUTION } from './caution.js';
import type { OsmolarityResult } from './osmolarity.js';

/**
 * The JSON object `pondus osmolarity --json` writes for one solution: each component's mOsm/L,
 * the total, and mmol/L and mEq/L by ion, each an amount (held in mol/L, Osm/L, Eq/L).
 *
 * @param r - a result of `osmolarity`.
 * @param input - the input text as given (the solution).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not an osmolarity result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * const row = osmolarityJson(osmolarity('NaCl=0.9 %'), 'NaCl=0.9 %')
 * row.mOsmPerL.display // '308.0 mOsm/L'
 */
export function osmolarityJson(r: OsmolarityResult, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  return {
    input,
    components: r.components.map((c) => ({ salt: speciesText(c.result.salt), saltHill: c.result.salt.formula, strength: c.strength, mOsmPerL: amount(c.result.osmoles, 'result', 'mM', rounding, 'mOsm/L') })),
    mOsmPerL: amount(r.osmolarity, 'result', 'mM', rounding, 'mOsm/L'),
    ions: r.ions.map((i) => ({ ion: i.ion, charge: i.charge, mmolPerL: amount(i.molarity, 'result', 'mM', rounding, 'mmol/L'), meqPerL: amount(i.equivalents, 'result', 'mM', rounding, 'mEq/L') })),
    rounding,
    notes: notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}
