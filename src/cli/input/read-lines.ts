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
export async function* readLineBatches(stream: AsyncIterable<string | Buffer> & { setEncoding?: (e: BufferEncoding) => unknown }): AsyncGenerator<string[]> {
  stream.setEncoding?.('utf8');
  let rest = '';
  let first = true;
  for await (const chunk of stream) {
    let text = rest + (typeof chunk === 'string' ? chunk : chunk.toString('utf8'));
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

/** Offset of the next LF or CR from `from`, or -1. */
function lineEnd(text: string, from: number): number {
  for (let i = from; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 10 || c === 13) return i;
  }
  return -1;
}
