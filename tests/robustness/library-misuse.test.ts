// Helpers of the library called the wrong way from JavaScript (no types to stop it): each refuses
// with a PondusError naming the argument, never a TypeError or a DecimalError.
import { describe, expect, it } from 'vitest';
import { Decimal } from '../../src/exact/decimal.js';
import { PondusError } from '../../src/errors/pondus-error.js';
import { displayMeasured, roundToPosition, roundToSigFigs } from '../../src/sigfig/round.js';
import { readNumber } from '../../src/sigfig/read-number.js';

function codeOf(fn: () => unknown): string {
  try {
    fn();
  } catch (e) {
    if (e instanceof PondusError) return e.issues[0].code;
    throw e;
  }
  return 'ok';
}

const x = new Decimal('2.45');
// eslint-disable-next-line @typescript-eslint/no-explicit-any
const loose = (f: (...a: any[]) => unknown) => f as (...a: unknown[]) => unknown;

describe('rounding helpers refuse misuse with a PondusError', () => {
  it('roundToSigFigs: figures must be a whole number of at least 1', () => {
    expect(codeOf(() => roundToSigFigs(x, 0))).toBe('BAD_OPTION');
    expect(codeOf(() => roundToSigFigs(x, -1))).toBe('BAD_OPTION');
    expect(codeOf(() => roundToSigFigs(x, 1.5))).toBe('BAD_OPTION');
    expect(codeOf(() => roundToSigFigs(x, Number.NaN))).toBe('BAD_OPTION');
    expect(codeOf(() => roundToSigFigs(x, 1e9))).toBe('BAD_OPTION');
    expect(() => roundToSigFigs(x, 0)).toThrow(/significant figures must be a whole number from 1/);
  });

  it('roundToSigFigs: the value must be finite; a plain number is taken as its decimal', () => {
    expect(codeOf(() => roundToSigFigs(new Decimal(Number.NaN), 2))).toBe('BAD_NUMBER');
    expect(codeOf(() => roundToSigFigs(new Decimal(Infinity), 2))).toBe('BAD_NUMBER');
    expect(codeOf(() => loose(roundToSigFigs)(null, 2))).toBe('BAD_NUMBER');
    expect(codeOf(() => loose(roundToSigFigs)({}, 2))).toBe('BAD_NUMBER');
    // 2.45 → 2.4 half to even (ASTM E29; common practice)
    expect(loose(roundToSigFigs)(2.45, 2)!.toString()).toBe('2.4');
    expect(loose(roundToSigFigs)('2.45', 2)!.toString()).toBe('2.4');
  });

  it('an unknown rounding mode is refused, not silently read as half-even', () => {
    expect(codeOf(() => loose(roundToSigFigs)(x, 2, 'up'))).toBe('BAD_OPTION');
    expect(roundToSigFigs(x, 2, 'half-up').toString()).toBe('2.5');
  });

  it('roundToPosition and displayMeasured check the position and the figures', () => {
    expect(codeOf(() => roundToPosition(x, 1.5))).toBe('BAD_OPTION');
    expect(codeOf(() => roundToPosition(x, -1e10))).toBe('BAD_OPTION');
    expect(roundToPosition(x, -1).toString()).toBe('2.4');
    expect(codeOf(() => loose(displayMeasured)(null))).toBe('BAD_NUMBER');
    expect(codeOf(() => displayMeasured({ value: x, lsd: Number.NaN }))).toBe('BAD_OPTION');
    expect(codeOf(() => displayMeasured({ value: x, lsd: -2, sigFigs: 0 }))).toBe('BAD_OPTION');
    expect(displayMeasured({ value: x, lsd: -1 }).text).toBe('2.4');
  });

  it('readNumber reads text only', () => {
    expect(codeOf(() => loose(readNumber)(123))).toBe('BAD_NUMBER');
    expect(codeOf(() => loose(readNumber)(undefined))).toBe('BAD_NUMBER');
    expect(readNumber('8.80').lsd).toBe(-2);
  });
});
