// A target as strong as the stock is a dilution factor of 1, which is no dilution: every dilution
// refuses it the same way, as it refuses a target stronger than the stock.
import { describe, expect, it } from 'vitest';
import { Decimal, dilute, diluteByMass, dilutionSeries, planSteps, PondusError } from '../../src/index.js';
import { firstIssue } from '../support/error-code.js';

function refusal(run: () => unknown): { code: string; message: string } {
  try {
    run();
  } catch (e) {
    if (e instanceof PondusError) return { code: e.first.code, message: e.first.message };
    throw e;
  }
  throw new Error('expected a refusal');
}

describe('a target equal to the stock', () => {
  it('dilute refuses it, as dilutionSeries does, with the same message', () => {
    const one = refusal(() => dilute('1.00 M', '1.00 M', '100.0 mL'));
    const series = refusal(() => dilutionSeries({ stock: '1.00 M', target: '1.00 M', volume: '100.0 mL' }));
    expect(one.code).toBe('BAD_AMOUNT');
    expect(one.message).toMatch(/dilution factor of 1/);
    expect(one.message).toMatch(/use the stock as it is/);
    expect(series).toEqual(one);
  });

  it('equal values in other units of the same figures are the same concentration', () => {
    expect(refusal(() => dilute('10.0 mg/mL', '10.0 g/L', '50.00 mL')).message).toMatch(/dilution factor of 1/);
  });

  it('a stronger target is refused the same way by both', () => {
    const one = refusal(() => dilute('1.00 M', '2.00 M', '100.0 mL'));
    expect(refusal(() => dilutionSeries({ stock: '1.00 M', target: '2.00 M', volume: '100.0 mL' }))).toEqual(one);
    expect(one.message).toMatch(/more concentrated than the stock/);
  });

  it('a dilution by mass refuses an equal content too', () => {
    expect(refusal(() => diluteByMass('5.0 % w/w', '5.0 % w/w', '20.0 g')).message).toMatch(/dilution factor of 1/);
  });

  it('a weaker target is still diluted', () => {
    expect(dilute('1.00 M', '0.999 M', '100.0 mL').stockVolume).not.toBeNull();
  });
});

describe('planSteps refuses what no plan can reach', () => {
  it('a largest step below 2', () => {
    expect(refusal(() => planSteps(new Decimal(1000), new Decimal(1))).code).toBe('BAD_AMOUNT');
    expect(refusal(() => planSteps(new Decimal(1000), new Decimal('1.5'))).message).toMatch(/at least 2/);
  });

  it('a factor not more than 1', () => {
    expect(refusal(() => planSteps(new Decimal(1), new Decimal(100))).code).toBe('BAD_AMOUNT');
    expect(refusal(() => planSteps(new Decimal('0.5'), new Decimal(100))).message).toMatch(/more than 1/);
  });

  it('still plans a factor with a step of 2', () => {
    // 2 × 2 × 2 = 8
    expect(planSteps(new Decimal(8), new Decimal(2)).map(String)).toEqual(['2', '2', '2']);
  });
});

describe('a concentrated stock', () => {
  it('gets a note with the usual handling of concentrated acids and bases, in every format', () => {
    // concentrated hydrochloric acid is about 12 M (CRC Handbook, from memory); 12 M × V = 1.000 M × 100.0 mL gives 8.333 mL
    const r = dilute('12 M', '1.000 M', '100.0 mL');
    expect(r.notes.map((n) => n.code)).toContain('CONCENTRATED_STOCK');
    expect(r.notes.find((n) => n.code === 'CONCENTRATED_STOCK')!.message).toMatch(/acid to water/);
    expect(dilute('1.0 M', '0.10 M', '100.0 mL').notes.map((n) => n.code)).not.toContain('CONCENTRATED_STOCK');
  });

  it('a name after the amount is refused with a hint to give the amount alone', () => {
    const hint = firstIssue(() => dilute('6 M HCl', '0.5 M', '100 mL')).hint ?? '';
    expect(hint).toMatch(/'6 M'.*'HCl', is not read here/);
  });
});
