// The CLI run in this process through `main(argv, io)`, with standard input given as text and
// the two output streams captured: as a user sees it, without the cost of starting Node.
import { Writable } from 'node:stream';
import { main } from '../../src/cli/main.js';

export interface InProcessRun {
  status: number;
  stdout: string;
  stderr: string;
  ms: number;
}

class Capture extends Writable {
  text = '';
  isTTY = false;
  override _write(chunk: Buffer | string, _enc: BufferEncoding, done: () => void): void {
    this.text += typeof chunk === 'string' ? chunk : chunk.toString('utf8');
    done();
  }
}

/** Runs pondus in-process with arguments and optional standard input. */
export async function runInProcess(args: string[], input = ''): Promise<InProcessRun> {
  const stdout = new Capture();
  const stderr = new Capture();
  const t0 = performance.now();
  const status = await main(args, {
    stdin: () =>
      (async function* () {
        if (input !== '') yield input;
      })(),
    stdout,
    stderr,
  });
  return { status, stdout: stdout.text, stderr: stderr.text, ms: performance.now() - t0 };
}
