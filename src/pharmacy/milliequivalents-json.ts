/**
 * The one serialiser of `pondus meq`: the JSON object of a plain milliequivalents result. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { speciesText } from '../preparation/species.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import type { RoundingMode } from '../sigfig/round.js';
import { PHARMACY_CAUTION } from './caution.js';
import type { MilliequivalentResult } from './milliequivalents.js';

/** A mass and amounts for a target are instructions (working precision); from a weighed mass or a strength, results. */
const kindOf = (r: MilliequivalentResult) => (r.mode === 'target' ? 'instruction' : 'result');

/**
 * The JSON object `pondus meq --json` writes for one result: per mL and per L for a strength,
 * otherwise the mass, mmol, mEq and mOsm, each an amount (mEq and mOsm held in Eq and Osm).
 *
 * @param r - a result of `milliequivalents`.
 * @param input - the input text as given (the salt).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a milliequivalents result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * const row = meqJson(milliequivalents('KCl', { mass: '1.000 g' }), 'KCl')
 * row.meq.display // '13.41 mEq'
 * row.meq.unit // 'Eq'
 */
export function meqJson(r: MilliequivalentResult, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  const k = kindOf(r);
  return {
    input,
    salt: speciesText(r.salt),
    saltHill: r.salt.formula,
    molarMass: r.salt.molarMass.toNumber(),
    mode: r.mode,
    ions: r.ions.ions.map((i) => ({ ion: i.ion, charge: i.charge, count: i.count })),
    meqPerMmol: r.ions.equivalentsPerMole,
    mOsmPerMmol: r.ions.particles,
    ...(r.mode === 'strength'
      ? {
          mmolPerMl: amount(r.moles, 'result', 'M', rounding, 'mmol/mL'),
          meqPerMl: amount(r.equivalents, 'result', 'M', rounding, 'mEq/mL'),
          meqPerL: amount(r.equivalents, 'result', 'mM', rounding, 'mEq/L'),
          mOsmPerL: amount(r.osmoles, 'result', 'mM', rounding, 'mOsm/L'),
          perIon: r.perIon.map((i) => ({ ion: i.ion, meqPerL: amount(i.equivalents, 'result', 'mM', rounding, 'mEq/L') })),
        }
      : {
          mass: amount(r.mass!, k, 'g', rounding),
          mmol: amount(r.moles, k, 'mmol', rounding),
          meq: amount(r.equivalents, k, 'mmol', rounding, 'mEq'),
          mOsm: amount(r.osmoles, k, 'mmol', rounding, 'mOsm'),
          perIon: r.perIon.map((i) => ({ ion: i.ion, mmol: amount(i.amount, k, 'mmol', rounding), meq: amount(i.equivalents, k, 'mmol', rounding, 'mEq') })),
        }),
    rounding,
    notes: notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}
