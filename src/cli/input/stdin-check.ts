import { fstatSync, statSync } from 'node:fs';
import { fail } from '../../errors/pondus-error.js';

/**
 * Refuses standard input that cannot hold inputs — a directory, or a closed descriptor (which Node
 * opens on /dev/null) — with a usage error (exit 2) saying what happened, instead of reading
 * nothing and succeeding. Streams other than the process's own fd 0 (tests) are not checked.
 *
 * @example
 * refuseUnreadableStdin(process.stdin) // throws USAGE when run as `pondus mass - < /tmp`
 */
export function refuseUnreadableStdin(stream: unknown): void {
  if (typeof stream !== 'object' || stream === null || (stream as { fd?: unknown }).fd !== 0) return;
  let st;
  try {
    st = fstatSync(0);
  } catch (e) {
    throw fail({ code: 'USAGE', message: `standard input cannot be read (${(e as NodeJS.ErrnoException).code ?? String(e)}): give the inputs in a file or a pipe, as in pondus mass - < formulas.txt` });
  }
  if (st.isDirectory()) throw fail({ code: 'USAGE', message: 'standard input is a directory, not text: give the inputs in a file or a pipe, as in pondus mass - < formulas.txt' });
  if (st.isCharacterDevice() && st.rdev === nullDevice()) {
    throw fail({ code: 'USAGE', message: "standard input is closed (or /dev/null), so '-' has no inputs to read: give them in a file or a pipe, or as arguments" });
  }
}

function nullDevice(): number | undefined {
  try {
    return statSync('/dev/null').rdev;
  } catch {
    return undefined;
  }
}

/**
 * A read error of standard input (EISDIR, EIO, …) as a usage error; anything else unchanged.
 *
 * @example
 * stdinReadError(Object.assign(new Error('read'), { code: 'EIO' })).message // 'cannot read standard input: EIO'
 */
export function stdinReadError(e: unknown): unknown {
  const code = (e as NodeJS.ErrnoException | null)?.code;
  if (typeof code === 'string' && /^E[A-Z]+$/.test(code)) return fail({ code: 'USAGE', message: `cannot read standard input: ${code}` });
  return e;
}
