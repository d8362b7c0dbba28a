export { ELEMENTS, ATOMIC_WEIGHT_PROVENANCE, getElement, isElementSymbol, type ElementData, type StandardWeight } from './element-table.js';
export { getNuclide, naturalIsotopes, principalIsotope, NUCLIDE_PROVENANCE, type Nuclide, type NaturalIsotope } from './nuclides.js';
export { getAtomData, atomKey, atomLabel, type AtomData, type WeightTable, type TabulatedValue } from './atom-data.js';
export { ELECTRON_MASS, CONSTANTS_PROVENANCE } from './constants.js';
