import { describe, expect, it } from 'vitest';
import { potency } from '../../src/pharmacy/potency.js';
import { strengthForms } from '../../src/pharmacy/ratio-strength.js';
import { displayInstruction } from '../../src/sigfig/instruction.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';
import { prepareSolution } from '../../src/preparation/solution.js';

const form = (text: string, unit: string) => strengthForms(text).forms.find((f) => f.unit === unit)!.value.toString();

describe('potency as is, and the mass of powder for an amount of active', () => {
  it('an antibiotic powder of 950 µg/mg: 500 mg of activity needs 526.3 mg', () => {
    // source: pharmaceutical calculations, potency-adjusted weighing: mass = required activity ÷ potency (from memory); 500 ÷ 0.950 = 526.3
    const r = potency('950. µg/mg', { need: '500. mg' });
    expect(displayInstruction(r.weigh!, 'mg').text).toBe('526.3 mg');
    expect(r.notes.map((n) => n.code)).toContain('POTENCY_AS_IS');
  });

  it('101.2 % on the anhydrous basis with 4.8 % water is 96.3 % as is', () => {
    // source: the anhydrous-basis relation of USP General Notices 5.60 (from memory): as is = anhydrous × (1 − water)
    const r = potency('101.2 %', { basis: 'anhydrous', water: '4.8 %' });
    expect(displayQuantity(r.asIs, '%').text).toBe('96.3 %');
    expect(r.notes.map((n) => n.code)).toContain('ABOVE_100_PERCENT');
  });

  it('refuses a potency as is over 100 %, and a potency without a unit', () => {
    expect(() => potency('101.2 %')).toThrow(/cannot exceed 100/);
    expect(() => potency('0.95')).toThrow(/unit/);
  });

  it('refuses a water, loss or solvent content its basis does not use: it would be dropped', () => {
    // a dropped 4.8 % water made the mass to weigh 0.2632 g where the content was meant to count
    expect(() => potency('95.0 %', { basis: 'as-is', water: '4.8 %', need: '250.0 mg' })).toThrow("`water` would be ignored for a potency as is");
    expect(() => potency('95.0 %', { basis: 'dried', loss: '0.5 %', water: '4.8 %' })).toThrow('`water` would be ignored converting from the dried to the as-is basis');
    expect(() => potency('101.2 %', { basis: 'anhydrous', water: '4.8 %', loss: '0.5 %' })).toThrow('`loss` would be ignored');
  });

  it("refuses a water content with no unit: '0.05' may be 0.05 % (Karl Fischer) or 5 %", () => {
    // read as a fraction, 0.05 made the weighing 0.1108 g where 0.05 % gives 0.1053 g
    expect(() => potency('95.00 %', { basis: 'anhydrous', water: '0.05', need: '100.0 mg' })).toThrow('the water content 0.05 has no unit, and reads two ways');
    const r = potency('95.00 %', { basis: 'anhydrous', water: '0.05 %', need: '100.0 mg' });
    // worked by hand: 100.0 mg / (0.9500 × 0.9995) = 105.3 mg
    expect(displayInstruction(r.weigh!, 'mg').text).toBe('105.3 mg');
  });
});

describe('strengths in every form', () => {
  it('1:1000 w/v is 0.1 % w/v and 1 mg/mL (epinephrine 1 mg/mL)', () => {
    // source: ratio strength 1:1000 = 1 g in 1000 mL = 0.1 % w/v = 1 mg/mL (common practice; epinephrine injection 1:1000 is 1 mg/mL)
    expect(form('1:1000', '% w/v')).toBe('0.1');
    expect(form('1:1000', 'mg/mL')).toBe('1');
    expect(strengthForms('1:1000').notes.map((n) => n.code)).toContain('RATIO_AS_W_V');
  });

  it('0.02 % w/v is 1:5000; 1:750 is 0.1333 % w/v; mg/dL is a hundredth of g/L', () => {
    // source: Ansel's Pharmaceutical Calculations, ratio strength (from memory): 0.02 % = 1:5000
    expect(strengthForms('0.02 % w/v').ratio.toString()).toBe('5000');
    expect(strengthForms('1:750').ratio.toString()).toBe('750');
    expect(Number(form('1:750', '% w/v'))).toBeCloseTo(0.13333, 4);
    expect(form('12 mg/dL', 'g/L')).toBe('0.12');
  });

  it('w/w forms: 0.5 % w/w is 5 mg/g and 5000 mg/kg; 5 mg/kg is 1:200000', () => {
    expect(form('0.5 % w/w', 'mg/g')).toBe('5');
    expect(form('0.5 % w/w', 'mg/kg')).toBe('5000');
    expect(strengthForms('5 mg/kg').ratio.toString()).toBe('200000');
  });

  it('prepare takes % w/v spelled out and a ratio strength; refuses % w/w and mg/kg for a volume', () => {
    const a = prepareSolution('NaCl', { concentration: '0.90 % w/v', volume: '500.0 mL' });
    expect(displayInstruction(a.mass!, 'g').text).toBe('4.500 g');
    const b = prepareSolution('NaCl', { concentration: '1:1000', volume: '100.0 mL' });
    expect(displayInstruction(b.mass!, 'mg').text).toBe('100.0 mg');
    expect(() => prepareSolution('NaCl', { concentration: '0.9 % w/w', volume: '500.0 mL' })).toThrow(/fraction by mass/);
    expect(() => prepareSolution('NaCl', { concentration: '5 mg/kg', volume: '500.0 mL' })).toThrow(/fraction by mass/);
    expect(() => prepareSolution('C2H6O', { concentration: '70 % v/v', volume: '500.0 mL' })).toThrow(/fraction by volume/);
  });
});
