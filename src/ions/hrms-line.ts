/**
 * The HRMS line of an experimental section, in the usual journal form (common practice, as in
 * the ACS author guidelines' examples): `HRMS (ESI) m/z: [M + H]+ calcd for C15H16NO2 242.1176;
 * found 242.1172.` The ion formula is the ion's Hill formula without its charge; the calculated
 * value is rounded once (half to even), the found value is written as measured.
 */

/** What the report line is built from. */
export interface HrmsLineParts {
  ionisation: string;
  /** '[M + H]+' */
  journalNotation: string;
  /** 'C15H16NO2' */
  ionFormulaPlain: string;
  /** '242.1176' */
  calculatedText: string;
  /** '242.1172', as written */
  foundText: string;
}

/**
 * Writes the HRMS line.
 *
 * @param p - the parts of the line: the ionisation, the ion in journal notation, the ion's formula, and the calculated and found m/z as text.
 * @returns the HRMS line as journals print it.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * hrmsLine({ ionisation: 'ESI', journalNotation: '[M + H]+', ionFormulaPlain: 'C15H16NO2', calculatedText: '242.1176', foundText: '242.1172' })
 * // 'HRMS (ESI) m/z: [M + H]+ calcd for C15H16NO2 242.1176; found 242.1172.'
 */
export function hrmsLine(p: HrmsLineParts): string {
  return `HRMS (${p.ionisation}) m/z: ${p.journalNotation} calcd for ${p.ionFormulaPlain} ${p.calculatedText}; found ${p.foundText}.`;
}
