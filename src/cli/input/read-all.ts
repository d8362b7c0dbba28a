import { readFileSync } from 'node:fs';
import { fail } from '../../errors/pondus-error.js';

/**
 * Reads a whole sheet from a file, or from standard input when the path is '-'.
 *
 * @example
 * await readAllText('results.csv', () => process.stdin)
 */
export async function readAllText(path: string, stdin: () => AsyncIterable<string | Buffer>): Promise<string> {
  if (path !== '-') {
    try {
      return readFileSync(path, 'utf8');
    } catch (e) {
      throw fail({ code: 'USAGE', message: `cannot read ${path}: ${(e as NodeJS.ErrnoException).code ?? String(e)}` });
    }
  }
  let text = '';
  for await (const chunk of stdin()) text += typeof chunk === 'string' ? chunk : chunk.toString('utf8');
  return text;
}
