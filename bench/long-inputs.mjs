// Long inputs, each command: every command must answer or refuse within about a second whatever
// its input. For each example of each command's help, the input (read from standard input) and
// then each option's value in turn are replaced by a long text: a number, a run of spaces, and a
// letter ('1' + n spaces + 'x'), the shape that made a reader quadratic. Prints the slowest case
// of each command, and every case past the goal.
//   node bench/long-inputs.mjs [--quick]      (build first: npm run build)
// Exported as longInputRows() for bench/run.mjs, which prints its lines.
import { spawnSync } from 'node:child_process';
import { createRequire } from 'node:module';
import { fileURLToPath, pathToFileURL } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const bin = `${root}bin/pondus.cjs`;
const GOAL_MS = 1000;

/** The words of an example's command line, as a shell would pass them. */
const words = (line) => [...line.matchAll(/'([^']*)'|(\S+)/g)].map((m) => m[1] ?? m[2]).slice(1);

/** Runs pondus with `args` and `stdin`; returns the wall time (ms) and the exit status. */
function run(args, stdin) {
  const t0 = process.hrtime.bigint();
  const r = spawnSync(process.execPath, [bin, ...args], { input: stdin, stdio: ['pipe', 'ignore', 'ignore'], timeout: 20_000, maxBuffer: 1 << 20 });
  return { ms: Number(process.hrtime.bigint() - t0) / 1e6, status: r.status ?? 'killed' };
}

/**
 * Runs the cases; returns the lines to print.
 *
 * @example
 * for (const line of longInputRows({ quick: true })) console.log(line)
 */
export function longInputRows({ quick = false } = {}) {
  const examples = createRequire(import.meta.url)(`${root}dist/test/cli-main.cjs`).HELP_EXAMPLES;
  // an argument is at most 128 kB on Linux; standard input takes the longer text
  const argText = `1${' '.repeat(quick ? 20_000 : 100_000)}x`;
  const lineText = `1${' '.repeat(quick ? 50_000 : 200_000)}x\n`;
  const out = [];
  const over = [];
  for (const [command, list] of Object.entries(examples)) {
    if (command === 'completion' || command === 'manual') continue;
    let worst = { ms: 0, what: '' };
    for (const example of list) {
      const args = words(example);
      if (args.some((a) => a.startsWith('examples/'))) continue; // a file's rows, not one text
      const cases = [];
      const input = args.findIndex((a, i) => i > 0 && !a.startsWith('-') && !args[i - 1].startsWith('--'));
      if (input > 0) cases.push({ what: 'the input, on standard input', args: args.map((a, i) => (i === input ? '-' : a)), stdin: lineText });
      args.forEach((a, i) => {
        if (i > 0 && args[i - 1].startsWith('--') && !a.startsWith('-')) cases.push({ what: `the value of ${args[i - 1]}`, args: args.map((b, j) => (j === i ? argText : b)), stdin: '' });
      });
      for (const c of cases) {
        const r = run(c.args, c.stdin);
        if (r.ms > worst.ms) worst = { ms: r.ms, what: c.what };
        if (r.ms > GOAL_MS) over.push(`          past the goal: pondus ${command}, the long text as ${c.what}: ${r.ms.toFixed(0)} ms (exit ${r.status})`);
      }
    }
    out.push(`          ${command.padEnd(14)} slowest ${worst.ms.toFixed(0).padStart(6)} ms (when it is ${worst.what || 'the input'})`);
  }
  return [`long      each command's slowest long input ('1', ${quick ? '20,000/50,000' : '100,000/200,000'} spaces, 'x'; goal < ${GOAL_MS} ms)`, ...out, ...over];
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) {
  for (const line of longInputRows({ quick: process.argv.includes('--quick') })) console.log(line);
}
