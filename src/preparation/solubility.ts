/**
 * The solubility in water of common laboratory salts and solids, to catch a target no solution
 * can hold (7 M NaCl is 409 g/L; water dissolves about 36 g per 100 g at 20 °C).
 *
 * The figures are grams of the anhydrous compound per 100 g of water at 20 °C, typed from memory
 * of the CRC Handbook of Chemistry and Physics table of aqueous solubility of inorganic
 * compounds (and for the organic solids, of its physical-constants tables). They are used only
 * with a wide margin (see {@link solubilityWarning}), so a figure a few per cent off changes
 * nothing the user sees.
 */
import type { Note } from '../errors/issue.js';
import { Decimal } from '../exact/decimal.js';
import { formulaMassDetail, type MassDetail, type MassOptions } from '../mass/formula-mass.js';
import { atomsPastWater } from './past-water.js';

/** Solubility, g of anhydrous compound per 100 g of water at 20 °C (from memory, CRC Handbook). */
export const SOLUBILITY_20C: readonly (readonly [formula: string, name: string, gPer100g: string])[] = [
  ['NaCl', 'sodium chloride', '35.9'],
  ['KCl', 'potassium chloride', '34.2'],
  ['NH4Cl', 'ammonium chloride', '37.2'],
  ['KBr', 'potassium bromide', '65.3'],
  ['KI', 'potassium iodide', '144'],
  ['KNO3', 'potassium nitrate', '31.6'],
  ['NaNO3', 'sodium nitrate', '87.6'],
  ['AgNO3', 'silver nitrate', '216'],
  ['NaHCO3', 'sodium hydrogen carbonate', '9.6'],
  ['Na2CO3', 'sodium carbonate', '21.5'],
  ['Na2SO4', 'sodium sulfate', '19.5'],
  ['MgSO4', 'magnesium sulfate', '33.7'],
  ['CuSO4', 'copper(II) sulfate', '20.7'],
  ['CaSO4', 'calcium sulfate', '0.21'],
  ['BaCl2', 'barium chloride', '35.8'],
  ['CaCl2', 'calcium chloride', '74.5'],
  ['KMnO4', 'potassium permanganate', '6.4'],
  ['K2Cr2O7', 'potassium dichromate', '12'],
  ['KH2PO4', 'potassium dihydrogen phosphate', '22.6'],
  ['Na2HPO4', 'disodium hydrogen phosphate', '7.7'],
  ['Na2S2O3', 'sodium thiosulfate', '70'],
  ['Ca(OH)2', 'calcium hydroxide', '0.17'],
  ['Ba(OH)2', 'barium hydroxide', '3.9'],
  ['NaOH', 'sodium hydroxide', '109'],
  ['KOH', 'potassium hydroxide', '112'],
  ['C8H5KO4', 'potassium hydrogen phthalate', '8'],
  ['C6H12O6', 'glucose', '91'],
  ['C12H22O11', 'sucrose', '200'],
];

interface Entry {
  key: string;
  name: string;
  formula: string;
  molarMass: Decimal;
  gPer100g: Decimal;
  /** What a kilogram of water dissolves, g. */
  limit: Decimal;
  /** The mass fraction of a saturated solution, S/(100 + S). */
  w: Decimal;
  /** What a litre of saturated solution holds at the least (w × 1000 g), g. */
  atLeast: Decimal;
}

/** A key of atom counts, the same for every way of writing one compound. */
const keyOf = (atoms: Map<string, string>) => [...atoms].sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0)).map(([k, v]) => `${k}${v}`).join(' ');

/** The elements of a compound other than H and O, which water of crystallisation cannot remove: a cheap first test. */
const elementsOf = (atoms: Iterable<string>) => [...atoms].filter((e) => e !== 'H' && e !== 'O').sort().join(' ');

const isLower = (c: number) => c >= 97 && c <= 122;
/**
 * Whether a row's formula names exactly these elements past H and O, read from the symbols in its
 * text: the table's formulas are plain (symbols, counts, brackets), so a row's symbols are its
 * elements. A scan of the text, with no string or array made: start-up pays for every object.
 */
function namesExactly(formula: string, wanted: readonly string[]): boolean {
  let seen = 0;
  for (let i = 0; i < formula.length; i++) {
    const c = formula.charCodeAt(i);
    if (c < 65 || c > 90) continue;
    const two = i + 1 < formula.length && isLower(formula.charCodeAt(i + 1));
    if (!two && (c === 72 || c === 79)) continue; // H, O
    const at = wanted.findIndex((w) => w.charCodeAt(0) === c && (two ? w.length === 2 && w.charCodeAt(1) === formula.charCodeAt(i + 1) : w.length === 1));
    if (at < 0) return false;
    seen |= 1 << at;
  }
  return seen === 2 ** wanted.length - 1;
}

/** The entries made so far, by the elements their formulas name past H and O (at most one per row of the table). */
const entriesByElements = new Map<string, Entry[]>();
const NO_ENTRIES: Entry[] = [];

function entryOf([formula, name, s]: (typeof SOLUBILITY_20C)[number]): Entry {
  const d = formulaMassDetail(formula);
  const gPer100g = new Decimal(s);
  // a saturated solution is w = S/(100 + S) by mass; a litre of it weighs at least 1000 g (salt solutions are denser than water)
  const w = gPer100g.div(gPer100g.plus(100));
  return { key: keyOf(atomsPastWater(d)), name, formula, molarMass: new Decimal(d.molarMass.toString()), gPer100g, limit: gPer100g.times(10), w, atLeast: w.times(1000) };
}

/**
 * The entries whose elements (past H and O) are those of the reagent; most reagents have none.
 * A row is read as a formula only when a reagent with its elements is looked up.
 */
function candidates(reagent: MassDetail): Entry[] {
  const k = elementsOf(reagent.atoms.keys());
  let entries = entriesByElements.get(k);
  if (entries === undefined) {
    const wanted = k === '' ? [] : k.split(' ');
    const rows = wanted.length > 30 ? [] : SOLUBILITY_20C.filter((row) => namesExactly(row[0], wanted));
    entries = rows.length === 0 ? NO_ENTRIES : rows.map(entryOf);
    // a batch of many compounds names many sets of elements: the remembered ones are bounded
    if (entriesByElements.size >= 1024) entriesByElements.clear();
    entriesByElements.set(k, entries);
  }
  return entries;
}

/** The table's entry for the reagent (a hydrate matching its anhydrous salt), or undefined. */
function entryFor(reagent: MassDetail, options: MassOptions): Entry | undefined {
  // a batch reads each reagent once and hands its reading to every row that names it
  const known = ENTRY_OF_READING.get(reagent);
  if (known !== undefined) return known ?? undefined;
  const e = lookUp(reagent, options);
  ENTRY_OF_READING.set(reagent, e ?? null);
  return e;
}

function lookUp(reagent: MassDetail, options: MassOptions): Entry | undefined {
  const near = candidates(reagent);
  if (near.length === 0) return undefined;
  // a batch names the same few salts again and again: their entries are remembered (bounded)
  const id = `${reagent.formula}|${reagent.input}`;
  const seen = ENTRY_OF.get(id);
  if (seen !== undefined) return seen ?? undefined;
  const key = keyOf(atomsPastWater(reagent, options));
  const e = near.find((x) => x.key === key);
  if (ENTRY_OF.size >= 1024) ENTRY_OF.clear();
  ENTRY_OF.set(id, e ?? null);
  return e;
}
/** The entry found for each reagent text lately (null for none); the table does not depend on the mass options. */
const ENTRY_OF = new Map<string, Entry | null>();
/** The entry found for each reading of a reagent (null for none), kept while the reading is. */
const ENTRY_OF_READING = new WeakMap<MassDetail, Entry | null>();

/** ' (as anhydrous CuSO4)' for a hydrate, '' for the anhydrous salt itself. */
const hydrateText = (reagent: MassDetail, e: Entry) => (reagent.formula !== formulaMassDetail(e.formula).formula ? ` (as anhydrous ${e.formula})` : '');

/**
 * A warning when a solution would hold more of a reagent than water can dissolve at 20 °C, or
 * null (also for a reagent not in the table). The test is generous: the anhydrous compound per
 * litre of solution is compared with what a whole kilogram of water dissolves, more water than a
 * litre of any such solution holds, so the warning means the target cannot be made as written.
 *
 * @param reagent - the reagent weighed, as read by formulaMassDetail (a hydrate counts as its anhydrous salt).
 * @param molesPerLitre - formula units of the reagent per litre of solution (or a function giving them, called only for a reagent in the table).
 * @param options - the mass options the reagent was read with.
 * Between what a litre of saturated solution holds at the least (its mass fraction times 1000 g)
 * and that bound, the note is SOLUBILITY_NEAR: the target may not dissolve.
 * @returns a SOLUBILITY_EXCEEDED or SOLUBILITY_NEAR note, or null.
 * @example
 * solubilityWarning(formulaMassDetail('NaCl'), new Decimal(7))?.code // 'SOLUBILITY_EXCEEDED'
 * solubilityWarning(formulaMassDetail('NaCl'), new Decimal(5.8))?.code // 'SOLUBILITY_NEAR'
 * solubilityWarning(formulaMassDetail('NaCl'), new Decimal(1)) // null
 * solubilityWarning(formulaMassDetail('CuSO4·5H2O'), new Decimal('0.100')) // null
 */
export function solubilityWarning(reagent: MassDetail, molesPerLitre: Decimal | (() => Decimal), options: MassOptions = {}): Note | null {
  const e = entryFor(reagent, options);
  if (!e) return null;
  if (typeof molesPerLitre === 'function') molesPerLitre = molesPerLitre();
  const gPerL = molesPerLitre.times(e.molarMass);
  const { limit, w, atLeast } = e;
  if (gPerL.lte(limit)) {
    if (gPerL.lte(atLeast)) return null;
    return {
      code: 'SOLUBILITY_NEAR',
      message: `the target is ${gPerL.toSignificantDigits(4).toFixed()} g of ${e.name} per litre${hydrateText(reagent, e)}, near or above its solubility at 20 °C: a saturated solution is ${w.times(100).toSignificantDigits(3).toFixed()} % w/w (${e.gPer100g.toFixed()} g per 100 g of water, from memory of the CRC Handbook), ${atLeast.toSignificantDigits(3).toFixed()} g/L or more depending on its density; check that it all dissolves at the temperature of use before making up to volume`,
    };
  }
  const hydrate = hydrateText(reagent, e);
  return {
    code: 'SOLUBILITY_EXCEEDED',
    message: `the target is ${gPerL.toSignificantDigits(4).toFixed()} g of ${e.name} per litre${hydrate}, more than a kilogram of water dissolves at 20 °C (about ${e.gPer100g.toFixed()} g per 100 g of water, from memory of the CRC Handbook): no such solution can be made; check the target and its unit`,
  };
}

/**
 * The mass fraction of a saturated aqueous solution of the reagent at 20 °C (its anhydrous salt
 * per mass of solution), or null for a reagent not in the table.
 *
 * @example
 * saturatedFraction(formulaMassDetail('NaCl'))?.toSignificantDigits(3).toString() // '0.264'
 * saturatedFraction(formulaMassDetail('C9H8O4')) // null
 */
export function saturatedFraction(reagent: MassDetail, options: MassOptions = {}): Decimal | null {
  const e = entryFor(reagent, options);
  return e ? e.w : null;
}
