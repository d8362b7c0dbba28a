/**
 * Reads one reagent as written on the command line: `REAGENT=AMOUNT`, then
 * optional `KEY=VALUE` entries through the one KEY=VALUE reader:
 *
 *   `n-BuLi=1.1 equiv, solution=1.6 M in hexanes`
 *   `Ac2O=1.5 equiv, density=1.08 g/mL, purity=98 %`
 *   `HCl=2.0 equiv, solution=37 % w/w, density=1.19`
 *   `CuSO4=5.00 mmol, form=CuSO4·5H2O`
 *
 * Keys: purity (or assay), density (or d), solution, form (or as), formula.
 * A product is written without an amount: `C9H8O4`, `4-butylanisole, formula=C11H16O`.
 */
import { fail, PondusError } from '../errors/pondus-error.js';
import { readKeyValuePair, readKeyValues } from '../key-values/read-key-values.js';
import type { ReagentRole, ReagentSpec } from './table.js';

const KEYS: Readonly<Record<string, 'purity' | 'density' | 'solution' | 'form' | 'formula'>> = Object.freeze({
  purity: 'purity',
  assay: 'purity',
  density: 'density',
  d: 'density',
  solution: 'solution',
  form: 'form',
  as: 'form',
  formula: 'formula',
});

/**
 * Reads a reagent row written as text.
 *
 * @param text - the row: REAGENT=AMOUNT then optional KEY=VALUE pieces (purity, density, solution, form, formula), e.g. 'Ac2O=1.5 equiv, density=1.08 g/mL'; a product row may be its reagent alone.
 * @param role - the row's role (reference, reagent, catalyst, additive, product).
 * @returns the row as a spec: its role, reagent, amount and the values given for its keys.
 * @throws PondusError: BAD_RECORD for an empty row, a row with no amount or no reagent, a piece not written key=value, an unknown key or a key given twice (with its column); INPUT_TOO_LONG past 2,000 characters; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readRowText('n-BuLi=1.1 equiv, solution=1.6 M in hexanes', 'reagent').solution // '1.6 M in hexanes'
 * readRowText('C9H8O4', 'product').reagent // 'C9H8O4'
 */
export function readRowText(text: string, role: ReagentRole): ReagentSpec {
  const t = text.trim();
  if (t === '') throw fail({ code: 'BAD_RECORD', message: 'an empty reagent row' }, text);
  if (t.length > 2000) throw fail({ code: 'INPUT_TOO_LONG', message: `a reagent row of ${t.length} characters; the limit is 2,000` }, text.slice(0, 80));
  const pair = readKeyValuePair(t);
  const eq = pair ? pair.keyText.length : -1;
  const comma = t.search(/[,;]/);
  if (role === 'product' && (eq < 0 || (comma >= 0 && comma < eq))) {
    // a product takes no amount: 'C9H8O4', or 'aspirin, formula=C9H8O4'
    if (comma < 0) return { role, reagent: t, text };
    return { ...readRowText(`${t.slice(0, comma)}=${t.slice(comma)}`, role), text };
  }
  if (eq < 0) {
    throw fail({ code: 'BAD_RECORD', message: `'${t}' has no amount: write REAGENT=AMOUNT (e.g. 'Ac2O=1.5 equiv, density=1.08 g/mL')` }, text);
  }
  const reagent = pair!.key;
  if (reagent === '') throw fail({ code: 'BAD_RECORD', message: 'a row starts with = : write REAGENT=AMOUNT', column: 1 }, text);
  const rest = pair!.valueText;
  const cut = rest.search(/[,;]/);
  const amount = (cut >= 0 ? rest.slice(0, cut) : rest).trim();
  const spec: ReagentSpec = { role, reagent, amount, text };
  if (cut >= 0) {
    const mods = rest.slice(cut + 1);
    const offset = eq + 1 + cut + 1;
    if (mods.trim() === '') return spec;
    let entries;
    try {
      entries = readKeyValues(mods, { code: 'BAD_RECORD', example: 'density=1.08 g/mL, purity=98 %' });
    } catch (e) {
      if (e instanceof PondusError) throw new PondusError(e.issues.map((i) => ({ ...i, column: i.column !== undefined ? i.column + offset : undefined })), text);
      throw e;
    }
    for (const e of entries) {
      const key = e.key.toLowerCase();
      if (!Object.hasOwn(KEYS, key)) {
        throw fail({ code: 'BAD_RECORD', message: `'${e.key}' is not a key of a reagent row: use purity, density, solution, form or formula`, column: e.column + offset, length: e.key.length }, text);
      }
      const field = KEYS[key];
      if (spec[field] !== undefined) throw fail({ code: 'BAD_RECORD', message: `${field} is given twice`, column: e.column + offset }, text);
      spec[field] = e.value;
    }
  }
  return spec;
}
