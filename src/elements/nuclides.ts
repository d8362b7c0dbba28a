import isotopes from './data/isotopes.json' with { type: 'json' };
import nuclideMasses from './data/nuclide-masses.json' with { type: 'json' };
import { fail } from '../errors/pondus-error.js';

/** A nuclide with its AME2020 atomic mass (decimal string, in u). */
export interface Nuclide {
  symbol: string;
  massNumber: number;
  mass: string;
}

/** A naturally occurring isotope with its CIAAW ICE 2013 amount fraction and AME2020 mass. */
export interface NaturalIsotope {
  massNumber: number;
  abundance: string;
  uncertainty: string;
  mass: string;
}

interface IsotopeEntry {
  natural?: [number, string, string, string][];
  longestLived?: [number, string];
}

const TABLE = isotopes.isotopes as unknown as Record<string, IsotopeEntry>;

/** Where the isotope data come from. */
export const NUCLIDE_PROVENANCE: Readonly<Record<string, string>> = Object.freeze({ ...isotopes.provenance });

/** The table's entry for an element symbol; undefined for anything else, '__proto__' included. */
function entryFor(symbol: string): IsotopeEntry | undefined {
  return typeof symbol === 'string' && Object.hasOwn(TABLE, symbol) ? TABLE[symbol] : undefined;
}

let fullTable: Map<string, string> | null = null;

/**
 * The complete AME2020 table (3,557 nuclides), indexed on first use: only a formula that names a
 * nuclide outside the natural set ([14C], [18F]) needs it. It is part of the library's data, so
 * the library reads no file and runs wherever JavaScript runs.
 */
function allNuclides(): Map<string, string> {
  if (fullTable) return fullTable;
  const data = nuclideMasses as unknown as { nuclides: [string, number, string, string][] };
  fullTable = new Map();
  for (const [symbol, a, mass] of data.nuclides) fullTable.set(`${a}${symbol}`, mass);
  return fullTable;
}

/**
 * The AME2020 atomic mass of a nuclide, or undefined when AME2020 lists no such nuclide.
 *
 * @param symbol - an element symbol ('C'; hydrogen's isotopes are written 'H' with their mass number).
 * @param massNumber - the mass number (13 for carbon-13).
 * @returns the nuclide with its AME2020 mass as exact decimal text, or undefined when there is none (an unknown symbol too).
 * @throws PondusError: BAD_ARGUMENT when `symbol` is not a string or `massNumber` not a number.
 * @example
 * getNuclide('C', 13)?.mass // '13.00335483534'
 */
export function getNuclide(symbol: string, massNumber: number): Nuclide | undefined {
  const entry = entryFor(symbol);
  if (!entry) return undefined;
  for (const [a, , , mass] of entry.natural ?? []) if (a === massNumber) return { symbol, massNumber, mass };
  if (entry.longestLived && entry.longestLived[0] === massNumber) return { symbol, massNumber, mass: entry.longestLived[1] };
  const mass = allNuclides().get(`${massNumber}${symbol}`);
  return mass === undefined ? undefined : { symbol, massNumber, mass };
}

/**
 * The naturally occurring isotopes of an element (empty for elements with none in ICE 2013).
 *
 * @param symbol - an element symbol ('Cl').
 * @returns each natural isotope with its mass number, abundance, uncertainty and mass; an empty array for an element without a natural composition or a string that is no element symbol.
 * @throws PondusError: BAD_ARGUMENT when `symbol` is not a string.
 * @example
 * naturalIsotopes('Cl').map(i => i.massNumber) // [35, 37]
 */
export function naturalIsotopes(symbol: string): NaturalIsotope[] {
  return (entryFor(symbol)?.natural ?? []).map(([massNumber, abundance, uncertainty, mass]) => ({ massNumber, abundance, uncertainty, mass }));
}

/**
 * The isotope used for monoisotopic mass: the most abundant natural isotope or,
 * for elements without a natural composition, the longest-lived isotope.
 *
 * @param symbol - an element symbol ('Br').
 * @returns the nuclide used for monoisotopic mass, with its mass as exact decimal text.
 * @throws PondusError: UNKNOWN_ELEMENT for a string that is no element symbol (D and T too, with a hint to write [2H] or [3H]); INTERNAL_ERROR if the data lack both a natural composition and a longest-lived isotope; BAD_ARGUMENT when `symbol` is not a string.
 * @example
 * principalIsotope('Br').massNumber // 79
 */
export function principalIsotope(symbol: string): Nuclide {
  const entry = entryFor(symbol);
  if (!entry) {
    const known = symbol === 'D' || symbol === 'T' ? `; write the nuclide as [${symbol === 'D' ? 2 : 3}H]` : '';
    throw fail({ code: 'UNKNOWN_ELEMENT', message: `no isotope data for '${symbol}': not an element symbol${known}` });
  }
  if (entry.natural && entry.natural.length > 0) {
    const best = entry.natural.reduce((a, b) => (Number(b[1]) > Number(a[1]) ? b : a));
    return { symbol, massNumber: best[0], mass: best[3] };
  }
  if (!entry.longestLived) throw fail({ code: 'INTERNAL_ERROR', message: `the isotope data for '${symbol}' have neither a natural composition nor a longest-lived isotope` });
  const [massNumber, mass] = entry.longestLived;
  return { symbol, massNumber, mass };
}
