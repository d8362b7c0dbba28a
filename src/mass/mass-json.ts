import type { MassResult } from './formula-mass.js';

/** The stable JSON shape of a mass result (the `mass --json` contract). */
export interface MassJson {
  input: string;
  formula: string;
  molarMass: number;
  monoisotopicMass: number;
  nominalMass: number | null;
  charge: number;
  notes?: string[];
}

/**
 * The JSON object `pondus mass --json` writes for one result; numbers at full precision.
 *
 * @example
 * massJson(formulaMass('H2O')) // { input: 'H2O', formula: 'H2O', molarMass: 18.015, monoisotopicMass: 18.010564683056, nominalMass: 18, charge: 0 }
 */
export function massJson(r: MassResult): MassJson {
  const o: MassJson = {
    input: r.input,
    formula: r.formula,
    molarMass: r.molarMassNumber(),
    monoisotopicMass: r.monoisotopicMassNumber(),
    nominalMass: r.nominalMass,
    charge: r.charge,
  };
  if (r.notes.length > 0) o.notes = r.notes.map((n) => n.message);
  return o;
}

/**
 * The same text as JSON.stringify(massJson(r)), written straight to one JSON
 * line: the batch hot path, without an intermediate object.
 *
 * @example
 * massJsonLine(formulaMass('H2O')) // '{"input":"H2O","formula":"H2O","molarMass":18.015,…}'
 */
export function massJsonLine(r: MassResult): string {
  if (r.notes.length > 0) return JSON.stringify(massJson(r));
  // Hill formulas hold only letters, digits, brackets, '.', '^', '+' and '-': nothing to escape
  return `{"input":${jsonString(r.input)},"formula":"${r.formula}","molarMass":${r.molarMassJson()},"monoisotopicMass":${r.monoisotopicMassJson()},"nominalMass":${r.nominalMass},"charge":${r.charge}}`;
}

/** Characters JSON.stringify would escape (and lone surrogates): strings without them are quoted as they are. */
export const NEEDS_ESCAPE = /["\\\u0000-\u001f\u2028\u2029\ud800-\udfff]/;

/** A JSON string literal; plain text (the usual formula) skips JSON.stringify. */
function jsonString(s: string): string {
  return NEEDS_ESCAPE.test(s) ? JSON.stringify(s) : `"${s}"`;
}
