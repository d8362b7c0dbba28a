export { formulaMass, safeFormulaMass, molarMass, type MassOptions, type MassResult, type Contribution } from './formula-mass.js';
export { massJson, massJsonLine, type MassJson } from './mass-json.js';
export { reportedMolarMass } from './reported-mass.js';
