/**
 * The one JSON form of a reagent-table row (what `pondus reagents --json` prints, one line per row).
 */
import type { Note } from '../errors/issue.js';
import { noteText } from '../errors/message.js';
import type { ReagentRow } from './table.js';

/** The JSON row of a reagent-table row: the row's own fields, its written cells as `written`, and notes without columns. */
export type ReagentRowJson = Omit<ReagentRow, 'spec' | 'notes'> & {
  written: ReagentRow['spec'];
  notes: { code: string; message: string }[];
};

const noteJson = (n: Note) => ({ code: n.code, message: noteText(n) });

/**
 * The stable JSON shape of one row of a reagent table.
 *
 * @param r - a row of a {@link reagentTable} result.
 * @returns the stable JSON object of the row.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * reagentRowJson(reagentTable([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }]).rows[0]).amount?.display // '14.5 mmol'
 */
export function reagentRowJson(r: ReagentRow): ReagentRowJson {
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
    notes: r.notes.map(noteJson),
  };
}
