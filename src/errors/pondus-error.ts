import type { Issue, Note } from './issue.js';

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
  /**
   * What was noted about the input before it failed (a `.` read as the addition dot, an
   * abbreviation expanded): a failed row carries these as an ok row carries its notes.
   */
  readonly notes: readonly Note[];

  constructor(issues: Issue[], input?: string, notes: readonly Note[] = []) {
    const kept = issues.length > MAX_ISSUES ? issues.slice(0, MAX_ISSUES) : issues;
    super(kept.map((i) => i.message).join('; '));
    this.name = 'PondusError';
    this.issues = kept;
    this.input = input;
    this.more = kept !== issues;
    this.notes = notes;
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
 * What an error that is not a PondusError becomes when it reaches the public API's boundary: a
 * division by zero keeps its meaning (DIVISION_BY_ZERO), a value decimal.js cannot read as a number
 * is BAD_ARGUMENT; anything else is a PondusError with code
 * INTERNAL_ERROR naming the function and the original message (kept as `cause`).
 *
 * @example
 * asPondusError('f', new Error('boom')).first.code // 'INTERNAL_ERROR'
 */
export function asPondusError(name: string, e: unknown): PondusError {
  if (e instanceof PondusError) return e;
  const message = e instanceof Error ? e.message : String(e);
  const invalid = /^\[DecimalError\] Invalid argument: (.*)$/s.exec(message);
  const err = /division by zero/i.test(message)
    ? new PondusError([{ code: 'DIVISION_BY_ZERO', message: `${name}: division by zero` }])
    : invalid
      ? new PondusError([{ code: 'BAD_ARGUMENT', message: `${name}: not a number: '${invalid[1].slice(0, 40)}'` }])
      : new PondusError([{ code: 'INTERNAL_ERROR', message: `${name}: internal error (please report it): ${message}` }]);
  (err as { cause?: unknown }).cause = e;
  return err;
}

/**
 * Runs `fn` and turns anything it throws into a failed SafeResult: a PondusError as it is, any
 * other error as a PondusError (INTERNAL_ERROR naming the original, or DIVISION_BY_ZERO; the
 * original kept as `cause`). It never throws what `fn` throws.
 *
 * @param fn - a function to run, taking no arguments.
 * @returns `{ success: true, data }` with what `fn` returned, or `{ success: false, error }` with what it threw, as a PondusError.
 * @throws PondusError: BAD_ARGUMENT when `fn` is not a function (from the public API's boundary); nothing that `fn` throws.
 * @example
 * toSafe(() => parseFormula('H2O')).success // true
 * toSafe(() => parseFormula('Xx')).success  // false
 * const r = toSafe(() => JSON.parse('{'))
 * r.success ? '' : r.error.first.code // 'INTERNAL_ERROR'
 */
export function toSafe<T>(fn: () => T): SafeResult<T> {
  try {
    return { success: true, data: fn() };
  } catch (e) {
    return { success: false, error: asPondusError('toSafe', e) };
  }
}
