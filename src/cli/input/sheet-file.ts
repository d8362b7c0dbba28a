import { closeSync, constants, createReadStream, fstatSync, openSync } from 'node:fs';
import { fail } from '../../errors/pondus-error.js';
import { refuseUnreadableStdin, stdinReadError } from './stdin-check.js';

/** Largest sheet read, from a file or standard input. */
export const MAX_SHEET_BYTES = 100 * 1024 * 1024;
/** Largest row of a sheet (a field that never closes its quote, or a file with no line ends, stops here). */
export const MAX_SHEET_ROW_BYTES = 1024 * 1024;

/** One CSV record of a sheet, as read: its text as written (the sheet's own reader reads its cells), its 1-based line (where it ends). */
export interface SheetRecord {
  raw: string;
  line: number;
}

const megabytes = (n: number) => `${Math.round(n / (1024 * 1024))} MB`;

/**
 * Opens a sheet for reading: standard input for '-', otherwise a regular file named directly. A
 * symbolic link, a directory, a device, a FIFO or a socket is refused (exit 2), and so is a file
 * beyond {@link MAX_SHEET_BYTES}. Messages name the path, never the file's content.
 *
 * @example
 * const chunks = openSheet('results.csv', () => process.stdin);
 */
export function openSheet(path: string, stdin: () => AsyncIterable<string | Buffer>, option = '--sheet'): AsyncIterable<string | Buffer> {
  if (path === '-') {
    const s = stdin();
    refuseUnreadableStdin(s);
    return limited(s, 'the sheet on standard input');
  }
  let fd: number;
  try {
    // O_NOFOLLOW: a link is refused, not followed; O_NONBLOCK: opening a FIFO does not wait for a writer
    fd = openSync(path, constants.O_RDONLY | constants.O_NOFOLLOW | constants.O_NONBLOCK);
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    if (code === 'ELOOP') throw fail({ code: 'USAGE', message: `${option} ${path} is a symbolic link; sheets are read only from the file itself, so give its own path` });
    if (code === 'ENOENT') throw fail({ code: 'USAGE', message: `${option} ${path}: no such file` });
    if (code === 'EACCES' || code === 'EPERM') throw fail({ code: 'USAGE', message: `${option} ${path}: permission denied` });
    throw fail({ code: 'USAGE', message: `cannot read ${option} ${path} (${code ?? String(e)})` });
  }
  const st = fstatSync(fd);
  const refuse = (message: string) => {
    closeSync(fd);
    return fail({ code: 'USAGE', message });
  };
  if (st.isDirectory()) throw refuse(`${option} ${path} is a directory; give a CSV file`);
  if (!st.isFile()) throw refuse(`${option} ${path} is not a regular file (a device, FIFO or socket); give a CSV file, or - with the sheet on standard input`);
  if (st.size > MAX_SHEET_BYTES) throw refuse(`${option} ${path} is ${megabytes(st.size)}; sheets are read up to ${megabytes(MAX_SHEET_BYTES)}: split it`);
  return limited(createReadStream('', { fd, autoClose: true }), `${option} ${path}`);
}

/** Passes the chunks on, refusing once more than the size limit has come (a file that grows, a pipe). */
async function* limited(source: AsyncIterable<string | Buffer>, what: string): AsyncGenerator<string | Buffer> {
  let bytes = 0;
  try {
    for await (const chunk of source) {
      bytes += typeof chunk === 'string' ? Buffer.byteLength(chunk) : chunk.length;
      if (bytes > MAX_SHEET_BYTES) throw fail({ code: 'USAGE', message: `${what} is more than ${megabytes(MAX_SHEET_BYTES)}; sheets are read up to that size: split it` });
      yield chunk;
    }
  } catch (e) {
    throw stdinReadError(e);
  }
}

/**
 * The records of a CSV sheet as they are read, in batches of at most 512: a batch ends where the
 * input read so far ends, so a sheet written row by row is answered row by row. A record ends at a
 * line end (LF, CRLF or a lone CR) outside quotes; a quoted cell may hold line ends (RFC 4180:
 * a quote inside a quoted cell is doubled, so quotes pair up). Empty lines are skipped; a leading
 * byte-order mark is dropped. The cells are read by the sheet's own reader (csv-parse), from `raw`.
 *
 * @example
 * for await (const batch of sheetRecords(openSheet('results.csv', () => process.stdin))) batch[0].line
 */
export async function* sheetRecords(source: AsyncIterable<string | Buffer>): AsyncGenerator<SheetRecord[]> {
  let record = ''; // the record so far, held across chunks
  let quoted = false; // inside a quoted cell
  let line = 1; // physical line of the current position
  let pendingCr = false; // the last chunk ended in CR: a following LF belongs to it
  let first = true;
  let batch: SheetRecord[] = [];
  const out: SheetRecord[][] = [];
  const end = () => {
    if (record.length > 0) {
      batch.push({ raw: record, line });
      if (batch.length >= 512) {
        out.push(batch);
        batch = [];
      }
    }
    record = '';
  };
  for await (const chunk of source) {
    let text = typeof chunk === 'string' ? chunk : chunk.toString('utf8');
    if (first) {
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      first = false;
    }
    let from = 0; // start of the text not yet added to `record`
    for (let i = 0; i < text.length; i++) {
      const c = text.charCodeAt(i);
      if (pendingCr) {
        pendingCr = false;
        if (c === 10) {
          from = i + 1;
          continue;
        }
      }
      if (c === 34) quoted = !quoted;
      else if (c === 10 || c === 13) {
        if (quoted) {
          if (c === 10 || text.charCodeAt(i + 1) !== 10) line++;
          continue;
        }
        record += text.slice(from, i);
        end();
        line++;
        if (c === 13) {
          if (i + 1 === text.length) pendingCr = true;
          else if (text.charCodeAt(i + 1) === 10) i++;
        }
        from = i + 1;
      }
    }
    record += text.slice(from);
    if (record.length > MAX_SHEET_ROW_BYTES) {
      throw fail({ code: 'BAD_RECORD', message: `the sheet is not valid CSV at line ${line}: a row longer than ${megabytes(MAX_SHEET_ROW_BYTES)} (a quote never closed, or no line ends)` });
    }
    for (const b of out.splice(0)) yield b;
    if (batch.length > 0) {
      yield batch;
      batch = [];
    }
  }
  if (quoted) throw fail({ code: 'BAD_RECORD', message: `the sheet is not valid CSV at line ${line}: a quote is never closed` });
  end();
  for (const b of out.splice(0)) yield b;
  if (batch.length > 0) yield batch;
}

/**
 * A whole small sheet as text (a procedure file), read with the same checks as a streamed sheet:
 * a regular file named directly, within the size limit, or `-` for standard input.
 *
 * @example
 * await readSheetText('procedure.csv', () => process.stdin, '--procedure')
 */
export async function readSheetText(path: string, stdin: () => AsyncIterable<string | Buffer>, option = '--sheet'): Promise<string> {
  let text = '';
  for await (const chunk of openSheet(path, stdin, option)) text += typeof chunk === 'string' ? chunk : chunk.toString('utf8');
  return text;
}
