/**
 * The one serialiser of `pondus replicates`: the JSON object of plain replicate statistics. The
 * CLI prints exactly this (its JSON writer adds the input's line number).
 */
import { notesJson } from '../errors/note-json.js';
import type { ReplicateResult } from './replicates.js';

/**
 * The JSON object `pondus replicates --json` writes for one set of replicates: n, mean, SD, RSD,
 * Student's t and the confidence interval, unrounded beside the reported texts.
 *
 * @param r - a result of `replicates`.
 * @param input - the input text as given (the replicate values).
 * @returns the row, with the rounding of the result and `notes`.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a replicates result or `input` not a string.
 * @example
 * replicatesJson(replicates('99.1, 99.4, 99.2'), '99.1, 99.4, 99.2').meanReported // '99.23'
 */
export function replicatesJson(r: ReplicateResult, input: string): Record<string, unknown> {
  return {
    input,
    n: r.n,
    unit: r.unit,
    mean: r.mean.value.toNumber(),
    meanReported: r.meanReported,
    halfWidthReported: r.halfWidthReported,
    sd: r.sd.toNumber(),
    rsdPercent: r.rsdPercent.toNumber(),
    level: r.level,
    df: r.df,
    t: r.t,
    halfWidth: r.halfWidth.toNumber(),
    reported: r.reported,
    rounding: r.rounding,
    notes: notesJson(r.notes),
  };
}
