/**
 * Standard output and standard error written with plain system calls when they are a file, a pipe
 * or /dev/null: Node's own `process.stdout` loads its stream modules on first use, which costs
 * more start-up time (2–4 ms) than a one-line answer takes to compute. A terminal keeps Node's
 * stream (it knows the terminal's width and colours), and so does a pipe that would make the
 * process wait (EAGAIN): from then on everything goes through Node's stream, in order.
 */
import { fstatSync, statSync, writeSync } from 'node:fs';

/** A stream the command line writes to: Node's own, a test's, or an {@link FdWriter}. */
export interface OutStream {
  write(chunk: string | Uint8Array, done?: (e?: Error | null) => void): unknown;
  readonly writableNeedDrain?: boolean;
  readonly isTTY?: boolean;
}

/**
 * Writes to a file descriptor with `writeSync`, handing over to Node's stream for the process
 * when a write would have to wait.
 *
 * @example
 * new FdWriter(1, () => process.stdout, (e) => { throw e }).write('H2O\t18.015\n')
 */
export class FdWriter implements OutStream {
  readonly isTTY = false;
  private stream: OutStream | null = null;
  constructor(
    private readonly fd: number,
    private readonly nodeStream: () => OutStream,
    /** What to do when the output cannot be written (a closed pipe, a full disk). */
    private readonly onError: (e: NodeJS.ErrnoException) => void,
    /** The system call (a test's stand-in otherwise). */
    private readonly writeFd: (fd: number, bytes: Uint8Array) => number = writeSync,
  ) {}

  get writableNeedDrain(): boolean {
    return this.stream?.writableNeedDrain ?? false;
  }

  write(chunk: string | Uint8Array, done?: (e?: Error | null) => void): boolean {
    if (this.stream) {
      this.stream.write(chunk, done);
      return true;
    }
    let rest = typeof chunk === 'string' ? Buffer.from(chunk) : chunk;
    try {
      while (rest.length > 0) rest = rest.subarray(this.writeFd(this.fd, rest));
    } catch (e) {
      const err = e as NodeJS.ErrnoException;
      if (err.code !== 'EAGAIN') {
        this.onError(err);
        return true;
      }
      // a full pipe that does not block: the rest, and everything after it, through Node's stream
      this.stream = this.nodeStream();
      this.stream.write(rest, done);
      return true;
    }
    done?.();
    return true;
  }
}

/**
 * Whether a descriptor can take plain writes: a regular file, a pipe, a socket or /dev/null, not a
 * terminal (nor anything that cannot be told apart from one).
 *
 * @example
 * plainOutput(1) // false on a terminal, true in `pondus mass H2O | cat`
 */
export function plainOutput(fd: number): boolean {
  try {
    const st = fstatSync(fd);
    if (st.isFile() || st.isFIFO() || st.isSocket()) return true;
    return st.isCharacterDevice() && st.rdev === statSync('/dev/null').rdev;
  } catch {
    return false;
  }
}
