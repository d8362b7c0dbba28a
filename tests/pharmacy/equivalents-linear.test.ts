// The equivalents and ratio-strength readers find their unit with `^(|.*?\S)\s*UNIT`, which tries
// a run of spaces once; the plain `^(.*?)\s*UNIT` tried it again from every start (quadratic on a
// long run). The two must capture the same on any short text.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isChargePerVolume, readChargeAmount } from '../../src/pharmacy/equivalents-unit.js';
import { dilute } from '../../src/preparation/dilution.js';
import { toSafe } from '../../src/errors/pondus-error.js';

const EQ = '([mµμu])?(Eq|eq)';
const pairs: [RegExp, RegExp][] = [
  [new RegExp(`^(.*?)\\s*${EQ}\\s*\\/\\s*(\\S+)$`), new RegExp(`^(|.*?\\S)\\s*${EQ}\\s*\\/\\s*(\\S+)$`)],
  [new RegExp(`^(.*?)\\s*${EQ}$`), new RegExp(`^(|.*?\\S)\\s*${EQ}$`)],
  [/^(.*?)\s*(w\/v|w\/w|v\/v)$/i, /^(|.*?\S)\s*(w\/v|w\/w|v\/v)$/i],
];
const unit = fc.constantFrom('2', '0', '.', ' ', '  ', '\t', 'm', 'µ', 'Eq', 'eq', '/', 'L', 'ml', 'x', 'w/v', 'W/V', '%');

describe('equivalents and ratio-strength units', () => {
  it('the linear patterns capture what the plain ones do', () => {
    fc.assert(
      fc.property(fc.string({ unit, maxLength: 16 }), (text) => {
        for (const [plain, linear] of pairs) expect(linear.exec(text)?.slice(1) ?? null).toEqual(plain.exec(text)?.slice(1) ?? null);
      }),
      { numRuns: 5000 },
    );
  });

  it('a long run of spaces is no strength in equivalents, and is answered at once', () => {
    expect(isChargePerVolume(`1${' '.repeat(200_000)}x`)).toBe(false);
    expect(isChargePerVolume(`20${' '.repeat(2_000)}mEq/L`)).toBe(true);
  });
});

describe('a long strength in equivalents', () => {
  it('is refused as too long, naming which text it is, not read as something else', () => {
    const long = `20${' '.repeat(20_000)}mEq/L`;
    const r = toSafe(() => dilute('2 mEq/mL', long, '1 L'));
    expect(r.success ? null : [r.error.first.code, r.error.first.message]).toEqual(['INPUT_TOO_LONG', 'the target concentration is 20,007 characters long; the limit is 10,000']);
    const a = toSafe(() => readChargeAmount(`20${' '.repeat(20_000)}mEq`, 'the target', []));
    expect(a.success ? null : a.error.first.code).toBe('INPUT_TOO_LONG');
  });
});
