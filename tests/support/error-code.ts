import { expect } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';

/**
 * Runs `fn` and returns the code of the PondusError it throws, or null when it
 * succeeds. Any other kind of error fails the test: bad input must never
 * surface as anything but a PondusError.
 */
export function errorCode(fn: () => unknown): string | null {
  try {
    fn();
    return null;
  } catch (e) {
    expect(e).toBeInstanceOf(PondusError);
    return (e as PondusError).first.code;
  }
}

/**
 * Runs `fn`, which must throw a PondusError, and returns that error's first issue (its code,
 * message and hint): what a test of a refusal's wording reads.
 */
export function firstIssue(fn: () => unknown): { code: string; message: string; hint?: string } {
  try {
    fn();
  } catch (e) {
    expect(e).toBeInstanceOf(PondusError);
    return (e as PondusError).first;
  }
  throw new Error('expected a PondusError, and nothing was thrown');
}
