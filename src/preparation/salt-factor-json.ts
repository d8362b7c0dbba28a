/**
 * The JSON row of `salt`: the salt/parent factor of a salt form, and the masses either way. The
 * dose and salt mass are echoed as given (trimmed); the salt mass for a dose is an instruction, the
 * parent in a salt mass a result (sigfig/instruction.ts).
 */
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { instructionJson, resultJson, type AmountJson } from '../sigfig/instruction.js';
import { displayMeasured, type RoundingMode } from '../sigfig/round.js';
import { DOSE_CAUTION } from './caution.js';
import type { MetalSaltReading, SaltFactorResult, SaltForm, SaltOptions } from './salt-factor.js';
import { speciesText } from './species.js';

/** The JSON row of a salt/parent factor. */
export interface SaltFactorJson {
  /** The salt as given. */
  input: string;
  /** The salt, normalised (as written, never in Hill order). */
  salt: string;
  /** The parent, normalised. */
  parent: string;
  saltHill: string;
  parentHill: string;
  /** An addition salt (parent·acid) or a metal salt of an acidic drug. */
  form: SaltForm;
  /** For a metal salt: how it was read. */
  metalSalt: MetalSaltReading | null;
  /** Grams of salt per gram of parent, unrounded. */
  factor: number;
  /** The factor to its reported figures. */
  factorDisplay: string;
  /** The mass of parent asked about, as given, or null. */
  dose: string | null;
  /** The salt mass that carries the dose (an instruction), or null. */
  saltMass: AmountJson | null;
  /** The mass of salt given, as given, or null. */
  saltGiven: string | null;
  /** The parent carried by the salt mass given (a result), or null. */
  parentMass: AmountJson | null;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a salt/parent factor (`pondus salt SALT --parent PARENT --json`, with `--dose` or `--salt-mass`).
 *
 * @param r - a result of `saltFactor`.
 * @param given - the options it was computed with: the mass of parent (`parentMass`, echoed as `dose`) and the salt mass (`saltMass`, echoed as `saltGiven`) as written.
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the salt and parent, the form of the salt, the factor (unrounded and to its figures), the masses as given, the salt mass for the dose (an instruction), the parent in the salt mass (a result), the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `r` is not a salt/parent factor, `given` not an options object or `rounding` not a rounding mode.
 * @example
 * const given = { parentMass: '10.0 mg' }
 * saltFactorJson(saltFactor('C17H19NO3·HCl·3H2O', 'C17H19NO3', given), given).saltMass.display // '13.17 mg'
 */
export function saltFactorJson(r: SaltFactorResult, given: Partial<SaltOptions>, rounding: RoundingMode = 'half-even'): SaltFactorJson {
  return {
    input: r.salt.input,
    salt: speciesText(r.salt),
    parent: speciesText(r.parent),
    saltHill: r.salt.formula,
    parentHill: r.parent.formula,
    form: r.form,
    metalSalt: r.metalSalt,
    factor: r.factor.toNumber(),
    factorDisplay: displayMeasured(r.reported, rounding).text,
    dose: given.parentMass?.trim() ?? null,
    saltMass: r.saltMass ? instructionJson(r.saltMass, r.saltMass.quantity.unit?.symbol, rounding) : null,
    saltGiven: given.saltMass?.trim() ?? null,
    parentMass: r.parentMass ? resultJson(r.parentMass, r.parentMass.unit?.symbol, rounding) : null,
    notes: notesJson(r.notes),
    caution: DOSE_CAUTION,
  };
}
