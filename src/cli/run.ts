/** Entry point of the bundled CLI. */
import { main } from './main.js';

process.stdout.on('error', (e: NodeJS.ErrnoException) => {
  if (e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
});

main(process.argv.slice(2), { stdin: () => process.stdin, stdout: process.stdout, stderr: process.stderr }).then(
  (status) => {
    process.exitCode = status;
  },
  (e: unknown) => {
    process.stderr.write(`pondus: internal error (please report it): ${e instanceof Error ? e.message : String(e)}\n`);
    process.exitCode = 2;
  },
);
