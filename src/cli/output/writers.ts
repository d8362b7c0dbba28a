/**
 * Result writers for each output format. Each input gets exactly one result
 * (or error) in order; nothing is dropped.
 */
import Table from 'cli-table3';
import type { ChalkInstance } from 'chalk';
import { errorJson, renderError } from '../../errors/render.js';
import type { PondusError } from '../../errors/pondus-error.js';
import type { InputItem } from '../input/inputs.js';
import { delimitedCell, guardCell, notesCell, visibleControls, type Cell, type OutputFormat } from './format.js';
import type { Presenter } from './presenter.js';

export interface ResultWriter<R> {
  ok(item: InputItem, result: R): void;
  /** A finished JSON line from the presenter's hot path (JSON Lines only). */
  okLine?(line: string): void;
  fail(item: InputItem, error: PondusError): void;
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
  errStyle: ChalkInstance;
  outStyle: ChalkInstance;
  /** True when inputs came from standard input or there are several: errors then say which line. */
  numbered: boolean;
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

class JsonLinesWriter<R> implements ResultWriter<R> {
  private readonly line: (result: R) => string;
  constructor(p: Presenter<R>, private readonly ctx: WriterContext) {
    this.line = p.jsonLine ?? ((r) => JSON.stringify(p.json(r)));
  }
  ok(_item: InputItem, result: R): void {
    this.ctx.out.write(this.line(result) + '\n');
  }
  okLine(line: string): void {
    this.ctx.out.write(line + '\n');
  }
  fail(item: InputItem, error: PondusError): void {
    this.ctx.out.write(JSON.stringify({ input: item.text, line: item.line, error: errorJson(error) }) + '\n');
  }
  endBatch(): void {}
}

class DelimitedWriter<R> implements ResultWriter<R> {
  private headerDone = false;
  /** A presenter may write its own notes column (with its codes and caution); otherwise the writer adds one. */
  private readonly ownNotes: boolean;
  constructor(private readonly p: Presenter<R>, private readonly ctx: WriterContext, private readonly sep: string) {
    this.ownNotes = p.columns.includes('notes');
  }
  private line(cells: Cell[], guard: boolean): void {
    if (!this.headerDone) {
      this.headerDone = true;
      this.line([...this.p.columns, ...(this.ownNotes ? [] : ['notes']), 'error', 'message'], false);
    }
    let s = '';
    for (let i = 0; i < cells.length; i++) s += (i ? this.sep : '') + delimitedCell(guard ? guardCell(cells[i]) : cells[i], this.sep);
    this.ctx.out.write(s + '\n');
  }
  ok(_item: InputItem, result: R): void {
    const items = [...(this.p.noteItems?.(result) ?? (this.p.notes?.(result) ?? []).map((message) => ({ code: '', message })))];
    // a caution goes with every row: in a spreadsheet each row may be read alone
    if (this.p.caution) items.push({ code: 'CAUTION', message: this.p.caution });
    this.line([...this.p.cells(result), ...(this.ownNotes ? [] : [notesCell(items)]), '', ''], true);
  }
  fail(item: InputItem, error: PondusError): void {
    const blanks = new Array<Cell>(this.p.columns.length - 1 + (this.ownNotes ? 0 : 1)).fill('');
    this.line([item.text, ...blanks, error.first.code, error.first.message], true);
  }
  endBatch(): void {}
}

const TABLE_CHUNK = 1000;

class TableWriter<R> implements ResultWriter<R> {
  private rows: Cell[][] = [];
  private blocks: string[] = [];
  private notes: string[] = [];
  private okCount = 0;
  constructor(private readonly p: Presenter<R>, private readonly ctx: WriterContext) {}

  ok(item: InputItem, result: R): void {
    this.okCount++;
    const where = this.ctx.numbered ? `line ${item.line}: ` : '';
    for (const n of this.p.notes?.(result) ?? []) this.notes.push(`${where}${n}`);
    if (this.p.block) this.blocks.push(this.p.block(result));
    else this.rows.push(this.p.table!.row(result));
  }

  fail(item: InputItem, error: PondusError): void {
    const opts = this.ctx.numbered ? { line: item.line, emphasis: this.ctx.errStyle.red } : { emphasis: this.ctx.errStyle.red };
    this.ctx.err.write(renderError(error, opts) + '\n');
    if (!this.p.block && this.ctx.numbered) {
      const width = this.p.table!.head.length;
      this.rows.push([item.text, `✗ ${error.first.code}`, ...new Array<Cell>(width - 2).fill('')]);
    }
  }

  endBatch(final: boolean): void {
    if (!final && this.rows.length < TABLE_CHUNK && this.blocks.length < TABLE_CHUNK) return;
    const s = this.ctx.outStyle;
    if (this.blocks.length) this.ctx.out.write(this.blocks.map((b) => b.split('\n').map((l) => visibleControls(l, s.level > 0)).join('\n')).join('\n') + '\n');
    if (this.rows.length && this.okCount > 0) {
      const t = this.p.table!;
      const table = new Table({
        head: t.head.map((h) => s.bold(h)),
        colAligns: t.align ?? t.head.map(() => 'left' as const),
        style: { head: [], border: [] },
        chars: { mid: '', 'left-mid': '', 'mid-mid': '', 'right-mid': '' },
      });
      for (const r of this.rows) table.push(r.map((c) => (c === null || c === undefined ? '' : visibleControls(String(c)))));
      this.ctx.out.write(table.toString() + '\n');
    }
    if (this.notes.length) this.ctx.out.write(this.notes.map((n) => s.dim(`note: ${visibleControls(n)}`)).join('\n') + '\n');
    if (final && this.p.caution && this.okCount > 0) this.ctx.out.write(s.yellow(`caution: ${this.p.caution}`) + '\n');
    this.rows = [];
    this.blocks = [];
    this.notes = [];
  }
}
