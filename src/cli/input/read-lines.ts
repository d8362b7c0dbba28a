/** Most lines per batch: small batches keep few objects alive when the garbage collector runs. */
const BATCH = 512;

/**
 * Reads text lines from a stream in batches of up to 512, so the per-line cost
 * stays small on million-line inputs and memory stays flat. A trailing newline
 * does not make an extra empty line; a leading byte-order mark is dropped. A line
 * ends at LF, CRLF or a lone CR (a file saved with old Mac line endings is read
 * as lines, not as one long line).
 *
 * @example
 * for await (const batch of readLineBatches(process.stdin)) console.log(batch.length);
 */
export async function* readLineBatches(stream: AsyncIterable<string | Buffer>): AsyncGenerator<string[]> {
  let rest = '';
  let first = true;
  for await (const chunk of textPieces(stream)) {
    let text = rest + chunk;
    if (first) {
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      first = false;
    }
    const hasCr = text.indexOf('\r') >= 0;
    let start = 0;
    for (;;) {
      const lines: string[] = [];
      let nl = -1;
      if (!hasCr) {
        while (lines.length < BATCH && (nl = text.indexOf('\n', start)) >= 0) {
          lines.push(text.slice(start, nl));
          start = nl + 1;
        }
      } else {
        while (lines.length < BATCH && (nl = lineEnd(text, start)) >= 0) {
          // a CR at the end of the chunk may be the first half of a CRLF: wait for the next chunk
          if (text.charCodeAt(nl) === 13 && nl === text.length - 1) {
            nl = -1;
            break;
          }
          lines.push(text.slice(start, nl));
          start = text.charCodeAt(nl) === 13 && text.charCodeAt(nl + 1) === 10 ? nl + 2 : nl + 1;
        }
      }
      if (lines.length > 0) yield lines;
      if (nl < 0) break;
    }
    rest = text.slice(start);
  }
  if (rest.length > 0) {
    // the held CR (a last line ending in CR), or a last line without a line end
    const lines = rest.split(/\r\n|\r|\n/);
    if (lines[lines.length - 1] === '') lines.pop();
    if (lines.length > 0) yield lines;
  }
}

/** Bytes decoded at a time: each line's text then keeps only a small piece alive, not a whole 64 kB chunk. */
const PIECE = 8192;

/**
 * The text of a stream in pieces. Byte chunks are decoded (UTF-8) a few kilobytes at a time, cut
 * just after a line end (an LF or CR byte is never part of a longer UTF-8 sequence), so that a
 * batch's lines share a small string that dies with the batch instead of a whole chunk that would
 * live through several garbage collections; bytes after the last line end wait for the next chunk.
 */
async function* textPieces(stream: AsyncIterable<string | Buffer>): AsyncGenerator<string> {
  let carry: Buffer | null = null;
  for await (const chunk of stream) {
    if (typeof chunk === 'string') {
      yield chunk;
      continue;
    }
    const buf: Buffer = carry ? Buffer.concat([carry, chunk]) : chunk;
    carry = null;
    let start = 0;
    while (start < buf.length) {
      let end = start + PIECE;
      if (end >= buf.length) end = buf.length;
      else end = Math.max(buf.lastIndexOf(10, end), buf.lastIndexOf(13, end)) + 1;
      if (end <= start) {
        // no line end in the window: the first one after it, if any
        const lf = buf.indexOf(10, start);
        const cr = buf.indexOf(13, start);
        end = (lf < 0 ? cr : cr < 0 ? lf : Math.min(lf, cr)) + 1;
        if (end <= 0) break;
      }
      const last = buf[end - 1];
      if (end === buf.length && last !== 10 && last !== 13) break;
      yield buf.toString('utf8', start, end);
      start = end;
    }
    if (start < buf.length) carry = buf.subarray(start);
  }
  if (carry) yield carry.toString('utf8');
}

/** Offset of the next LF or CR from `from`, or -1. */
function lineEnd(text: string, from: number): number {
  for (let i = from; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) return i;
  }
  return -1;
}
