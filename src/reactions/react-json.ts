/**
 * The one JSON form of a react result (what `pondus react --json` prints).
 */
import { notesJson } from '../errors/note-json.js';
import type { ReactResult, SpeciesLine } from './react.js';

const lineJson = (l: SpeciesLine) => ({
  species: l.species,
  formula: l.formula,
  coefficient: l.coefficient,
  exactCoefficient: l.exactCoefficient,
  molarMass: l.molarMass,
  moles: l.moles ? l.moles.value : null,
  molesDisplay: l.moles ? l.moles.figure : '',
  mass: l.mass ? l.mass.value : null,
  massDisplay: l.mass ? l.mass.figure : '',
  take: l.take ? { volume: l.take.volume ? l.take.volume.value : null, volumeDisplay: l.take.volume ? l.take.volume.display : '', mass: l.take.mass ? l.take.mass.value : null, massDisplay: l.take.mass ? l.take.mass.display : '', of: l.take.of } : null,
});

/**
 * The stable JSON shape of a react result: amounts in mol and g as numbers, with the figures shown.
 *
 * @param r - a result of {@link react}.
 * @returns the stable JSON object: each species' amounts in mol and g as numbers beside the figures shown, the limiting reagent, yields and notes.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * reactJson(react('H2 + O2 -> H2O', { amounts: ['H2=4.00 g', 'O2=16.0 g'] })).limiting // 'O2'
 */
export function reactJson(r: ReactResult) {
  return {
    input: r.input,
    balanced: r.balanced,
    balancedAsWritten: r.balance.balancedAsWritten,
    unique: r.balance.unique,
    limiting: r.limiting,
    extent: r.extent.value,
    reactants: r.reactants.map(lineJson),
    products: r.products.map(lineJson),
    excess: r.excess.map((e) => ({ species: e.species, moles: e.moles.value, molesDisplay: e.moles.figure, mass: e.mass ? e.mass.value : null, massDisplay: e.mass ? e.mass.figure : '' })),
    catalysts: r.catalysts.map((c) => ({ species: c.species, formula: c.formula, equiv: c.equiv, moles: c.moles ? c.moles.value : null, molesDisplay: c.moles ? c.moles.figure : '', mass: c.mass ? c.mass.value : null, massDisplay: c.mass ? c.mass.figure : '' })),
    percentYield: r.percentYield ? { species: r.percentYield.species, percent: r.percentYield.percent.value, display: r.percentYield.percent.figure } : null,
    notes: notesJson(r.notes),
  };
}
