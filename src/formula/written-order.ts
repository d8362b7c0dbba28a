/**
 * The conventional written order of an inorganic formula: IUPAC's electronegativity order.
 *
 * Source: IUPAC, Nomenclature of Inorganic Chemistry (Red Book) 2005, IR-4.4.2.1 ("the least
 * electronegative element being cited first … the later an element occurs when the table is
 * traversed following the arrows, the more electropositive is the element") with the element
 * sequence of Table VI (IR-2.15.3.1): group 17 top to bottom, group 16, then H, then groups 15
 * down to 4, group 3 (Sc, Y, the lanthanoids, the actinoids), group 2, group 1, and group 18 last.
 * The Red Book's own examples of IR-2.15.3.1 follow from it: S2Cl2, O2Cl, H2Te, AlH3.
 *
 * Two conventions of the trade are applied on top unless `strict` is asked for, each because the
 * plain sequence would write a formula no chemist writes:
 * - oxoacids and acid salts (common practice, IR-8 writes acids this way): in a formula with O
 *   and at least three elements, H is cited after the metals and before the other non-metals, so
 *   HNO3, H3PO4, HClO4, NaHCO3, KH2PO4 (strict order: NHO3, PH3O4, HO4Cl, NaCHO3);
 * - oxoanions of the halogens (the central atom before its oxygen ligands, as in the additive
 *   formula [ClO4]⁻, IR-4.4.3.2): in a formula with O and at least three elements and no other
 *   non-metal, a halogen is cited before O, so KClO4, NaClO, KIO3 (strict: KO4Cl); POCl3 and
 *   SOCl2 keep the strict order. Binary halogen oxides keep it too (OCl2, O2Cl, as the Red Book
 *   writes them).
 * A hydroxide of metals only (metals, O and H, as many O as H) is written with its OH group:
 * NaOH, Ca(OH)2 (strict: NaHO, CaH2O2).
 *
 * Organic formulas are written in Hill order (Hill 1900; IR-4.7), not this one.
 */
import { amountText, type Amount } from './amount.js';
import type { AtomCounts } from './flatten.js';
import { formatFormula, hillEntries } from './hill.js';

const LANTHANOIDS = ['La', 'Ce', 'Pr', 'Nd', 'Pm', 'Sm', 'Eu', 'Gd', 'Tb', 'Dy', 'Ho', 'Er', 'Tm', 'Yb', 'Lu'];
const ACTINOIDS = ['Ac', 'Th', 'Pa', 'U', 'Np', 'Pu', 'Am', 'Cm', 'Bk', 'Cf', 'Es', 'Fm', 'Md', 'No', 'Lr'];

/**
 * Red Book 2005 Table VI, in the direction of its arrows: from the most electronegative (F) to the
 * most electropositive; a formula cites its elements from the end of this list backwards.
 */
export const TABLE_VI_SEQUENCE: readonly string[] = [
  ...['F', 'Cl', 'Br', 'I', 'At', 'Ts'], // group 17
  ...['O', 'S', 'Se', 'Te', 'Po', 'Lv'], // group 16
  'H',
  ...['N', 'P', 'As', 'Sb', 'Bi', 'Mc'], // 15
  ...['C', 'Si', 'Ge', 'Sn', 'Pb', 'Fl'], // 14
  ...['B', 'Al', 'Ga', 'In', 'Tl', 'Nh'], // 13
  ...['Zn', 'Cd', 'Hg', 'Cn'], // 12
  ...['Cu', 'Ag', 'Au', 'Rg'], // 11
  ...['Ni', 'Pd', 'Pt', 'Ds'], // 10
  ...['Co', 'Rh', 'Ir', 'Mt'], // 9
  ...['Fe', 'Ru', 'Os', 'Hs'], // 8
  ...['Mn', 'Tc', 'Re', 'Bh'], // 7
  ...['Cr', 'Mo', 'W', 'Sg'], // 6
  ...['V', 'Nb', 'Ta', 'Db'], // 5
  ...['Ti', 'Zr', 'Hf', 'Rf'], // 4
  ...['Sc', 'Y', ...LANTHANOIDS, ...ACTINOIDS], // 3
  ...['Be', 'Mg', 'Ca', 'Sr', 'Ba', 'Ra'], // 2
  ...['Li', 'Na', 'K', 'Rb', 'Cs', 'Fr'], // 1
  ...['He', 'Ne', 'Ar', 'Kr', 'Xe', 'Rn', 'Og'], // 18
];

/** An element's place in the sequence, -1 for a symbol that is none (a scan: a formula has few elements, and start-up pays for every table made). */
const positionOf = (symbol: string): number => TABLE_VI_SEQUENCE.indexOf(symbol);
const HALOGENS = new Set(['F', 'Cl', 'Br', 'I', 'At', 'Ts']);
// the non-metals (and metalloids) of the sequence: everything up to and including group 13's boron
// and group 14–15's metalloids, by the usual classification (common practice)
const NONMETALS = new Set(['F', 'Cl', 'Br', 'I', 'At', 'O', 'S', 'Se', 'Te', 'H', 'N', 'P', 'As', 'Sb', 'C', 'Si', 'Ge', 'B', 'He', 'Ne', 'Ar', 'Kr', 'Xe', 'Rn']);

/**
 * Whether an element is a metal, by the usual classification (the non-metals and metalloids are
 * H, B, C, N, O, F, Si, P, S, Cl, Ge, As, Se, Br, Sb, Te, I, At and the noble gases; common practice).
 *
 * @param symbol - an element symbol: 'Pb', 'Cl'.
 * @returns true for a metal.
 * @example
 * isMetal('Pb') // true
 * isMetal('Cl') // false
 */
export function isMetal(symbol: string): boolean {
  return !NONMETALS.has(symbol) && positionOf(symbol) >= 0;
}

/** The element symbol of a count key ('13C' → 'C', 'D' and 'T' → 'H'). */
function symbolOf(key: string): string {
  const m = /^[0-9]*([A-Za-z]+)$/.exec(key);
  const s = m ? m[1] : key;
  return s === 'D' || s === 'T' ? 'H' : s;
}

export interface WrittenOrderOptions {
  /** Table VI order only, without the conventions for acids, halogen oxoanions and hydroxides. */
  strict?: boolean;
}

/**
 * The keys of a count map in IUPAC's electronegativity order (Red Book 2005 IR-4.4.2.1, Table VI):
 * most electropositive first. Isotopes of one element keep their order among themselves.
 *
 * @param keys - the atom keys of a count map (element symbols, or isotope keys such as '13C').
 * @param options - `strict` for the Table VI order without the conventions for acids and halogen oxoanions.
 * @returns the keys in written order; a key that names no element goes last.
 * @throws PondusError: BAD_ARGUMENT when `keys` is not iterable or `options` not an object; the keys themselves are not checked (a string is taken as its characters).
 * @example
 * writtenOrder(['Cl', 'Cu']) // ['Cu', 'Cl']
 * writtenOrder(['O', 'P']) // ['P', 'O']
 * writtenOrder(['H', 'N', 'O']) // ['H', 'N', 'O']
 * writtenOrder(['H', 'N', 'O'], { strict: true }) // ['N', 'H', 'O']
 */
export function writtenOrder(keys: Iterable<string>, options: WrittenOrderOptions = {}): string[] {
  const list = [...keys];
  const symbols = new Set(list.map(symbolOf));
  const conventional = !options.strict && symbols.has('O') && symbols.size >= 3;
  // a halogen is the central atom of an oxoanion only when no other non-metal could be (KClO4, not POCl3)
  const halogenCentral = conventional && [...symbols].every((s) => s === 'O' || s === 'H' || HALOGENS.has(s) || !NONMETALS.has(s));
  const rank = (key: string): number => {
    const s = symbolOf(key);
    const p = positionOf(s);
    if (p < 0) return -1; // unknown: last
    // H after the metals, before every non-metal of the anion
    if (conventional && s === 'H') return lowestMetalRank(symbols) - 0.5;
    // a halogen as the central atom of its oxoanion, just before O
    if (halogenCentral && HALOGENS.has(s)) return positionOf('O') + 0.5 - p / 100;
    return p;
  };
  return list
    .map((key, i) => ({ key, i, r: rank(key) }))
    .sort((a, b) => b.r - a.r || a.i - b.i)
    .map((x) => x.key);
}

/** The rank just below the least electropositive metal present (or above every non-metal when there is none). */
function lowestMetalRank(symbols: Set<string>): number {
  let lowest = Infinity;
  for (const s of symbols) {
    const p = NONMETALS.has(s) ? -1 : positionOf(s);
    if (p >= 0) lowest = Math.min(lowest, p);
  }
  if (lowest !== Infinity) return lowest;
  let highest = -1;
  for (const s of symbols) if (s !== 'H') highest = Math.max(highest, positionOf(s));
  return highest + 1;
}

/**
 * A formula written in IUPAC's electronegativity order, for a formula pondus generates (an
 * inorganic answer, a label) rather than one it echoes: 'CuCl2', not Hill's 'Cl2Cu'.
 *
 * @param counts - atom counts (from {@link flattenFormula}).
 * @param charge - the charge, written as '^3-' after the formula; 0 by default.
 * @param options - `strict` for Table VI order without the conventions (see {@link writtenOrder}).
 * @returns the formula text.
 * @throws PondusError: BAD_ARGUMENT when `counts` is not a Map, `charge` not a number or `options` not an object; a key that is not an atom key, or a count that is not an amount, is not checked and gives INTERNAL_ERROR.
 * @example
 * writtenFormula(new Map([['Cl', 2], ['Cu', 1]])) // 'CuCl2'
 * writtenFormula(new Map([['O', 4], ['P', 1]]), -3) // 'PO4^3-'
 * writtenFormula(new Map([['H', 2], ['O', 4], ['S', 1]])) // 'H2SO4'
 * writtenFormula(new Map([['Ca', 1], ['H', 2], ['O', 2]])) // 'Ca(OH)2'
 */
export function writtenFormula(counts: AtomCounts, charge = 0, options: WrittenOrderOptions = {}): string {
  const hydroxide = options.strict ? null : hydroxideText(counts, charge);
  if (hydroxide !== null) return hydroxide;
  const order = writtenOrder(counts.keys(), options);
  return formatFormula(labels(order), order.map((k) => counts.get(k)!), charge);
}

/** How each key is written: 'C', '[13C]', 'D'. */
function labels(keys: readonly string[]): string[] {
  return keys.map((k) => hillEntries([k])[0].label);
}

/** A hydroxide of metals only (metals, O and H with as many O as H, plain symbols): 'NaOH', 'Ca(OH)2'. */
function hydroxideText(counts: AtomCounts, charge: number): string | null {
  const o = counts.get('O');
  const h = counts.get('H');
  if (typeof o !== 'number' || typeof h !== 'number' || o !== h) return null;
  const metals = [...counts.keys()].filter((k) => k !== 'O' && k !== 'H');
  if (metals.length === 0 || metals.some((k) => positionOf(k) < 0 || NONMETALS.has(k))) return null;
  const order = writtenOrder(metals, { strict: true });
  const head = formatFormula(labels(order), order.map((k) => counts.get(k)! as Amount), 0);
  const group = o === 1 ? 'OH' : `(OH)${amountText(o)}`;
  return formatFormula([head + group], [1], charge);
}
