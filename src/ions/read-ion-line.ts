/**
 * One line of batch input for ions: `FORMULA ION [FOUND]`, `FORMULA [FOUND]` (the ion from an
 * option), or `ION [FOUND]` where the ion names its formula (`[C6H12O6+Na]+ 203.0524`).
 * Fields are separated by spaces or tabs; the ion may hold spaces (`[M + H]+`).
 */
import { fail } from '../errors/pondus-error.js';
import { isIonNotation } from './read-ion-notation.js';

/** The fields of one input line. */
export interface IonLine {
  formula: string | null;
  ion: string | null;
  found: string | null;
}

const NUMBER = /^[0-9]+(\.[0-9]+)?$/;

/**
 * Splits a line into formula, ion and found m/z (nothing is computed).
 *
 * @param line - a line: a formula, then an ion notation, then a found m/z (the last two optional), or an ion that names its own formula.
 * @returns the formula (or null), the ion (or null) and the found m/z (or null), as text.
 * @throws PondusError: EMPTY_INPUT for an empty line; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readIonLine('C15H15NO2 [M+H]+ 242.1172') // { formula: 'C15H15NO2', ion: '[M+H]+', found: '242.1172' }
 * readIonLine('[C6H12O6+Na]+')             // { formula: null, ion: '[C6H12O6+Na]+', found: null }
 */
export function readIonLine(line: string): IonLine {
  const text = line.trim();
  if (text === '') throw fail({ code: 'EMPTY_INPUT', message: 'the line is empty' }, line);
  let rest = text;
  let found: string | null = null;
  const m = /^(.*?)\s+(\S+)$/s.exec(text);
  if (m && NUMBER.test(m[2])) {
    rest = m[1].trim();
    found = m[2];
  }
  if (rest.startsWith('[') && isIonNotation(rest)) return { formula: null, ion: rest, found };
  const f = /^(\S+)(?:\s+(.*))?$/s.exec(rest)!;
  return { formula: f[1], ion: f[2] !== undefined && f[2].trim() !== '' ? f[2].trim() : null, found };
}
