/**
 * The one JSON form of a balance result (what `pondus balance --json` prints).
 */
import { notesJson } from '../errors/note-json.js';
import type { BalanceResult } from './balance.js';

/** The JSON row of a balance result. */
export interface BalanceJson {
  input: string;
  balanced: string;
  species: string[];
  coefficients: number[];
  exactCoefficients: string[];
  balancedAsWritten: boolean;
  unique: boolean;
  independentBalances: number;
  basis: string[];
  settledBy: BalanceResult['settledBy'];
  catalysts: string[];
  notes: { code: string; message: string }[];
}

/**
 * The stable JSON shape of a balance result.
 *
 * @param r - a result of {@link balance}.
 * @returns the stable JSON object of the balance.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * balanceJson(balance('H2 + O2 -> H2O')).coefficients // [2, 1, 2]
 */
export function balanceJson(r: BalanceResult): BalanceJson {
  return {
    input: r.input,
    balanced: r.balanced,
    species: [...r.species],
    coefficients: [...r.coefficients],
    exactCoefficients: [...r.exactCoefficients],
    balancedAsWritten: r.balancedAsWritten,
    unique: r.unique,
    independentBalances: r.independentBalances,
    basis: [...r.basis],
    settledBy: r.settledBy,
    catalysts: [...r.catalysts],
    notes: notesJson(r.notes),
  };
}
