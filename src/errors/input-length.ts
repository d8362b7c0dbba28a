/**
 * The length check a reader makes before any work: a measurement set, a sample or product mass,
 * found percents, a measured pattern or a solution of solutes longer than the limit is refused at
 * once (INPUT_TOO_LONG), so no reader is ever run on megabytes of text.
 */
import type { Issue } from './issue.js';
import { fail } from './pondus-error.js';

/** Longest text read as one measurement set, mass or list of found values (the formula limit too). */
export const MAX_INPUT_LENGTH = 10_000;

/**
 * The INPUT_TOO_LONG issue for text longer than the limit (naming what it is and how long), or null.
 *
 * @example
 * inputTooLong('C=40.00 H=6.71 O=53.29', 'the measurement set') // null
 * inputTooLong('C=1' + ' '.repeat(20000), 'the measurement set')?.code // 'INPUT_TOO_LONG'
 */
export function inputTooLong(text: unknown, what: string, limit = MAX_INPUT_LENGTH): Issue | null {
  if (typeof text !== 'string' || text.length <= limit) return null;
  return { code: 'INPUT_TOO_LONG', message: `${what} is ${text.length.toLocaleString('en-US')} characters long; the limit is ${limit.toLocaleString('en-US')}` };
}

/**
 * Throws the INPUT_TOO_LONG error for text longer than the limit; returns otherwise.
 *
 * @example
 * checkInputLength('C=40.00 H=6.71 O=53.29', 'the measurement set') // undefined
 */
export function checkInputLength(text: unknown, what: string, limit = MAX_INPUT_LENGTH): void {
  const issue = inputTooLong(text, what, limit);
  if (issue) throw fail(issue);
}
