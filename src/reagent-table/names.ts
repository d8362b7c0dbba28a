/**
 * Common names a reagent table may use, with the formula each stands for, and
 * the hazard classes that call for a caution. Every entry is common practice
 * (the trade name as chemists write it); names that would need a registry are
 * out of scope: write the formula instead. Abbreviations of the formula
 * language (PPh3, Et3N, NaOtBu) are read by the formula parser itself, and the
 * solvent and reagent names of `formula-parser/names.ts` (THF, DMF, TEA, NBS, …)
 * are looked up there.
 */
import { namedSubstance } from '../formula-parser/names.js';

/** Hazard classes that carry a caution in a reagent table. */
export type Hazard = 'pyrophoric' | 'water-reactive' | 'concentrated-acid';

/** A common name: its formula, full name and where the entry comes from. */
export interface CommonName {
  formula: string;
  name: string;
  source: string;
  hazard?: Hazard;
}

const CP = 'common practice';

/**
 * Common names by lower-case spelling, besides the solvent and reagent names of
 * `formula-parser/names.ts`, which are not typed again here.
 *
 * @example
 * COMMON_NAMES['n-buli'].formula // 'C4H9Li'
 */
export const COMMON_NAMES: Readonly<Record<string, CommonName>> = Object.freeze({
  'n-buli': { formula: 'C4H9Li', name: 'n-butyllithium', source: CP, hazard: 'pyrophoric' },
  'buli': { formula: 'C4H9Li', name: 'n-butyllithium', source: CP, hazard: 'pyrophoric' },
  's-buli': { formula: 'C4H9Li', name: 'sec-butyllithium', source: CP, hazard: 'pyrophoric' },
  't-buli': { formula: 'C4H9Li', name: 'tert-butyllithium', source: CP, hazard: 'pyrophoric' },
  'meli': { formula: 'CH3Li', name: 'methyllithium', source: CP, hazard: 'pyrophoric' },
  'phli': { formula: 'C6H5Li', name: 'phenyllithium', source: CP, hazard: 'pyrophoric' },
  'lihmds': { formula: 'C6H18LiNSi2', name: 'lithium bis(trimethylsilyl)amide', source: CP, hazard: 'water-reactive' },
  'nahmds': { formula: 'C6H18NNaSi2', name: 'sodium bis(trimethylsilyl)amide', source: CP, hazard: 'water-reactive' },
  'khmds': { formula: 'C6H18KNSi2', name: 'potassium bis(trimethylsilyl)amide', source: CP, hazard: 'water-reactive' },
  'lah': { formula: 'AlH4Li', name: 'lithium aluminium hydride', source: CP, hazard: 'water-reactive' },
  'dibal-h': { formula: 'C8H19Al', name: 'diisobutylaluminium hydride', source: CP, hazard: 'pyrophoric' },
  'acetic anhydride': { formula: 'C4H6O3', name: 'acetic anhydride', source: CP },
  'salicylic acid': { formula: 'C7H6O3', name: '2-hydroxybenzoic acid', source: CP },
  'aspirin': { formula: 'C9H8O4', name: 'acetylsalicylic acid', source: CP },
  'acetylsalicylic acid': { formula: 'C9H8O4', name: 'acetylsalicylic acid', source: CP },
  'glucose': { formula: 'C6H12O6', name: 'D-glucose', source: CP },
  'benzaldehyde': { formula: 'C7H6O', name: 'benzaldehyde', source: CP },
  'bromobenzene': { formula: 'C6H5Br', name: 'bromobenzene', source: CP },
  '4-bromoanisole': { formula: 'C7H7BrO', name: '1-bromo-4-methoxybenzene', source: CP },
  'phenylboronic acid': { formula: 'C6H7BO2', name: 'phenylboronic acid', source: CP },
  'potassium carbonate': { formula: 'K2CO3', name: 'potassium carbonate', source: CP },
  'sodium borohydride': { formula: 'BH4Na', name: 'sodium borohydride', source: CP, hazard: 'water-reactive' },
  'hydrochloric acid': { formula: 'HCl', name: 'hydrochloric acid', source: CP, hazard: 'concentrated-acid' },
  'nitric acid': { formula: 'HNO3', name: 'nitric acid', source: CP, hazard: 'concentrated-acid' },
  'hexanes': { formula: 'C6H14', name: 'hexanes (as n-hexane)', source: CP },
});

/** What a written name was read as. */
export interface NameReading {
  formula: string;
  /** The full name, when the text was a name. */
  name: string | null;
  source: string | null;
}

/**
 * The formula a reagent's name stands for: a common name of this table, a name of the formula
 * language's table (THF, DMF, TEA), or null when the text is to be read as a formula.
 *
 * @param text - a reagent as written: a common name, an abbreviation of the formula language (THF, DMF), or a formula.
 * @returns the formula the name stands for, with the full name and its source, or null when the text is to be read as a formula.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * lookUpName('n-BuLi')?.formula // 'C4H9Li'
 * lookUpName('THF')?.formula // 'C4H8O'
 * lookUpName('C7H6O3') // null
 */
export function lookUpName(text: string): NameReading | null {
  const key = text.trim().toLowerCase();
  if (Object.hasOwn(COMMON_NAMES, key)) {
    const c = COMMON_NAMES[key];
    return { formula: c.formula, name: c.name, source: c.source };
  }
  const n = namedSubstance(text.trim());
  return n ? { formula: n.formula, name: n.name, source: CP } : null;
}

const ACIDS = new Set(['H2O4S', 'HNO3', 'ClH', 'BrH', 'HI', 'FH', 'ClHO4', 'H3O4P', 'C2HF3O2', 'ClHO3S', 'CH4O3S']);

/**
 * The hazard class of a reagent by its name and Hill formula: organolithiums and Grignard
 * reagents are pyrophoric or water-reactive, metal and alkylaluminium hydrides water-reactive,
 * the strong mineral acids (and TFA, HF) corrosive when concentrated (common practice).
 *
 * @param text - the reagent as written (its name).
 * @param hill - its formula in Hill order.
 * @returns 'pyrophoric', 'water-reactive' or 'concentrated-acid', or null for no hazard class known here.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * hazardOf('n-BuLi', 'C4H9Li') // 'pyrophoric'
 * hazardOf('MeMgBr', 'CH3BrMg') // 'water-reactive'
 * hazardOf('NaH', 'HNa') // 'water-reactive'
 * hazardOf('H2SO4', 'H2O4S') // 'concentrated-acid'
 */
export function hazardOf(text: string, hill: string): Hazard | null {
  const key = text.trim().toLowerCase();
  if (Object.hasOwn(COMMON_NAMES, key) && COMMON_NAMES[key].hazard) return COMMON_NAMES[key].hazard!;
  const els = new Set((hill.match(/[A-Z][a-z]?/g) ?? []));
  const onlyOf = (allowed: string[]) => [...els].every((e) => allowed.includes(e));
  if (els.has('C') && els.has('Li') && onlyOf(['C', 'H', 'Li'])) return 'pyrophoric';
  if (els.has('C') && els.has('Mg') && (els.has('Cl') || els.has('Br') || els.has('I'))) return 'water-reactive';
  if (els.has('C') && els.has('Al') && onlyOf(['C', 'H', 'Al'])) return 'pyrophoric';
  if (els.has('H') && els.size >= 2 && onlyOf(['H', 'Li', 'Na', 'K', 'Ca', 'Al', 'B']) && !onlyOf(['H', 'B'])) return 'water-reactive';
  const formula = hill.replace(/\^.*$/, '');
  if (ACIDS.has(formula)) return 'concentrated-acid';
  return null;
}
