import { Chalk, type ChalkInstance } from 'chalk';

/**
 * Colours for one output stream: on only for a terminal, off when NO_COLOR is set.
 *
 * @example
 * styleFor(process.stderr).red('error')
 */
export function styleFor(stream: { isTTY?: boolean }): ChalkInstance {
  const noColor = process.env.NO_COLOR !== undefined && process.env.NO_COLOR !== '';
  const force = process.env.FORCE_COLOR !== undefined && process.env.FORCE_COLOR !== '0';
  const level = noColor ? 0 : force || stream.isTTY ? 1 : 0;
  return new Chalk({ level });
}
