import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dilutionSeries, planSteps } from '../../src/preparation/dilution-series.js';
import { diluteByMass } from '../../src/preparation/mass-dilution.js';
import { Decimal } from '../../src/exact/decimal.js';
import { displayInstruction } from '../../src/sigfig/instruction.js';

const codes = (notes: { code: string }[]) => notes.map((n) => n.code);

describe('serial dilution plans', () => {
  it('1000 µg/mL to 1.000 µg/mL in 10.00 mL steps: 1:100 (100 µL) then 1:10 (1.000 mL), not a 10 µL transfer', () => {
    // common practice: no transfer below 100 µL, no step above 1:100
    const r = dilutionSeries({ stock: '1000. µg/mL', target: '1.000 µg/mL', volume: '10.00 mL' });
    expect(r.steps.map((s) => s.factor.toString())).toEqual(['100', '10']);
    expect(displayInstruction(r.steps[0].take, 'µL').text).toBe('100.0 µL');
    expect(displayInstruction(r.steps[1].take, 'mL').text).toBe('1.000 mL');
    expect(displayInstruction(r.steps[1].concentration!, 'µg/mL').text).toBe('1.000 µg/mL');
    expect(codes(r.notes)).toContain('SERIAL_PLAN');
  });

  it('a larger smallest transfer gives more, smaller steps: 1:1000 with 500 µL in 10 mL is 1:10 three times', () => {
    const r = dilutionSeries({ factor: '1:1000', volume: '10.00 mL', minTransfer: '500. µL' });
    expect(r.steps.map((s) => s.factor.toString())).toEqual(['10', '10', '10']);
    for (const s of r.steps) expect(s.take.quantity.value.gte('0.0005')).toBe(true);
  });

  it('a factor within one step stays one step', () => {
    const r = dilutionSeries({ stock: '1.00 M', target: '0.100 M', volume: '100.0 mL' });
    expect(r.steps).toHaveLength(1);
    expect(displayInstruction(r.steps[0].take, 'mL').text).toBe('10.00 mL');
  });

  it('refuses a smallest transfer more than half the step volume, and a plan of too many steps', () => {
    expect(() => dilutionSeries({ factor: '100', volume: '1.00 mL', minTransfer: '0.800 mL' })).toThrow(/half the volume/);
    expect(() => dilutionSeries({ factor: '1e15', volume: '10.00 mL' })).toThrow(/dilution factor/);
    expect(() => dilutionSeries({ factor: '1:1000000000000000', volume: '1.000 mL', minTransfer: '250. µL' })).toThrow(/steps/);
  });

  it('property: the steps multiply to the requested factor, each within the step limit and the smallest transfer', () => {
    fc.assert(
      fc.property(fc.integer({ min: 2, max: 10_000_000 }), fc.constantFrom('100', '50', '20', '10'), fc.constantFrom('100.', '200.', '500.'), (f, max, minT) => {
        const limit = Math.min(Number(max), 10 / (Number(minT) / 1000));
        let r;
        try {
          r = dilutionSeries({ factor: String(f), volume: '10.00 mL', minTransfer: `${minT} µL`, maxStep: max });
        } catch (e) {
          // refused only when no plan of at most 6 steps exists
          expect(f).toBeGreaterThan(limit ** 6);
          expect(String(e)).toMatch(/more than 6 steps/);
          return;
        }
        const product = r.steps.reduce((p, s) => p.times(s.factor), new Decimal(1));
        expect(product.toSignificantDigits(25).eq(new Decimal(f))).toBe(true);
        for (const s of r.steps) {
          expect(s.factor.lte(r.maxStep)).toBe(true);
          expect(s.factor.gt(1)).toBe(true);
          expect(s.take.quantity.value.gte(r.minTransfer.value)).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('planSteps keeps round factors: 1:10000 in steps of 100', () => {
    expect(planSteps(new Decimal(10000), new Decimal(100)).map(String)).toEqual(['100', '100']);
  });
});

describe('dilution by mass (solids and semisolids)', () => {
  it('a 10 % w/w ointment let down to 2.5 % w/w, 60.0 g: 15.00 g of ointment and 45.00 g of base', () => {
    // source: the alligation/dilution rule of pharmaceutical calculations, C1·m1 = C2·m2 (from memory: Ansel's Pharmaceutical Calculations, dilution of ointments)
    const r = diluteByMass('10. % w/w', '2.5 % w/w', '60.0 g');
    expect(displayInstruction(r.take, 'g').text).toBe('15.00 g');
    expect(displayInstruction(r.diluent, 'g').text).toBe('45.00 g');
    expect(r.take.quantity.value.plus(r.diluent.quantity.value).eq(r.total.value)).toBe(true); // masses add
  });

  it('a 1:10 trituration of a drug for a 5.0 mg/g powder, 20.0 g: 1.000 g of trituration', () => {
    // 100 mg/g trituration (1 g drug + 9 g lactose), 5.0 mg/g × 20.0 g ÷ 100 mg/g = 1.000 g (from memory: the aliquot method of pharmaceutical calculations)
    const r = diluteByMass('100. mg/g', '5.0 mg/g', '20.0 g');
    expect(displayInstruction(r.take, 'g').text).toBe('1.000 g');
  });

  it('a content by mass is not diluted by volume: one-step dilute points to `mass`', async () => {
    const { dilute } = await import('../../src/preparation/dilution.js');
    expect(() => dilute('10 % w/w', '2 % w/w', '100.0 mL')).toThrow(/`mass`/);
    expect(() => dilute('500 mg/kg', '50 mg/kg', '100.0 mL')).toThrow(/content by mass/);
    expect(displayInstruction(dilute('70. % v/v', '35.0 % v/v', '100.0 mL').stockVolume!, 'mL').text).toBe('50.00 mL');
  });

  it('refuses a per-volume strength, and a bare % is read as w/w with a note', () => {
    expect(() => diluteByMass('10 % w/v', '2 % w/w', '50 g')).toThrow(/per volume/);
    expect(codes(diluteByMass('10. %', '2.0 %', '50.0 g').notes)).toContain('PERCENT_AS_W_W');
  });
});
