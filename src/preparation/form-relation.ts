/**
 * Whether two formulas are forms of one substance, and how many formula units of one make one of
 * the other: hydrates of one salt (CuSO4 and CuSO4·5H2O), or an acid-addition salt and its free
 * base, which may hold more than one base per formula unit (a sulfate: (C17H19NO3)2·H2SO4 holds two).
 * Anything else (FeCl3 for FeCl2, NaNO3 for NaNO2, H2O2 for H2O) is a different substance.
 */
import { Decimal } from '../exact/decimal.js';

/** How two forms are related, past water of crystallisation. */
export type FormRelation =
  | { kind: 'same' }
  | {
      kind: 'salt';
      /** Which of the two is the salt. */
      salt: 'first' | 'second';
      /** Formula units of the free base in one formula unit of the salt. */
      basesPerSalt: number;
      /** The acid the salt adds, and how many of it per formula unit of the salt. */
      acid: string;
      acids: number;
    };

/** The acids of acid-addition salts (pharmacopoeial salt forms), as atom counts. */
const ACIDS: readonly [name: string, atoms: Record<string, number>][] = [
  ['HCl', { H: 1, Cl: 1 }],
  ['HBr', { H: 1, Br: 1 }],
  ['HI', { H: 1, I: 1 }],
  ['HNO3', { H: 1, N: 1, O: 3 }],
  ['H2SO4', { H: 2, S: 1, O: 4 }],
  ['H3PO4', { H: 3, P: 1, O: 4 }],
  ['CH3SO3H', { C: 1, H: 4, S: 1, O: 3 }],
  ['C7H7SO3H', { C: 7, H: 8, S: 1, O: 3 }],
  ['C4H4O4 (maleic or fumaric acid)', { C: 4, H: 4, O: 4 }],
  ['C4H6O4 (succinic acid)', { C: 4, H: 6, O: 4 }],
  ['C4H6O6 (tartaric acid)', { C: 4, H: 6, O: 6 }],
  ['C6H8O7 (citric acid)', { C: 6, H: 8, O: 7 }],
  ['C2H4O2 (acetic acid)', { C: 2, H: 4, O: 2 }],
];

const MAX_BASES = 4;
const MAX_ACIDS = 4;

/** `salt` minus k × `base`, or null when an element would go below zero. */
function minus(salt: Map<string, string>, base: Map<string, string>, k: number): Map<string, Decimal> | null {
  const out = new Map<string, Decimal>();
  for (const [el, n] of salt) out.set(el, new Decimal(n));
  for (const [el, n] of base) {
    const left = (out.get(el) ?? new Decimal(0)).minus(new Decimal(n).times(k));
    if (left.isNegative()) return null;
    out.set(el, left);
  }
  for (const [el, n] of out) if (n.isZero()) out.delete(el);
  return out;
}

/** The acid and its count that `rest` is exactly, or null. */
function asAcid(rest: Map<string, Decimal>): { acid: string; acids: number } | null {
  for (const [acid, atoms] of ACIDS) {
    const els = Object.keys(atoms);
    if (els.length !== rest.size || !els.every((e) => rest.has(e))) continue;
    const j = rest.get(els[0])!.div(atoms[els[0]]);
    if (!j.isInteger() || j.lt(1) || j.gt(MAX_ACIDS)) continue;
    if (els.every((e) => rest.get(e)!.eq(j.times(atoms[e])))) return { acid: acid.split(' ')[0], acids: j.toNumber() };
  }
  return null;
}

/**
 * How two forms are related, from their atoms past water of crystallisation (see atomsPastWater),
 * or null for two different substances.
 *
 * @param first - the atoms of one form, element to count.
 * @param second - the atoms of the other.
 * @returns 'same' for the same atoms (hydrates of one salt), 'salt' for an acid-addition salt and its base, else null.
 * @example
 * formRelation(new Map([['Cu', '1'], ['S', '1'], ['O', '4']]), new Map([['Cu', '1'], ['S', '1'], ['O', '4']]))?.kind // 'same'
 * formRelation(new Map([['C', '34'], ['H', '40'], ['N', '2'], ['O', '10'], ['S', '1']]), new Map([['C', '17'], ['H', '19'], ['N', '1'], ['O', '3']])) // { kind: 'salt', salt: 'first', basesPerSalt: 2, acid: 'H2SO4', acids: 1 }
 * formRelation(new Map([['Fe', '1'], ['Cl', '3']]), new Map([['Fe', '1'], ['Cl', '2']])) // null
 */
export function formRelation(first: Map<string, string>, second: Map<string, string>): FormRelation | null {
  if (first.size === second.size && [...first].every(([k, v]) => second.has(k) && new Decimal(second.get(k)!).eq(v))) return { kind: 'same' };
  for (const [salt, base, which] of [[first, second, 'first'], [second, first, 'second']] as const) {
    for (let k = 1; k <= MAX_BASES; k++) {
      const rest = minus(salt, base, k);
      if (rest === null) break;
      if (rest.size === 0) continue;
      const acid = asAcid(rest);
      if (acid) return { kind: 'salt', salt: which, basesPerSalt: k, ...acid };
    }
  }
  return null;
}
