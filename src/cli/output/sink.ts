import { once, type EventEmitter } from 'node:events';
import { FdWriter, type OutStream } from './fd-writer.js';

/** Bytes held before a write even while input keeps coming. */
const BLOCK = 65536;
/** Size of each output buffer: a batch may write more than a block before it is flushed. */
const CAPACITY = 2 * BLOCK;
/** Text gathered before it is encoded (a long string of many small ones costs more to flatten). */
const PENDING = 4096;
/** Buffers kept for reuse once the stream has written them (the process's own stdout and stderr). */
const POOL = 4;

/** The sinks writing to the process's own stdout and stderr, for {@link flushSinksNow}. */
const processSinks = new Map<OutStream, Sink>();

/**
 * Buffered text output with back-pressure. While input keeps coming, writes accumulate in memory
 * and go out in blocks of about 64 kB; as soon as the process would wait (for more input, or for
 * anything else), what has been computed goes out, so a program that writes one line and waits
 * for its answer gets it.
 *
 * Writes are encoded (UTF-8) into a preallocated buffer every few kilobytes: a long string built
 * from many small ones and encoded only at the end costs more to flatten than the rows cost to
 * compute, and its pieces would live on through garbage collections. A buffer is handed to the
 * stream whole, so every chunk holds complete writes; for the process's own stdout and stderr, a
 * buffer the stream has finished writing is used again, which keeps memory flat however long
 * the input.
 *
 * @example
 * const out = new Sink(process.stdout);
 * out.write('{"input":"H2O"}\n'); // written when the event loop next waits, or at flush
 */
export class Sink {
  /** Writes not yet encoded: a few kilobytes, encoded together. */
  private pending = '';
  private buf: Buffer | null = null;
  private used = 0;
  private idle: ReturnType<typeof setImmediate> | null = null;
  /** Buffers written out and free again (only for streams known not to keep a chunk after writing it). */
  private readonly free: Buffer[] | null;

  constructor(private readonly stream: OutStream) {
    // (an FdWriter is the process's own: asking for process.stdout would open Node's stream)
    const own = stream instanceof FdWriter || (typeof process !== 'undefined' && (stream === process.stdout || stream === process.stderr));
    if (own) processSinks.set(stream, this);
    this.free = own ? [] : null;
  }

  write(text: string): void {
    this.pending += text;
    if (this.pending.length >= PENDING) this.encode();
    // setImmediate runs once the loop has no more ready work: when the next input chunk is not
    // there yet (a co-process waiting for its answer), or between chunks of a file being read
    this.idle ??= setImmediate(this.onIdle);
  }

  /** Encodes the pending text into the current buffer (handing a full one to the stream first). */
  private encode(): void {
    const text = this.pending;
    if (text.length === 0) return;
    this.pending = '';
    // a UTF-16 unit takes at most 3 bytes in UTF-8 (a surrogate pair, 2 units, takes 4)
    const most = text.length * 3;
    if (this.buf === null || this.used + most > CAPACITY) {
      if (this.used > 0) this.hand();
      if (most > CAPACITY) {
        this.stream.write(text);
        return;
      }
      this.buf ??= this.free?.pop() ?? Buffer.allocUnsafeSlow(CAPACITY);
    }
    this.used += this.buf.write(text, this.used);
  }

  /** Gives the stream the bytes of the current buffer. */
  private hand(): void {
    const buf = this.buf!;
    const chunk = buf.subarray(0, this.used);
    this.buf = null;
    this.used = 0;
    const free = this.free;
    if (free) {
      this.stream.write(chunk, (e) => {
        if (!e && free.length < POOL) free.push(buf);
      });
    } else this.stream.write(chunk);
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
    this.encode();
    if (this.used > 0) this.hand();
  }

  /** Flushes when enough has accumulated (or always, with force), then waits while the stream asks. */
  async flush(force = false): Promise<void> {
    const held = this.used + this.pending.length;
    if (held >= BLOCK || (force && held > 0)) this.push();
    if (this.stream.writableNeedDrain) await once(this.stream as unknown as EventEmitter, 'drain');
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
