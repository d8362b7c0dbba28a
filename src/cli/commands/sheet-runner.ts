import { fail, PondusError } from '../../errors/pondus-error.js';
import type { IdentifiedItem } from '../output/writers.js';
import { openSheet, sheetRecords, type SheetRecord } from '../input/sheet-file.js';
import type { OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';
import type { CommandName, CommandOptions } from './registry.js';

/** Options of a command that can read a sheet: the rows end up keyed by their raw text. */
export interface SheetOptions<Row> extends OutputOptions {
  sheet?: string;
  sheetRows?: Record<string, Row>;
}

/** A sheet row as each command's ok rows identify it: which cells, under which keys, in their order. */
type Identify = (row: { raw: string; [cell: string]: unknown }) => [string, string][];

const cell = (row: { [cell: string]: unknown }, key: string): string => (typeof row[key] === 'string' ? (row[key] as string) : '');

/**
 * How a failed row of each command's sheet identifies itself: as the same command's ok rows do,
 * so a failed row can be matched to its sample (`tests/cli/sheet-error-rows.test.ts` holds the two
 * to each other). The default is the id and the row as written.
 */
const IDENTIFY: Partial<Record<CommandName, Identify>> = {
  analysis: (r) => [['id', cell(r, 'id')], ['input', cell(r, 'formula')]],
  ion: (r) => [['id', cell(r, 'id')], ['input', cell(r, 'formula')]],
  empirical: (r) => [['id', cell(r, 'id')], ['input', cell(r, 'measurements')]],
  prepare: (r) => [['input', r.raw], ['id', cell(r, 'id')]],
};
const identifyDefault: Identify = (r) => [['input', r.raw], ['id', cell(r, 'id')]];

/**
 * Runs a command over its arguments, or — with --sheet — over the rows of a sheet read from a file
 * or standard input, each row keeping its line number. The sheet is streamed: rows are read,
 * computed and written a batch at a time, so memory stays flat however long the sheet. The
 * presenter finds a row of the current batch by its raw text in `sheetRows`.
 *
 * `readRows` is the sheet's reader (header checks, cells to row); it is given the header with the
 * rows of one batch at a time.
 *
 * @example
 * await runWithSheet(run, 'analysis', formulas, o, stdin, readSheet)
 */
export async function runWithSheet<Row extends { raw: string; line: number }, K extends CommandName, O extends SheetOptions<Row> & CommandOptions<K>>(
  run: CommandRunner,
  command: K,
  inputs: string[],
  options: O,
  stdin: () => AsyncIterable<string | Buffer>,
  readRows: (text: string) => Row[],
): Promise<void> {
  if (options.sheet === undefined) return run(command, inputs, options);
  if (inputs.length > 0) throw fail({ code: 'USAGE', message: 'give either inputs or --sheet, not both' });
  const batches = sheetRecords(openSheet(options.sheet, stdin));
  const first = await batches.next();
  if (first.done || first.value.length === 0) throw fail({ code: 'BAD_RECORD', message: 'the sheet is empty' });
  const header = first.value[0].raw;
  const sheetRows: Record<string, Row> = Object.create(null);
  const one = (rec: SheetRecord): Row[] => {
    try {
      return readRows(`${header}\n${rec.raw}\n`).map((row) => ({ ...row, line: rec.line, raw: rec.raw }));
    } catch (e) {
      // the reader saw the header and this row: its line 2 is the row's own line
      if (e instanceof PondusError && e.first.code === 'BAD_RECORD') throw fail({ ...e.first, message: e.first.message.replace(/ at line \d+/, ` at line ${rec.line}`) });
      throw e;
    }
  };
  const rowsOf = (records: SheetRecord[]): Row[] => {
    if (records.length === 0) return [];
    let rows: Row[] | null = null;
    try {
      rows = readRows(`${header}\n${records.map((r) => r.raw).join('\n')}\n`);
    } catch {
      rows = null;
    }
    if (rows && rows.length === records.length) return rows.map((row, i) => ({ ...row, line: records[i].line, raw: records[i].raw }));
    // a row that is not valid CSV, or reads differently on its own (a blank row): one at a time
    return records.flatMap(one);
  };
  // the header is checked (and the first rows read) before the command starts, so a sheet without
  // the columns it needs is refused at once, and the command's option checks see the first rows
  readRows(`${header}\n`);
  let pending = rowsOf(first.value.slice(1));
  while (pending.length === 0) {
    // the header came on its own (a sheet written row by row): wait for the first rows
    const more = await batches.next();
    if (more.done) throw fail({ code: 'BAD_RECORD', message: 'the sheet has a header and no rows' });
    pending = rowsOf(more.value);
  }
  for (const r of pending) sheetRows[r.raw] = r;
  const conflict = (rows: Row[]) => {
    // a row's own molar mass would silently win over --molar-mass
    if ((options as { molarMass?: string }).molarMass !== undefined && rows.some((r) => (r as { molarMass?: string }).molarMass !== undefined)) {
      throw fail({ code: 'USAGE', message: 'the sheet has a molar-mass column and --molar-mass was given too: use one (the column for each row, or --molar-mass for all)' });
    }
  };
  conflict(pending);
  async function* items(): AsyncGenerator<IdentifiedItem[]> {
    for (;;) {
      if (pending.length > 0) yield pending.map((r) => ({ text: r.raw, line: r.line, identity: identify(r as unknown as { raw: string }) }));
      // the batch has been computed and written: its rows are no longer needed
      for (const k of Object.keys(sheetRows)) delete sheetRows[k];
      const next = await batches.next();
      if (next.done) return;
      pending = rowsOf(next.value);
      conflict(pending);
      for (const r of pending) sheetRows[r.raw] = r;
    }
  }
  const identify = IDENTIFY[command] ?? identifyDefault;
  const withRows: O = { ...options, sheetRows };
  return run(command, [], withRows, undefined, items());
}
