import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { MAX_PAIR_ROWS, PARTNER_PENALTY, percents, searchSolvates, solvateSearch, type Candidate, type MassVector } from '../../src/analysis/solvate-fit.js';
import { analysis } from '../../src/analysis/check.js';
import { composition } from '../../src/composition/element-shares.js';
import { errorCode } from '../support/error-code.js';

// An independent brute-force check: every grid point scored and sorted by the documented ranking
// (reported rank score, fewer partners, less of them, smaller sum of squares).
function exhaustive(found: number[], base: MassVector, partners: MassVector[], steps: number[], maxes: number[], top: number): Candidate[] {
  const grids = partners.map((_, j) => Array.from({ length: Math.round(maxes[j] / steps[j] + 1e-9) }, (_, k) => Number(((k + 1) * steps[j]).toFixed(6))));
  const all: Candidate[] = [];
  const add = (amounts: number[]) => {
    const calc = percents(base, partners, amounts);
    const d = found.map((f, i) => f - calc[i]);
    all.push({ amounts: [...amounts], maxDeviation: Math.max(...d.map(Math.abs)), sumSquares: d.reduce((s, x) => s + x * x, 0) });
  };
  const zero = partners.map(() => 0);
  add(zero);
  partners.forEach((_, j) => grids[j].forEach((a) => add(zero.map((_, x) => (x === j ? a : 0)))));
  for (let j = 0; j < partners.length; j++) for (let k = j + 1; k < partners.length; k++) for (const a of grids[j]) for (const b of grids[k]) add(zero.map((_, x) => (x === j ? a : x === k ? b : 0)));
  const n = (c: Candidate) => c.amounts.filter((x) => x > 0).length;
  const rank = (c: Candidate) => Math.round((c.maxDeviation + PARTNER_PENALTY * n(c)) * 100 + 1e-9);
  const sum = (c: Candidate) => c.amounts.reduce((s, x) => s + x, 0);
  all.sort((a, b) => rank(a) - rank(b) || n(a) - n(b) || (Math.abs(sum(a) - sum(b)) > 1e-9 ? sum(a) - sum(b) : 0) || a.sumSquares - b.sumSquares);
  return all.slice(0, top);
}

// element masses per formula unit for C, H, N, Cl (g/mol; CIAAW 2021 abridged weights, from memory)
const W = { C: 12.011, H: 1.008, N: 14.007, Cl: 35.45 };
const vec = (c: number, h: number, n: number, cl: number, other = 0): MassVector => {
  const masses = [c * W.C, h * W.H, n * W.N, cl * W.Cl];
  return { masses, total: masses.reduce((a, b) => a + b, 0) + other };
};
const PARTNERS = [vec(0, 2, 0, 0, 15.999), vec(1, 2, 0, 2), vec(4, 8, 0, 0, 2 * 15.999), vec(1, 4, 0, 0, 15.999), vec(6, 14, 0, 0), vec(2, 3, 1, 0), vec(1, 1, 0, 3)];

describe('the two-partner search', () => {
  it('lists exactly what scoring every grid point lists', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 8, max: 30 }),
        fc.integer({ min: 8, max: 50 }),
        fc.integer({ min: 1, max: 5 }),
        fc.subarray([0, 1, 2, 3, 4, 5, 6], { minLength: 2, maxLength: 4 }),
        fc.array(fc.double({ min: -1.5, max: 1.5, noNaN: true }), { minLength: 4, maxLength: 4 }),
        fc.constantFrom(0.05, 0.1, 0.25, 0.03),
        fc.constantFrom(1, 2),
        fc.integer({ min: 1, max: 8 }),
        fc.boolean(),
        (c, h, n, chosen, noise, step, max, top, flat) => {
          const base = vec(c, h, n, 0, 16);
          // a partner of the compound's own composition leaves every percent unchanged: long ties
          const partners = [...chosen.map((i) => PARTNERS[i]), ...(flat ? [base] : [])];
          // found values: the base with some of the first two partners, plus noise
          const truth = percents(base, partners, partners.map((_, j) => (j < 2 ? 0.3 + 0.4 * j : 0)));
          const found = truth.map((p, i) => Math.max(0, p + noise[i]));
          const steps = partners.map(() => step);
          const maxes = partners.map(() => max);
          const got = searchSolvates(found, base, partners, steps, maxes, top);
          const want = exhaustive(found, base, partners, steps, maxes, top);
          expect(got.map((x) => x.amounts)).toEqual(want.map((x) => x.amounts));
          expect(got.map((x) => x.maxDeviation)).toEqual(want.map((x) => x.maxDeviation));
        },
      ),
      { numRuns: 60 },
    );
  });

  it('finds a solvate pair on a fine grid over the whole range (12 partners, step 0.01 up to 20)', () => {
    // found values computed from C20H25N3O·0.5H2O·0.25CH2Cl2 (composition from CIAAW weights)
    const truth = composition('C20H25N3O·0.5H2O·0.25CH2Cl2');
    const found = truth.elements.filter((e) => ['C', 'H', 'N'].includes(e.symbol)).map((e) => `${e.symbol}=${e.massPercent.toFixed(3)}`).join(',');
    const solvents = ['water', 'DCM', 'CHCl3', 'MeOH', 'EtOH', 'EtOAc', 'ether', 'THF', 'acetone', 'MeCN', 'DMF', 'DMSO'];
    const r = analysis('C20H25N3O', found, { solvents, step: 0.01, max: 20 });
    expect(r.fits[0].formula).toBe('C20H25N3O·0.5H2O·0.25CH2Cl2');
    expect(r.notes.map((x) => x.code)).not.toContain('PAIRS_NOT_SEARCHED');
  });

  it('searches pairs above 12 partners too', () => {
    const truth = composition('C20H25N3O·0.5H2O·0.25C7H8');
    const found = truth.elements.filter((e) => ['C', 'H', 'N'].includes(e.symbol)).map((e) => `${e.symbol}=${e.massPercent.toFixed(3)}`).join(',');
    const solvents = ['water', 'DCM', 'CHCl3', 'MeOH', 'EtOH', 'EtOAc', 'ether', 'THF', 'acetone', 'MeCN', 'DMF', 'DMSO', 'toluene', 'hexane'];
    const r = analysis('C20H25N3O', found, { solvents, step: 0.05 });
    expect(r.fits[0].formula).toBe('C20H25N3O·0.5H2O·0.25C7H8');
  });

  it('says so when the pairs are beyond the bound, and still lists one-partner fits', () => {
    const partners = Array.from({ length: 40 }, (_, i) => vec(1 + (i % 7), 2 + i, 0, i % 3, 16));
    const base = vec(20, 25, 3, 0, 16);
    const s = solvateSearch([72.3, 7.91, 12.6, 0], base, partners, 0.01, 20, 5);
    expect(40 * 39 / 2 * 2000).toBeGreaterThan(MAX_PAIR_ROWS);
    expect(s.notes.map((x) => x.code)).toEqual(['PAIRS_NOT_SEARCHED']);
    expect(s.notes[0].message).toMatch(/`step`/);
    expect(s.candidates.length).toBe(5);
    expect(s.candidates.every((c) => c.amounts.filter((x) => x > 0).length <= 1)).toBe(true);
  });

  it('refuses a grid, a list length or a partner count it cannot bound', () => {
    const base = vec(6, 6, 0, 0);
    const water = PARTNERS[0];
    expect(errorCode(() => searchSolvates([92], base, [water], 1e-9, 2, 5))).toBe('BAD_OPTION');
    expect(errorCode(() => searchSolvates([92], base, [water], 0.05, 2, 0))).toBe('BAD_OPTION');
    expect(errorCode(() => searchSolvates([92], base, [water], 0.05, 2, 1e6))).toBe('BAD_OPTION');
    expect(errorCode(() => searchSolvates([92], base, Array(101).fill(water), 0.05, 2, 5))).toBe('BAD_OPTION');
    expect(errorCode(() => analysis('C20H25N3O', 'C=72.30,H=7.91,N=12.60', { solvents: ['HCl'], saltStep: 1e-9 }))).toBe('BAD_OPTION');
  });
});
