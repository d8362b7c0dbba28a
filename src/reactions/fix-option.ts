/**
 * Reads what a user writes to fix coefficients: `written`, or `SPECIES=N` entries
 * (`C4H6O3=5, C7H6O3=1`), through the one KEY=VALUE reader.
 */
import { fail } from '../errors/pondus-error.js';
import { readKeyValues } from '../key-values/read-key-values.js';
import type { FixedCoefficients } from './balance.js';

/**
 * Reads `--fix` texts (each `written` or `SPECIES=N[, SPECIES=N]`).
 *
 * @param texts - the texts given to --fix: 'written' alone, or SPECIES=N lists.
 * @returns 'written', or each species with its coefficient as text.
 * @throws PondusError: USAGE for 'written' given with other texts, a text not written species=N, or a species given twice; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readFixOption(['written']) // 'written'
 * readFixOption(['C4H6O3=5', 'C6H12O6=1']) // { C4H6O3: '5', C6H12O6: '1' }
 */
export function readFixOption(texts: readonly string[]): FixedCoefficients {
  if (texts.some((t) => t.trim() === 'written')) {
    if (texts.length > 1) throw fail({ code: 'USAGE', message: '`fix: written` takes the coefficients written in the equation: give it alone, not with SPECIES=N', options: ['fix'] });
    return 'written';
  }
  const out: Record<string, string> = Object.create(null);
  for (const t of texts) {
    for (const e of readKeyValues(t, { code: 'USAGE', example: 'C4H6O3=5' })) {
      if (Object.hasOwn(out, e.key)) throw fail({ code: 'USAGE', message: `\`fix\` gives ${e.key} twice`, options: ['fix'] });
      out[e.key] = e.value;
    }
  }
  return out;
}
