import { describe, expect, it } from 'vitest';
import { LazyTexts } from '../../src/exact/lazy-texts.js';

describe('a table of texts made after some look-ups', () => {
  it('keeps nothing until it has been asked `after` times, then keeps what it is given', () => {
    const t = new LazyTexts(16, 3);
    for (let i = 0; i < 3; i++) {
      expect(t.get(5)).toBeUndefined();
      expect(t.keep(5, 'five')).toBe('five');
    }
    expect(t.get(5)).toBeUndefined(); // the fourth look-up makes the table, still empty
    t.keep(5, 'five');
    expect(t.get(5)).toBe('five');
    expect(t.get(6)).toBeUndefined();
  });

  it('holds each text at its own key once made, and every key of its size', () => {
    const t = new LazyTexts(4096);
    for (let round = 0; round < 3; round++) for (let k = 0; k < 4096; k += 7) expect(t.get(k) ?? t.keep(k, String(k))).toBe(String(k));
    // past the first 64 look-ups every key asked again is found, with its own text
    for (let k = 0; k < 4096; k += 7) expect(t.get(k)).toBe(String(k));
    expect(t.get(4094)).toBeUndefined(); // never kept (not a multiple of 7)
  });
});
