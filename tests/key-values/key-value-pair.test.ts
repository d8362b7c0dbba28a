import { describe, expect, it } from 'vitest';
import { readKeyValuePair } from '../../src/key-values/read-key-values.js';
import { osmolarity } from '../../src/pharmacy/osmolarity.js';
import { readRowText } from '../../src/reagent-table/row-text.js';
import { PondusError } from '../../src/errors/pondus-error.js';

describe('one KEY=VALUE pair, split at its first =', () => {
  it('keeps the key and value trimmed and as written, with their columns', () => {
    const p = readKeyValuePair(' n-BuLi = 1.1 equiv')!;
    expect(p.key).toBe('n-BuLi');
    expect(p.value).toBe('1.1 equiv');
    expect(p.keyText).toBe(' n-BuLi ');
    expect(p.valueText).toBe(' 1.1 equiv');
    expect(p.column).toBe(2);
    expect(' n-BuLi = 1.1 equiv'.slice(p.valueColumn - 1)).toBe('1.1 equiv');
  });

  it('splits at the first = only: the value may hold another', () => {
    expect(readKeyValuePair('a=b=c')).toMatchObject({ key: 'a', value: 'b=c' });
  });

  it('returns null without an =, and an empty key when the text starts with one', () => {
    expect(readKeyValuePair('NaCl')).toBeNull();
    expect(readKeyValuePair('=5 g')?.keyText).toBe('');
  });

  it('is the reader of reagent rows and of the salts of a solution', () => {
    expect(readRowText('Ac2O = 1.5 equiv, density=1.08 g/mL', 'reagent')).toMatchObject({ reagent: 'Ac2O', amount: '1.5 equiv' });
    let err: unknown;
    try {
      osmolarity('NaCl=0.9 %, =5 %');
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(PondusError);
    expect((err as PondusError).first.code).toBe('BAD_RECORD');
    expect((err as PondusError).first.column).toBe(13); // the '=' of the second salt
  });
});
