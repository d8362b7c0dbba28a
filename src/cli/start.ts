/**
 * Starts the command line in this process: the streams, an interrupt, a closed pipe, and the exit
 * status. Each bundle of the command line (src/cli/bundles/) calls {@link start} with its commands.
 */
import { FdWriter, plainOutput, type OutStream } from './output/fd-writer.js';
import { flushSinksNow, outputFailure } from './output/sink.js';
import { runProgram, type CommandSet } from './program.js';

let failed = false;

/** The output cannot be written (full disk, closed pipe, I/O error): say so once and stop. */
function onOutputError(e: NodeJS.ErrnoException): void {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0); // the reader stopped reading (| head)
  if (failed) return;
  failed = true;
  try {
    process.stderr.write(`pondus: ${outputFailure(e)}\n`);
  } catch {
    // stderr is gone too
  }
  process.exit(2);
}

/**
 * Runs the command line over `process.argv` with the given commands, and sets the exit status.
 *
 * @example
 * start(ALL_COMMANDS)
 */
export function start(commands: CommandSet): void {
  // a file, a pipe or /dev/null takes plain writes; a terminal (or a write that would wait) Node's stream
  const stream = (fd: 1 | 2): OutStream => {
    const node = (): OutStream => {
      const s = fd === 1 ? process.stdout : process.stderr;
      if (fd === 1) s.on('error', onOutputError);
      return s;
    };
    return plainOutput(fd) ? new FdWriter(fd, node, onOutputError) : node();
  };
  const stdout = stream(1);
  const stderr = stream(2);

  // an interrupt keeps the results computed before it: they are written, then pondus stops
  for (const [signal, status] of [['SIGINT', 130], ['SIGTERM', 143]] as const) {
    process.on(signal, () => {
      try {
        flushSinksNow();
      } finally {
        process.exit(status);
      }
    });
  }

  runProgram(process.argv.slice(2), { stdin: () => process.stdin, stdout, stderr }, commands).then(
    (status) => {
      process.exitCode = status;
    },
    (e: unknown) => {
      const code = (e as NodeJS.ErrnoException | null)?.code;
      if (typeof code === 'string' && /^E[A-Z]+$/.test(code)) return onOutputError(e as NodeJS.ErrnoException);
      stderr.write(`pondus: internal error (please report it): ${e instanceof Error ? e.message : String(e)}\n`);
      process.exitCode = 2;
    },
  );
}
