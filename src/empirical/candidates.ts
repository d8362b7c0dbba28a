/**
 * Candidate formulas for an accurate mass and/or found percents: every formula
 * in the element ranges whose monoisotopic mass lies in the window, filtered by
 * chemical plausibility and ranked by error. The search fixes the heavy atoms,
 * bounds carbon from the mass window and solves hydrogen directly, so it
 * visits only formulas near the target mass.
 *
 * Plausibility (Kind & Fiehn, BMC Bioinformatics 8 (2007) 105): RDBE
 * (ring-plus-double-bond equivalents, IUPAC Gold Book) non-negative and whole,
 * as for neutral closed-shell molecules; the SENIOR rules with the lowest
 * valences; and the element-ratio limits that cover almost all known compounds
 * (H/C 0.2–3.1, N/C ≤ 1.3, O/C ≤ 1.2, P/C ≤ 0.3, S/C ≤ 0.8, F/C ≤ 1.5,
 * Cl/C ≤ 0.8, Br/C ≤ 0.8; values from memory of the paper's table).
 */
import type { Note } from '../errors/issue.js';
import { fail, toSafe, type SafeResult } from '../errors/pondus-error.js';
import { getAtomData } from '../elements/atom-data.js';
import { hillFormula } from '../formula/hill.js';
import { readFoundValues } from '../analysis/found-values.js';
import { readNumber } from '../sigfig/read-number.js';

/** Formulas a candidate search may visit: about a second of work; a larger search is refused up front in effect. */
export const MAX_WORK = 600_000;

export interface CandidateOptions {
  /** Neutral monoisotopic mass, u. */
  mass?: string;
  /** Mass tolerance, ppm (default 5). */
  ppm?: number;
  /** Average molar mass, g/mol, when no accurate mass is known. */
  molarMass?: string;
  /** Window on the molar mass, g/mol (default 0.5). */
  molarMassTolerance?: number;
  /** Found percents: 'C=64.85 H=5.44 N=6.30'. */
  found?: string;
  /** Allowed |found − calculated|, percentage points (default 0.4). */
  tolerance?: number;
  /** Element ranges: 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2'. */
  elements?: string;
  /** Apply the Kind & Fiehn element-ratio limits (default true). */
  ratios?: boolean;
  /** Most candidates to return (default 50). */
  limit?: number;
}

export interface Candidate {
  formula: string;
  counts: Map<string, number>;
  monoisotopicMass: number;
  molarMass: number;
  /** (candidate − target) / target × 10⁶, when an accurate mass was given. */
  ppm: number | null;
  rdbe: number;
  /** Largest |found − calculated| percent, when found values were given. */
  maxDeviation: number | null;
}

export interface CandidateResult {
  input: string;
  candidates: Candidate[];
  /** How many formulas met the mass window before the plausibility filters. */
  examined: number;
  /** More candidates fit than were returned. */
  truncated: boolean;
  /** Remarks (found values summing over 100 %, …). */
  notes: Note[];
}

export const DEFAULT_RANGES = 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2';
const HEAVY_ORDER = ['I', 'Br', 'Cl', 'S', 'P', 'F', 'O', 'N'];
const VALENCE: Record<string, number> = { C: 4, H: 1, N: 3, O: 2, S: 2, P: 3, F: 1, Cl: 1, Br: 1, I: 1 };
const RATIO_LIMITS: Record<string, [number, number]> = { H: [0.2, 3.1], N: [0, 1.3], O: [0, 1.2], P: [0, 0.3], S: [0, 0.8], F: [0, 1.5], Cl: [0, 0.8], Br: [0, 0.8] };

/**
 * Ring-plus-double-bond equivalents (IUPAC Gold Book, "degree of unsaturation"):
 * 1 + C + (N + P)/2 − (H + halogens)/2, with Si counted like C; O and S do not count.
 *
 * @example
 * rdbe(new Map([['C', 6], ['H', 6]])) // 4
 */
export function rdbe(counts: Map<string, number>): number {
  const n = (s: string) => counts.get(s) ?? 0;
  return 1 + n('C') + n('Si') + (n('N') + n('P')) / 2 - (n('H') + n('F') + n('Cl') + n('Br') + n('I')) / 2;
}

/**
 * Reads element ranges such as 'C0-80 H0-160 N0-4'.
 *
 * @example
 * readRanges('C1-10 H0-20').get('C') // [1, 10]
 */
export function readRanges(text: string): Map<string, [number, number]> {
  const out = new Map<string, [number, number]>();
  for (const part of text.split(/[\s,;]+/).filter((x) => x)) {
    const m = /^([A-Z][a-z]?)(\d+)(?:-(\d+))?$/.exec(part);
    if (!m) throw fail({ code: 'BAD_OPTION', message: `'${part}' is not an element range such as C0-40` });
    if (!(m[1] in VALENCE)) throw fail({ code: 'BAD_OPTION', message: `candidate search covers C, H, N, O, S, P, F, Cl, Br and I, not ${m[1]}` });
    const lo = Number(m[2]);
    const hi = m[3] === undefined ? lo : Number(m[3]);
    if (hi < lo || hi > 500) throw fail({ code: 'BAD_OPTION', message: `range ${part} is empty or too wide (at most 500)` });
    out.set(m[1], [lo, hi]);
  }
  if (!out.has('C')) out.set('C', [0, 0]);
  if (!out.has('H')) out.set('H', [0, 0]);
  return out;
}

const mono = (s: string) => Number(getAtomData(s, null)!.monoisotopic.text);
const avg = (s: string) => Number(getAtomData(s, null)!.average.standard.text);

/**
 * Lists plausible formulas for an accurate mass (± ppm) and/or found percents.
 *
 * @example
 * candidateFormulas({ mass: '180.06339', ppm: 3, elements: 'C0-20 H0-40 O0-10' }).candidates[0].formula // 'C6H12O6'
 */
export function candidateFormulas(options: CandidateOptions): CandidateResult {
  const ranges = readRanges(options.elements ?? DEFAULT_RANGES);
  const ppm = options.ppm ?? 5;
  if (!(ppm > 0 && ppm <= 1000)) throw fail({ code: 'BAD_OPTION', message: 'ppm must be between 0 and 1000' });
  let lo: number;
  let hi: number;
  let target: number | null = null;
  let massOf: (s: string) => number = mono;
  if (options.mass !== undefined) {
    const m = readNumber(options.mass).value;
    if (m.lte(0) || m.gt(5000)) throw fail({ code: 'BAD_OPTION', message: 'the accurate mass must be between 0 and 5000 u' });
    target = m.toNumber();
    lo = target * (1 - ppm * 1e-6);
    hi = target * (1 + ppm * 1e-6);
  } else if (options.molarMass !== undefined) {
    const m = Number(options.molarMass);
    const tol = options.molarMassTolerance ?? 0.5;
    if (!(m > 0 && m <= 5000)) throw fail({ code: 'BAD_OPTION', message: 'the molar mass must be between 0 and 5000 g/mol' });
    lo = m - tol;
    hi = m + tol;
    massOf = avg;
  } else {
    throw fail({ code: 'BAD_OPTION', message: 'give an accurate mass (--mass, with --ppm) or a molar mass (--molar-mass): the search needs a mass window' });
  }
  const read = options.found ? readFoundValues(options.found) : null;
  const found = read ? read.values : null;
  const tolerance = options.tolerance ?? 0.4;
  const useRatios = options.ratios ?? true;
  const limit = options.limit ?? 50;

  const heavy = HEAVY_ORDER.filter((s) => ranges.has(s));
  const heavyMass = heavy.map(massOf);
  const [cMin, cMax] = ranges.get('C')!;
  const [hMin, hMax] = ranges.get('H')!;
  const mC = massOf('C');
  const mH = massOf('H');
  const counts = new Array<number>(heavy.length).fill(0);
  let out: Candidate[] = [];
  let examined = 0;
  let work = 0;
  let cut = false;
  const rank = (c: Candidate) => (c.ppm !== null ? Math.abs(c.ppm) : 0) + (c.maxDeviation ?? 0);
  const byRank = (p: Candidate, q: Candidate) => rank(p) - rank(q) || (p.maxDeviation ?? 0) - (q.maxDeviation ?? 0);
  const tooLarge = () =>
    fail({
      code: 'SEARCH_TOO_LARGE',
      message: `the search visits more than ${MAX_WORK.toLocaleString('en-US')} formulas (${describe(options)}), more than pondus answers within about a second: narrow the window (--ppm), the element ranges (--elements), or add found percents (--found)`,
    });

  const consider = (c: number, h: number) => {
    examined++;
    if (++work > MAX_WORK) throw tooLarge();
    const all = new Map<string, number>();
    if (c) all.set('C', c);
    if (h) all.set('H', h);
    heavy.forEach((s, i) => counts[i] && all.set(s, counts[i]));
    if (all.size === 0) return;
    let valenceSum = 4 * c + h;
    let maxValence = c ? 4 : h ? 1 : 0;
    let atoms = c + h;
    heavy.forEach((s, i) => {
      const n = counts[i];
      if (!n) return;
      valenceSum += VALENCE[s] * n;
      maxValence = Math.max(maxValence, VALENCE[s]);
      atoms += n;
    });
    const r = rdbe(all);
    if (r < 0 || !Number.isInteger(r)) return;
    // SENIOR rules
    if (valenceSum % 2 !== 0 || valenceSum < 2 * maxValence || valenceSum < 2 * (atoms - 1)) return;
    if (useRatios) {
      if (c === 0) return;
      for (const [s, n] of all) {
        const lim = RATIO_LIMITS[s];
        if (lim && (n / c < lim[0] || n / c > lim[1])) return;
      }
      if (!all.has('H') && RATIO_LIMITS.H[0] > 0) return;
    }
    let maxDeviation: number | null = null;
    const molar = [...all].reduce((a, [s, n]) => a + n * avg(s), 0);
    if (found) {
      maxDeviation = 0;
      for (const [s, v] of found) {
        const calc = ((all.get(s) ?? 0) * avg(s) * 100) / molar;
        maxDeviation = Math.max(maxDeviation, Math.abs(calc - v.toNumber()));
        if (maxDeviation > tolerance) return;
      }
    }
    const monoMass = [...all].reduce((a, [s, n]) => a + n * mono(s), 0);
    // memory stays bounded: only the best `limit` are kept once the list grows
    if (out.length >= 4 * limit + 10_000) {
      out.sort(byRank);
      out = out.slice(0, limit);
      cut = true;
    }
    out.push({
      formula: hillFormula(all),
      counts: all,
      monoisotopicMass: monoMass,
      molarMass: molar,
      ppm: target === null ? null : ((monoMass - target) / target) * 1e6,
      rdbe: r,
      maxDeviation,
    });
  };

  const walk = (i: number, cum: number) => {
    if (cum > hi) return;
    if (i === heavy.length) {
      // carbon from the window, hydrogen solved directly
      const cFrom = Math.max(cMin, Math.ceil((lo - cum - hMax * mH) / mC - 1e-9));
      const cTo = Math.min(cMax, Math.floor((hi - cum) / mC + 1e-9));
      for (let c = cFrom; c <= cTo; c++) {
        const rest = cum + c * mC;
        const hFrom = Math.max(hMin, Math.ceil((lo - rest) / mH - 1e-9));
        const hTo = Math.min(hMax, Math.floor((hi - rest) / mH + 1e-9));
        for (let h = hFrom; h <= hTo; h++) consider(c, h);
      }
      return;
    }
    if (++work > MAX_WORK) throw tooLarge();
    const [a, b] = ranges.get(heavy[i])!;
    for (let n = a; n <= b; n++) {
      const next = cum + n * heavyMass[i];
      if (next > hi) break;
      counts[i] = n;
      walk(i + 1, next);
    }
    counts[i] = 0;
  };
  walk(0, 0);

  out.sort(byRank);
  return { input: describe(options), candidates: out.slice(0, limit), examined, truncated: cut || out.length > limit, notes: read ? [...read.notes] : [] };
}

function describe(o: CandidateOptions): string {
  const parts: string[] = [];
  if (o.mass !== undefined) parts.push(`mass ${o.mass} ± ${o.ppm ?? 5} ppm`);
  if (o.molarMass !== undefined) parts.push(`molar mass ${o.molarMass} ± ${o.molarMassTolerance ?? 0.5}`);
  if (o.found) parts.push(`found ${o.found}`);
  return parts.join(', ');
}

/** Non-throwing {@link candidateFormulas}. */
export function safeCandidateFormulas(options: CandidateOptions): SafeResult<CandidateResult> {
  return toSafe(() => candidateFormulas(options));
}
