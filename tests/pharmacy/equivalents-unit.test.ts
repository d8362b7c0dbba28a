import { describe, expect, it } from 'vitest';
import { PondusError } from '../../src/errors/pondus-error.js';
import { readChargeAmount, readChargePerVolume } from '../../src/pharmacy/equivalents-unit.js';
import { milliequivalents } from '../../src/pharmacy/milliequivalents.js';
import { osmolarity } from '../../src/pharmacy/osmolarity.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

function thrown(f: () => unknown): PondusError {
  try {
    f();
  } catch (e) {
    if (e instanceof PondusError) return e;
    throw e;
  }
  throw new Error('did not throw');
}

describe('equivalents as written', () => {
  // from memory: 1 mEq/mL = 1000 mEq/L = 1 Eq/L; 1 µEq = 0.001 mEq (SI prefixes)
  it('reads l and ml as L and mL, and the prefix of Eq as that of mol', () => {
    expect(readChargePerVolume('20 mEq/l', 'the strength', [])!.value.value.toString()).toBe('0.02');
    expect(readChargePerVolume('2 mEq/ml', 'the strength', [])!.value.value.toString()).toBe('2');
    expect(readChargePerVolume('20 µEq/mL', 'the strength', [])!.value.value.toString()).toBe('0.02');
    expect(readChargePerVolume('0.5 Eq/L', 'the strength', [])!.value.value.toString()).toBe('0.5');
    expect(readChargePerVolume('0.9 %', 'the strength', [])).toBeNull();
  });

  // from memory: 'meq' is a common pharmacy spelling of mEq; a bare 'eq' is also a synthesis's molar equivalents
  it('reads meq as mEq and refuses a bare eq with both readings', () => {
    expect(readChargePerVolume('20 meq/L', 'the strength', [])!.value.value.toString()).toBe('0.02');
    expect(readChargeAmount('20 meq', 'the target', []).value.toString()).toBe('0.02');
    const e = thrown(() => readChargePerVolume('20 eq/L', 'the strength', []));
    expect(e.first.code).toBe('AMBIGUOUS_READING');
    expect(e.first.message).toMatch(/molar equivalents/);
  });

  it('quotes the text as typed, at its own column', () => {
    const unit = thrown(() => readChargePerVolume('20 mEq/foo', 'the strength', []));
    expect(unit.input).toBe('20 mEq/foo');
    expect(unit.first).toMatchObject({ code: 'UNKNOWN_UNIT', column: 8 });
    expect(unit.first.message).toContain("'foo'");
    const number = thrown(() => readChargePerVolume('20x mEq/l', 'the strength', []));
    expect(number.input).toBe('20x mEq/l');
    expect(number.first).toMatchObject({ code: 'UNKNOWN_UNIT', column: 3 });
    expect(number.first.message).not.toMatch(/mmol/);
    const micro = thrown(() => readChargePerVolume('20 µ Eq/mL', 'the strength', []));
    expect(micro.input).toBe('20 µ Eq/mL');
    expect(micro.first.message).toContain("unknown unit 'µ Eq/mL' at column 4");
  });

  // common practice: KCl concentrate for infusion is labelled 2 mEq/mL (2 mmol/mL of KCl)
  it('gives the same result for mEq/ml as for mEq/mL', () => {
    const a = milliequivalents('KCl', { concentration: '2 mEq/ml' });
    const b = milliequivalents('KCl', { concentration: '2 mEq/mL' });
    expect(a.moles.value.eq(b.moles.value)).toBe(true);
    expect(displayQuantity(a.osmoles, 'mM').text).toBe(displayQuantity(b.osmoles, 'mM').text);
  });

  it('in a solution list, puts the column of an error inside the strength and in its message alike', () => {
    const e = thrown(() => osmolarity('NaCl=0.9 %, KCl=20x mEq/l'));
    expect(e.first.column).toBe(19);
    expect(e.first.message).toContain('at column 19');
    // 20 mEq/l of KCl: 20 mmol/L, 40 mOsm/L (from memory: 2 particles per formula unit)
    const r = osmolarity('KCl=20 mEq/l');
    expect(displayQuantity(r.osmolarity, 'mM').text).toBe('40.00 mM');
  });
});

describe('a prefix of Eq that is not read', () => {
  it('is refused, quoting the unit as typed at its column', async () => {
    const { readChargePerVolume, readChargeAmount } = await import('../../src/pharmacy/equivalents-unit.js');
    const err = (f: () => unknown) => {
      try {
        f();
      } catch (e) {
        return (e as { first: { code: string; message: string; column?: number } }).first;
      }
      throw new Error('not refused');
    };
    expect(err(() => readChargePerVolume('2 MEq/mL', 'the strength', []))).toMatchObject({ code: 'UNKNOWN_UNIT', column: 3, message: "unknown unit 'MEq/mL' at column 3" });
    expect(err(() => readChargeAmount('20 kEq', 'the target', []))).toMatchObject({ code: 'UNKNOWN_UNIT', column: 4, message: "unknown unit 'kEq' at column 4" });
    // the prefixes read are those of mol (SI Brochure, 9th edition, table 7): m and µ
    expect(readChargePerVolume('2 mEq/mL', 'the strength', [])?.eq).toBe('mEq');
  });
});
