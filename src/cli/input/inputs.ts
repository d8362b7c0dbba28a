import { readLineBatches } from './read-lines.js';
import { refuseUnreadableStdin, stdinReadError } from './stdin-check.js';

/** One input to a command, with its 1-based position in the whole input sequence. */
export interface InputItem {
  text: string;
  line: number;
}

/**
 * The inputs of a command as batches: the arguments in order, with `-` replaced
 * by the lines of standard input.
 *
 * @example
 * for await (const batch of inputBatches(['H2O', '-'], () => process.stdin)) …
 */
export async function* inputBatches(args: string[], stdin: () => AsyncIterable<string | Buffer>): AsyncGenerator<InputItem[]> {
  let line = 0;
  let pending: InputItem[] = [];
  for (const a of args) {
    if (a === '-') {
      if (pending.length) yield pending;
      pending = [];
      const stream = stdin();
      refuseUnreadableStdin(stream);
      const lines = readLineBatches(stream);
      for (;;) {
        let next: IteratorResult<string[]>;
        try {
          next = await lines.next();
        } catch (e) {
          throw stdinReadError(e);
        }
        if (next.done) break;
        const batch = next.value;
        const items = new Array<InputItem>(batch.length);
        for (let i = 0; i < batch.length; i++) items[i] = { text: batch[i], line: ++line };
        yield items;
      }
    } else {
      pending.push({ text: a, line: ++line });
    }
  }
  if (pending.length) yield pending;
}

/**
 * Inputs already read (a lab sheet's rows), with their own line numbers, as one batch.
 *
 * @example
 * for await (const b of fixedBatch(['row'], [2])) b[0].line // 2
 */
export async function* fixedBatch(texts: string[], lines: number[]): AsyncGenerator<InputItem[]> {
  yield texts.map((text, i) => ({ text, line: lines[i] }));
}
