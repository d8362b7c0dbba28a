import { once } from 'node:events';
import type { Writable } from 'node:stream';

/** Text held before a write even while input keeps coming. */
const BLOCK = 65536;

/** The sinks writing to the process's own stdout and stderr, for {@link flushSinksNow}. */
const processSinks = new Map<Writable, Sink>();

/**
 * Buffered text output with back-pressure. While input keeps coming, writes accumulate in memory
 * and go out in blocks of about 64 kB; as soon as the process would wait (for more input, or for
 * anything else), what has been computed goes out, so a program that writes one line and waits
 * for its answer gets it.
 *
 * @example
 * const out = new Sink(process.stdout);
 * out.write('{"input":"H2O"}\n'); // written when the event loop next waits, or at flush
 */
export class Sink {
  private text = '';
  private idle: ReturnType<typeof setImmediate> | null = null;

  constructor(private readonly stream: Writable) {
    if (typeof process !== 'undefined' && (stream === process.stdout || stream === process.stderr)) processSinks.set(stream, this);
  }

  write(text: string): void {
    this.text += text;
    // setImmediate runs once the loop has no more ready work: when the next input chunk is not
    // there yet (a co-process waiting for its answer), or between chunks of a file being read
    this.idle ??= setImmediate(this.onIdle);
  }

  private readonly onIdle = (): void => {
    this.idle = null;
    this.push();
  };

  /** Hands everything held to the stream now (without waiting for it to drain). */
  push(): void {
    if (this.idle !== null) {
      clearImmediate(this.idle);
      this.idle = null;
    }
    if (this.text.length === 0) return;
    const text = this.text;
    this.text = '';
    this.stream.write(text);
  }

  /** Flushes when enough has accumulated (or always, with force), then waits while the stream asks. */
  async flush(force = false): Promise<void> {
    if (this.text.length >= BLOCK || (force && this.text.length > 0)) this.push();
    if (this.stream.writableNeedDrain) await once(this.stream, 'drain');
  }
}

/**
 * Writes out at once what the process's stdout and stderr sinks hold: for an interrupt, so that
 * the results computed before it are not lost.
 *
 * @example
 * process.on('SIGINT', () => { flushSinksNow(); process.exit(130); });
 */
export function flushSinksNow(): void {
  for (const s of processSinks.values()) s.push();
}

const WRITE_FAILURES: Record<string, string> = {
  ENOSPC: 'no space left on the device',
  EDQUOT: 'the disk quota is used up',
  EFBIG: 'the output file is too large for its file system',
  EIO: 'an input/output error on the device',
  EBADF: 'the output is closed',
  EROFS: 'the output is on a read-only file system',
  EACCES: 'permission denied',
};

/**
 * What to tell the user when the output cannot be written (a full disk is not an internal error).
 *
 * @example
 * outputFailure(Object.assign(new Error('write'), { code: 'ENOSPC' })) // 'cannot write the output: no space left on the device (ENOSPC); the results are incomplete'
 */
export function outputFailure(e: NodeJS.ErrnoException): string {
  const why = (e.code && WRITE_FAILURES[e.code]) ?? e.message;
  return `cannot write the output: ${why}${e.code ? ` (${e.code})` : ''}; the results are incomplete`;
}
