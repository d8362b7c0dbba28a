/**
 * The one JSON form of a reagent-table row (what `pondus reagents --json` prints, one line per row).
 * The table's own notes (the reference's reading, the equation's) belong to no row: they are
 * carried on the first row, so that one line per row holds every note of the table.
 */
import type { Note } from '../errors/issue.js';
import { notesJson, type NoteJson } from '../errors/note-json.js';
import { TABLE_CAUTION, type ReagentRow } from './table.js';

/** The JSON row of a reagent-table row: the row's own fields, its written cells as `written`, notes without columns, and the caution. */
export type ReagentRowJson = Omit<ReagentRow, 'spec' | 'notes'> & {
  written: ReagentRow['spec'];
  notes: NoteJson[];
  caution: string;
};

const NO_NOTES: readonly Note[] = [];

/**
 * The stable JSON shape of one row of a reagent table.
 *
 * @param r - a row of a {@link reagentTable} result.
 * @param tableNotes - the table's own notes (`notes` of the {@link reagentTable} result), given with the first row only: they come before the row's notes. None unless given.
 * @returns the stable JSON object of the row, with the table's caution.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * reagentRowJson(reagentTable([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }]).rows[0]).amount?.display // '14.5 mmol'
 * const table = reagentTable([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }, { role: 'product', reagent: 'C9H8O4' }], { equation: 'C7H6O3 + C4H6O3 -> C9H8O4 + C2H4O2' })
 * reagentRowJson(table.rows[0], table.notes).notes[0].code // 'BALANCED_AS_WRITTEN'
 */
export function reagentRowJson(r: ReagentRow, tableNotes: readonly Note[] = NO_NOTES): ReagentRowJson {
  return {
    input: r.input,
    role: r.role,
    reagent: r.reagent,
    formula: r.formula,
    name: r.name,
    molarMass: r.molarMass,
    molarMassDisplay: r.molarMassDisplay,
    equiv: r.equiv,
    equivDisplay: r.equivDisplay,
    amount: r.amount ? { ...r.amount } : null,
    mass: r.mass ? { ...r.mass } : null,
    volume: r.volume ? { ...r.volume } : null,
    percentYield: r.percentYield ? { ...r.percentYield } : null,
    written: { ...r.spec },
    hazard: r.hazard,
    notes: notesJson(tableNotes.length ? [...tableNotes, ...r.notes] : r.notes),
    caution: TABLE_CAUTION,
  };
}
