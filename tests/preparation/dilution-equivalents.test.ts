import { describe, expect, it } from 'vitest';
import { dilute } from '../../src/preparation/dilution.js';
import { dilutionJson } from '../../src/preparation/dilution-json.js';
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
    expect(r.madeUnit).toBe('mEq/mL');
    // the number is not a molarity: only the unit as written names it
    const json = dilutionJson(r);
    expect(json.made).toMatchObject({ value: 0.02, unit: 'mEq/mL', display: '0.02 mEq/mL' });
    // 10.00 mL of 2 mEq/L in 100.0 mL: 0.2 mEq/L, not 0.2 M
    expect(dilutionJson(dilute('2 mEq/L', undefined, '100.0 mL', '10.00 mL')).made?.display).toBe('0.2 mEq/L');
    expect(dilutionJson(dilute('2 µEq/mL', undefined, '100.0 mL', '10.00 mL')).made?.display).toBe('0.2 µEq/mL');
    expect(dilute('1.00 M', undefined, '250.0 mL', '25.00 mL').madeUnit).toBeNull();
  });

  it('refuses mEq against mol, since that needs the salt', () => {
    expect(() => dilute('2 mEq/mL', '20 mmol/L', '1.000 L')).toThrow(/salt's charge/);
    expect(() => dilute('2 M', '20 mEq/L', '1.000 L')).toThrow(/in equivalents/);
  });
});
