/**
 * Group and ligand abbreviations chemists write inside formulas, each with the
 * formula it stands for and where the expansion comes from.
 *
 * How they are read (see parse.ts):
 * - an abbreviation whose letters cannot be read as element symbols (Me, Ph,
 *   Boc, Cp*, dba, …) is read by default, with a note naming the expansion;
 * - an abbreviation whose letters are also element symbols (Pr, Ac, Ts, OAc,
 *   TBS, TIPS, …) is read only with `abbreviations: true`; by default the
 *   reading must be settled (readings.ts refuses the formula with both readings
 *   where the abbreviation fits);
 * - `Py` is refused either way: chemists write it both for pyridyl (C5H4N, a
 *   substituent) and for pyridine (C5H5N, a ligand, which is `py`).
 * Np is left out on purpose: chemists use it for both naphthyl and neopentyl,
 * so it stays neptunium (with a note saying so).
 */
import { isElementSymbol } from '../elements/element-table.js';

/** One abbreviation: the formula it stands for, its name, and where the expansion comes from. */
export interface Abbreviation {
  formula: string;
  name: string;
  source: string;
}

const CP = 'common practice';
const IUPAC_LIGANDS = 'IUPAC Red Book 2005, Table VII (ligand abbreviations)';

/** Every abbreviation pondus knows, by its spelling (case matters: `py` is pyridine, `Py` is refused). */
export const ABBREVIATIONS: Readonly<Record<string, Abbreviation>> = Object.freeze({
  // alkyl and aryl groups
  Me: { formula: 'CH3', name: 'methyl', source: CP },
  Et: { formula: 'C2H5', name: 'ethyl', source: CP },
  Pr: { formula: 'C3H7', name: 'propyl', source: CP },
  nPr: { formula: 'C3H7', name: 'n-propyl', source: CP },
  iPr: { formula: 'C3H7', name: 'isopropyl', source: CP },
  Bu: { formula: 'C4H9', name: 'butyl', source: CP },
  nBu: { formula: 'C4H9', name: 'n-butyl', source: CP },
  iBu: { formula: 'C4H9', name: 'isobutyl', source: CP },
  sBu: { formula: 'C4H9', name: 'sec-butyl', source: CP },
  tBu: { formula: 'C4H9', name: 'tert-butyl', source: CP },
  Cy: { formula: 'C6H11', name: 'cyclohexyl', source: CP },
  Ph: { formula: 'C6H5', name: 'phenyl', source: CP },
  Bn: { formula: 'C7H7', name: 'benzyl', source: CP },
  Bz: { formula: 'C7H5O', name: 'benzoyl', source: CP },
  Tol: { formula: 'C7H7', name: 'tolyl (methylphenyl)', source: CP },
  Xyl: { formula: 'C8H9', name: 'xylyl (dimethylphenyl)', source: CP },
  Mes: { formula: 'C9H11', name: 'mesityl (2,4,6-trimethylphenyl)', source: CP },
  Dipp: { formula: 'C12H17', name: '2,6-diisopropylphenyl', source: CP },
  Tr: { formula: 'C19H15', name: 'trityl', source: CP },
  Cp: { formula: 'C5H5', name: 'cyclopentadienyl', source: IUPAC_LIGANDS },
  'Cp*': { formula: 'C10H15', name: 'pentamethylcyclopentadienyl', source: IUPAC_LIGANDS },
  Py: { formula: 'C5H4N', name: 'pyridyl', source: CP },
  // acyl, protecting and leaving groups
  Ac: { formula: 'C2H3O', name: 'acetyl', source: CP },
  OAc: { formula: 'C2H3O2', name: 'acetate (acetoxy)', source: CP },
  Piv: { formula: 'C5H9O', name: 'pivaloyl', source: CP },
  Boc: { formula: 'C5H9O2', name: 'tert-butoxycarbonyl', source: CP },
  Cbz: { formula: 'C8H7O2', name: 'benzyloxycarbonyl', source: CP },
  Fmoc: { formula: 'C15H11O2', name: '9-fluorenylmethoxycarbonyl', source: CP },
  PMB: { formula: 'C8H9O', name: '4-methoxybenzyl', source: CP },
  Ts: { formula: 'C7H7O2S', name: 'tosyl (4-toluenesulfonyl)', source: CP },
  OTs: { formula: 'C7H7O3S', name: 'tosylate', source: CP },
  Ms: { formula: 'CH3O2S', name: 'mesyl (methanesulfonyl)', source: CP },
  Tf: { formula: 'CF3O2S', name: 'triflyl (trifluoromethanesulfonyl)', source: CP },
  OTf: { formula: 'CF3O3S', name: 'triflate', source: CP },
  OMe: { formula: 'CH3O', name: 'methoxy', source: CP },
  OEt: { formula: 'C2H5O', name: 'ethoxy', source: CP },
  OtBu: { formula: 'C4H9O', name: 'tert-butoxy', source: CP },
  TMS: { formula: 'C3H9Si', name: 'trimethylsilyl', source: CP },
  TES: { formula: 'C6H15Si', name: 'triethylsilyl', source: CP },
  TBS: { formula: 'C6H15Si', name: 'tert-butyldimethylsilyl', source: CP },
  TBDMS: { formula: 'C6H15Si', name: 'tert-butyldimethylsilyl', source: CP },
  TIPS: { formula: 'C9H21Si', name: 'triisopropylsilyl', source: CP },
  TBDPS: { formula: 'C16H19Si', name: 'tert-butyldiphenylsilyl', source: CP },
  Bpin: { formula: 'C6H12BO2', name: 'pinacolatoboryl (B + pinacolato)', source: CP },
  // ligands (lower case, as in IUPAC Red Book 2005 Table VII where listed there)
  py: { formula: 'C5H5N', name: 'pyridine', source: IUPAC_LIGANDS },
  en: { formula: 'C2H8N2', name: 'ethane-1,2-diamine', source: IUPAC_LIGANDS },
  bpy: { formula: 'C10H8N2', name: '2,2′-bipyridine', source: IUPAC_LIGANDS },
  phen: { formula: 'C12H8N2', name: '1,10-phenanthroline', source: IUPAC_LIGANDS },
  acac: { formula: 'C5H7O2', name: 'acetylacetonato (pentane-2,4-dionato)', source: IUPAC_LIGANDS },
  cod: { formula: 'C8H12', name: 'cycloocta-1,5-diene', source: IUPAC_LIGANDS },
  nbd: { formula: 'C7H8', name: 'norbornadiene (bicyclo[2.2.1]hepta-2,5-diene)', source: IUPAC_LIGANDS },
  dba: { formula: 'C17H14O', name: 'dibenzylideneacetone', source: CP },
  dppm: { formula: 'C25H22P2', name: 'bis(diphenylphosphino)methane', source: CP },
  dppe: { formula: 'C26H24P2', name: '1,2-bis(diphenylphosphino)ethane', source: IUPAC_LIGANDS },
  dppp: { formula: 'C27H26P2', name: '1,3-bis(diphenylphosphino)propane', source: CP },
  dppf: { formula: 'C34H28FeP2', name: '1,1′-bis(diphenylphosphino)ferrocene', source: CP },
  pin: { formula: 'C6H12O2', name: 'pinacolato (2,3-dimethylbutane-2,3-diolato)', source: CP },
  tmeda: { formula: 'C6H16N2', name: 'N,N,N′,N′-tetramethylethane-1,2-diamine', source: CP },
  thf: { formula: 'C4H8O', name: 'tetrahydrofuran', source: IUPAC_LIGANDS },
  dmso: { formula: 'C2H6OS', name: 'dimethyl sulfoxide', source: IUPAC_LIGANDS },
});

/**
 * True when `text` can be read, in its exact case, as a run of element symbols (D and T included).
 *
 * @example
 * readsAsElements('TBS') // true (T, B, S)
 * readsAsElements('Ph') // false
 */
export function readsAsElements(text: string): boolean {
  if (text.length === 0) return false;
  // words of a capital and its lower-case letters, read without a match array (this runs for
  // every abbreviation at start-up); anything else in the text is no symbol
  for (let i = 0; i < text.length; ) {
    const c = text.charCodeAt(i);
    if (c < 65 || c > 90) return false;
    let j = i + 1;
    while (j < text.length && text.charCodeAt(j) >= 97 && text.charCodeAt(j) <= 122) j++;
    const one = j - i === 1;
    if (!((one && (c === 68 || c === 84)) || (j - i <= 2 && isElementSymbol(one ? text[i] : text.slice(i, j))))) return false;
    i = j;
  }
  return true;
}

/** Abbreviations refused whatever the option says, with the reason. */
export const REFUSED_ABBREVIATIONS: Readonly<Record<string, string>> = Object.freeze({
  Py: "'Py' is written both for pyridyl (C5H4N, a substituent) and for pyridine (C5H5N, a ligand)",
});

/**
 * Abbreviations whose letters are also element symbols (Pr, Ac, Ts, OAc, TBS, …). With
 * `abbreviations: true` the abbreviation wins, with a note; by default the reading must be settled.
 *
 * @example
 * ABBREVIATION_CLASHES.includes('Ac') // true
 */
export const ABBREVIATION_CLASHES: readonly string[] = Object.freeze(Object.keys(ABBREVIATIONS).filter(readsAsElements));
const CLASHES: ReadonlySet<string> = new Set(ABBREVIATION_CLASHES);

/**
 * Abbreviations read by default: none of them can be read as element symbols.
 *
 * @example
 * SAFE_ABBREVIATIONS.includes('Ph') // true
 */
export const SAFE_ABBREVIATIONS: readonly string[] = Object.freeze(Object.keys(ABBREVIATIONS).filter((k) => !CLASHES.has(k) && !Object.hasOwn(REFUSED_ABBREVIATIONS, k)));

function escape(s: string): string {
  return s.replace(/[*]/g, '\\*');
}

/**
 * A regular expression matching any of `names`, longest first, not followed by a lower-case letter.
 *
 * @example
 * abbreviationPattern(['Me', 'Mes']).exec('Mes')[0] // 'Mes'
 */
export function abbreviationPattern(names: readonly string[] = Object.keys(ABBREVIATIONS)): RegExp {
  const sorted = [...names].sort((a, b) => b.length - a.length || (a < b ? -1 : a > b ? 1 : 0));
  return new RegExp(`(?:${sorted.map(escape).join('|')})(?![a-z])`);
}
