import { fail } from '../../errors/pondus-error.js';
import { readAllText } from '../input/read-all.js';
import type { OutputOptions } from './common.js';
import type { CommandRunner } from './runner.js';

/** Options of a command that can read a sheet: the rows end up keyed by their raw text. */
export interface SheetOptions<Row> extends OutputOptions {
  sheet?: string;
  sheetRows?: Record<string, Row>;
}

/**
 * Runs a command over its arguments, or — with --sheet — over the rows of a sheet read from a file
 * or standard input, each row keeping its line number. The presenter finds a row by its raw text.
 *
 * @example
 * await runWithSheet(run, 'analysis', formulas, o, stdin, readSheet)
 */
export async function runWithSheet<Row extends { raw: string; line: number }, O extends SheetOptions<Row>>(
  run: CommandRunner,
  command: string,
  inputs: string[],
  options: O,
  stdin: () => AsyncIterable<string | Buffer>,
  readRows: (text: string) => Row[],
): Promise<void> {
  if (options.sheet === undefined) return run(command, inputs, options);
  if (inputs.length > 0) throw fail({ code: 'USAGE', message: 'give either inputs or --sheet, not both' });
  const rows = readRows(await readAllText(options.sheet, stdin));
  const sheetRows: Record<string, Row> = Object.create(null);
  for (const r of rows) sheetRows[r.raw] = r;
  const withRows: O = { ...options, sheetRows };
  return run(command, rows.map((r) => r.raw), withRows, rows.map((r) => r.line));
}
