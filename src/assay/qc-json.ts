/**
 * The serialisers of `pondus titration` and `pondus sample-basis`: the JSON object of a result as
 * reported on its basis. The CLI prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import type { Note } from '../errors/issue.js';
import { reportedAmountJson as amount } from '../sigfig/amount-json.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { QC_CAUTION } from './caution.js';
import type { Reported } from './reported-on-basis.js';
import type { SampleBasis } from './sample-basis.js';
import type { SpecificationCheck } from './specification.js';
import type { TitrationAssayResult } from './titration-assay.js';


/**
 * The JSON of a specification check: the limits, the basis, the rounded value and the verdict.
 *
 * @param s - the check, or null when no limits were given.
 * @param basis - the basis the value was checked on.
 * @returns the object, or null.
 * @throws nothing.
 * @example
 * specificationJson(null, 'as-is') // null
 */
export function specificationJson(s: SpecificationCheck | null, basis: SampleBasis): Record<string, unknown> | null {
  return s ? { limits: `${s.limits.low}–${s.limits.high} %`, basis, rounded: s.roundedText, complies: s.complies, rounding: s.rounding } : null;
}

/**
 * The JSON object `pondus titration --json` writes for one titration: the titre, moles, analyte
 * mass and assay, and the value reported on its basis, each a result amount.
 *
 * @param t - a result of `titrationAssay`.
 * @param rep - the assay as reported (from `reportOnBasis`).
 * @param input - the input text as given (the analyte).
 * @param rounding - how reported figures are rounded.
 * @returns the row, with `notes` and the caution.
 * @throws PondusError: BAD_ARGUMENT (from the public API) when `t` is not a titration result or `rep` not a reported result.
 * @example
 * const t = titrationAssay('KHC8H4O4', { sample: '0.5000 g', titrant: '0.1000 M', volume: '24.40 mL' })
 * titrationJson(t, reportOnBasis(t.assay, 'as-is', 'as-is'), 'KHC8H4O4').assay.display // '99.66 %'
 */
export function titrationJson(t: TitrationAssayResult, rep: Reported, input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  return {
    input,
    analyte: t.analyte.formula,
    molarMass: t.analyte.molarMass.toNumber(),
    kind: t.kind,
    ratio: t.ratio.text,
    reagentRatio: t.reagentRatio?.text ?? null,
    netTitre: amount(t.netTitre, 'result', 'mL', rounding),
    moles: amount(t.moles, 'result', 'mmol', rounding),
    analyteMass: amount(t.mass, 'result', 'mg', rounding),
    assay: amount(t.assay, 'result', '%', rounding),
    basis: rep.basis,
    reported: amount(rep.value, 'result', '%', rounding),
    specification: specificationJson(rep.spec, rep.basis),
    rounding,
    notes: notesJson([...t.notes, ...rep.notes]),
    caution: QC_CAUTION,
  };
}

/**
 * The JSON object `pondus sample-basis --json` writes for one result: the value given, the
 * factor and the value on the other basis, each a result amount.
 *
 * @param value - the result as given.
 * @param from - the basis it is on.
 * @param rep - the result as reported (from `reportOnBasis`).
 * @param notes - the notes of reading the input.
 * @param input - the input text as given.
 * @param rounding - how reported figures are rounded.
 * @returns the row, with `notes` and the caution.
 * @throws PondusError: BAD_ARGUMENT (from the public API) when `value` is not a Quantity or `rep` not a reported result.
 * @example
 * const v = quantity(readNumber('0.991'), null)
 * sampleBasisJson(v, 'as-is', reportOnBasis(v, 'as-is', 'dried', { loss: '0.50 %' }), [], '99.1 %').to // 'dried'
 */
export function sampleBasisJson(value: Quantity, from: SampleBasis, rep: Reported, notes: readonly Note[], input: string, rounding: RoundingMode = 'half-even'): Record<string, unknown> {
  return {
    input,
    from,
    to: rep.basis,
    value: amount(value, 'result', '%', rounding),
    factor: rep.conversion ? rep.conversion.factor.value.toNumber() : 1,
    converted: amount(rep.value, 'result', '%', rounding),
    specification: specificationJson(rep.spec, rep.basis),
    rounding,
    notes: notesJson([...notes, ...rep.notes]),
    caution: QC_CAUTION,
  };
}
