/** Most lines per batch: small batches keep few objects alive when the garbage collector runs. */
const BATCH = 512;

/**
 * Reads text lines from a stream in batches of up to 512, so the per-line cost
 * stays small on million-line inputs and memory stays flat. A trailing newline
 * does not make an extra empty line; CRLF and a leading byte-order mark are handled.
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
    let start = 0;
    for (;;) {
      const lines: string[] = [];
      let nl = -1;
      while (lines.length < BATCH && (nl = text.indexOf('\n', start)) >= 0) {
        const end = nl > start && text.charCodeAt(nl - 1) === 13 ? nl - 1 : nl;
        lines.push(text.slice(start, end));
        start = nl + 1;
      }
      if (lines.length > 0) yield lines;
      if (nl < 0) break;
    }
    rest = text.slice(start);
  }
  if (rest.length > 0) yield [rest.endsWith('\r') ? rest.slice(0, -1) : rest];
}
