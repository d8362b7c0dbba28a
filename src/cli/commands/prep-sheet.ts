/**
 * `pondus prepare --sheet FILE`: one printable instruction per row of a prep sheet.
 */
import { notesJson } from '../../errors/note-json.js';
import { fail } from '../../errors/pondus-error.js';
import { BENCH_CAUTION, CONCENTRATED_CAUTION } from '../../preparation/caution.js';
import { prepRow, readPrepSheet, type PrepRowResult, type PrepSheetRow } from '../../preparation/prep-sheet.js';
import { displayInstruction, displayResult, instructionJson, massUnitFor, resultJson, volumeUnitFor, type Instruction } from '../../sigfig/instruction.js';
import type { RoundingMode } from '../../sigfig/round.js';
import type { Presenter } from '../output/presenter.js';
import { roundingOf, type RoundingOptions } from './common.js';
import type { SheetOptions } from './sheet-runner.js';

export interface PrepSheetCliOptions extends SheetOptions<PrepSheetRow>, RoundingOptions {
  abbreviations?: boolean;
}

export { readPrepSheet };


/** What a row tells the person at the bench to do, and the amount. */
function amountOf(p: PrepRowResult): { ins: Instruction | null; unit: string; verb: string } {
  if (p.kind === 'solid') {
    const m = p.solution.mass;
    return { ins: m, unit: m ? massUnitFor(m.quantity) : 'g', verb: 'weigh' };
  }
  const t = p.concentrated.take;
  return { ins: t, unit: t ? volumeUnitFor(t.quantity, p.concentrated.volume?.unit ?? null) : 'mL', verb: 'take' };
}

function made(p: PrepRowResult) {
  if (p.kind === 'solid') return p.solution.made ? { q: p.solution.made, unit: p.solution.unit } : null;
  return p.concentrated.made ? { q: p.concentrated.made, unit: 'M' } : null;
}

/** The instruction line of a row, ready to print. */
function instructionText(p: PrepRowResult, rounding: RoundingMode): string {
  const { ins, unit, verb } = amountOf(p);
  const r = p.row;
  const label = r.reagent !== r.formula ? `${r.reagent} (${r.formula})` : r.formula;
  if (!ins) return '';
  const amount = displayInstruction(ins, unit, rounding).text;
  if (p.kind === 'solid') return `weigh ${amount} of ${label}${r.purity ? ` (assay ${r.purity})` : ''}, dissolve, and make up to ${r.volume}`;
  return `${verb} ${amount} of ${r.purity} ${label} (d ${r.density}), add it slowly to about half the water${p.concentrated.acid ? ' (acid to water)' : ''}, cool, and make up to ${r.volume}`;
}

/** The presenter for `pondus prepare --sheet`. */
export function prepSheetPresenter(o: PrepSheetCliOptions): Presenter<PrepRowResult> {
  const rows = o.sheetRows;
  if (!rows) throw fail({ code: 'USAGE', message: 'a prep sheet needs --sheet FILE' });
  const rounding = roundingOf(o);
  const liquids = Object.values(rows).some((r) => r.density !== '');
  const caution = liquids ? `${CONCENTRATED_CAUTION}; check each reagent label (formula, hydrate form, assay)` : BENCH_CAUTION;
  const options = { abbreviations: !!o.abbreviations };
  return {
    compute: (input) => {
      const row = rows[input];
      if (!row) throw fail({ code: 'BAD_RECORD', message: 'not a row of the prep sheet' });
      return prepRow(row, options);
    },
    json: (p) => {
      const { ins, unit, verb } = amountOf(p);
      const m = made(p);
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
        instruction: instructionText(p, rounding),
        made: m ? resultJson(m.q, m.unit, rounding) : null,
        notes: notesJson(p.kind === 'solid' ? p.solution.notes : p.concentrated.notes),
        caution,
      };
    },
    columns: ['input', 'id', 'reagent', 'formula', 'form', 'target', 'volume', 'action', 'amount_base', 'amount', 'instruction', 'made'],
    cells: (p) => {
      const { ins, unit, verb } = amountOf(p);
      const m = made(p);
      return [p.row.raw, p.row.id, p.row.reagent, p.kind === 'solid' ? p.solution.reagent.formula : p.concentrated.reagent.formula, p.kind, p.row.target, p.row.volume, verb, ins ? ins.quantity.value.toFixed() : '', ins ? displayInstruction(ins, unit, rounding).text : '', instructionText(p, rounding), m ? displayResult(m.q, m.unit, rounding).text : ''];
    },
    block: (p) => {
      const m = made(p);
      const head = `${p.row.id ? `${p.row.id}  ` : ''}${p.row.target ? `${p.row.target} ` : ''}${p.row.reagent}, ${p.row.volume}`;
      const lines = [head];
      const ins = instructionText(p, rounding);
      if (ins) lines.push(`  ${ins}`);
      if (m) lines.push(`  made: ${p.kind === 'solid' ? `${p.row.weighed} weighed` : `${p.row.taken} taken`} gives ${displayResult(m.q, m.unit, rounding).text}`);
      return lines.join('\n');
    },
    notes: (p) => (p.kind === 'solid' ? p.solution.notes : p.concentrated.notes),
    noteItems: (p) => notesJson(p.kind === 'solid' ? p.solution.notes : p.concentrated.notes),
    caution,
  };
}
