import constants from './data/constants.json' with { type: 'json' };

/** Relative atomic mass of the electron, in u (CODATA 2018). */
export const ELECTRON_MASS: string = constants.electronMass.value;
/** Where the physical constants come from. */
export const CONSTANTS_PROVENANCE: string = constants.provenance;
