import { describe, expect, it } from 'vitest';
import { errorCode } from '../support/error-code.js';
import { isSinglePair, readKeyValues, splitTrailingValues } from '../../src/key-values/read-key-values.js';
import { PondusError } from '../../src/errors/pondus-error.js';

const pairs = (t: string, o = {}) => readKeyValues(t, o).map((e) => [e.key, e.value]);

describe('the one KEY=VALUE reader', () => {
  it('reads spaces, commas and semicolons between entries, and values with units', () => {
    expect(pairs('C=40.00 H=6.71 O=53.29')).toEqual([['C', '40.00'], ['H', '6.71'], ['O', '53.29']]);
    expect(pairs('C=72.30, H=7.91;N=12.60')).toEqual([['C', '72.30'], ['H', '7.91'], ['N', '12.60']]);
    expect(pairs('NaCl=5.00 g KCl = 3.00 g')).toEqual([['NaCl', '5.00 g'], ['KCl', '3.00 g']]);
    expect(pairs('C: 40 H: 6.7', { colon: true })).toEqual([['C', '40'], ['H', '6.7']]);
    expect(pairs('{"C": "40.00", "H": 6.71}', { json: true })).toEqual([['C', '40.00'], ['H', '6.71']]);
  });

  it('gives the column of every key and value', () => {
    const e = readKeyValues('NaCl=5.00 g, KCl=3.00 g');
    expect(e.map((x) => [x.column, x.valueColumn])).toEqual([[1, 6], [14, 18]]);
  });

  it('refuses entries without =, a decimal comma, and a key given twice, naming the column', () => {
    const at = (t: string) => {
      try {
        readKeyValues(t);
        return null;
      } catch (err) {
        expect(err).toBeInstanceOf(PondusError);
        return (err as PondusError).first.column;
      }
    };
    expect(at('C=40,00 H=6.71')).toBe(6);
    expect(at('C=40 C=41')).toBe(6);
    expect(at('C=40, junk')).toBe(7);
    expect(errorCode(() => readKeyValues(''))).toBe('BAD_MEASUREMENT');
    expect(errorCode(() => readKeyValues('x', { code: 'BAD_AMOUNT' }))).toBe('BAD_AMOUNT');
  });

  it('tells single pairs (one shell word) from sets and from other text', () => {
    expect(isSinglePair('C=40.00')).toBe(true);
    expect(isSinglePair('NaCl=5.00')).toBe(true);
    expect(isSinglePair('C=40 H=6.7')).toBe(false);
    expect(isSinglePair('C=40,H=6.7')).toBe(false);
    expect(isSinglePair('C20H25N3O')).toBe(false);
    expect(isSinglePair('{"C":40}')).toBe(false);
  });

  it('splits a batch line into the formula and its found values', () => {
    expect(splitTrailingValues('C20H25N3O  C=72.30 H=7.91 N=12.60')).toEqual(['C20H25N3O', 'C=72.30 H=7.91 N=12.60']);
    expect(splitTrailingValues('C20H25N3O')).toBeNull();
  });
});
