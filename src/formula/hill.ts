/**
 * Hill order (Hill 1900; IUPAC Red Book 2005, IR-4.7): with carbon present,
 * C first, then H, then the other elements alphabetically; without carbon,
 * all elements alphabetically. Nuclides follow their element, lightest first,
 * and D and T count as hydrogen.
 */
import { getAtomData } from '../elements/atom-data.js';
import { amountText, type Amount } from './amount.js';
import type { AtomCounts } from './flatten.js';

interface Keyed {
  key: string;
  symbol: string;
  massNumber: number;
  label: string;
}

const described = new Map<string, Keyed>();

function describe(key: string): Keyed {
  const hit = described.get(key);
  if (hit) return hit;
  const m = /^([0-9]*)([A-Za-z]+)$/.exec(key)!;
  const massNumber = m[1] ? Number(m[1]) : 0;
  const data = getAtomData(m[2], m[1] ? massNumber : null);
  const k: Keyed = { key, symbol: m[2], massNumber, label: data ? data.label : key };
  described.set(key, k);
  return k;
}

/**
 * The atom keys of a count map in Hill order.
 *
 * @example
 * hillOrder(new Map([['O', 1], ['H', 2]])) // ['H', 'O']
 */
export function hillOrder(counts: Iterable<string>): string[] {
  const items = [...counts].map(describe);
  const hasCarbon = items.some((i) => i.symbol === 'C');
  const rank = (i: Keyed): number => (hasCarbon ? (i.symbol === 'C' ? 0 : i.symbol === 'H' ? 1 : 2) : 2);
  items.sort((a, b) => rank(a) - rank(b) || (a.symbol < b.symbol ? -1 : a.symbol > b.symbol ? 1 : 0) || a.massNumber - b.massNumber);
  return items.map((i) => i.key);
}

/**
 * Writes a charge the way pondus prints it: '^2-', '^+'.
 *
 * @example
 * chargeText(-2) // '^2-'
 */
export function chargeText(charge: number): string {
  if (charge === 0) return '';
  const mag = Math.abs(charge);
  return `^${mag === 1 ? '' : mag}${charge > 0 ? '+' : '-'}`;
}

/**
 * The Hill formula of a count map, with its charge.
 *
 * @example
 * hillFormula(flattenFormula(parseFormula('CuSO4·5H2O')), 0) // 'H10CuO9S'
 */
export function hillFormula(counts: AtomCounts, charge = 0): string {
  let s = '';
  for (const key of hillOrder(counts.keys())) {
    const n: Amount = counts.get(key)!;
    s += describe(key).label;
    if (!(typeof n === 'number' && n === 1)) s += amountText(n);
  }
  return s + chargeText(charge);
}
