/**
 * Prep sheets: a CSV of solutions to make, one per row — the reagent, the
 * form in hand, its purity (or, for a concentrated liquid, its mass fraction
 * and density), the target and the volume — becomes one instruction per row,
 * computed exactly as `prepare` computes it; a row that gives the mass
 * actually weighed (or the volume taken) also gets the concentration made.
 *
 * Columns (case-insensitive; only reagent, target and volume are needed):
 * `id`, `reagent` (a formula, or a name when `form` gives the formula),
 * `form` (the formula of the material in hand: CuSO4·5H2O), `purity` (assay,
 * or mass fraction of a concentrated liquid), `density` (makes the row a
 * concentrated liquid), `as`, `target` (or `concentration`), `volume`,
 * `weighed` (a solid), `taken` (a liquid).
 */
import { fail } from '../errors/pondus-error.js';
import { readCsvSheet } from '../sheets/read-sheet.js';
import { saturatedFraction } from './solubility.js';
import { readShare } from '../assay/read-quantity.js';
import { formulaMassDetail, type MassOptions } from '../mass/formula-mass.js';
import { CONCENTRATED_GRADES } from './concentrated-grades.js';
import { concentratedReagent, type ConcentratedResult } from './concentrated.js';
import { prepareSolution, type SolutionResult } from './solution.js';

/** One solution to make, as the sheet gives it. */
export interface PrepSheetRow {
  /** 1-based line number in the sheet. */
  line: number;
  /** The row as written. */
  raw: string;
  id: string;
  /** What the row calls the reagent. */
  reagent: string;
  /** The formula to compute with: the form column, else the reagent. */
  formula: string;
  purity: string;
  density: string;
  as: string;
  target: string;
  volume: string;
  weighed: string;
  taken: string;
}

/** The instruction for one row: a solid to weigh, or a concentrated liquid to measure. */
export type PrepRowResult = { row: PrepSheetRow; kind: 'solid'; solution: SolutionResult } | { row: PrepSheetRow; kind: 'concentrated'; concentrated: ConcentratedResult };

const COLUMNS: Record<Exclude<keyof PrepSheetRow, 'line' | 'raw' | 'formula'> | 'form', RegExp> = {
  id: /^(id|no\.?|#|label)$/i,
  reagent: /^(reagent|substance|name)$/i,
  form: /^(form|formula|form in hand|material)$/i,
  purity: /^(purity|assay|fraction|strength|% ?w\/w)$/i,
  density: /^(density|d|specific gravity)$/i,
  as: /^(as|as species)$/i,
  target: /^(target|concentration|conc\.?)$/i,
  volume: /^(volume|final volume)$/i,
  weighed: /^(weighed|mass weighed|actual mass)$/i,
  taken: /^(taken|volume taken)$/i,
};

/**
 * The rows of a sheet, through the one CSV reader (src/sheets). Kept as one call so that a
 * streaming reader can take its place.
 */
function sheetRows(text: string) {
  return readCsvSheet(text);
}

/**
 * Reads a prep sheet. A row's own problems (a bad formula, a missing volume) surface when the row
 * is computed, so one bad row never stops the others.
 *
 * @param text - the CSV text of the sheet: a reagent (or form) column, target and volume columns, and optionally id, purity, density, as, weighed and taken.
 * @returns one row for each data line, with its line number, raw text and cells by column.
 * @throws PondusError: BAD_RECORD for text that is not valid CSV, an empty sheet, or a header without a reagent (or form), target or volume column; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readPrepSheet('reagent,target,volume\nNaCl,0.100 M,250.0 mL\n')[0].formula // 'NaCl'
 */
export function readPrepSheet(text: string): PrepSheetRow[] {
  const { header, rows } = sheetRows(text);
  const at = Object.fromEntries(Object.entries(COLUMNS).map(([k, re]) => [k, header.findIndex((h) => re.test(h.trim()))])) as Record<keyof typeof COLUMNS, number>;
  if (at.reagent < 0 && at.form < 0) throw fail({ code: 'BAD_RECORD', message: `the prep sheet has no 'reagent' (or 'form') column (columns: ${header.join(', ')})` });
  for (const need of ['target', 'volume'] as const) {
    if (at[need] < 0) throw fail({ code: 'BAD_RECORD', message: `the prep sheet has no '${need}' column (columns: ${header.join(', ')})` });
  }
  const cell = (cells: string[], k: keyof typeof COLUMNS) => (at[k] >= 0 ? (cells[at[k]] ?? '').trim() : '');
  return rows.map(({ line, raw, cells }) => {
    const reagent = cell(cells, 'reagent');
    const form = cell(cells, 'form');
    return {
      line,
      raw,
      id: cell(cells, 'id'),
      reagent: reagent || form,
      formula: form || reagent,
      purity: cell(cells, 'purity'),
      density: cell(cells, 'density'),
      as: cell(cells, 'as'),
      target: cell(cells, 'target'),
      volume: cell(cells, 'volume'),
      weighed: cell(cells, 'weighed'),
      taken: cell(cells, 'taken'),
    };
  });
}

const opt = (s: string) => (s === '' ? undefined : s);

/**
 * True for a row that is a concentrated liquid, measured by volume: it gives a density, or its
 * reagent is a grade in the table of common concentrated reagents (37 % HCl, 96 % H2SO4, …)
 * with its mass fraction in the purity column, whose density the table then gives.
 *
 * @example
 * isConcentratedRow(readPrepSheet('reagent,purity,target,volume\nHCl,37 %,1.00 M,500.0 mL\n')[0]) // true
 * isConcentratedRow(readPrepSheet('reagent,purity,target,volume\nNaCl,99.5 %,0.100 M,1.000 L\n')[0]) // false
 */
export function isConcentratedRow(row: PrepSheetRow, options: MassOptions = {}): boolean {
  if (row.density !== '') return true;
  if (row.purity === '' || row.formula === '') return false;
  let hill: string;
  try {
    hill = formulaMassDetail(row.formula, options).formula;
  } catch {
    return false; // the row's own reading reports the formula
  }
  return CONCENTRATED_GRADES.some((g) => g.formula === hill);
}

/**
 * For a row with a density whose purity is more than a saturated solution of its reagent holds:
 * the refusal, naming the two readings (a solid's assay, or a liquid's mass fraction); else null.
 */
function solidReading(row: PrepSheetRow, options: MassOptions): { message: string; hint: string } | null {
  let detail;
  let fraction;
  try {
    detail = formulaMassDetail(row.formula, options);
    fraction = readShare(row.purity, 'the purity', [], { bare: 'fraction', note: 'FRACTION_AS_DECIMAL' });
  } catch {
    return null; // the row's own reading reports the problem
  }
  const saturated = saturatedFraction(detail, options);
  if (saturated === null || fraction.value.lte(saturated)) return null;
  const sat = `${saturated.times(100).toSignificantDigits(3).toFixed()} % w/w`;
  return {
    message: `${row.formula.trim()} at ${row.purity.trim()} with a density of ${row.density.trim()} reads two ways: as a solution of ${row.purity.trim()} w/w, which no solution of it reaches (saturated at about ${sat} at 20 °C, from memory of the CRC Handbook), or as the solid with an assay of ${row.purity.trim()} (the density then being the crystal's)`,
    hint: `for the solid, leave the density empty; for a stock solution, give its mass fraction (at most ${sat}) and the solution's density`,
  };
}

/**
 * The instruction for one row of a prep sheet, computed as `prepare` computes it.
 *
 * @param row - a row of {@link readPrepSheet}.
 * @param options - the mass options.
 * @returns the row with the result of {@link concentratedReagent} for a concentrated liquid ({@link isConcentratedRow}), else of {@link prepareSolution}.
 * @throws PondusError: BAD_RECORD for a row with no reagent, no volume or no target (nor mass weighed or volume taken), a concentrated liquid without a purity or with a mass weighed or 'as', or a volume taken for a solid; the codes of {@link concentratedReagent} or {@link prepareSolution}; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * const [row] = readPrepSheet('reagent,form,purity,target,volume\ncopper sulfate,CuSO4·5H2O,98.5 %,0.100 M,250.0 mL\n')
 * displayInstruction(prepRow(row).solution.mass, 'g').text // '6.337 g'
 */
export function prepRow(row: PrepSheetRow, options: MassOptions = {}): PrepRowResult {
  if (row.formula === '') throw fail({ code: 'BAD_RECORD', message: `the row names no reagent` });
  if (row.volume === '') throw fail({ code: 'BAD_RECORD', message: `the row gives no volume` });
  if (row.target === '' && row.weighed === '' && row.taken === '') throw fail({ code: 'BAD_RECORD', message: `the row gives no target (nor a mass weighed or volume taken)` });
  if (isConcentratedRow(row, options)) {
    if (row.purity === '') throw fail({ code: 'BAD_RECORD', message: `a concentrated liquid (a density is given) needs its mass fraction in the purity column ('37 %')` });
    if (row.weighed !== '') throw fail({ code: 'BAD_RECORD', message: `a concentrated liquid is measured by volume: give the volume taken ('taken'), not a mass weighed` });
    if (row.as !== '') throw fail({ code: 'BAD_RECORD', message: `'as' applies to a solid reagent, not to a concentrated liquid` });
    // a fraction no solution of a solid reaches (99.5 % NaCl with a density) is the assay of the solid, not a mass fraction
    if (row.density !== '') {
      const solid = solidReading(row, options);
      if (solid) throw fail({ code: 'BAD_RECORD', message: solid.message, hint: solid.hint });
    }
    const concentrated = concentratedReagent(row.formula, { ...options, fraction: row.purity, density: opt(row.density), concentration: opt(row.target), volume: row.volume, taken: opt(row.taken) });
    // the purity column is an assay for a solid and a mass fraction for a liquid: a density decides,
    // which is worth saying where the reagent is not one of the common concentrated grades
    if (row.density !== '' && !CONCENTRATED_GRADES.some((g) => g.formula === concentrated.reagent.formula)) {
      concentrated.notes.push({
        code: 'PURITY_AS_MASS_FRACTION',
        message: `the row gives a density, so ${row.formula.trim()} is read as a liquid reagent (a solution) of ${row.purity.trim()} w/w, measured by volume; for a solid weighed with an assay of ${row.purity.trim()}, leave the density empty`,
      });
    }
    return { row, kind: 'concentrated', concentrated };
  }
  if (row.taken !== '') throw fail({ code: 'BAD_RECORD', message: `a volume taken applies to a concentrated liquid (give its density); a solid is weighed ('weighed')` });
  return { row, kind: 'solid', solution: prepareSolution(row.formula, { ...options, concentration: opt(row.target), volume: row.volume, purity: opt(row.purity), as: opt(row.as), weighed: opt(row.weighed) }) };
}
