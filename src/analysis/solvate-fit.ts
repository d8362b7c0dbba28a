/**
 * Searches for the retained solvent, water or salt partner that explains an
 * elemental analysis: fractional amounts (a grid of `step` up to `max`) of one
 * or two partners added to the formula, ranked by the largest deviation, then
 * by the sum of squared deviations, then by fewer partners and smaller amounts.
 *
 * A second partner always fits the noise of real data a little better, so for
 * ranking each partner adds PARTNER_PENALTY percentage points to the largest
 * deviation: a two-partner fit must beat a one-partner fit by more than that to
 * rank above it. The deviations reported are the real ones. The search runs in
 * floating point; the fits it reports are recomputed exactly by the caller.
 */

/** Element masses per formula unit (g/mol) for the elements analysed, and the molar mass. */
export interface MassVector {
  masses: number[];
  total: number;
}

export interface Candidate {
  /** Amount of each partner, same order as the partner list (0 when absent). */
  amounts: number[];
  maxDeviation: number;
  sumSquares: number;
}

/** Percent by mass of each analysed element for base + Σ amounts × partners. */
export function percents(base: MassVector, partners: MassVector[], amounts: number[]): number[] {
  let total = base.total;
  for (let j = 0; j < partners.length; j++) total += amounts[j] * partners[j].total;
  return base.masses.map((m, i) => {
    let mi = m;
    for (let j = 0; j < partners.length; j++) mi += amounts[j] * partners[j].masses[i];
    return (100 * mi) / total;
  });
}

function score(found: number[], calc: number[]): [number, number] {
  let max = 0;
  let ss = 0;
  for (let i = 0; i < found.length; i++) {
    const d = found[i] - calc[i];
    max = Math.max(max, Math.abs(d));
    ss += d * d;
  }
  return [max, ss];
}

const EPS = 1e-9;
/** Percentage points added per partner when ranking (about the noise of a CHN analysis). */
export const PARTNER_PENALTY = 0.05;

const partnersIn = (c: Candidate) => c.amounts.filter((x) => x > 0).length;
const rankScore = (c: Candidate) => c.maxDeviation + PARTNER_PENALTY * partnersIn(c);

/** A rank score as reported: deviations are printed to 0.01, so fits equal at that figure are tied. */
const reported = (c: Candidate) => Math.round(rankScore(c) * 100 + EPS);

/** Ranks fits: by the rank score to the reported 0.01; ties go to the simpler fit (fewer partners, then less of them), then to the smaller sum of squares. */
function better(a: Candidate, b: Candidate): number {
  if (reported(a) !== reported(b)) return reported(a) - reported(b);
  if (partnersIn(a) !== partnersIn(b)) return partnersIn(a) - partnersIn(b);
  const amount = a.amounts.reduce((s, x) => s + x, 0) - b.amounts.reduce((s, x) => s + x, 0);
  if (Math.abs(amount) > EPS) return amount;
  return a.sumSquares - b.sumSquares;
}

/**
 * The best candidates: no partner, one partner, or two, on a grid of amounts.
 *
 * @example
 * const base = { masses: [120.11, 10.08], total: 130.19 }
 * const water = { masses: [0, 2.016], total: 18.015 }
 * searchSolvates([86.29, 7.97], base, [water], 0.05, 2, 5)[0].amounts // [0.5]
 */
export function searchSolvates(found: number[], base: MassVector, partners: MassVector[], step: number | readonly number[], max: number | readonly number[], top: number, pairs = true): Candidate[] {
  // one grid of amounts per partner: its step up to its largest amount
  const grids = partners.map((_, j) => {
    const st = typeof step === 'number' ? step : step[j];
    const mx = typeof max === 'number' ? max : max[j];
    const g: number[] = [];
    const n = Math.round(mx / st + EPS);
    for (let k = 1; k <= n; k++) g.push(Number((k * st).toFixed(6)));
    return g;
  });
  const best: Candidate[] = [];
  const consider = (amounts: number[]) => {
    const [maxDeviation, sumSquares] = score(found, percents(base, partners, amounts));
    const c: Candidate = { amounts: [...amounts], maxDeviation, sumSquares };
    if (best.length < top || better(c, best[best.length - 1]) < 0) {
      best.push(c);
      best.sort(better);
      if (best.length > top) best.pop();
    }
  };
  const amounts = partners.map(() => 0);
  consider(amounts);
  for (let j = 0; j < partners.length; j++) {
    for (const a of grids[j]) {
      amounts[j] = a;
      consider(amounts);
    }
    amounts[j] = 0;
  }
  if (pairs) {
    for (let j = 0; j < partners.length; j++) {
      for (let k = j + 1; k < partners.length; k++) {
        for (const a of grids[j]) {
          for (const b of grids[k]) {
            amounts[j] = a;
            amounts[k] = b;
            consider(amounts);
          }
        }
        amounts[j] = 0;
        amounts[k] = 0;
      }
    }
  }
  return best;
}

/**
 * The continuous amount of one partner that best fits (least squares), searched on [0, max].
 *
 * @example
 * const base = { masses: [120.11, 10.08], total: 130.19 }
 * const water = { masses: [0, 2.016], total: 18.015 }
 * continuousAmount([86.29, 7.97], base, water, 2).toFixed(1) // '0.5'
 */
export function continuousAmount(found: number[], base: MassVector, partner: MassVector, max: number): number {
  const ss = (x: number) => score(found, percents(base, [partner], [x]))[1];
  const samples = 400;
  let bestX = 0;
  let bestV = ss(0);
  for (let k = 1; k <= samples; k++) {
    const x = (max * k) / samples;
    const v = ss(x);
    if (v < bestV) {
      bestV = v;
      bestX = x;
    }
  }
  // golden-section refinement around the best sample
  let lo = Math.max(0, bestX - max / samples);
  let hi = Math.min(max, bestX + max / samples);
  const g = (Math.sqrt(5) - 1) / 2;
  for (let it = 0; it < 60; it++) {
    const a = hi - g * (hi - lo);
    const b = lo + g * (hi - lo);
    if (ss(a) < ss(b)) hi = b;
    else lo = a;
  }
  return (lo + hi) / 2;
}
