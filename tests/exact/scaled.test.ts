// Scaled integer units (10^-12 u) to text: the first masses of a run are written directly, later
// ones from digit tables; both ways must give the exact decimal, which decimal.js computes here
// independently (an integer over 10^12 is exact in decimal arithmetic: common practice).
import { Decimal } from 'decimal.js';
import { describe, expect, it, vi } from 'vitest';

type ScaledModule = typeof import('../../src/exact/scaled.js');

/** A fresh copy of the module, so its first calls take the direct way again. */
async function fresh(): Promise<ScaledModule> {
  vi.resetModules();
  return import('../../src/exact/scaled.js');
}

const exact = (n: number) => new Decimal(n).div(new Decimal(10).pow(12)).toFixed();

// integer parts up to the largest safe integer, fractions with 0 to 12 digits and
// trailing zeros in each group of three, negatives, zero
const VALUES: number[] = [0, 1, -1, 7, 70, 700, 1000, 1e12, -1e12, 18015000000000, 18010564683056, -1500000, 999999999999, 1000000000001, 9999e12, 9007e12, 12345678901234, 4503599627370495, -4503599627370495, Number.MAX_SAFE_INTEGER, 20000000000, 2000000, 2000, 200];
let seed = 12345;
const next = () => (seed = (seed * 1103515245 + 12345) % 2147483648);
for (let i = 0; i < 200; i++) {
  const int = next() % (i % 3 === 0 ? 100 : 9000);
  const cut = 10 ** (next() % 12);
  const frac = Math.floor((next() * 1000 + next()) % 1e12 / cut) * cut;
  VALUES.push((i % 5 === 0 ? -1 : 1) * (int * 1e12 + frac));
}

describe('scaledToString', () => {
  it('the examples of its documentation', async () => {
    const { scaledToString } = await fresh();
    expect(scaledToString(18015000000000)).toBe('18.015');
    expect(scaledToString(-1500000)).toBe('-0.0000015');
  });

  it('the first masses of a run (written directly) are exact', async () => {
    for (let k = 0; k < VALUES.length; k += 32) {
      const { scaledToString } = await fresh();
      for (const n of VALUES.slice(k, k + 32)) expect([n, scaledToString(n)]).toEqual([n, exact(n)]);
    }
  });

  it('masses past the first of a run (written from the tables) are exact, and the same as written directly', async () => {
    const { scaledToString } = await fresh();
    const direct = VALUES.map((n) => scaledToString(n)); // the first ones directly, then from the tables
    const tabled = VALUES.map((n) => scaledToString(n));
    for (let i = 0; i < VALUES.length; i++) expect([VALUES[i], tabled[i]]).toEqual([VALUES[i], exact(VALUES[i])]);
    expect(tabled).toEqual(direct);
  });

  it('fromScaled gives the exact Decimal', async () => {
    const { fromScaled } = await fresh();
    for (const n of VALUES.slice(0, 40)) expect(fromScaled(n).toFixed()).toBe(exact(n));
  });
});
