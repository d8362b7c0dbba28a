/**
 * Result writers for each output format. Each input gets exactly one result
 * (or error) in order; nothing is dropped.
 */
import type { Style } from './style.js';
import { errorRowFields, FLAG_NAMING, renderError } from '../../errors/render.js';
import { issueLine, noteText } from '../../errors/message.js';
import type { PondusError } from '../../errors/pondus-error.js';
import type { InputItem } from '../input/inputs.js';
import { delimitedCell, guardCell, notesCell, visibleControls, type Cell, type OutputFormat } from './format.js';
import { columnWidths, fitWidths, ruleLine, rowLine, textWidth, type Align } from './box-table.js';
import type { CodedNote, Presenter } from './presenter.js';

/** A remark for the CSV/TSV `notes` cell, its options and functions named as the command line names them. */
const flagWords = (n: CodedNote): { code: string; message: string } => ({ code: n.code, message: noteText(n, FLAG_NAMING) });

/**
 * An input that identifies itself in a failed row by other fields than its text: a sheet row gives
 * the cells its ok rows give (its `id`, and the formula cell as `input`), not the whole row. The
 * pairs are written in their order, `input` among them.
 */
export interface IdentifiedItem extends InputItem {
  identity?: [key: string, value: string][];
}

/** The identifying fields of a failed row, `input` first unless the item says otherwise. */
function identityOf(item: InputItem): [string, string][] {
  return (item as IdentifiedItem).identity ?? [['input', item.text]];
}

/**
 * A failed input's JSON line: `line`, the input's identification (`input`, and for a sheet row its
 * `id`), then `error` (the first issue) and `errors` (all of them).
 *
 * @example
 * errorRowLine({ text: 'XxQq', line: 1 }, safeParseFormula('XxQq').error) // '{"line":1,"input":"XxQq","error":{…},"errors":[…]}\n'
 */
export function errorRowLine(item: InputItem, error: PondusError): string {
  const row: Record<string, unknown> = { line: item.line };
  for (const [k, v] of identityOf(item)) row[k] = v;
  return JSON.stringify({ ...row, ...errorRowFields(error, FLAG_NAMING) }) + '\n';
}

export interface ResultWriter<R> {
  ok(item: InputItem, result: R): void;
  fail(item: InputItem, error: PondusError): void;
  /** A finished JSON row, line number included, from the presenter's jsonRow (JSON Lines only). */
  okRow?(row: string): void;
  /** Called after each batch; table output prints what it holds here when enough has gathered. */
  endBatch(final: boolean): void;
}

/** Where writers put text (a Sink in the CLI). */
export interface TextOut {
  write(text: string): void;
}

export interface WriterContext {
  out: TextOut;
  err: TextOut;
  errStyle: Style;
  outStyle: Style;
  /** True when inputs came from standard input or there are several: errors then say which line. */
  numbered: boolean;
  /** The terminal's width when output goes to a terminal: tables are fitted to it. */
  columns?: number;
}

/** Creates the writer for a format. */
export function createWriter<R>(format: OutputFormat, p: Presenter<R>, ctx: WriterContext): ResultWriter<R> {
  switch (format) {
    case 'json':
      return new JsonLinesWriter(p, ctx);
    case 'csv':
      return new DelimitedWriter(p, ctx, ',');
    case 'tsv':
      return new DelimitedWriter(p, ctx, '\t');
    default:
      return new TableWriter(p, ctx);
  }
}

/**
 * A result's JSON line with the input's line number spliced in as the first key, and its newline:
 * every row of every command carries `line`, without parsing the row again.
 *
 * @example
 * withLine('{"input":"H2O"}', 3) // '{"line":3,"input":"H2O"}\n'
 */
export function withLine(json: string, line: number): string {
  return json.length > 2 ? `{"line":${line},${json.slice(1)}\n` : `{"line":${line}}\n`;
}

class JsonLinesWriter<R> implements ResultWriter<R> {
  private readonly line: (result: R) => string;
  constructor(p: Presenter<R>, private readonly ctx: WriterContext) {
    this.line = p.jsonLine ?? ((r) => JSON.stringify(p.json(r)));
  }
  ok(item: InputItem, result: R): void {
    this.ctx.out.write(withLine(this.line(result), item.line));
  }
  okRow(row: string): void {
    this.ctx.out.write(row + '\n');
  }
  fail(item: InputItem, error: PondusError): void {
    this.ctx.out.write(errorRowLine(item, error));
  }
  endBatch(): void {}
}

class DelimitedWriter<R> implements ResultWriter<R> {
  /** The presenter's columns (for its `delimited.rows`), once decided. */
  private columns: string[] | null = null;
  /** The header written: the presenter's columns, with a `line` column second when they have none. */
  private header: string[] | null = null;
  /** What the writer puts before the presenter's cells of each row: `line` second, `input` first. */
  private adds: 'nothing' | 'line' | 'input and line' = 'nothing';
  /** With columns decided from the first block: that block's rows, held until it ends. */
  private held: { item: InputItem; result?: R; error?: PondusError }[] = [];
  /** A presenter may write its own notes column (with its codes and caution); otherwise the writer adds one. */
  private readonly ownNotes: boolean;
  constructor(private readonly p: Presenter<R>, private readonly ctx: WriterContext, private readonly sep: string) {
    this.ownNotes = p.columns.includes('notes');
    if (!p.delimited) this.decide(p.columns);
  }
  /**
   * Every row starts with the input as given and the line it came from, as the JSON rows carry
   * them: the writer adds the `input` and `line` columns the presenter does not have.
   */
  private decide(columns: string[]): void {
    this.columns = columns;
    const hasInput = columns[0] === 'input';
    this.adds = columns.includes('line') ? 'nothing' : hasInput ? 'line' : 'input and line';
    this.header = this.adds === 'nothing' ? columns : hasInput ? ['input', 'line', ...columns.slice(1)] : ['input', 'line', ...columns];
  }
  private framed(item: InputItem, cells: Cell[]): Cell[] {
    if (this.adds === 'line') return [cells[0], item.line, ...cells.slice(1)];
    return this.adds === 'nothing' ? cells : [item.text, item.line, ...cells];
  }
  private write(cells: Cell[], guard: boolean): void {
    let s = '';
    for (let i = 0; i < cells.length; i++) s += (i ? this.sep : '') + delimitedCell(guard ? guardCell(cells[i]) : cells[i], this.sep);
    this.ctx.out.write(s + '\n');
  }
  ok(item: InputItem, result: R): void {
    if (!this.header) {
      this.held.push({ item, result });
      return;
    }
    if (this.held.length === 0 && !this.headerWritten) this.begin();
    this.resultRow(item, result);
  }
  private headerWritten = false;
  private begin(): void {
    this.headerWritten = true;
    this.write([...this.header!, ...(this.ownNotes ? [] : ['notes']), 'error', 'message'], false);
  }
  private resultRow(item: InputItem, result: R): void {
    const given = this.p.noteItems?.(result) ?? (this.p.notes?.(result) ?? []).map((n) => ({ ...n, code: '' }));
    const items = given.map(flagWords);
    let rows: Cell[][];
    if (this.p.delimited) {
      const made = this.p.delimited.rows(result, this.columns!);
      rows = made.rows;
      items.push(...made.notes.map(flagWords));
    } else rows = [this.p.cells(result)];
    // a caution goes with every row: in a spreadsheet each row may be read alone
    if (this.p.caution) items.push({ code: 'CAUTION', message: this.p.caution });
    const notes = this.ownNotes ? [] : [notesCell(items)];
    for (const r of rows) this.write([...this.framed(item, r), ...notes, '', ''], true);
  }
  fail(item: InputItem, error: PondusError): void {
    if (!this.header) {
      this.held.push({ item, error });
      return;
    }
    if (!this.headerWritten) this.begin();
    // the input's identification in the columns of the same names, its line in the `line`
    // column, and every issue, joined as notes are
    const cells = new Array<Cell>(this.header.length + (this.ownNotes ? 0 : 1)).fill('');
    // the notes made before the input failed, in the notes column, as an ok row has them
    cells[this.ownNotes ? this.header.indexOf('notes') : this.header.length] = notesCell(error.notes.map(flagWords));
    const ids = identityOf(item);
    for (const [k, v] of ids) {
      const at = this.header.indexOf(k);
      if (at >= 0) cells[at] = v;
    }
    cells[this.header.indexOf('line')] = item.line;
    // the error cell holds one code, the first (as JSON's `error`), so a sheet can filter on it; the
    // message cell holds every issue, each with its code when there are several, its column once
    // and its hint
    const several = error.issues.length > 1;
    const messages = error.issues.map((i) => `${several ? `${i.code}: ` : ''}${issueLine(i, FLAG_NAMING)}`).join(' | ') + (error.more ? ' | … and more' : '');
    this.write([...cells, error.first.code, messages], true);
  }
  endBatch(): void {
    if (this.header && this.headerWritten) return;
    if (!this.header) {
      const results = this.held.flatMap((h) => (h.error ? [] : [h.result as R]));
      this.decide(this.p.delimited!.columns(results));
    }
    this.begin();
    const held = this.held;
    this.held = [];
    for (const h of held) {
      if (h.error) this.fail(h.item, h.error);
      else this.resultRow(h.item, h.result as R);
    }
  }
}


const MAX_TABLE_NOTES = 1000;
// eslint-disable-next-line no-control-regex
const CONTROL_BUT_NEWLINE = /[\u0000-\u0009\u000b-\u001f\u007f-\u009f]/;

/**
 * Tables stream: the column widths come from the first block of rows (up to 512 inputs, or all
 * of them), fitted to the terminal's width when there is one; the header is written once, each
 * later row as it comes. A later cell wider than its column widens that column from there on
 * (a cell is never cut, except to fit a terminal). Notes follow the table (the first 1,000; the
 * rest are counted).
 */
class TableWriter<R> implements ResultWriter<R> {
  private rows: string[][] = [];
  private blocks: string[] = [];
  private notes: string[] = [];
  private okCount = 0;
  private widths: number[] | null = null;
  private moreNotes = 0;
  private readonly align: Align[];
  constructor(private readonly p: Presenter<R>, private readonly ctx: WriterContext) {
    const t = p.table;
    this.align = t ? (t.align ?? t.head.map(() => 'left' as const)) : [];
  }

  ok(item: InputItem, result: R): void {
    this.okCount++;
    const where = this.ctx.numbered ? `line ${item.line}: ` : '';
    for (const n of this.p.notes?.(result) ?? []) {
      // notes are printed under the table; past a bound they are counted, so memory stays flat
      if (this.notes.length < MAX_TABLE_NOTES) this.notes.push(`${where}${noteText(n, FLAG_NAMING)}`);
      else this.moreNotes++;
    }
    if (this.p.block) this.blocks.push(this.p.block(result));
    else this.rows.push(this.p.table!.row(result).map(cellText));
  }

  fail(item: InputItem, error: PondusError): void {
    const opts = { ...(this.ctx.numbered ? { line: item.line } : {}), emphasis: this.ctx.errStyle.red, naming: FLAG_NAMING };
    this.ctx.err.write(renderError(error, opts) + '\n');
    if (!this.p.block && this.ctx.numbered) {
      const width = this.p.table!.head.length;
      // a sheet row is named by its id, as its ok rows are; other inputs by their text
      const ids = identityOf(item);
      const id = ids.find(([k, v]) => k === 'id' && v !== '')?.[1] ?? ids.find(([k]) => k === 'input')?.[1] ?? item.text;
      this.rows.push([visibleControls(id), `✗ ${error.first.code}`, ...new Array<string>(width - 2).fill('')]);
    }
  }

  endBatch(final: boolean): void {
    const s = this.ctx.outStyle;
    const out = this.ctx.out;
    if (this.blocks.length) {
      const text = this.blocks.join('\n');
      // echoed input is made harmless line by line, where a block holds any control character but its newlines
      out.write((CONTROL_BUT_NEWLINE.test(text) ? text.split('\n').map((l) => visibleControls(l, s.level > 0)).join('\n') : text) + '\n');
    }
    if (this.rows.length && (this.okCount > 0 || this.widths)) {
      const t = this.p.table!;
      if (!this.widths) {
        this.widths = fitWidths(columnWidths(t.head, this.rows), this.align, this.ctx.columns, columnWidths(t.head.map(() => ''), this.rows));
        out.write(ruleLine(this.widths, 'top') + '\n' + rowLine(t.head, this.widths, this.align, (h) => s.bold(h)) + '\n');
      }
      const w = this.widths;
      let text = '';
      for (const r of this.rows) {
        // a wider cell widens its column from here on; on a terminal, echoed text is cut to fit instead (numbers never are)
        for (let i = 0; i < w.length; i++) if (!this.ctx.columns || this.align[i] === 'right') w[i] = Math.max(w[i], textWidth(r[i] ?? ''));
        text += rowLine(r, w, this.align) + '\n';
      }
      out.write(text);
    }
    this.rows = [];
    this.blocks = [];
    if (!final) return;
    if (this.widths) out.write(ruleLine(this.widths, 'bottom') + '\n');
    if (this.notes.length) out.write(this.notes.map((n) => s.dim(`note: ${visibleControls(n)}`)).join('\n') + '\n');
    if (this.moreNotes > 0) out.write(s.dim(`note: ${this.moreNotes} more note${this.moreNotes === 1 ? '' : 's'} not shown here; --json and --csv give every note on its row`) + '\n');
    if (this.p.caution && this.okCount > 0) out.write(s.yellow(`caution: ${this.p.caution}`) + '\n');
    this.notes = [];
  }
}

const cellText = (c: Cell): string => (c === null || c === undefined ? '' : visibleControls(String(c)));
