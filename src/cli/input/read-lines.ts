import { StringDecoder } from 'node:string_decoder';

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
  // Each piece is searched for line ends once: the pieces of a line that has not ended yet are held
  // and joined when it ends, so a 10 MB line with no line end costs one pass, not one per piece.
  let held: string[] = [];
  let skipLf = false; // the last piece ended in a CR: an LF that starts the next one is its CRLF
  let first = true;
  for await (let text of textPieces(stream)) {
    if (text.length === 0) continue;
    if (first) {
      if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
      first = false;
    }
    let start = 0;
    if (skipLf && text.charCodeAt(0) === 10) start = 1;
    skipLf = false;
    const hasCr = text.indexOf('\r', start) >= 0;
    let lines: string[] = [];
    for (;;) {
      const nl = hasCr ? lineEnd(text, start) : text.indexOf('\n', start);
      if (nl < 0) break;
      let line = text.slice(start, nl);
      if (held.length > 0) {
        held.push(line);
        line = held.join('');
        held = [];
      }
      lines.push(line);
      start = nl + 1;
      if (text.charCodeAt(nl) === 13) {
        if (start === text.length) skipLf = true;
        else if (text.charCodeAt(start) === 10) start++;
      }
      if (lines.length === BATCH) {
        yield lines;
        lines = [];
      }
    }
    if (lines.length > 0) yield lines;
    if (start < text.length) held.push(text.slice(start));
  }
  // a last line without a line end
  if (held.length > 0) yield [held.join('')];
}

/** Bytes decoded at a time: each line's text then keeps only a small piece alive, not a whole 64 kB chunk. */
const PIECE = 8192;

/**
 * The text of a stream in pieces. Byte chunks are decoded (UTF-8) a few kilobytes at a time, so
 * that a batch's lines share a small string that dies with the batch instead of a whole chunk that
 * would live through several garbage collections. The decoder holds the bytes of a character cut
 * at a piece's end until the next piece.
 */
async function* textPieces(stream: AsyncIterable<string | Buffer>): AsyncGenerator<string> {
  const decoder = new StringDecoder('utf8');
  for await (const chunk of stream) {
    if (typeof chunk === 'string') {
      yield chunk;
      continue;
    }
    for (let at = 0; at < chunk.length; at += PIECE) yield decoder.write(chunk.subarray(at, Math.min(chunk.length, at + PIECE)));
  }
  const last = decoder.end();
  if (last) yield last;
}

/** Offset of the next LF or CR from `from`, or -1. */
function lineEnd(text: string, from: number): number {
  for (let i = from; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) return i;
  }
  return -1;
}
