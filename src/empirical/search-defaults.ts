/**
 * Constants of the formula searches that the command line declares as options: plain data that
 * imports nothing, so the help texts can be built without loading the searches.
 */

/** What was collected in a combustion analysis, and the element it carries. */
export const PRODUCTS: Readonly<Record<string, { formula: string; element: string }>> = Object.freeze({
  co2: { formula: 'CO2', element: 'C' },
  h2o: { formula: 'H2O', element: 'H' },
  n2: { formula: 'N2', element: 'N' },
  so2: { formula: 'SO2', element: 'S' },
  agcl: { formula: 'AgCl', element: 'Cl' },
  agbr: { formula: 'AgBr', element: 'Br' },
  agi: { formula: 'AgI', element: 'I' },
});

/** The element ranges candidate formulas are searched in when none are given. */
export const DEFAULT_RANGES = 'C0-80 H0-160 N0-10 O0-20 S0-4 P0-2 F0-6 Cl0-4 Br0-3 I0-2';
