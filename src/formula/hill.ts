/**
 * Hill order (Hill 1900; IUPAC Red Book 2005, IR-4.7): with carbon present,
 * C first, then H, then the other elements alphabetically; without carbon,
 * all elements alphabetically. Nuclides follow their element, lightest first,
 * and D and T count as hydrogen.
 */
import { alphabeticalRank, ATOMS, getAtomData, type AtomData } from '../elements/atom-data.js';
import { amountText, type Amount } from './amount.js';
import type { AtomCounts } from './flatten.js';

/** An atom key with what ordering and printing it need. */
export interface HillEntry {
  key: string;
  symbol: string;
  massNumber: number;
  label: string;
  /** The atom's mass data (undefined only for keys no element has). */
  atom: AtomData | undefined;
  /** Sort rank without carbon: alphabetical by symbol, then mass number (natural composition first). */
  plain: number;
  /** Sort rank with carbon present: C first, then H, then as `plain`. */
  organic: number;
}

export { alphabeticalRank };

const described = new Map<string, HillEntry>();

function describe(key: string): HillEntry {
  const hit = described.get(key);
  if (hit) return hit;
  const m = /^([0-9]*)([A-Za-z]+)$/.exec(key)!;
  const massNumber = m[1] ? Number(m[1]) : 0;
  const symbol = m[2];
  const data = getAtomData(symbol, m[1] ? massNumber : null);
  const plain = data ? ATOMS.rankPlain[data.id] : alphabeticalRank(symbol) * 1000 + massNumber;
  const organic = data ? ATOMS.rankOrganic[data.id] : plain;
  const k: HillEntry = { key, symbol, massNumber, label: data ? data.label : key, atom: data, plain, organic };
  described.set(key, k);
  return k;
}

/**
 * The atom keys of a count map in Hill order.
 *
 * @param counts - atom keys ('C', 'H', '13C'), such as an array or a count map's keys().
 * @returns the same keys in Hill order.
 * @throws PondusError: BAD_ARGUMENT when `counts` is a string, not iterable, or holds something that is not an atom key.
 * @example
 * hillOrder(new Map([['O', 1], ['H', 2]]).keys()) // ['H', 'O']
 */
export function hillOrder(counts: Iterable<string>): string[] {
  const items = hillEntries(counts);
  const out = new Array<string>(items.length);
  for (let i = 0; i < items.length; i++) out[i] = items[i].key;
  return out;
}

/**
 * The atom keys of a count map in Hill order, with their labels and mass data.
 *
 * @example
 * hillEntries(['O', 'H']).map((e) => e.label) // ['H', 'O']
 */
export function hillEntries(counts: Iterable<string>): HillEntry[] {
  const items: HillEntry[] = [];
  let hasCarbon = false;
  for (const key of counts) {
    const k = describe(key);
    if (k.symbol === 'C') hasCarbon = true;
    items.push(k);
  }
  // insertion sort: formulas have few kinds of atom
  for (let i = 1; i < items.length; i++) {
    const it = items[i];
    const r = hasCarbon ? it.organic : it.plain;
    let j = i - 1;
    while (j >= 0 && (hasCarbon ? items[j].organic : items[j].plain) > r) {
      items[j + 1] = items[j];
      j--;
    }
    items[j + 1] = it;
  }
  return items;
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
 * @param counts - atom totals keyed by atom key (from flattenFormula).
 * @param charge - the charge to append ('^2-'); 0 by default.
 * @param order - the keys in the order to write them; Hill order by default.
 * @returns the formula text, such as 'CuH10O9S' or 'O4S^2-'.
 * @throws PondusError: BAD_ARGUMENT when `counts` is not a Map, `charge` not a number or `order` not an array; a map key that is not an atom key ('H-') is not checked and gives INTERNAL_ERROR.
 * @example
 * hillFormula(flattenFormula(parseFormula('CuSO4·5H2O')), 0) // 'CuH10O9S'
 */
export function hillFormula(counts: AtomCounts, charge = 0, order: readonly string[] = hillOrder(counts.keys())): string {
  return formatFormula(
    order.map((key) => describe(key).label),
    order.map((key) => counts.get(key)!),
    charge,
  );
}

/**
 * Writes labels and counts already in order as a formula: 'C6H12O6', 'O4S^2-'.
 *
 * @example
 * formatFormula(['H', 'O'], [2, 1], 0) // 'H2O'
 */
export function formatFormula(labels: readonly string[], counts: readonly Amount[], charge = 0): string {
  let s = '';
  for (let i = 0; i < labels.length; i++) {
    const n = counts[i];
    s += labels[i];
    if (!(typeof n === 'number' && n === 1)) s += typeof n === 'number' ? n : amountText(n);
  }
  return charge === 0 ? s : s + chargeText(charge);
}
