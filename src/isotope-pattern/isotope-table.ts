/**
 * The isotopes each kind of atom brings to a pattern: an element with natural composition
 * takes its CIAAW ICE 2013 amount fractions (normalised to sum to 1, since the published
 * fractions are rounded) with AME2020 masses; a labelled atom ([13C], D) is that one nuclide;
 * an element without a natural composition is its longest-lived isotope.
 */
import { getAtomData } from '../elements/atom-data.js';
import { fail } from '../errors/pondus-error.js';
import { naturalIsotopes } from '../elements/nuclides.js';

/** The isotope distribution of one kind of atom. */
export interface AtomIsotopes {
  /** Atom key: 'C', '13C'. */
  key: string;
  symbol: string;
  massNumbers: number[];
  masses: number[];
  /** Amount fractions, normalised to sum to 1. */
  fractions: number[];
  /** Index of the principal (most abundant) isotope, the one monoisotopic mass uses. */
  principal: number;
  /** 'natural', 'label' (a single nuclide written in the formula) or 'longest-lived'. */
  source: 'natural' | 'label' | 'longest-lived';
}

const cache = new Map<string, AtomIsotopes>();

/**
 * The isotopes of an atom key, lightest first.
 *
 * @param key - an atom key: an element symbol ('Cl') or a labelled isotope ('13C').
 * @returns the isotopes' mass numbers, masses (AME2020) and fractions, the principal one, and their source (natural abundance or a label).
 * @throws PondusError: BAD_ARGUMENT for a key that is not an atom key with isotope data, or an argument of the wrong kind (from the public API's boundary).
 * @example
 * atomIsotopes('Cl').massNumbers // [35, 37]
 * atomIsotopes('13C').fractions  // [1]
 */
export function atomIsotopes(key: string): AtomIsotopes {
  const hit = cache.get(key);
  if (hit) return hit;
  const k = /^([0-9]*)([A-Za-z]+)$/.exec(key);
  if (!k) throw fail({ code: 'BAD_ARGUMENT', message: `'${key}' is not an atom key ('C', '13C', '2H')` });
  const symbol = k[2];
  const data = getAtomData(symbol, k[1] ? Number(k[1]) : null);
  if (!data) throw fail({ code: 'BAD_ARGUMENT', message: `'${key}' is not an atom key with isotope data ('C', '13C', '2H')` });
  let out: AtomIsotopes;
  const natural = naturalIsotopes(symbol);
  if (data.massNumber !== null) {
    out = { key, symbol, massNumbers: [data.massNumber], masses: [Number(data.monoisotopic.text)], fractions: [1], principal: 0, source: 'label' };
  } else if (natural.length === 0) {
    out = { key, symbol, massNumbers: [data.nominal], masses: [Number(data.monoisotopic.text)], fractions: [1], principal: 0, source: 'longest-lived' };
  } else {
    const sorted = [...natural].sort((a, b) => a.massNumber - b.massNumber).filter((i) => Number(i.abundance) > 0);
    const total = sorted.reduce((s, i) => s + Number(i.abundance), 0);
    const fractions = sorted.map((i) => Number(i.abundance) / total);
    let principal = 0;
    sorted.forEach((i, j) => {
      if (i.massNumber === data.nominal) principal = j;
    });
    out = { key, symbol, massNumbers: sorted.map((i) => i.massNumber), masses: sorted.map((i) => Number(i.mass)), fractions, principal, source: 'natural' };
  }
  cache.set(key, out);
  return out;
}

/**
 * The average mass of an atom from its isotopes (Σ fraction × AME2020 mass): ICE × AME, not the
 * CIAAW standard atomic weight.
 *
 * @param a - the isotopes of an atom, from {@link atomIsotopes}.
 * @returns the average mass, Σ fraction × mass.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * isotopeAverage(atomIsotopes('Cl')) // 35.4528…
 */
export function isotopeAverage(a: AtomIsotopes): number {
  let m = 0;
  for (let i = 0; i < a.masses.length; i++) m += a.fractions[i] * a.masses[i];
  return m;
}

/**
 * Checks the atoms of a pattern: every key an atom key with isotope data, every count a whole
 * number from 0 up.
 *
 * @param atoms - counts by atom key.
 * @returns nothing; it throws on the first bad entry.
 * @throws PondusError: BAD_ARGUMENT for a key without isotope data or a count that is not a whole number ≥ 0.
 * @example
 * checkPatternAtoms(new Map([['C', 6], ['H', 6]])) // undefined
 */
export function checkPatternAtoms(atoms: Map<string, number>): void {
  for (const [key, n] of atoms) {
    atomIsotopes(key);
    if (!(Number.isInteger(n) && n >= 0)) throw fail({ code: 'BAD_ARGUMENT', message: `an isotope pattern takes whole counts of atoms: ${key} has ${n}` });
  }
}
