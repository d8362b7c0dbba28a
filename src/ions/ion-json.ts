import { keysFirst } from '../exact/json-row.js';
import { notesJson } from '../errors/note-json.js';
import { Decimal } from '../exact/decimal.js';
import type { IonResult } from './ion-mass.js';

/** The JSON shape of an ion result (`pondus ion --json`): numbers as numbers, exact values as decimal text beside them. */
export interface IonJson {
  input: string;
  formula: string;
  ion: string | null;
  ionFormula: string;
  charge: number;
  mz: number;
  mzExact: string;
  ionMass: number;
  neutralMass: number;
  oddElectron: boolean;
  calculated: string;
  found: number | null;
  foundText: string | null;
  errorPpm: number | null;
  errorPpmExact: string | null;
  errorMDa: number | null;
  reportLine: string | null;
  notes: { code: string; message: string }[];
}

/**
 * The JSON object `pondus ion --json` writes for one ion. `errorPpm` and `errorMDa` are
 * rounded to one decimal as reported; `errorPpmExact` keeps the unrounded value.
 *
 * @param r - a result of {@link ionMass}.
 * @param extra - keys written first, before the result's own (for example a row's id and line).
 * @returns the plain JSON object of the ion, with the errors rounded as reported and the exact ppm error beside them.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * ionJson(ionMass('C15H15NO2', '[M+H]+', { found: '242.1172' })).errorPpm // -1.5
 */
export function ionJson(r: IonResult, extra: Record<string, unknown> = {}): IonJson & Record<string, unknown> {
  return keysFirst(extra, {
    input: r.input,
    formula: r.formula,
    ion: r.notation,
    ionFormula: r.ionFormula,
    charge: r.charge,
    mz: r.mz,
    mzExact: new Decimal(r.mzExact).toDecimalPlaces(15).toFixed(),
    ionMass: r.ionMass,
    neutralMass: r.neutralMass,
    oddElectron: r.oddElectron,
    calculated: r.calculatedText,
    found: r.found ? r.found.value : null,
    foundText: r.found ? r.found.text : null,
    errorPpm: r.found ? new Decimal(r.found.ppmExact).toDecimalPlaces(1).toNumber() : null,
    errorPpmExact: r.found ? new Decimal(r.found.ppmExact).toSignificantDigits(12).toFixed() : null,
    errorMDa: r.found ? new Decimal(r.found.mDaExact).toDecimalPlaces(1).toNumber() : null,
    reportLine: r.reportLine,
    notes: notesJson(r.notes),
  });
}
