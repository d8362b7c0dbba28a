/**
 * The one serialiser of `pondus osmolarity`: the JSON object of a plain osmolarity result. The CLI
 * prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import { speciesText } from '../preparation/species.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { PHARMACY_CAUTION } from './caution.js';
import type { OsmolarityResult } from './osmolarity.js';

/**
 * The JSON object `pondus osmolarity --json` writes for one solution: each component with its
 * kind ('salt' or 'non-electrolyte'), particles, mmol/L and mOsm/L (a salt also its mEq/L and
 * ions); the total and its parts from salts and from non-electrolytes; and mmol/L and mEq/L by
 * ion, each an amount (held in mol/L, Osm/L, Eq/L).
 *
 * @param r - a result of `osmolarity`.
 * @param input - the input text as given (the solution).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row, with `notes` and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not an osmolarity result, `input` not a string or `rounding` not a rounding mode.
 * @example
 * const row = osmolarityJson(osmolarity('NaCl=0.9 %'), 'NaCl=0.9 %')
 * row.mOsmPerL.display // '308.0 mOsm/L'
 * const d = osmolarityJson(osmolarity('C6H12O6=5 %'), 'C6H12O6=5 %')
 * d.components[0].kind // 'non-electrolyte'
 * d.components[0].mOsmPerL.display // '277.5 mOsm/L'
 * d.saltMOsmPerL // null
 */
export function osmolarityJson(r: OsmolarityResult, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  const mOsm = (q: Quantity | null) => (q === null ? null : amount(q, 'result', 'mM', rounding, 'mOsm/L'));
  return {
    input,
    components: r.components.map((c) => {
      const detail = c.kind === 'salt' ? c.result.salt : c.result.solute;
      const head = { kind: c.kind, solute: speciesText({ input: c.solute }), soluteHill: detail.formula };
      const common = { strength: c.strength, particles: c.particles, mmolPerL: amount(c.result.moles, 'result', 'mM', rounding, 'mmol/L'), mOsmPerL: mOsm(c.result.osmoles) };
      if (c.kind !== 'salt') return { ...head, ...common };
      return {
        ...head,
        salt: speciesText(c.result.salt),
        saltHill: c.result.salt.formula,
        ...common,
        meqPerL: amount(c.result.equivalents, 'result', 'mM', rounding, 'mEq/L'),
        ions: c.result.perIon.map((i) => ({ ion: i.ion, charge: i.charge, mmolPerL: amount(i.amount, 'result', 'mM', rounding, 'mmol/L'), meqPerL: amount(i.equivalents, 'result', 'mM', rounding, 'mEq/L') })),
      };
    }),
    mOsmPerL: mOsm(r.osmolarity),
    saltMOsmPerL: mOsm(r.saltOsmolarity),
    nonElectrolyteMOsmPerL: mOsm(r.nonElectrolyteOsmolarity),
    ions: r.ions.map((i) => ({ ion: i.ion, charge: i.charge, mmolPerL: amount(i.molarity, 'result', 'mM', rounding, 'mmol/L'), meqPerL: amount(i.equivalents, 'result', 'mM', rounding, 'mEq/L') })),
    rounding,
    notes: notesJson(r.notes),
    caution: PHARMACY_CAUTION,
  };
}
