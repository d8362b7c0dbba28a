/**
 * Names chemists use for common lab solvents and salt partners, with their
 * formulas (common practice). Any formula may be given instead of a name.
 */
export const SOLVENTS: Readonly<Record<string, { formula: string; name: string }>> = Object.freeze({
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
 * Looks up a solvent by name (any case), or returns null for a name it does not know.
 *
 * @example
 * solventByName('DCM')?.formula // 'CH2Cl2'
 */
export function solventByName(name: string): { formula: string; name: string } | null {
  const key = name.trim().toLowerCase();
  return Object.hasOwn(SOLVENTS, key) ? SOLVENTS[key] : null;
}
