/**
 * Names of reagents and ligands that read as element symbols and abbreviations just as well, and
 * that no reading option turns into their formulas: the N-heterocyclic carbenes IMes, SIMes, IPr
 * and SIPr (IMes reads as iodine and mesityl, SIPr as sulfur, iodine and praseodymium), and NCS
 * written alone (N-chlorosuccinimide, or the atoms of the thiocyanate group). Such a formula is
 * refused with both readings offered.
 */
import type { Issue } from '../errors/issue.js';
import { columnOf } from './prescan.js';

interface NamedLigand {
  formula: string;
  name: string;
  /** What the letters read as otherwise. */
  letters: string;
}

/** The carbene ligands, by name (formulas from memory; common practice). */
const CARBENES: Readonly<Record<string, NamedLigand>> = Object.freeze({
  SIMes: { formula: 'C21H26N2', name: '1,3-bis(2,4,6-trimethylphenyl)imidazolidin-2-ylidene', letters: 'sulfur, iodine and mesityl' },
  IMes: { formula: 'C21H24N2', name: '1,3-bis(2,4,6-trimethylphenyl)imidazol-2-ylidene', letters: 'iodine and mesityl (C9H11I)' },
  SIPr: { formula: 'C27H38N2', name: '1,3-bis(2,6-diisopropylphenyl)imidazolidin-2-ylidene', letters: 'sulfur, iodine and praseodymium or propyl' },
  IPr: { formula: 'C27H36N2', name: '1,3-bis(2,6-diisopropylphenyl)imidazol-2-ylidene', letters: 'iodine and praseodymium or propyl' },
});

const CARBENE_AT = /(?<![A-Za-z])(SIMes|IMes|SIPr|IPr)(?![a-z])/g;

/** N-chlorosuccinimide, refused when NCS is the whole formula (in brackets it is the thiocyanate ligand, Hg(NCS)2). */
const NCS: NamedLigand = { formula: 'C4H4ClNO2', name: 'N-chlorosuccinimide', letters: 'the atoms N, C and S (the thiocyanate group)' };

/**
 * The refusals of the names above in a formula's text.
 *
 * @param text - the formula text.
 * @returns one AMBIGUOUS_READING issue per name found, with both readings in the hint; empty when there is none.
 * @example
 * ligandNameIssues('Pd(IMes)Cl2')[0].code // 'AMBIGUOUS_READING'
 * ligandNameIssues('Hg(NCS)2') // []
 */
export function ligandNameIssues(text: string): Issue[] {
  const issues: Issue[] = [];
  const issue = (name: string, at: number, l: NamedLigand, other: string): Issue => ({
    code: 'AMBIGUOUS_READING',
    message: `'${name}' reads as ${l.letters}, and is also the name of ${l.name} (${name}, ${l.formula})`,
    column: columnOf(text, at),
    length: name.length,
    hint: `for ${name} the ${name === 'NCS' ? 'reagent' : 'carbene'}, write its formula, ${l.formula}; ${other}`,
  });
  if (text.trim() === 'NCS') issues.push(issue('NCS', text.indexOf('NCS'), NCS, 'for the atoms, write CNS'));
  for (const m of text.matchAll(CARBENE_AT)) issues.push(issue(m[1], m.index, CARBENES[m[1]], 'for the atoms and groups its letters spell, write them in another order'));
  return issues;
}
