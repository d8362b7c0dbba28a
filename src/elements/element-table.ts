import data from './data/atomic-weights.json' with { type: 'json' };

/** How CIAAW states an element's standard atomic weight. */
export type StandardWeight =
  | { kind: 'value'; value: string; uncertainty: string }
  | { kind: 'interval'; low: string; high: string; conventional: string }
  | { kind: 'none'; massNumber: number };

/** One chemical element with its CIAAW data. Values are decimal strings, exactly as published. */
export interface ElementData {
  z: number;
  symbol: string;
  name: string;
  standard: StandardWeight;
  /** The abridged (five-figure) value and its uncertainty; null for elements without a standard atomic weight. */
  abridged: { value: string; uncertainty: string } | null;
  /** CIAAW footnotes: g, m, r. */
  footnotes: string[];
  /** Year of a revision after the 2021 table (2024 for Gd, Lu, Zr). */
  revised: number | null;
}

interface RawElement {
  z: number;
  symbol: string;
  name: string;
  value?: string;
  uncertainty?: string;
  interval?: string[];
  conventional?: string;
  massNumber?: number;
  abridged?: string;
  abridgedUncertainty?: string;
  footnotes?: string[];
  revised?: number;
}

function toElement(r: RawElement): ElementData {
  let standard: StandardWeight;
  if (r.interval) standard = { kind: 'interval', low: r.interval[0], high: r.interval[1], conventional: r.conventional! };
  else if (r.value) standard = { kind: 'value', value: r.value, uncertainty: r.uncertainty! };
  else standard = { kind: 'none', massNumber: r.massNumber! };
  return {
    z: r.z,
    symbol: r.symbol,
    name: r.name,
    standard,
    abridged: r.abridged ? { value: r.abridged, uncertainty: r.abridgedUncertainty! } : null,
    footnotes: r.footnotes ?? [],
    revised: r.revised ?? null,
  };
}

const RAW = data.elements as RawElement[];

/**
 * The 118 symbols in order of atomic number (index 0 is H): what the readers index their own
 * tables by. The element records are made from the data only when one is asked for, as a
 * command needs the few its formulas name, and the young heap is what start-up pays for.
 */
export const ELEMENT_SYMBOLS: readonly string[] = RAW.map((r) => r.symbol);

/** Each symbol's atomic number, made with no pair arrays (start-up pays for every object made). */
const Z_OF_SYMBOL = new Map<string, number>();
for (let i = 0; i < RAW.length; i++) Z_OF_SYMBOL.set(RAW[i].symbol, i + 1);

/** The records made so far, by atomic number: one object per element, however it is reached. */
const MADE: ElementData[] = [];
const elementOfZ = (z: number): ElementData => (MADE[z] ??= toElement(RAW[z - 1]));

/** All 118 elements in order of atomic number. */
export const ELEMENTS: readonly ElementData[] = /* @__PURE__ */ Object.freeze(/* @__PURE__ */ RAW.map((r) => elementOfZ(r.z)));

/** Where the element data come from, as stated in the data file. */
export const ATOMIC_WEIGHT_PROVENANCE: Readonly<Record<string, string>> = /* @__PURE__ */ Object.freeze({ ...data.provenance });

/**
 * The atomic number of an element symbol (case-sensitive), or undefined for anything else.
 *
 * @example
 * atomicNumber('Fe') // 26
 * atomicNumber('FE') // undefined
 */
export function atomicNumber(symbol: string): number | undefined {
  return Z_OF_SYMBOL.get(symbol);
}

/**
 * Looks up an element by its symbol (case-sensitive, as symbols are).
 *
 * @param symbol - an element symbol, case-sensitive ('Fe', not 'FE').
 * @returns the element's data (number, name, standard atomic weight), or undefined for a string that is no element symbol.
 * @throws PondusError: BAD_ARGUMENT when `symbol` is not a string.
 * @example
 * getElement('Fe')?.name // 'iron'
 */
export function getElement(symbol: string): ElementData | undefined {
  const z = Z_OF_SYMBOL.get(symbol);
  return z === undefined ? undefined : elementOfZ(z);
}

/**
 * True when `symbol` is one of the 118 element symbols.
 *
 * @param symbol - the value to test; any value is accepted.
 * @returns true for one of the 118 symbols, false for anything else (a non-string too).
 * @throws PondusError: none in practice; BAD_ARGUMENT is never raised, as any argument is accepted.
 * @example
 * isElementSymbol('Co') // true
 * isElementSymbol('CO') // false
 */
export function isElementSymbol(symbol: string): boolean {
  return Z_OF_SYMBOL.has(symbol);
}
