/**
 * Drives a command over its inputs: one result or one error per input, in
 * order, written as they come; returns how many failed.
 */
import { withNaming } from '../errors/message.js';
import { fail, PondusError } from '../errors/pondus-error.js';
import { FLAG_NAMING } from '../errors/render.js';
import type { InputItem } from './input/inputs.js';
import type { OutputFormat } from './output/format.js';
import type { Presenter } from './output/presenter.js';
import { createWriter, type ResultWriter } from './output/writers.js';
import type { Sink } from './output/sink.js';
import type { Style } from './output/style.js';
import { holdYoungHeap } from './young-heap.js';

export interface BatchIo {
  out: Sink;
  err: Sink;
  outStyle: Style;
  errStyle: Style;
  /** The terminal's width when standard output is a terminal (tables fit it). */
  columns?: number;
  /** The command's option values, each with its flag ('0.100 M' → '--concentration'): see {@link OptionValueError}. */
  optionFlags?: ReadonlyMap<string, string>;
}

/** Codes of a text that cannot be read at all, whatever it is used for: an option value with one is wrong for every input. */
const UNREADABLE = new Set(['UNKNOWN_UNIT', 'BAD_EXPRESSION', 'NUMBER_OUT_OF_RANGE', 'UNEXPECTED_CHARACTER']);

/**
 * The first input failed because an option's value cannot be read (an unknown unit, a malformed
 * number): every other input would fail the same way, so the command stops before them and says
 * it once, naming the option, as a usage error (exit 2).
 */
export class OptionValueError extends Error {
  constructor(readonly flag: string, readonly value: string, readonly error: PondusError) {
    super(`${flag} '${value}': ${error.message}`);
    this.name = 'OptionValueError';
  }
}

/**
 * The option whose value an error is about, when the error is that the value cannot be read:
 * the error's text is not the input's but an option's value, and its code is one of reading.
 *
 * @example
 * optionValueFailure(fail({ code: 'UNKNOWN_UNIT', message: 'x' }, 'abc'), 'NaCl', new Map([['abc', '--volume']])) // '--volume'
 */
export function optionValueFailure(error: PondusError, input: string, flags: ReadonlyMap<string, string> | undefined): string | null {
  if (!flags || error.input === undefined || error.input === input || !UNREADABLE.has(error.first.code)) return null;
  return flags.get(error.input) ?? null;
}

export interface BatchSummary {
  total: number;
  failed: number;
  failedLines: number[];
  /** How many results the presenter's tally counted. */
  tallied: number;
  /** Whether an input failed on the options (USAGE): the exit status is then 2, not 1. */
  usage: boolean;
}

/**
 * Runs a presenter over batches of inputs, writing each result as it comes. The results' notes
 * are written with the command line's naming (flags and commands, {@link FLAG_NAMING}), by the
 * writers and by the library serialisers they call alike.
 *
 * @example
 * await runBatch(massPresenter({}), inputBatches(['H2O'], process.stdin), 'json', io, false)
 */
export async function runBatch<R>(p: Presenter<R>, batches: AsyncIterable<InputItem[]>, format: OutputFormat, io: BatchIo, numbered: boolean): Promise<BatchSummary> {
  const writer = createWriter(format, p, { ...io, numbered });
  const summary: BatchSummary = { total: 0, failed: 0, failedLines: [], tallied: 0, usage: false };
  let written = 0;
  for await (const batch of batches) {
    withNaming(FLAG_NAMING, () => {
      processItems(p, batch, writer, summary, io.optionFlags);
      writer.endBatch(false);
    });
    await io.out.flush();
    await io.err.flush();
    holdYoungHeap(++written);
  }
  withNaming(FLAG_NAMING, () => writer.endBatch(true));
  return summary;
}

/**
 * Computes and writes the results of one batch, in order, counting failures.
 *
 * @example
 * processItems(massPresenter({}), [{ text: 'H2O', line: 1 }], writer, summary)
 */
export function processItems<R>(p: Presenter<R>, items: InputItem[], writer: ResultWriter<R>, summary: BatchSummary, optionFlags?: ReadonlyMap<string, string>): void {
  const row = writer.okRow && p.jsonRow && !p.tally ? p.jsonRow : null;
  const failed = (item: InputItem, e: unknown) => {
    const error = asPondusError(e, item.text);
    // the first input refused for an option's value that cannot be read: said once, for the option
    if (summary.total === 1) {
      const flag = optionValueFailure(error, item.text, optionFlags);
      if (flag !== null) throw new OptionValueError(flag, error.input!, error);
    }
    summary.failed++;
    if (summary.failedLines.length < 10) summary.failedLines.push(item.line);
    if (error.issues.some((i) => i.code === 'USAGE')) summary.usage = true;
    writer.fail(item, error);
  };
  for (const item of items) {
    summary.total++;
    if (row) {
      let text: string;
      try {
        text = row(item.text, item.line);
      } catch (e) {
        failed(item, e);
        continue;
      }
      writer.okRow!(text);
      continue;
    }
    let result: R;
    try {
      result = p.compute(item.text);
    } catch (e) {
      failed(item, e);
      continue;
    }
    if (p.tally?.count(result)) summary.tallied++;
    writer.ok(item, result);
  }
}

/** Any error becomes a PondusError: bad input is reported, a defect is reported too, never as a stack trace. */
export function asPondusError(e: unknown, input: string): PondusError {
  if (e instanceof PondusError) return e;
  if (e instanceof RangeError && /call stack/i.test(e.message)) {
    return fail({ code: 'INPUT_TOO_LONG', message: 'the input is too deeply nested to process' }, input);
  }
  const msg = e instanceof Error ? e.message : String(e);
  return fail({ code: 'INTERNAL_ERROR', message: `internal error (please report it): ${msg}` }, input);
}
