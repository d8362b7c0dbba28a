import { describe, expect, it } from 'vitest';
import { dilute } from '../../src/preparation/dilution.js';
import { displayInstruction } from '../../src/sigfig/instruction.js';

describe('dilute in equivalents', () => {
  // from memory: C1·V1 = C2·V2 in any one kind of strength; 2 mEq/mL is 100 times 20 mEq/L
  it('takes mEq per volume on both sides, in different volume units', () => {
    const r = dilute('2 mEq/mL', '20 mEq/L', '1.000 L');
    expect(displayInstruction(r.stockVolume!, 'mL').text).toBe('10.00 mL');
    expect(r.factor.value.toString()).toBe('100');
    expect(r.notes.map((n) => n.code)).toContain('EQUIVALENTS_DILUTED');
    const l = dilute('2 meq/ml', '20 mEq/l', '1.000 L');
    expect(l.stockVolume!.quantity.value.eq(r.stockVolume!.quantity.value)).toBe(true);
  });

  it('gives the concentration made in the stock unit as written', () => {
    // 10.00 mL of 2 mEq/mL in 1.000 L: 0.02 mEq/mL (from memory: C2 = C1·V1/V2)
    const r = dilute('2 mEq/mL', undefined, '1.000 L', '10.00 mL');
    expect(r.made!.value.toString()).toBe('0.02');
    expect(r.made!.unit).toBeNull();
  });

  it('refuses mEq against mol, since that needs the salt', () => {
    expect(() => dilute('2 mEq/mL', '20 mmol/L', '1.000 L')).toThrow(/salt's charge/);
    expect(() => dilute('2 M', '20 mEq/L', '1.000 L')).toThrow(/in equivalents/);
  });
});
