/**
 * A result as reported: converted to the basis asked for (dried, anhydrous, solvent-free) and
 * checked against specification limits, with the notes of both steps.
 */
import type { Note } from '../errors/issue.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { convertSampleBasis, type BasisConversion, type SampleBasis } from './sample-basis.js';
import { checkSpecification, type SpecificationCheck } from './specification.js';

/** The basis a result is reported on, the conversion to it, and the check against limits. */
export interface Reported {
  basis: SampleBasis;
  conversion: BasisConversion | null;
  value: Quantity;
  spec: SpecificationCheck | null;
  notes: Note[];
}

/** What reporting needs besides the value: the content for the conversion, the limits, the rounding. */
export interface ReportOptions {
  loss?: string;
  water?: string;
  solvent?: string;
  limits?: string;
  rounding?: RoundingMode;
  /** True when the basis was inferred from the content given rather than asked for. */
  inferred?: boolean;
}

/**
 * Reports a result on a basis: converts it from `from` to `basis` with the content given, then
 * checks it against the limits when they are given.
 *
 * @param value - the result, a percent on the basis `from`.
 * @param from - the basis the result is on.
 * @param basis - the basis to report it on.
 * @param options - the loss on drying, water or solvent content the conversion needs, the limits, the rounding.
 * @returns the basis, the conversion (null when none was needed), the value reported, the specification check and their notes.
 * @throws PondusError: BAD_AMOUNT or BAD_NUMBER for a content that cannot be read or is out of range; BAD_OPTION for limits that cannot be read; BAD_ARGUMENT for an argument of the wrong kind.
 * @example
 * reportOnBasis(quantity(readNumber('0.991'), null), 'as-is', 'dried', { loss: '0.50 %' }).value.value.toFixed(4) // '0.9960'
 */
export function reportOnBasis(value: Quantity, from: SampleBasis, basis: SampleBasis, options: ReportOptions = {}): Reported {
  const notes: Note[] = [];
  let conversion: BasisConversion | null = null;
  let v = value;
  if (basis !== from) {
    conversion = convertSampleBasis(value, from, basis, { loss: options.loss, water: options.water, solvent: options.solvent });
    notes.push(...conversion.notes);
    if (options.inferred) notes.push({ code: 'BASIS_INFERRED', message: `reported on the ${basis} basis, the one the content given implies; give \`on\` to choose`, options: ['on'] });
    v = conversion.converted;
  }
  let spec: SpecificationCheck | null = null;
  if (options.limits !== undefined) {
    spec = checkSpecification(v, options.limits, options.rounding, `the ${basis}`); // its own default when none is given: half-up, as USP rounds
    notes.push(...spec.notes);
  }
  return { basis, conversion, value: v, spec, notes };
}
