/**
 * Procedure files: a reagent table kept as a small CSV, one row per reagent.
 *
 *   role,reagent,formula,amount,purity,density,solution,form,actual
 *   reference,salicylic acid,,2.00 g,99 %,,,,
 *   reagent,Ac2O,,3.0 equiv,,1.08 g/mL,,,
 *   catalyst,H2SO4,,5 mol %,,1.84 g/mL,98 % w/w,,
 *   solvent,toluene,,0.2 M,,,,,
 *   product,aspirin,,,,,,,2.10 g
 *
 * Roles: reference, reagent, catalyst, additive, product, solvent (its amount is the
 * target concentration of the reference), equation (the reagent cell holds the
 * equation). Other columns (the computed M, equiv, mmol, mass, volume, notes of a
 * table written as CSV) are ignored, so a table's CSV reads back as the same table.
 */
import { fail } from '../errors/pondus-error.js';
import { readCsvSheet } from '../sheets/read-sheet.js';
import type { ReagentRole, ReagentSpec, ReagentTableOptions } from './table.js';

/** The columns a procedure file is written with, in order. */
export const PROCEDURE_COLUMNS = Object.freeze(['role', 'reagent', 'formula', 'amount', 'purity', 'density', 'solution', 'form', 'actual'] as const);

/** Read too when present: the equation may stand in a column (a table written as CSV puts it on the product row). */
const EQUATION_COLUMN = 'equation';

/** A row of a procedure file: a reagent, the solvent, or the equation. */
export interface ProcedureRow {
  line: number;
  raw: string;
  kind: 'reagent' | 'solvent' | 'equation';
  spec: ReagentSpec;
  /** For the solvent: the target concentration. For a product: the amount obtained. */
  value: string;
}

/** A procedure read from a file. */
export interface Procedure {
  rows: ProcedureRow[];
  /** The reagent rows as specs, in order. */
  specs: ReagentSpec[];
  /** The table options the file sets (solvent and concentration, equation, amount obtained). */
  options: Pick<ReagentTableOptions, 'concentration' | 'solvent' | 'equation' | 'actual'>;
}

const ROLES: Readonly<Record<string, ReagentRole | 'solvent' | 'equation'>> = Object.freeze({
  reference: 'reference',
  limiting: 'reference',
  reagent: 'reagent',
  catalyst: 'catalyst',
  additive: 'additive',
  product: 'product',
  solvent: 'solvent',
  equation: 'equation',
});

/**
 * Reads a procedure file (CSV text).
 *
 * @param text - the CSV text of the procedure file: columns role, reagent and amount (and optionally formula, purity, density, solution, form, actual).
 * @returns each row with its line and text, the reagent specs, and the table options the file sets (equation, solvent and concentration, amount obtained).
 * @throws PondusError: BAD_RECORD for text that is not valid CSV, an empty file, a missing role, reagent or amount column, an unknown role, a second equation or solvent row, or an amount obtained on a row that is not a product or given twice; BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * readProcedure('role,reagent,amount\nreference,C7H6O3,2.00 g\nproduct,C9H8O4,\n').specs[1].role // 'product'
 */
export function readProcedure(text: string): Procedure {
  const { header, rows } = readCsvSheet(text);
  const col = (name: string) => header.findIndex((h) => h.trim().toLowerCase() === name);
  const idx = Object.fromEntries(PROCEDURE_COLUMNS.map((c) => [c, col(c)])) as Record<(typeof PROCEDURE_COLUMNS)[number], number>;
  if (idx.role < 0 || idx.reagent < 0) throw fail({ code: 'BAD_RECORD', message: `a procedure file needs the columns role and reagent (columns: ${header.join(', ')})` });
  if (idx.amount < 0) throw fail({ code: 'BAD_RECORD', message: `a procedure file needs an amount column (columns: ${header.join(', ')})` });
  const out: ProcedureRow[] = [];
  const options: Procedure['options'] = {};
  const eqCol = col(EQUATION_COLUMN);
  for (const r of rows) {
    const cell = (name: (typeof PROCEDURE_COLUMNS)[number]) => (idx[name] >= 0 ? (r.cells[idx[name]] ?? '').trim() : '');
    const roleText = cell('role').toLowerCase();
    if (!Object.hasOwn(ROLES, roleText)) throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: '${cell('role')}' is not a role (reference, reagent, catalyst, additive, solvent, product, equation)` }, r.raw);
    const role = ROLES[roleText];
    const reagent = cell('reagent');
    if (role === 'equation') {
      if (options.equation !== undefined) throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: a second equation` }, r.raw);
      options.equation = reagent;
      out.push({ line: r.line, raw: r.raw, kind: 'equation', spec: { role: 'reagent', reagent, text: r.raw }, value: reagent });
      continue;
    }
    if (role === 'solvent') {
      if (options.concentration !== undefined) throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: a second solvent row; give one solvent with the target concentration` }, r.raw);
      options.concentration = cell('amount');
      if (reagent) options.solvent = reagent;
      out.push({ line: r.line, raw: r.raw, kind: 'solvent', spec: { role: 'reagent', reagent, amount: cell('amount'), text: r.raw }, value: cell('amount') });
      continue;
    }
    const spec: ReagentSpec = { role, reagent, text: r.raw };
    for (const k of ['formula', 'amount', 'purity', 'density', 'solution', 'form'] as const) {
      const v = cell(k);
      if (v !== '') spec[k] = v;
    }
    const eqText = eqCol >= 0 ? (r.cells[eqCol] ?? '').trim() : '';
    if (eqText !== '') {
      if (options.equation !== undefined && options.equation !== eqText) throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: a second, different equation` }, r.raw);
      options.equation = eqText;
    }
    const actual = cell('actual');
    if (actual !== '') {
      if (role !== 'product') throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: only a product row takes an amount obtained (actual)` }, r.raw);
      if (options.actual !== undefined) throw fail({ code: 'BAD_RECORD', message: `line ${r.line}: a second amount obtained; a table gives the yield of one product` }, r.raw);
      options.actual = actual;
    }
    out.push({ line: r.line, raw: r.raw, kind: 'reagent', spec, value: actual });
  }
  return { rows: out, specs: out.filter((r) => r.kind === 'reagent').map((r) => r.spec), options };
}

/** A CSV cell, quoted when it holds a comma, a quote or a line break. */
function csvCell(v: string): string {
  return /[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v;
}

/**
 * Writes a procedure file from specs and options (the inverse of {@link readProcedure}).
 *
 * @param specs - the reagent rows to write.
 * @param options - the table options to write as their own rows or cells (equation, solvent and concentration, amount obtained).
 * @returns the CSV text of the procedure file, header first, cells quoted where needed.
 * @throws PondusError: BAD_ARGUMENT for an argument of the wrong kind (from the public API's boundary).
 * @example
 * writeProcedure([{ role: 'reference', reagent: 'C7H6O3', amount: '2.00 g' }], {}).split('\n')[1] // 'reference,C7H6O3,,2.00 g,,,,,'
 */
export function writeProcedure(specs: readonly ReagentSpec[], options: Procedure['options']): string {
  const lines = [PROCEDURE_COLUMNS.join(',')];
  if (options.equation) lines.push(['equation', options.equation, '', '', '', '', '', '', ''].map(csvCell).join(','));
  // the amount obtained is of one product, the first: only its row carries it
  const first = specs.find((s) => s.role === 'product');
  for (const s of specs) {
    const actual = s === first && options.actual ? options.actual : '';
    lines.push([s.role, s.reagent, s.formula ?? '', s.amount ?? '', s.purity ?? '', s.density ?? '', s.solution ?? '', s.form ?? '', actual].map(csvCell).join(','));
  }
  if (options.concentration) lines.push(['solvent', options.solvent ?? '', '', options.concentration, '', '', '', '', ''].map(csvCell).join(','));
  return lines.join('\n') + '\n';
}
