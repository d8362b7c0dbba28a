/**
 * Names chemists write for common solvents and reagents (THF, DMF, NBS, …),
 * with their formulas. One table: the solvate search of `analysis --solvents`
 * looks names up here (any case), and the formula parser uses it to say what
 * a name stands for, and to refuse a name whose letters also read as element
 * symbols (THF would be F + H + tritium).
 */

/** A named substance: its formula and full name (common practice unless a source is given). */
export interface NamedSubstance {
  formula: string;
  name: string;
}

/**
 * Lab solvents and salt partners by lower-case name (common practice). Any formula may be
 * given instead of a name.
 *
 * @example
 * SOLVENTS.thf.formula // 'C4H8O'
 */
export const SOLVENTS: Readonly<Record<string, NamedSubstance>> = Object.freeze({
  water: { formula: 'H2O', name: 'water' },
  h2o: { formula: 'H2O', name: 'water' },
  dichloromethane: { formula: 'CH2Cl2', name: 'dichloromethane' },
  dcm: { formula: 'CH2Cl2', name: 'dichloromethane' },
  chloroform: { formula: 'CHCl3', name: 'chloroform' },
  methanol: { formula: 'CH4O', name: 'methanol' },
  meoh: { formula: 'CH4O', name: 'methanol' },
  ethanol: { formula: 'C2H6O', name: 'ethanol' },
  etoh: { formula: 'C2H6O', name: 'ethanol' },
  isopropanol: { formula: 'C3H8O', name: '2-propanol' },
  ipa: { formula: 'C3H8O', name: '2-propanol' },
  '2-propanol': { formula: 'C3H8O', name: '2-propanol' },
  'ethyl acetate': { formula: 'C4H8O2', name: 'ethyl acetate' },
  etoac: { formula: 'C4H8O2', name: 'ethyl acetate' },
  'diethyl ether': { formula: 'C4H10O', name: 'diethyl ether' },
  ether: { formula: 'C4H10O', name: 'diethyl ether' },
  et2o: { formula: 'C4H10O', name: 'diethyl ether' },
  thf: { formula: 'C4H8O', name: 'tetrahydrofuran' },
  tetrahydrofuran: { formula: 'C4H8O', name: 'tetrahydrofuran' },
  dioxane: { formula: 'C4H8O2', name: '1,4-dioxane' },
  acetone: { formula: 'C3H6O', name: 'acetone' },
  acetonitrile: { formula: 'C2H3N', name: 'acetonitrile' },
  mecn: { formula: 'C2H3N', name: 'acetonitrile' },
  dmf: { formula: 'C3H7NO', name: 'N,N-dimethylformamide' },
  dmso: { formula: 'C2H6OS', name: 'dimethyl sulfoxide' },
  toluene: { formula: 'C7H8', name: 'toluene' },
  benzene: { formula: 'C6H6', name: 'benzene' },
  hexane: { formula: 'C6H14', name: 'hexane' },
  hexanes: { formula: 'C6H14', name: 'hexane' },
  pentane: { formula: 'C5H12', name: 'pentane' },
  heptane: { formula: 'C7H16', name: 'heptane' },
  cyclohexane: { formula: 'C6H12', name: 'cyclohexane' },
  dce: { formula: 'C2H4Cl2', name: '1,2-dichloroethane' },
  pyridine: { formula: 'C5H5N', name: 'pyridine' },
  'acetic acid': { formula: 'C2H4O2', name: 'acetic acid' },
  acoh: { formula: 'C2H4O2', name: 'acetic acid' },
  triethylamine: { formula: 'C6H15N', name: 'triethylamine' },
  et3n: { formula: 'C6H15N', name: 'triethylamine' },
  hcl: { formula: 'HCl', name: 'hydrogen chloride' },
  hbr: { formula: 'HBr', name: 'hydrogen bromide' },
  tfa: { formula: 'C2HF3O2', name: 'trifluoroacetic acid' },
  'formic acid': { formula: 'CH2O2', name: 'formic acid' },
  'sulfuric acid': { formula: 'H2SO4', name: 'sulfuric acid' },
});

/**
 * Reagent and ligand names as chemists spell them (case matters), common practice. Several
 * read as element symbols too (NBS as N, B, S; DBU as D, B, U), which is why the parser
 * refuses them rather than computing the elements. NCS is left out on purpose: it is also
 * how the thiocyanate ligand is written (Hg(NCS)2).
 *
 * @example
 * REAGENTS.NBS.formula // 'C4H4BrNO2'
 */
export const REAGENTS: Readonly<Record<string, NamedSubstance>> = Object.freeze({
  THF: { formula: 'C4H8O', name: 'tetrahydrofuran' },
  DMF: { formula: 'C3H7NO', name: 'N,N-dimethylformamide' },
  DMSO: { formula: 'C2H6OS', name: 'dimethyl sulfoxide' },
  DCM: { formula: 'CH2Cl2', name: 'dichloromethane' },
  DCE: { formula: 'C2H4Cl2', name: '1,2-dichloroethane' },
  DME: { formula: 'C4H10O2', name: '1,2-dimethoxyethane' },
  NMP: { formula: 'C5H9NO', name: 'N-methyl-2-pyrrolidone' },
  HMPA: { formula: 'C6H18N3OP', name: 'hexamethylphosphoramide' },
  TFA: { formula: 'C2HF3O2', name: 'trifluoroacetic acid' },
  TEA: { formula: 'C6H15N', name: 'triethylamine' },
  DIPEA: { formula: 'C8H19N', name: 'N,N-diisopropylethylamine' },
  DMAP: { formula: 'C7H10N2', name: '4-(dimethylamino)pyridine' },
  DBU: { formula: 'C9H16N2', name: '1,8-diazabicyclo[5.4.0]undec-7-ene' },
  DCC: { formula: 'C13H22N2', name: 'N,N′-dicyclohexylcarbodiimide' },
  DIC: { formula: 'C7H14N2', name: 'N,N′-diisopropylcarbodiimide' },
  CDI: { formula: 'C7H6N4O', name: '1,1′-carbonyldiimidazole' },
  NBS: { formula: 'C4H4BrNO2', name: 'N-bromosuccinimide' },
  NIS: { formula: 'C4H4INO2', name: 'N-iodosuccinimide' },
  PCC: { formula: 'C5H6ClCrNO3', name: 'pyridinium chlorochromate' },
  PPTS: { formula: 'C12H13NO3S', name: 'pyridinium p-toluenesulfonate' },
  DIBAL: { formula: 'C8H19Al', name: 'diisobutylaluminium hydride' },
  BHT: { formula: 'C15H24O', name: 'butylated hydroxytoluene (2,6-di-tert-butyl-4-methylphenol)' },
  TBHP: { formula: 'C4H10O2', name: 'tert-butyl hydroperoxide' },
  TBAF: { formula: 'C16H36FN', name: 'tetrabutylammonium fluoride' },
  LDA: { formula: 'C6H14LiN', name: 'lithium diisopropylamide' },
  DDQ: { formula: 'C8Cl2N2O2', name: '2,3-dichloro-5,6-dicyano-1,4-benzoquinone' },
  THP: { formula: 'C5H10O', name: 'tetrahydropyran' },
  DHP: { formula: 'C5H8O', name: '3,4-dihydro-2H-pyran' },
  COD: { formula: 'C8H12', name: 'cycloocta-1,5-diene (cod)' },
  NBD: { formula: 'C7H8', name: 'norbornadiene (nbd)' },
  DPPF: { formula: 'C34H28FeP2', name: '1,1′-bis(diphenylphosphino)ferrocene (dppf)' },
  DPPP: { formula: 'C27H26P2', name: '1,3-bis(diphenylphosphino)propane (dppp)' },
  DPPE: { formula: 'C26H24P2', name: '1,2-bis(diphenylphosphino)ethane (dppe)' },
  BPY: { formula: 'C10H8N2', name: '2,2′-bipyridine (bpy)' },
  PHEN: { formula: 'C12H8N2', name: '1,10-phenanthroline (phen)' },
  BOC: { formula: 'C5H9O2', name: 'tert-butoxycarbonyl (Boc)' },
  AcOH: { formula: 'C2H4O2', name: 'acetic acid' },
  EtOAc: { formula: 'C4H8O2', name: 'ethyl acetate' },
  MeCN: { formula: 'C2H3N', name: 'acetonitrile' },
  MeOH: { formula: 'CH4O', name: 'methanol' },
  EtOH: { formula: 'C2H6O', name: 'ethanol' },
  Ac2O: { formula: 'C4H6O3', name: 'acetic anhydride' },
  NaOAc: { formula: 'C2H3NaO2', name: 'sodium acetate' },
  TsCl: { formula: 'C7H7ClO2S', name: 'tosyl chloride' },
  TsOH: { formula: 'C7H8O3S', name: 'p-toluenesulfonic acid' },
  HOTs: { formula: 'C7H8O3S', name: 'p-toluenesulfonic acid' },
  IPA: { formula: 'C3H8O', name: '2-propanol' },
  // lab names that read as element symbols just as well (KHP as K, H, P; SDS as S, D, S), from memory
  KHP: { formula: 'C8H5KO4', name: 'potassium hydrogen phthalate' },
  SDS: { formula: 'C12H25NaO4S', name: 'sodium dodecyl sulfate' },
  NHS: { formula: 'C4H5NO3', name: 'N-hydroxysuccinimide' },
  DTT: { formula: 'C4H10O2S2', name: 'dithiothreitol' },
  PDC: { formula: 'C10H12Cr2N2O7', name: 'pyridinium dichromate' },
  DCU: { formula: 'C13H24N2O', name: 'N,N′-dicyclohexylurea' },
  HBTU: { formula: 'C11H16F6N5OP', name: 'O-(benzotriazol-1-yl)-N,N,N′,N′-tetramethyluronium hexafluorophosphate' },
  TBTU: { formula: 'C11H16BF4N5O', name: 'O-(benzotriazol-1-yl)-N,N,N′,N′-tetramethyluronium tetrafluoroborate' },
  BOP: { formula: 'C12H22F6N6OP2', name: '(benzotriazol-1-yloxy)tris(dimethylamino)phosphonium hexafluorophosphate' },
  BPO: { formula: 'C14H10O4', name: 'benzoyl peroxide' },
  DBN: { formula: 'C7H12N2', name: '1,5-diazabicyclo[4.3.0]non-5-ene' },
  TBD: { formula: 'C7H13N3', name: '1,5,7-triazabicyclo[4.4.0]dec-5-ene' },
  HFIP: { formula: 'C3H2F6O', name: '1,1,1,3,3,3-hexafluoro-2-propanol' },
  DPPH: { formula: 'C18H12N5O6', name: '2,2-diphenyl-1-picrylhydrazyl' },
  HOAt: { formula: 'C5H4N4O', name: '1-hydroxy-7-azabenzotriazole' },
});

/**
 * What a name stands for: a reagent spelled as chemists write it, else a solvent in any case.
 *
 * @example
 * namedSubstance('THF')?.name // 'tetrahydrofuran'
 * namedSubstance('Dmf')?.formula // 'C3H7NO'
 */
export function namedSubstance(text: string): NamedSubstance | null {
  if (Object.hasOwn(REAGENTS, text)) return REAGENTS[text];
  const key = text.trim().toLowerCase();
  return Object.hasOwn(SOLVENTS, key) ? SOLVENTS[key] : null;
}
