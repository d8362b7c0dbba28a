/**
 * The whole pondus command line in one program, every command with its action: what the tests
 * run (dist/test/cli-main.cjs) and what `npm run build` checks the per-command bundles against.
 */
import { registerAnalysis } from './commands/analysis.js';
import { registerBalance } from './commands/balance.js';
import { registerCalc } from './commands/calc.js';
import { registerConversions } from './commands/conversions.js';
import { registerEmpirical } from './commands/empirical.js';
import { registerPrepare } from './commands/prepare.js';
import { registerReact } from './commands/react.js';
import { registerReagents } from './commands/reagents.js';
import { registerComposition } from './commands/composition.js';
import { registerMass } from './commands/mass.js';
import { registerQc } from './commands/qc.js';
import { registerPharmacy } from './commands/pharmacy.js';
import { registerIonCommands } from './commands/ion.js';
import { PRESENTERS } from './commands/registry.js';
import { runProgram, type CliIo, type CommandSet } from './program.js';
import { finishProgram } from './program-setup.js';

export { VERSION, type CliIo } from './program.js';
export { HELP_EXAMPLES } from './help-examples.js';

/** Every command, in the order `pondus --help` lists them, with its action and presenter. */
export const ALL_COMMANDS: CommandSet = {
  register(program, run, stdin) {
    registerMass(program, run);
    registerComposition(program, run);
    registerCalc(program, run);
    registerAnalysis(program, run, stdin);
    registerEmpirical(program, run, stdin);
    registerBalance(program, run);
    registerReact(program, run);
    registerReagents(program, run, stdin);
    registerPrepare(program, run, stdin);
    registerConversions(program, run);
    registerQc(program, run);
    registerPharmacy(program, run);
    registerIonCommands(program, run, stdin);
  },
  presenters: PRESENTERS,
  finish: finishProgram,
};

/**
 * Runs pondus with the given arguments (without `node` and the script path) and returns the exit status.
 *
 * @example
 * await main(['mass', 'H2O', '--json'], { stdin: () => process.stdin, stdout: process.stdout, stderr: process.stderr }) // 0
 */
export function main(args: string[], io: CliIo): Promise<number> {
  return runProgram(args, io, ALL_COMMANDS);
}
