import type { Command } from 'commander';
import { fail, PondusError } from '../../errors/pondus-error.js';
import type { Note } from '../../errors/issue.js';
import { readProcedure, type ProcedureRow } from '../../reagent-table/procedure.js';
import { reagentRowJson } from '../../reagent-table/reagent-table-json.js';
import { readRowText } from '../../reagent-table/row-text.js';
import { reagentRow, solventRow, tableCautions, tableContext, type ReagentRole, type ReagentRow, type ReagentSpec, type ReagentTableOptions, type TableContext } from '../../reagent-table/table.js';
import { readSheetText } from '../input/sheet-file.js';
import type { Cell } from '../output/format.js';
import type { Presenter } from '../output/presenter.js';
import { roundingOf, type OutputOptions, type RoundingOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import { declareReagents } from './declarations.js';

/** One line of the table as planned by the command: a reagent row or the solvent row. */
interface PlannedRow {
  input: string;
  kind: 'reagent' | 'solvent';
  spec: ReagentSpec;
  /** A row that could not be read: reported in its place. */
  error?: PondusError;
}

interface ReagentsCliOptions extends OutputOptions, RoundingOptions {
  reference?: string;
  reagent?: string[];
  catalyst?: string[];
  additive?: string[];
  product?: string[];
  concentration?: string;
  solvent?: string;
  equation?: string;
  actual?: string;
  procedure?: string;
  markdown?: boolean;
  abbreviations?: boolean;
  /** Set by the command: the rows, in order. */
  plan?: PlannedRow[];
  /** Set by the command: table options from a procedure file. */
  fileOptions?: Pick<ReagentTableOptions, 'concentration' | 'solvent' | 'equation' | 'actual'>;
}

const HEAD = ['reagent', 'formula', 'M g/mol', 'equiv', 'n mmol', 'mass', 'volume', 'notes'];
const ALIGN: ('left' | 'right')[] = ['left', 'left', 'right', 'right', 'right', 'right', 'right', 'left'];

/** Short words for how a row comes: the table's notes column. */
function remarks(r: ReagentRow): string {
  const out: string[] = [];
  if (r.role !== 'reagent') out.push(r.role === 'reference' ? 'reference (limiting)' : r.role);
  if (/mol\s*%$/i.test(r.spec.amount)) out.push(r.spec.amount);
  if (r.spec.purity) out.push(`${r.spec.purity} pure`);
  if (r.spec.solution) out.push(r.spec.solution);
  if (r.spec.density) out.push(`d ${r.spec.density}`);
  if (r.spec.form) out.push(`as ${r.spec.form}`);
  if (r.role === 'solvent') out.push(`to ${r.spec.amount}`);
  if (r.percentYield) out.push(`yield ${r.percentYield.figure} %`);
  if (r.role === 'product') out.push('theoretical yield');
  if (r.hazard) out.push(r.hazard.replace('-', ' '));
  return out.join('; ');
}

function cellsOf(r: ReagentRow): string[] {
  return [
    r.reagent,
    r.name && r.formula ? `${r.formula} (${r.name})` : r.formula,
    r.molarMassDisplay,
    r.equivDisplay,
    r.amount ? r.amount.figure : '',
    r.mass ? r.mass.display : '',
    r.volume ? r.volume.display : '',
    remarks(r),
  ];
}

const mdCell = (c: string) => c.replace(/\|/g, '\\|');

/** The presenter for `pondus reagents`: one result per row of the table, in order. */
export function reagentsPresenter(o: ReagentsCliOptions): Presenter<ReagentRow> {
  const plan = o.plan ?? [];
  const file = o.fileOptions ?? {};
  const options: ReagentTableOptions = {
    abbreviations: !!o.abbreviations,
    rounding: roundingOf(o),
    concentration: o.concentration ?? file.concentration,
    solvent: o.solvent ?? file.solvent,
    equation: o.equation ?? file.equation,
    actual: o.actual ?? file.actual,
  };
  const specs = plan.filter((p) => p.kind === 'reagent' && !(p.error && p.spec.role !== 'reference')).map((p) => p.spec);
  let ctx: TableContext | null = null;
  let ctxError: PondusError | null = null;
  const refError = plan.find((p) => p.error && p.spec.role === 'reference')?.error;
  try {
    if (refError) throw refError;
    ctx = tableContext(specs, options);
  } catch (e) {
    if (!(e instanceof PondusError)) throw e;
    // options that do not go together are one usage error, not a refusal on every row
    if (e.first.code === 'USAGE') throw e;
    ctxError = e;
  }
  const results = new Map<string, ReagentRow | PondusError>();
  for (const p of plan) {
    if (p.error) {
      results.set(p.input, p.error);
      continue;
    }
    if (ctxError || !ctx) {
      results.set(p.input, p.spec.role === 'reference' ? ctxError! : fail({ code: ctxError!.first.code, message: `no table without its reference: ${ctxError!.first.message}`, options: ctxError!.first.options }, p.input));
      continue;
    }
    try {
      results.set(p.input, p.kind === 'solvent' ? solventRow(ctx, options.solvent ?? null, options.concentration ?? '', p.input) : { ...reagentRow(ctx, p.spec), input: p.input });
    } catch (e) {
      if (!(e instanceof PondusError)) throw e;
      results.set(p.input, e);
    }
  }
  const ok = [...results.values()].filter((r): r is ReagentRow => !(r instanceof PondusError));
  const tableNotes: Note[] = ctx ? ctx.notes : [];
  const caution = tableCautions(ok).join('; ');
  const rowNotes = (r: ReagentRow, first: boolean): Note[] => [...(first ? tableNotes : []), ...r.notes.filter((n) => n.code !== 'CAUTION')];
  // the table's notes go with the first row that has a result, so that a row that fails cannot drop them
  const firstInput = plan.find((p) => !(results.get(p.input) instanceof PondusError))?.input;
  const lastInput = plan[plan.length - 1]?.input;
  let mdHeader = false;
  return {
    compute: (input) => {
      const r = results.get(input);
      if (!r) throw fail({ code: 'INTERNAL_ERROR', message: 'a row the table does not hold' }, input);
      if (r instanceof PondusError) throw r;
      return r;
    },
    json: (r) => reagentRowJson(r, r.input === firstInput ? tableNotes : undefined),
    // the written columns first (a procedure file reads them back), then what was computed
    columns: ['input', 'role', 'reagent', 'formula', 'amount', 'purity', 'density', 'solution', 'form', 'actual', 'equation', 'name', 'hill_formula', 'M_g_per_mol', 'equiv', 'n_mmol', 'mass', 'mass_unit', 'volume', 'volume_unit', 'percent_yield'],
    cells: (r): Cell[] => [
      r.input,
      r.role,
      r.reagent,
      r.spec.formula,
      r.spec.amount,
      r.spec.purity,
      r.spec.density,
      r.spec.solution,
      r.spec.form,
      r.role === 'product' && options.actual ? options.actual : '',
      r.role === 'product' && options.equation ? options.equation : '',
      r.name ?? '',
      r.role === 'solvent' ? '' : r.formula,
      r.molarMassDisplay,
      r.equivDisplay,
      r.amount ? r.amount.figure : '',
      r.mass ? r.mass.figure : '',
      r.mass ? r.mass.displayUnit : '',
      r.volume ? r.volume.figure : '',
      r.volume ? r.volume.displayUnit : '',
      r.percentYield ? r.percentYield.figure : '',
    ],
    ...(o.markdown
      ? {
          block: (r: ReagentRow) => {
            const lines: string[] = [];
            if (!mdHeader) {
              mdHeader = true;
              lines.push(`| ${HEAD.join(' | ')} |`, `| ${ALIGN.map((a) => (a === 'right' ? '---:' : '---')).join(' | ')} |`);
            }
            lines.push(`| ${cellsOf(r).map(mdCell).join(' | ')} |`);
            if (r.input === lastInput) lines.push('');
            return lines.join('\n');
          },
        }
      : { table: { head: HEAD, row: (r: ReagentRow) => cellsOf(r), align: ALIGN } }),
    notes: (r) => rowNotes(r, r.input === firstInput),
    noteItems: (r) => rowNotes(r, r.input === firstInput),
    caution,
  };
}


/** The rows given as options, in table order: reference, reagents, catalysts, additives, solvent, products. */
function planFromOptions(o: ReagentsCliOptions): PlannedRow[] {
  const rows: PlannedRow[] = [];
  const add = (texts: string[] | undefined, role: ReagentRole) => {
    for (const t of texts ?? []) {
      try {
        rows.push({ input: t, kind: 'reagent', spec: readRowText(t, role) });
      } catch (e) {
        if (!(e instanceof PondusError)) throw e;
        rows.push({ input: t, kind: 'reagent', spec: { role, reagent: t, text: t }, error: e });
      }
    }
  };
  if (o.reference === undefined) throw fail({ code: 'USAGE', message: "give the reference reagent (the limiting one) with its amount: --reference 'C7H6O3=2.00 g' (or a procedure file: --procedure FILE)" });
  add([o.reference], 'reference');
  add(o.reagent, 'reagent');
  add(o.catalyst, 'catalyst');
  add(o.additive, 'additive');
  if (o.concentration !== undefined) rows.push({ input: `${o.solvent ?? 'solvent'} to ${o.concentration}`, kind: 'solvent', spec: { role: 'reagent', reagent: o.solvent ?? '' } });
  add(o.product, 'product');
  return rows;
}

function planFromProcedure(rows: ProcedureRow[]): PlannedRow[] {
  return rows.filter((r) => r.kind !== 'equation').map((r) => ({ input: r.raw, kind: r.kind === 'solvent' ? 'solvent' : 'reagent', spec: r.spec }));
}

/** Registers `pondus reagents`. */
export function registerReagents(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>): void {
  declareReagents(program).action(async (o: ReagentsCliOptions) => {
    if (o.solvent !== undefined && o.concentration === undefined && o.procedure === undefined) throw fail({ code: 'USAGE', message: '--solvent needs --concentration (the target concentration of the reference sets the solvent volume)' });
    let plan: PlannedRow[];
    let lines: number[] | undefined;
    let fileOptions: ReagentsCliOptions['fileOptions'];
    if (o.procedure !== undefined) {
      const given = ['reference', 'reagent', 'catalyst', 'additive', 'product'].filter((k) => (o as Record<string, unknown>)[k] !== undefined);
      if (given.length) throw fail({ code: 'USAGE', message: `--procedure gives the rows: drop ${given.map((g) => `--${g}`).join(', ')}` });
      const proc = readProcedure(await readSheetText(o.procedure, stdin, '--procedure'));
      const clash = (['concentration', 'equation', 'actual'] as const).filter((k) => proc.options[k] !== undefined && o[k] !== undefined);
      if (clash.length) throw fail({ code: 'USAGE', message: `the procedure file already gives ${clash.join(', ')}: drop --${clash.join(', --')}` });
      fileOptions = proc.options;
      const rows = proc.rows.filter((r) => r.kind !== 'equation');
      plan = planFromProcedure(proc.rows);
      lines = rows.map((r) => r.line);
      if (o.concentration !== undefined && proc.options.concentration === undefined) {
        plan.push({ input: `${o.solvent ?? 'solvent'} to ${o.concentration}`, kind: 'solvent', spec: { role: 'reagent', reagent: o.solvent ?? '' } });
        lines.push(Math.max(0, ...lines) + 1);
      }
    } else {
      plan = planFromOptions(o);
    }
    const seen = new Set<string>();
    for (const p of plan) {
      if (seen.has(p.input)) throw fail({ code: 'USAGE', message: `the row '${p.input}' is given twice` });
      seen.add(p.input);
    }
    return run('reagents', plan.map((p) => p.input), { ...o, plan, fileOptions } as ReagentsCliOptions, lines ?? plan.map((_, i) => i + 1));
  });
}
