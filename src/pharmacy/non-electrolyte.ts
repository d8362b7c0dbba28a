/**
 * Non-electrolytes in a solution: a solute that does not split into ions counts one osmole per
 * mole and no equivalents. Which solutes are taken as such is decided from the formula, never
 * guessed silently: a neutral carbon compound of C, H, N and O only (dextrose, urea, mannitol,
 * glycerol, an amino acid, which as a zwitterion is one particle), written as one molecule with
 * any water of crystallisation set aside, is counted as one particle per molecule with a note
 * naming that reading. A formula with a metal, a halogen or any other element is not: it may give
 * ions (an amine hydrochloride is an electrolyte), and the caller refuses it.
 */
import type { Note } from '../errors/issue.js';
import { hydrateWater, noteHydrateWater, waterIn } from '../assay/hydrate-note.js';
import { formulaMassDetail, type MassDetail, type MassOptions } from '../mass/formula-mass.js';
import { reportedMolarMass } from '../mass/reported-mass.js';
import { displayMeasured } from '../sigfig/round.js';
import { quantity, type Quantity } from '../sigfig/quantity.js';
import { unitOf } from '../sigfig/units.js';
import { molarStrength } from './molar-strength.js';
import type { Strength } from './strength.js';

export interface NonElectrolyteOptions extends MassOptions {
  /** The strength was measured (keep its significant figures) rather than a label's nominal value. */
  measured?: boolean;
}

/** A non-electrolyte at a strength: its amount concentration, which is also its osmolarity. */
export interface NonElectrolyteResult {
  solute: MassDetail;
  /** Amount concentration, mol/L. */
  moles: Quantity;
  /** Osmolarity, osmol/L: one particle per molecule. */
  osmoles: Quantity;
  strength: Strength;
  /** Moles of water of crystallisation per formula unit, counted in the molar mass and not as particles. */
  waterOfCrystallisation: number;
  notes: Note[];
}

/** The elements that are not metals (metalloids among them). */
const NON_METALS = new Set(['H', 'He', 'B', 'C', 'N', 'O', 'F', 'Ne', 'Si', 'P', 'S', 'Cl', 'Ar', 'As', 'Se', 'Br', 'Kr', 'Te', 'I', 'Xe', 'At', 'Rn', 'Ts', 'Og']);
const HALOGENS = new Set(['F', 'Cl', 'Br', 'I', 'At', 'Ts']);
const ORGANIC = new Set(['C', 'H', 'N', 'O']);

const list = (xs: string[]) => (xs.length === 1 ? xs[0] : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);


/**
 * Why a neutral formula that does not split into known ions is not counted as a non-electrolyte,
 * or null when it is one: a carbon compound of C, H, N and O only, one molecule, water of
 * crystallisation aside.
 *
 * @param m - the solute (from formulaMassDetail).
 * @returns the reason in words ('it contains Na, a metal, so it gives ions'), or null for a non-electrolyte.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * notNonElectrolyte(formulaMassDetail('C6H12O6·H2O')) // null
 * notNonElectrolyte(formulaMassDetail('CH4N2O')) // null
 * notNonElectrolyte(formulaMassDetail('C6H11NO2·HCl')) // 'it contains Cl, so it may be a salt that gives ions (an amine hydrochloride does)…'
 */
export function notNonElectrolyte(m: MassDetail): string | null {
  if (m.charge !== 0) return 'it carries a charge';
  const symbols = [...new Set([...m.atoms.keys()].map((k) => k.replace(/^[0-9]+/, '')))];
  const metals = symbols.filter((s) => !NON_METALS.has(s));
  if (metals.length > 0) return `it contains ${list(metals)}, ${metals.length === 1 ? 'a metal' : 'metals'}, so it gives ions`;
  const halogens = symbols.filter((s) => HALOGENS.has(s));
  if (halogens.length > 0) return `it contains ${list(halogens)}, so it may be a salt that gives ions (an amine hydrochloride does) or a neutral compound of one particle, and the formula does not say which`;
  const others = symbols.filter((s) => !ORGANIC.has(s));
  if (others.length > 0) return `it contains ${list(others)}, and pondus counts one particle per molecule only for a compound of C, H, N and O: it cannot tell whether this one gives ions`;
  if (!symbols.includes('C')) return 'it has no carbon, and pondus counts one particle per molecule only for a carbon compound of C, H, N and O';
  const [first, ...rest] = m.tree.components;
  if (rest.some((c) => waterIn(c) === 0)) return "it is written in parts joined by '·' besides water of crystallisation, which pondus does not count as one particle (give each solute on its own)";
  if (first.multiplier !== null && first.multiplier.text !== '1') return "it is written with a count in front (give one molecule's formula)";
  return null;
}

const G_PER_MOL = unitOf('g/mol');

/**
 * A non-electrolyte at a strength: mmol/L and mOsm/L (one particle per molecule, no mEq).
 *
 * @param solute - the solute (from formulaMassDetail), one that {@link notNonElectrolyte} passes.
 * @param strengthText - its strength: '5 %', '50 g/L', '0.278 M'.
 * @param o - `measured` for a measured strength; atomic-weight options (for the molar mass of the monohydrate a note names).
 * @param asWritten - true when the solute was named in a form (anhydrous dextrose), so the note on dextrose's two forms is not needed.
 * @returns the amount concentration and the osmolarity, mol/L and osmol/L, with the notes of the reading.
 * @throws PondusError: BAD_AMOUNT for a strength without a unit, not positive, or in % w/w or v/v; a measurement that cannot be read (BAD_AMOUNT, BAD_EXPRESSION, UNKNOWN_UNIT, INCOMPATIBLE_UNITS, NUMBER_OUT_OF_RANGE); BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const r = nonElectrolyte(formulaMassDetail('C6H12O6·H2O'), '5 %')
 * displayQuantity(r.osmoles, 'mM').text // '252.3 mM'
 * r.notes.map((n) => n.code) // ['HYDRATE_WATER_COUNTED', 'PERCENT_AS_W_V', 'NOMINAL_STRENGTH', 'NON_ELECTROLYTE']
 */
export function nonElectrolyte(solute: MassDetail, strengthText: string, o: NonElectrolyteOptions = {}, asWritten = false): NonElectrolyteResult {
  const notes: Note[] = [...solute.notes];
  noteHydrateWater(solute, notes);
  const water = hydrateWater(solute);
  const M = quantity(reportedMolarMass(solute), G_PER_MOL);
  const { strength, molarity } = molarStrength(strengthText, M, o.measured, notes);
  notes.push({
    code: 'NON_ELECTROLYTE',
    message: `${solute.input} counted as a non-electrolyte: 1 mOsm per mmol and no mEq (a neutral compound of C, H, N and O that does not split into ions pondus knows, as dextrose, urea, mannitol, glycerol or an amino acid${water ? `; its ${water} H2O of crystallisation counted in the molar mass, not as particles` : ''}); an organic acid or base that ionises in solution gives more particles`,
  });
  if (!asWritten && solute.formula === 'C6H12O6' && water === 0) {
    const hydrous = formulaMassDetail('C6H12O6·H2O', o);
    notes.push({
      code: 'ANHYDROUS_DEXTROSE',
      message: `${solute.input} is taken as written, anhydrous (M = ${displayMeasured(reportedMolarMass(solute)).text} g/mol); if it is dextrose from a label, the strength on a dextrose injection's label is usually of dextrose hydrous, the monohydrate C6H12O6·H2O (M = ${displayMeasured(reportedMolarMass(hydrous)).text} g/mol), which gives fewer mOsm at the same strength: write C6H12O6·H2O for such a strength`,
    });
  }
  return { solute, moles: molarity, osmoles: molarity, strength, waterOfCrystallisation: water, notes };
}
