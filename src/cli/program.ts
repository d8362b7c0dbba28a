/**
 * The pondus command line: a thin layer that parses arguments, feeds inputs
 * to the library through a presenter, and sets the exit status
 * (0 all inputs succeeded, 1 some failed, 2 usage error).
 *
 * The program is built from a {@link CommandSet}: every command (main.ts, and the help bundle with
 * declarations only), or one command module with its presenters (a command's own bundle, which
 * loads no other command's code).
 */
import { Command, CommanderError } from 'commander';
import { PondusError } from '../errors/pondus-error.js';
import { FLAG_NAMING, renderError } from '../errors/render.js';
import { messageFor } from '../errors/message.js';
import { OptionValueError, runBatch } from './batch.js';
import { outputFormat, refuseRepeatedOptions, withUsageMessages } from './commands/common.js';
import type { CommandRunner } from './commands/runner.js';
import type { CommandName, CommandOptions, PresenterTable } from './commands/registry.js';
import type { Presenter } from './output/presenter.js';
import { fixedBatch, inputBatches } from './input/inputs.js';
import { Sink } from './output/sink.js';
import type { OutStream } from './output/fd-writer.js';
import { visibleControls } from './output/format.js';
import { styleFor } from './output/style.js';
import { addHelpExamples } from './help-examples.js';

export const VERSION = '0.1.0';

/** Options that collect a value each time they are given; every other option takes one value. */
const REPEATABLE: Record<string, string[]> = { react: ['--amount', '--fix', '--catalyst'], balance: ['--fix', '--catalyst'], reagents: ['--reagent', '--catalyst', '--additive', '--product'] };

/** The streams a run uses; tests pass their own. */
export interface CliIo {
  /** Standard input, asked for only when an input is `-` (opening it costs start-up time). */
  stdin: () => AsyncIterable<string | Buffer>;
  stdout: OutStream;
  stderr: OutStream;
}

/** Commands to build a program from: how to add them to it, and the presenters their actions run. */
export interface CommandSet {
  /** Adds the commands (declared in commands/declarations.ts) with their actions, or declared only. */
  register(program: Command, run: CommandRunner, stdin: () => AsyncIterable<string | Buffer>, only?: string): void;
  /** The presenters of the commands added. */
  presenters: PresenterTable;
  /** For a set that is the whole program (main.ts, the help bundle): adds the commands generated from it (finishProgram: completion, manual). */
  finish?(program: Command, write: (s: string) => void, version: string): void;
}

/**
 * The presenter of the named command for its options, from the presenters of a program's commands:
 * the one place the name is looked up, typed by the name so a command cannot be run with another's
 * options.
 *
 * @example
 * presenterIn(ALL_COMMANDS.presenters, 'mass', {}).columns[0] // 'input'
 */
export function presenterIn<K extends CommandName>(table: PresenterTable, command: K, options: CommandOptions<K>): Presenter<unknown> {
  const make = table[command] as ((o: CommandOptions<K>) => Presenter<unknown>) | undefined;
  if (!make) throw new Error(`the command '${command}' is not part of this bundle of the command line`);
  return make(options);
}

/**
 * The command's option values that are texts, each with its flag, for naming an option whose value
 * cannot be read (a value given to two options is named by both).
 *
 * @example
 * optionFlags({ concentration: '0.1 M', volume: '250 mL', json: true }).get('250 mL') // '--volume'
 */
export function optionFlags(options: object): Map<string, string> {
  const flags = new Map<string, string>();
  for (const [key, value] of Object.entries(options)) {
    const flag = '--' + key.replace(/[A-Z]/g, (c) => '-' + c.toLowerCase());
    for (const v of Array.isArray(value) ? value : [value]) {
      if (typeof v !== 'string') continue;
      const had = flags.get(v);
      flags.set(v, had ? `${had} or ${flag}` : flag);
    }
  }
  return flags;
}

/**
 * Runs pondus with the given arguments (without `node` and the script path) over a set of commands,
 * and returns the exit status.
 *
 * @example
 * await runProgram(['mass', 'H2O', '--json'], { stdin: () => process.stdin, stdout: process.stdout, stderr: process.stderr }, MASS_COMMANDS) // 0
 */
export async function runProgram(args: string[], io: CliIo, commands: CommandSet): Promise<number> {
  const out = new Sink(io.stdout);
  const err = new Sink(io.stderr);
  const outStyle = styleFor(io.stdout);
  const errStyle = styleFor(io.stderr);
  let status = 0;

  const run: CommandRunner = async (command, inputs, options, lineNumbers, source) => {
    const presenter = presenterIn(commands.presenters, command, options);
    const format = outputFormat(options);
    if (inputs.length === 0 && !source) {
      throw new PondusError([{ code: 'USAGE', message: 'no inputs: give them as arguments, or - to read one per line from standard input' }]);
    }
    const numbered = inputs.includes('-') || inputs.length > 1;
    const batches = source ?? (lineNumbers ? fixedBatch(inputs, lineNumbers) : inputBatches(inputs, io.stdin));
    const columns = io.stdout.isTTY ? (io.stdout as { columns?: number }).columns : undefined;
    const summary = await runBatch(presenter, batches, format, { out, err, outStyle, errStyle, columns, optionFlags: optionFlags(options) }, numbered || !!lineNumbers || !!source);
    if (presenter.tally) {
      const line = `${summary.tallied} of ${summary.total} ${presenter.tally.words}\n`;
      if (format === 'table') out.write(line);
      else err.write(`pondus: ${line}`);
    }
    if (summary.total === 0) {
      // an empty file piped in gives no row at all: said, and the usage status, as for no arguments
      const where = source ? 'the sheet has no rows' : 'standard input was empty';
      err.write(`pondus: no inputs: ${where}, so nothing was read\n`);
      status = 2;
    } else if (summary.failed > 0) {
      // an input refused for the options given (a conflict only its reading shows) is a usage error
      status = summary.usage ? 2 : 1;
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
  // a command's own bundle declares only the command run (of a module's several), not its siblings;
  // the whole program (help, completion, the manual) declares every command
  commands.register(program, run, io.stdin, commands.finish ? undefined : args[0]);

  // an option that takes one value is never silently overridden by a second one (exit 2), and
  // commander's usage errors say what the command declared (a conflict's reason, a required option's hint)
  for (const cmd of program.commands) withUsageMessages(refuseRepeatedOptions(cmd, REPEATABLE[cmd.name()] ?? []));
  // for the whole program, the completion and manual commands; then the examples at the end of every --help
  commands.finish?.(program, (s) => out.write(s), VERSION);
  addHelpExamples(program);

  try {
    // bare `pondus`: its help, once, on standard output, and the usage status
    if (args.length === 0) {
      program.outputHelp();
      status = 2;
    } else await program.parseAsync(args, { from: 'user' });
  } catch (e) {
    if (e instanceof CommanderError) {
      status = e.exitCode === 0 ? 0 : 2;
    } else if (e instanceof OptionValueError) {
      err.write(`pondus: ${e.flag} '${visibleControls(e.value)}' cannot be read, so no input was worked:\n${renderError(e.error, { emphasis: errStyle.red, naming: FLAG_NAMING })}\n`);
      status = 2;
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
