import { toScaled } from '../exact/scaled.js';
import { atomicNumber, ELEMENT_SYMBOLS, getElement, type ElementData } from './element-table.js';
import { getNuclide, principalIsotope } from './nuclides.js';

/** Which atomic weights to use for average molar mass. */
export type WeightTable = 'standard' | 'abridged';

/** A tabulated value: the decimal text as published and the same value in 10^-12 u. */
export interface TabulatedValue {
  text: string;
  scaled: number;
}

/**
 * Everything the mass calculations need about one kind of atom: an element with
 * natural isotopic composition (`massNumber` null) or a single nuclide (`[13C]`, D, T).
 */
export interface AtomData {
  /** Index into the dense per-atom tables: the atomic number for an element, 119 and up for nuclides (in order of first use). */
  id: number;
  /** 'C' for carbon, '13C' for carbon-13. */
  key: string;
  symbol: string;
  massNumber: number | null;
  /** How the atom is written in pondus output: 'C', '[13C]', 'D', 'T'. */
  label: string;
  element: ElementData;
  average: Record<WeightTable, TabulatedValue>;
  monoisotopic: TabulatedValue;
  nominal: number;
  /** True when the element has no standard atomic weight and the mass number stands in for it. */
  noStandardWeight: boolean;
}

const cache = new Map<string, AtomData | null>();

/**
 * Dense per-atom tables, indexed by {@link AtomData.id}: what the mass and composition sums and
 * Hill order read for every atom of every formula, without a map or an object per lookup.
 * `standardScaled`, `abridgedScaled` and `monoScaled` are the tabulated values in 10^-12 u.
 */
export const ATOMS = {
  data: [] as AtomData[],
  standardScaled: [] as number[],
  abridgedScaled: [] as number[],
  monoScaled: [] as number[],
  nominal: [] as number[],
  /** Hill rank without carbon: alphabetical by symbol, then mass number. */
  rankPlain: [] as number[],
  /** Hill rank with carbon present: C first, then H (with D and T), then as rankPlain. */
  rankOrganic: [] as number[],
};
let nextNuclideId = 119;

/** Each element's place in alphabetical order of the symbols, by atomic number (0 for Ac). */
const RANK_OF_Z = new Int16Array(ELEMENT_SYMBOLS.length + 1);
{
  const order = ELEMENT_SYMBOLS.map((_, i) => i).sort((a, b) => (ELEMENT_SYMBOLS[a] < ELEMENT_SYMBOLS[b] ? -1 : 1));
  for (let r = 0; r < order.length; r++) RANK_OF_Z[order[r] + 1] = r;
}

/**
 * Position of an element symbol in alphabetical order (0 for Ac): the Hill order of the elements
 * other than carbon and hydrogen.
 *
 * @example
 * alphabeticalRank('Ag') < alphabeticalRank('Al') // true
 */
export function alphabeticalRank(symbol: string): number {
  const z = atomicNumber(symbol);
  return z === undefined ? 999 : RANK_OF_Z[z];
}

function register(d: AtomData): void {
  const i = d.id;
  ATOMS.data[i] = d;
  ATOMS.standardScaled[i] = d.average.standard.scaled;
  ATOMS.abridgedScaled[i] = d.average.abridged.scaled;
  ATOMS.monoScaled[i] = d.monoisotopic.scaled;
  ATOMS.nominal[i] = d.nominal;
  const mass = d.massNumber ?? 0;
  const plain = alphabeticalRank(d.symbol) * 1000 + mass;
  ATOMS.rankPlain[i] = plain;
  ATOMS.rankOrganic[i] = d.symbol === 'C' ? mass - 2000 : d.symbol === 'H' ? mass - 1000 : plain;
}

/**
 * The dense-table index of an atom (registering its data on first use), or -1 for an unknown
 * symbol or a nuclide AME2020 does not list.
 *
 * @example
 * atomId('O', null) // 8
 */
export function atomId(symbol: string, massNumber: number | null): number {
  if (massNumber === null) {
    const z = atomicNumber(symbol);
    if (z === undefined) return -1;
    if (ATOMS.data[z] === undefined) getAtomData(symbol, null);
    return z;
  }
  return getAtomData(symbol, massNumber)?.id ?? -1;
}

/**
 * Builds the key for an atom: the symbol, prefixed by the mass number for a nuclide.
 *
 * @example
 * atomKey('C', 13) // '13C'
 */
export function atomKey(symbol: string, massNumber: number | null): string {
  return massNumber === null ? symbol : `${massNumber}${symbol}`;
}

/**
 * How pondus writes an atom in a formula: D and T for hydrogen-2 and -3, `[13C]` for other nuclides.
 *
 * @example
 * atomLabel('H', 2) // 'D'
 */
export function atomLabel(symbol: string, massNumber: number | null): string {
  if (massNumber === null) return symbol;
  if (symbol === 'H' && massNumber === 2) return 'D';
  if (symbol === 'H' && massNumber === 3) return 'T';
  return `[${massNumber}${symbol}]`;
}

function tab(text: string): TabulatedValue {
  return { text, scaled: toScaled(text) };
}

/**
 * The mass data for an atom, or undefined for an unknown symbol or a nuclide AME2020 does not list.
 *
 * @example
 * getAtomData('O', null)?.average.standard.text // '15.999'
 */
export function getAtomData(symbol: string, massNumber: number | null): AtomData | undefined {
  const key = atomKey(symbol, massNumber);
  const hit = cache.get(key);
  if (hit !== undefined) return hit ?? undefined;
  const built = build(symbol, massNumber, key);
  cache.set(key, built);
  if (built) register(built);
  return built ?? undefined;
}

function build(symbol: string, massNumber: number | null, key: string): AtomData | null {
  const element = getElement(symbol);
  if (!element) return null;
  const label = atomLabel(symbol, massNumber);
  if (massNumber !== null) {
    const n = getNuclide(symbol, massNumber);
    if (!n) return null;
    const m = tab(n.mass);
    return { id: nextNuclideId++, key, symbol, massNumber, label, element, average: { standard: m, abridged: m }, monoisotopic: m, nominal: massNumber, noStandardWeight: false };
  }
  const principal = principalIsotope(symbol);
  const monoisotopic = tab(principal.mass);
  const std = element.standard;
  let standard: TabulatedValue;
  let abridged: TabulatedValue;
  if (std.kind === 'none') {
    standard = abridged = tab(String(std.massNumber));
  } else {
    standard = tab(std.kind === 'value' ? std.value : std.conventional);
    abridged = tab(element.abridged!.value);
  }
  return {
    id: element.z,
    key,
    symbol,
    massNumber: null,
    label,
    element,
    average: { standard, abridged },
    monoisotopic,
    nominal: principal.massNumber,
    noStandardWeight: std.kind === 'none',
  };
}
