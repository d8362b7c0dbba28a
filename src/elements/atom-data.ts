import { toScaled } from '../exact/scaled.js';
import { getElement, type ElementData } from './element-table.js';
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
    return { key, symbol, massNumber, label, element, average: { standard: m, abridged: m }, monoisotopic: m, nominal: massNumber, noStandardWeight: false };
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
