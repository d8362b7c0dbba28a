/**
 * The JSON row of a prep sheet's row (`prepare --sheet`): what to do at the bench, the amount (an
 * instruction at working precision), the instruction line ready to print, and the concentration
 * made from a mass weighed or a volume taken (a result).
 */
import { flaskFor } from './warnings.js';
import { notesJson, type NoteJson } from '../errors/note-json.js';
import type { Note } from '../errors/issue.js';
import { displayInstruction, instructionJson, massUnitFor, resultJson, volumeUnitFor, type AmountJson, type Instruction } from '../sigfig/instruction.js';
import type { Quantity } from '../sigfig/quantity.js';
import type { RoundingMode } from '../sigfig/round.js';
import { BENCH_CAUTION, CONCENTRATED_CAUTION } from './caution.js';
import { isConcentratedRow, type PrepRowResult, type PrepSheetRow } from './prep-sheet.js';

/** What a row tells the person at the bench to do, and the amount with the unit it is shown in. */
export function prepRowAmount(p: PrepRowResult): { ins: Instruction | null; unit: string; verb: 'weigh' | 'take' } {
  if (p.kind === 'solid') {
    const m = p.solution.mass;
    return { ins: m, unit: m ? massUnitFor(m.quantity) : 'g', verb: 'weigh' };
  }
  const t = p.concentrated.take;
  return { ins: t, unit: t ? volumeUnitFor(t.quantity, p.concentrated.volume?.unit ?? null) : 'mL', verb: 'take' };
}

/** The concentration made from the mass weighed or the volume taken, with its unit, or null. */
export function prepRowMade(p: PrepRowResult): { q: Quantity; unit: string } | null {
  if (p.kind === 'solid') return p.solution.made ? { q: p.solution.made, unit: p.solution.unit } : null;
  return p.concentrated.made ? { q: p.concentrated.made, unit: 'M' } : null;
}

/** The notes of a row's result. */
export function prepRowNotes(p: PrepRowResult): Note[] {
  return p.kind === 'solid' ? p.solution.notes : p.concentrated.notes;
}

/** The instruction line of a row, ready to print ('' when the row asks only for the concentration made). */
export function prepRowInstruction(p: PrepRowResult, rounding: RoundingMode): string {
  const { ins, unit, verb } = prepRowAmount(p);
  const r = p.row;
  // the formula of what is weighed or measured first, then the row's name for it: 'Na2CO3·10H2O (sodium carbonate)'
  const name = r.reagent !== r.formula ? r.reagent : null;
  const aside = (...xs: (string | null)[]) => (xs.some((x) => x) ? ` (${xs.filter((x) => x).join('; ')})` : '');
  if (!ins) return '';
  const amount = displayInstruction(ins, unit, rounding).text;
  if (p.kind === 'solid') return `weigh ${amount} of ${r.formula}${aside(name, r.purity ? `assay ${r.purity}` : null)}, dissolve, and make up to ${r.volume}`;
  const density = r.density !== '' ? r.density : `${p.concentrated.density.value.div(1000).toFixed()} g/mL, from the table of common grades`;
  return `${verb} ${amount} of ${r.purity} ${r.formula}${aside(name, `d ${density}`)}, add it slowly to about half the water${p.concentrated.acid ? ' (acid to water)' : ''}${p.concentrated.reagent.formula === 'FH' ? ` in a ${flaskFor('FH')}, not glass` : ''}, cool, and make up to ${r.volume}`;
}

/**
 * The caution of a prep sheet, the same on each of its rows: the bench caution, or the caution
 * for concentrated acids and bases when any row is a concentrated liquid (gives a density).
 *
 * @param rows - the rows of the sheet (from readPrepSheet).
 * @returns the caution to print with the sheet's instructions.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `rows` is not an array of prep-sheet rows.
 * @example
 * prepSheetCaution(readPrepSheet('reagent,target,volume\nNaCl,0.100 M,250.0 mL\n')) // 'check the reagent label…'
 * prepSheetCaution(readPrepSheet('reagent,purity,density,target,volume\nHCl,37 %,1.19 g/mL,1.00 M,500.0 mL\n')) // 'concentrated acids and bases…'
 */
export function prepSheetCaution(rows: readonly PrepSheetRow[]): string {
  return rows.some((r) => isConcentratedRow(r)) ? `${CONCENTRATED_CAUTION}; check each reagent label (formula, hydrate form, assay)` : BENCH_CAUTION;
}

/** The JSON row of a prep sheet's row. */
export interface PrepRowJson {
  /** The row as written in the sheet. */
  input: string;
  id: string;
  /** What the row calls the reagent. */
  reagent: string;
  /** The formula computed with (Hill). */
  formula: string;
  /** A solid to weigh, or a concentrated liquid to measure by volume. */
  form: 'solid' | 'concentrated';
  purity: string | null;
  density: string | null;
  target: string | null;
  volume: string;
  action: 'weigh' | 'take';
  /** The mass to weigh or volume to take (an instruction), or null. */
  amount: AmountJson | null;
  /** The instruction line, ready to print. */
  instruction: string;
  /** The concentration made from the mass weighed or volume taken (a result), or null. */
  made: AmountJson | null;
  notes: NoteJson[];
  caution: string;
}

/**
 * The JSON row of a prep sheet's row (`pondus prepare --sheet FILE --json`).
 *
 * @param p - a result of `prepRow`.
 * @param caution - the sheet's caution, from `prepSheetCaution` of all its rows (the same on every row).
 * @param rounding - how reported figures are rounded ('half-even' unless given).
 * @returns the row as written, the reagent and its formula, the form, the columns given, what to do and the amount (an instruction), the instruction line, the concentration made (a result), the notes and the caution.
 * @throws PondusError BAD_ARGUMENT (from the public API) when `p` is not a prep-sheet row result, `caution` not a string or `rounding` not a rounding mode.
 * @example
 * const rows = readPrepSheet('reagent,form,purity,target,volume\ncopper sulfate,CuSO4·5H2O,98.5 %,0.100 M,250.0 mL\n')
 * prepRowJson(prepRow(rows[0]), prepSheetCaution(rows)).instruction // 'weigh 6.337 g of CuSO4·5H2O (copper sulfate; assay 98.5 %), dissolve, and make up to 250.0 mL'
 */
export function prepRowJson(p: PrepRowResult, caution: string, rounding: RoundingMode = 'half-even'): PrepRowJson {
  const { ins, unit, verb } = prepRowAmount(p);
  const m = prepRowMade(p);
  return {
    input: p.row.raw,
    id: p.row.id,
    reagent: p.row.reagent,
    formula: p.kind === 'solid' ? p.solution.reagent.formula : p.concentrated.reagent.formula,
    form: p.kind,
    purity: p.row.purity || null,
    density: p.row.density || null,
    target: p.row.target || null,
    volume: p.row.volume,
    action: verb,
    amount: ins ? instructionJson(ins, unit, rounding) : null,
    instruction: prepRowInstruction(p, rounding),
    made: m ? resultJson(m.q, m.unit, rounding) : null,
    notes: notesJson(prepRowNotes(p)),
    caution,
  };
}
