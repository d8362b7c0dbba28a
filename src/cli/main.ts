/**
 * The pondus command line: a thin layer that parses arguments, feeds inputs
 * to the library through a presenter, and sets the exit status
 * (0 all inputs succeeded, 1 some failed, 2 usage error).
 */
import { Command, CommanderError } from 'commander';
import type { Writable } from 'node:stream';
import { PondusError } from '../errors/pondus-error.js';
import { FLAG_NAMING, renderError } from '../errors/render.js';
import { messageFor } from '../errors/message.js';
import { runBatch } from './batch.js';
import { registerAnalysis } from './commands/analysis.js';
import { registerBalance } from './commands/balance.js';
import { registerCalc } from './commands/calc.js';
import { registerConversions } from './commands/conversions.js';
import { registerEmpirical } from './commands/empirical.js';
import { registerPrepare } from './commands/prepare.js';
import { registerReact } from './commands/react.js';
import { registerReagents } from './commands/reagents.js';
import { registerComposition } from './commands/composition.js';
import { outputFormat, refuseRepeatedOptions } from './commands/common.js';
import { registerMass } from './commands/mass.js';
import { registerQc } from './commands/qc.js';
import { registerPharmacy } from './commands/pharmacy.js';
import { registerIonCommands } from './commands/ion.js';
import type { CommandRunner } from './commands/runner.js';
import { presenterOf } from './commands/registry.js';
import { fixedBatch, inputBatches } from './input/inputs.js';
import { Sink } from './output/sink.js';
import { visibleControls } from './output/format.js';
import { styleFor } from './output/style.js';
import { finishProgram } from './program-setup.js';

export const VERSION = '0.1.0';

/** Options that collect a value each time they are given; every other option takes one value. */
const REPEATABLE: Record<string, string[]> = { react: ['--amount', '--fix', '--catalyst'], balance: ['--fix', '--catalyst'], reagents: ['--reagent', '--catalyst', '--additive', '--product'] };

/** The streams a run uses; tests pass their own. */
export interface CliIo {
  /** Standard input, asked for only when an input is `-` (opening it costs start-up time). */
  stdin: () => AsyncIterable<string | Buffer>;
  stdout: Writable & { isTTY?: boolean };
  stderr: Writable & { isTTY?: boolean };
}

/**
 * Runs pondus with the given arguments (without `node` and the script path) and returns the exit status.
 *
 * @example
 * await main(['mass', 'H2O', '--json'], { stdin: () => process.stdin, stdout: process.stdout, stderr: process.stderr }) // 0
 */
export async function main(args: string[], io: CliIo): Promise<number> {
  const out = new Sink(io.stdout);
  const err = new Sink(io.stderr);
  const outStyle = styleFor(io.stdout);
  const errStyle = styleFor(io.stderr);
  let status = 0;

  const run: CommandRunner = async (command, inputs, options, lineNumbers, source) => {
    const presenter = presenterOf(command, options);
    const format = outputFormat(options);
    if (inputs.length === 0 && !source) {
      throw new PondusError([{ code: 'USAGE', message: 'no inputs: give them as arguments, or - to read one per line from standard input' }]);
    }
    const numbered = inputs.includes('-') || inputs.length > 1;
    const batches = source ?? (lineNumbers ? fixedBatch(inputs, lineNumbers) : inputBatches(inputs, io.stdin));
    const columns = io.stdout.isTTY ? (io.stdout as { columns?: number }).columns : undefined;
    const summary = await runBatch(presenter, batches, format, { out, err, outStyle, errStyle, columns }, numbered || !!lineNumbers || !!source);
    if (presenter.tally) {
      const line = `${summary.tallied} of ${summary.total} ${presenter.tally.words}\n`;
      if (format === 'table') out.write(line);
      else err.write(`pondus: ${line}`);
    }
    if (summary.failed > 0) {
      status = 1;
      if (format !== 'table' || summary.total > 1) {
        const lines = summary.failedLines.join(', ') + (summary.failed > summary.failedLines.length ? ', …' : '');
        err.write(`pondus: ${summary.failed} of ${summary.total} input${summary.total === 1 ? '' : 's'} failed (line${summary.failed === 1 ? '' : 's'} ${lines})\n`);
      }
    }
  };

  const program = new Command()
    .name('pondus')
    .description('Quantitative chemistry for the bench: molar masses, composition, formulas from measurements, elemental analysis, reactions and solutions.')
    .version(VERSION)
    .exitOverride()
    .showSuggestionAfterError(true)
    .configureOutput({
      writeOut: (s) => out.write(s),
      writeErr: (s) => err.write(s),
      // one message style: commander's own usage errors start 'pondus:' like every other message
      outputError: (s, write) => write(errStyle.red(s.split('\n').map((l) => visibleControls(l)).join('\n').replace(/^error: /, 'pondus: '))),
    });
  registerMass(program, run);
  registerComposition(program, run);
  registerCalc(program, run);
  registerAnalysis(program, run, io.stdin);
  registerEmpirical(program, run, io.stdin);
  registerBalance(program, run);
  registerReact(program, run);
  registerReagents(program, run, io.stdin);
  registerPrepare(program, run, io.stdin);
  registerConversions(program, run);
  registerQc(program, run);
  registerPharmacy(program, run);
  registerIonCommands(program, run, io.stdin);

  // an option that takes one value is never silently overridden by a second one (exit 2)
  for (const cmd of program.commands) refuseRepeatedOptions(cmd, REPEATABLE[cmd.name()] ?? []);
  // completion and manual commands, the examples at the end of every --help
  finishProgram(program, (s) => out.write(s), VERSION);

  try {
    // bare `pondus`: its help, once, on standard output, and the usage status
    if (args.length === 0) {
      program.outputHelp();
      status = 2;
    } else await program.parseAsync(args, { from: 'user' });
  } catch (e) {
    if (e instanceof CommanderError) {
      status = e.exitCode === 0 ? 0 : 2;
    } else if (e instanceof PondusError && e.first.code === 'USAGE') {
      err.write(`pondus: ${messageFor(e.first, FLAG_NAMING)}\n`);
      status = 2;
    } else if (e instanceof PondusError) {
      err.write(renderError(e, { emphasis: errStyle.red, naming: FLAG_NAMING }) + '\n');
      status = 2;
    } else {
      err.write(`pondus: internal error (please report it): ${e instanceof Error ? e.message : String(e)}\n`);
      status = 2;
    }
  }
  await out.flush(true);
  await err.flush(true);
  return status;
}
