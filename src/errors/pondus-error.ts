import type { Issue } from './issue.js';

/**
 * Most issues one error carries. A reader that finds more keeps the first ones (in the order of
 * the input) and sets {@link PondusError.more}, so a hostile line stays cheap to report.
 */
export const MAX_ISSUES = 20;

/**
 * The one error type pondus throws. It carries the offending input and the
 * list of every issue found in it (up to {@link MAX_ISSUES}), in the order of the input; render
 * it with {@link renderError}.
 *
 * @example
 * let code = ''
 * try { parseFormula('Xx2') } catch (e) { if (e instanceof PondusError) code = e.issues[0].code }
 * code // 'UNKNOWN_ELEMENT'
 */
export class PondusError extends Error {
  readonly issues: Issue[];
  readonly input: string | undefined;
  /** True when the input had more issues than {@link MAX_ISSUES} and only the first are kept. */
  readonly more: boolean;

  constructor(issues: Issue[], input?: string) {
    const kept = issues.length > MAX_ISSUES ? issues.slice(0, MAX_ISSUES) : issues;
    super(kept.map((i) => i.message).join('; '));
    this.name = 'PondusError';
    this.issues = kept;
    this.input = input;
    this.more = kept !== issues;
  }

  /** The first issue, the one shown when only one is shown. */
  get first(): Issue {
    return this.issues[0];
  }
}

/** Result of a non-throwing entry point (`safe…` functions). */
export type SafeResult<T> = { success: true; data: T } | { success: false; error: PondusError };

/**
 * Creates a PondusError with a single issue.
 *
 * @example
 * fail({ code: 'BAD_COUNT', message: 'a count of zero', column: 3 }, 'H0').issues[0].column // 3
 */
export function fail(issue: Issue, input?: string): PondusError {
  return new PondusError([issue], input);
}

/**
 * Runs `fn` and turns a thrown PondusError into a failed SafeResult; other errors propagate.
 *
 * @param fn - a function to run, taking no arguments.
 * @returns `{ success: true, data }` with what `fn` returned, or `{ success: false, error }` when it threw a PondusError.
 * @throws PondusError: BAD_ARGUMENT when `fn` is not a function; an error of another type thrown by `fn` reaches the caller as INTERNAL_ERROR (or DIVISION_BY_ZERO) rather than as a failed result.
 * @example
 * toSafe(() => parseFormula('H2O')).success // true
 * toSafe(() => parseFormula('Xx')).success  // false
 */
export function toSafe<T>(fn: () => T): SafeResult<T> {
  try {
    return { success: true, data: fn() };
  } catch (e) {
    if (e instanceof PondusError) return { success: false, error: e };
    throw e;
  }
}
