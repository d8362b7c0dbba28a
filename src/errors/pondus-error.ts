import type { Issue } from './issue.js';

/**
 * The one error type pondus throws. It carries the offending input and the
 * list of issues found in it; render it with {@link renderError}.
 *
 * @example
 * let code = ''
 * try { parseFormula('Xx2') } catch (e) { if (e instanceof PondusError) code = e.issues[0].code }
 * code // 'UNKNOWN_ELEMENT'
 */
export class PondusError extends Error {
  readonly issues: Issue[];
  readonly input: string | undefined;

  constructor(issues: Issue[], input?: string) {
    super(issues.map((i) => i.message).join('; '));
    this.name = 'PondusError';
    this.issues = issues;
    this.input = input;
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
