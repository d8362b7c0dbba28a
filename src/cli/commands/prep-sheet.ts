/**
 * `pondus prepare --sheet FILE`: one printable instruction per row of a prep sheet.
 */
import { notesJson } from '../../errors/note-json.js';
import { fail } from '../../errors/pondus-error.js';
import { prepRow, readPrepSheet, type PrepRowResult, type PrepSheetRow } from '../../preparation/prep-sheet.js';
import { prepRowAmount, prepRowInstruction, prepRowJson, prepRowMade, prepRowNotes, prepSheetCaution } from '../../preparation/prep-sheet-json.js';
import { displayInstruction, displayResult } from '../../sigfig/instruction.js';
import type { Presenter } from '../output/presenter.js';
import { roundingOf, type RoundingOptions } from './common.js';
import type { SheetOptions } from './sheet-runner.js';
import { decimalCell } from '../output/format.js';
import { baseUnitText } from '../../sigfig/units.js';
import type { WeightTable } from '../../elements/atom-data.js';

export interface PrepSheetCliOptions extends SheetOptions<PrepSheetRow>, RoundingOptions {
  abbreviations?: boolean;
  weights?: WeightTable;
}

export { readPrepSheet };


/** The presenter for `pondus prepare --sheet`. */
export function prepSheetPresenter(o: PrepSheetCliOptions): Presenter<PrepRowResult> {
  const rows = o.sheetRows;
  if (!rows) throw fail({ code: 'USAGE', message: 'a prep sheet needs --sheet FILE' });
  const rounding = roundingOf(o);
  const caution = prepSheetCaution(Object.values(rows));
  const options = { abbreviations: !!o.abbreviations, weights: o.weights ?? 'standard' };
  return {
    compute: (input) => {
      const row = rows[input];
      if (!row) throw fail({ code: 'BAD_RECORD', message: 'not a row of the prep sheet' });
      return prepRow(row, options);
    },
    json: (p) => prepRowJson(p, caution, rounding),
    columns: ['input', 'id', 'reagent', 'formula', 'form', 'target', 'volume', 'action', 'amount_base', 'base_unit', 'amount', 'instruction', 'made'],
    cells: (p) => {
      const { ins, unit, verb } = prepRowAmount(p);
      const m = prepRowMade(p);
      return [p.row.raw, p.row.id, p.row.reagent, p.kind === 'solid' ? p.solution.reagent.formula : p.concentrated.reagent.formula, p.kind, p.row.target, p.row.volume, verb, ins ? decimalCell(ins.quantity.value) : '', ins ? baseUnitText(ins.quantity.dims) : '', ins ? displayInstruction(ins, unit, rounding).text : '', prepRowInstruction(p, rounding), m ? displayResult(m.q, m.unit, rounding).text : ''];
    },
    block: (p) => {
      const m = prepRowMade(p);
      const head = `${p.row.id ? `${p.row.id}  ` : ''}${p.row.target ? `${p.row.target} ` : ''}${p.row.reagent}, ${p.row.volume}`;
      const lines = [head];
      const ins = prepRowInstruction(p, rounding);
      if (ins) lines.push(`  ${ins}`);
      if (m) lines.push(`  made: ${p.kind === 'solid' ? `${p.row.weighed} weighed` : `${p.row.taken} taken`} gives ${displayResult(m.q, m.unit, rounding).text}`);
      return lines.join('\n');
    },
    notes: (p) => prepRowNotes(p),
    noteItems: (p) => notesJson(prepRowNotes(p)),
    caution,
  };
}
