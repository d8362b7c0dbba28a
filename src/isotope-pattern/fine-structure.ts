/**
 * The fine structure: the individual isotopologues, the most probable first, until they hold
 * the asked share of the probability (the coverage). Following IsoSpec (Łącki, Startek,
 * Valkenborg & Gambin, Anal. Chem. 89 (2017) 3272; Łącki et al., Anal. Chem. 92 (2020) 9472):
 * for a probability threshold t, each element keeps its configurations of probability at least
 * t divided by the other elements' best, and the joint configurations are enumerated with the
 * elements' lists sorted, cutting each loop as soon as the product (times the best of the
 * elements not yet chosen) falls below t. The threshold is lowered tenfold until the
 * configurations above it hold the coverage; then the smallest set of most probable
 * isotopologues that reaches the coverage is kept.
 */
import { fail } from '../errors/pondus-error.js';
import { atomIsotopes, checkPatternAtoms } from './isotope-table.js';
import { marginal, MODE_ONLY, type Marginal } from './marginal.js';

/** One isotopologue. */
export interface Isotopologue {
  /** Neutral mass in u. */
  mass: number;
  probability: number;
  /** Heavy isotopes beyond each element's principal one, e.g. '[13C]2[37Cl]'; '' for the monoisotopic species; null beyond the 5,000 most probable. */
  label: string | null;
}

/** The isotopologues kept, most probable first, with the share of probability they hold. */
export interface FineStructure {
  isotopologues: Isotopologue[];
  coverage: number;
}

/** Most isotopologues a fine structure may hold (the bound on time and memory). */
export const MAX_ISOTOPOLOGUES = 131_072;

/**
 * The fine structure of a set of atoms to a coverage (0 < coverage ≤ 1; 1 lists every
 * isotopologue above 10⁻³⁰⁰). Refuses when more than {@link MAX_ISOTOPOLOGUES} are needed.
 *
 * @param atoms - the atoms: counts by atom key ('C', '13C').
 * @param coverage - the share of the probability to list, above 0 and at most 1.
 * @param input - the text to name in an error.
 * @returns the isotopologues, most abundant first, and the share of the probability they cover.
 * @throws PondusError: PATTERN_TOO_LARGE when more than {@link MAX_ISOTOPOLOGUES} isotopologues are needed or the coverage is not reached; BAD_OPTION for a coverage outside (0, 1]; BAD_ARGUMENT for a key that is not an atom key with isotope data, a count that is not a whole number ≥ 0, or an argument of the wrong kind.
 * @example
 * fineStructure(new Map([['C', 1], ['H', 4]]), 0.999).isotopologues[0].label // '' (12C 1H4)
 */
export function fineStructure(atoms: Map<string, number>, coverage: number, input?: string): FineStructure {
  checkPatternAtoms(atoms);
  if (!(coverage > 0 && coverage <= 1)) throw fail({ code: 'BAD_OPTION', message: `the coverage is a share of the probability above 0 and at most 1 (such as 0.999), not ${coverage}` });
  const keys = [...atoms.keys()].filter((k) => atoms.get(k)! > 0);
  // the best configuration of each element: its probability bounds the others' thresholds
  const modes = keys.map((k) => marginal(k, atoms.get(k)!, MODE_ONLY).probs[0]);
  const modeProduct = modes.reduce((a, b) => a * b, 1);
  let t = modeProduct * 1e-2;
  for (let round = 0; round < 40; round++) {
    const target = coverage >= 1 ? 0 : t;
    const margs: Marginal[] = keys.map((k, e) => marginal(k, atoms.get(k)!, target === 0 ? 0 : target / (modeProduct / modes[e]) / 1.000001, input));
    const found = enumerate(margs, target, input);
    if (found.total >= coverage - 1e-12 || coverage >= 1 || t < 1e-300) return keep(found, margs, coverage);
    t /= 10;
  }
  throw fail({ code: 'PATTERN_TOO_LARGE', message: 'the fine structure did not reach the coverage asked for' }, input);
}

interface Found {
  probs: Float64Array;
  masses: Float64Array;
  /** marginal indices, margs.length per isotopologue */
  idx: Int32Array;
  n: number;
  total: number;
}

function enumerate(margs: Marginal[], t: number, input?: string): Found {
  const E = margs.length;
  if (E === 0) return { probs: Float64Array.of(1), masses: Float64Array.of(0), idx: new Int32Array(0), n: 1, total: 1 };
  const suffix = new Float64Array(E + 1);
  suffix[E] = 1;
  for (let e = E - 1; e >= 0; e--) suffix[e] = suffix[e + 1] * margs[e].probs[0];
  let cap = 1024;
  const out: Found = { probs: new Float64Array(cap), masses: new Float64Array(cap), idx: new Int32Array(cap * E), n: 0, total: 0 };
  const chosen = new Int32Array(E);
  const grow = () => {
    cap *= 2;
    const p = new Float64Array(cap);
    p.set(out.probs);
    const m = new Float64Array(cap);
    m.set(out.masses);
    const ix = new Int32Array(cap * E);
    ix.set(out.idx);
    out.probs = p;
    out.masses = m;
    out.idx = ix;
  };
  const last = margs[E - 1];
  const walk = (e: number, p: number, m: number): void => {
    if (e === E - 1) {
      const probs = last.probs;
      const masses = last.masses;
      for (let i = 0; i < probs.length; i++) {
        const q = p * probs[i];
        if (q < t) break;
        if (out.n === cap) {
          if (cap >= MAX_ISOTOPOLOGUES) {
            throw fail({ code: 'PATTERN_TOO_LARGE', message: `more than ${MAX_ISOTOPOLOGUES.toLocaleString('en-US')} isotopologues are needed for this coverage (those found so far hold ${(out.total * 100).toFixed(2)} %); ask for a lower \`coverage\`, or the aggregated pattern`, options: ['coverage'] }, input);
          }
          grow();
        }
        const k = out.n++;
        out.probs[k] = q;
        out.masses[k] = m + masses[i];
        const base = k * E;
        for (let f = 0; f < E - 1; f++) out.idx[base + f] = chosen[f];
        out.idx[base + E - 1] = i;
        out.total += q;
      }
      return;
    }
    const mg = margs[e];
    const rest = suffix[e + 1];
    for (let i = 0; i < mg.probs.length; i++) {
      const q = p * mg.probs[i];
      if (q * rest < t) break;
      chosen[e] = i;
      walk(e + 1, q, m + mg.masses[i]);
    }
  };
  walk(0, 1, 0);
  return out;
}

/** Isotopologues beyond this many (the least probable) are kept without a label. */
const LABELLED = 5000;

function keep(f: Found, margs: Marginal[], coverage: number): FineStructure {
  const E = margs.length;
  const order = new Uint32Array(f.n);
  for (let i = 0; i < f.n; i++) order[i] = i;
  const probs = f.probs;
  const sorted = Array.from(order).sort((a, b) => probs[b] - probs[a]);
  const info = margs.map((mg) => {
    const iso = atomIsotopes(mg.key);
    return { principal: iso.principal, names: iso.massNumbers.map((a) => `${a}${iso.symbol}`) };
  });
  const out: Isotopologue[] = [];
  let total = 0;
  for (const i of sorted) {
    if (total >= coverage && coverage < 1) break;
    let label: string | null = null;
    if (out.length < LABELLED) {
      label = '';
      for (let e = 0; e < E; e++) {
        const mg = margs[e];
        const c = f.idx[i * E + e];
        for (let j = 0; j < mg.k; j++) {
          if (j === info[e].principal) continue;
          const n = mg.counts[c * mg.k + j];
          if (n > 0) label += `[${info[e].names[j]}]${n === 1 ? '' : n}`;
        }
      }
    }
    out.push({ mass: f.masses[i], probability: probs[i], label });
    total += probs[i];
  }
  return { isotopologues: out, coverage: total };
}
