/**
 * Reads text lines from a stream in batches (one array per chunk read), so the
 * per-line cost stays small on million-line inputs and memory stays flat.
 * A trailing newline does not make an extra empty line; CRLF and a leading
 * byte-order mark are handled.
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
    const lines = text.split('\n');
    rest = lines.pop()!;
    for (let i = 0; i < lines.length; i++) {
      const l = lines[i];
      if (l.length > 0 && l.charCodeAt(l.length - 1) === 13) lines[i] = l.slice(0, -1);
    }
    if (lines.length > 0) yield lines;
  }
  if (rest.length > 0) yield [rest.endsWith('\r') ? rest.slice(0, -1) : rest];
}
