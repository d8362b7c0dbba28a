import { Chalk, type ChalkInstance } from 'chalk';

/**
 * The colour level for one output stream, from the environment:
 * `NO_COLOR` (not empty) turns colour off, whatever else is set; `FORCE_COLOR=0` (or `false`)
 * turns it off; `FORCE_COLOR=1`, `2` or `3` (or empty, or `true`) turns it on at that level even
 * on a pipe; `TERM=dumb` turns it off unless forced; otherwise colour only on a terminal.
 *
 * @example
 * colorLevel({ isTTY: true }, { TERM: 'dumb' }) // 0
 * colorLevel({ isTTY: false }, { FORCE_COLOR: '1' }) // 1
 */
export function colorLevel(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): 0 | 1 | 2 | 3 {
  if (env.NO_COLOR !== undefined && env.NO_COLOR !== '') return 0;
  const force = env.FORCE_COLOR;
  if (force !== undefined) {
    if (force === '0' || force.toLowerCase() === 'false') return 0;
    const n = Number.parseInt(force, 10);
    return n >= 1 && n <= 3 ? (n as 1 | 2 | 3) : 1;
  }
  if (env.TERM === 'dumb') return 0;
  return stream.isTTY ? 1 : 0;
}

/**
 * Colours for one output stream, at the level {@link colorLevel} gives.
 *
 * @example
 * styleFor(process.stderr).red('error')
 */
export function styleFor(stream: { isTTY?: boolean }, env: Record<string, string | undefined> = process.env): ChalkInstance {
  return new Chalk({ level: colorLevel(stream, env) });
}
