import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { alligation } from '../../src/pharmacy/alligation.js';
import { displayQuantity } from '../../src/sigfig/display-quantity.js';

describe('alligation', () => {
  it('20 % and 5 % to make 300 g of 10 %: 100 g and 200 g', () => {
    // source: alligation alternate (parts 10 − 5 = 5 of the 20 %, 20 − 10 = 10 of the 5 %), common practice; a standard textbook exercise
    const r = alligation('10 %', { higher: '20 %', lower: '5 %', total: '300 g' });
    expect(displayQuantity(r.higherAmount!, 'g').text).toBe('100.0 g');
    expect(displayQuantity(r.lowerAmount!, 'g').text).toBe('200.0 g');
    expect(r.by).toBe('mass');
    expect(r.notes.map((n) => n.code)).toContain('TARGET_FEW_FIGURES');
  });

  it('95 % alcohol and water to 500 mL of 70 %, by volume, volumes taken as additive', () => {
    // source: 500 × 70 / 95 = 368.4 mL (common practice; real mixtures contract, so make up to volume)
    const r = alligation('70 % v/v', { higher: '95 % v/v', lower: '0 % v/v', total: '500.0 mL' });
    expect(displayQuantity(r.higherAmount!, 'mL').text).toBe('368.4 mL');
    expect(displayQuantity(r.lowerAmount!, 'mL').text).toBe('131.6 mL');
    expect(r.notes.map((n) => n.code)).toEqual(expect.arrayContaining(['VOLUMES_ADDITIVE', 'DILUENT']));
  });

  it('parts only with --by', () => {
    const r = alligation('2.5 % w/w', { higher: '10 % w/w', lower: '1 % w/w', by: 'mass' });
    expect(r.higherParts.value.toNumber()).toBeCloseTo(0.015, 12);
    expect(r.lowerParts.value.toNumber()).toBeCloseTo(0.075, 12);
    expect(r.higherAmount).toBeNull();
  });

  it('refuses a target outside the two strengths, mixed kinds, and w/w mixed by volume', () => {
    expect(() => alligation('25 %', { higher: '20 %', lower: '5 %', by: 'mass' })).toThrow(/strictly between/);
    expect(() => alligation('10 % w/w', { higher: '20 % w/v', lower: '5 % w/w', total: '100 g' })).toThrow();
    expect(() => alligation('10 % w/w', { higher: '20 % w/w', lower: '5 % w/w', total: '100 mL' })).toThrow(/by mass/);
    expect(() => alligation('10 %', { higher: '20 %', lower: '5 %', total: '100 g', by: 'volume' })).toThrow(/conflicts/);
    expect(() => alligation('10 %', { higher: '20 %', lower: '5 %' })).toThrow(/`total: /);
  });

  it('property: the amounts add to the total and mix back to the target', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 500 }), fc.integer({ min: 1, max: 500 }), fc.integer({ min: 1, max: 500 }), fc.integer({ min: 1, max: 100000 }), (lo, d1, d2, total) => {
        const low = lo / 10;
        const target = (lo + d1) / 10;
        const high = (lo + d1 + d2) / 10;
        const r = alligation(`${target} %`, { higher: `${high} %`, lower: `${low} %`, total: `${total} g` });
        const h = r.higherAmount!.value;
        const l = r.lowerAmount!.value;
        expect(h.plus(l).minus(total).abs().lt('1e-30')).toBe(true);
        const mixed = h.times(high).plus(l.times(low)).div(total);
        expect(mixed.minus(target).abs().lt('1e-30')).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});
