/**
 * Group abbreviations organic chemists write inside formulas (common practice).
 * They are read only when the caller opts in, because some clash with element
 * symbols: with abbreviations on, Pr is propyl (not praseodymium), Ac is acetyl
 * (not actinium) and Ts is tosyl (not tennessine). Np is left out on purpose:
 * chemists use it for both naphthyl and neopentyl, so it stays neptunium.
 */
export const ABBREVIATIONS: Readonly<Record<string, { formula: string; name: string }>> = Object.freeze({
  Me: { formula: 'CH3', name: 'methyl' },
  Et: { formula: 'C2H5', name: 'ethyl' },
  Pr: { formula: 'C3H7', name: 'propyl' },
  nPr: { formula: 'C3H7', name: 'n-propyl' },
  iPr: { formula: 'C3H7', name: 'isopropyl' },
  Bu: { formula: 'C4H9', name: 'butyl' },
  nBu: { formula: 'C4H9', name: 'n-butyl' },
  iBu: { formula: 'C4H9', name: 'isobutyl' },
  sBu: { formula: 'C4H9', name: 'sec-butyl' },
  tBu: { formula: 'C4H9', name: 'tert-butyl' },
  Cy: { formula: 'C6H11', name: 'cyclohexyl' },
  Ph: { formula: 'C6H5', name: 'phenyl' },
  Bn: { formula: 'C7H7', name: 'benzyl' },
  Bz: { formula: 'C7H5O', name: 'benzoyl' },
  Mes: { formula: 'C9H11', name: 'mesityl' },
  Tr: { formula: 'C19H15', name: 'trityl' },
  Cp: { formula: 'C5H5', name: 'cyclopentadienyl' },
  Py: { formula: 'C5H4N', name: 'pyridyl' },
  Ac: { formula: 'C2H3O', name: 'acetyl' },
  Piv: { formula: 'C5H9O', name: 'pivaloyl' },
  Boc: { formula: 'C5H9O2', name: 'tert-butoxycarbonyl' },
  Cbz: { formula: 'C8H7O2', name: 'benzyloxycarbonyl' },
  Fmoc: { formula: 'C15H11O2', name: '9-fluorenylmethoxycarbonyl' },
  PMB: { formula: 'C8H9O', name: '4-methoxybenzyl' },
  Ts: { formula: 'C7H7O2S', name: 'tosyl (4-toluenesulfonyl)' },
  Ms: { formula: 'CH3O2S', name: 'mesyl (methanesulfonyl)' },
  Tf: { formula: 'CF3O2S', name: 'triflyl (trifluoromethanesulfonyl)' },
  TMS: { formula: 'C3H9Si', name: 'trimethylsilyl' },
  TBS: { formula: 'C6H15Si', name: 'tert-butyldimethylsilyl' },
  TBDMS: { formula: 'C6H15Si', name: 'tert-butyldimethylsilyl' },
  TIPS: { formula: 'C9H21Si', name: 'triisopropylsilyl' },
});

/** Abbreviations that are also element symbols; with abbreviations on, the abbreviation wins. */
export const ABBREVIATION_CLASHES: readonly string[] = Object.freeze(['Pr', 'Ac', 'Ts']);

/** A regular expression source matching any abbreviation, longest first, not followed by a lower-case letter. */
export function abbreviationPattern(): RegExp {
  const names = Object.keys(ABBREVIATIONS).sort((a, b) => b.length - a.length || (a < b ? -1 : a > b ? 1 : 0));
  return new RegExp(`(?:${names.join('|')})(?![a-z])`);
}
