/**
 * What the command line adds once every command is registered: the `completion` and `manual`
 * commands (generated from the program itself) and the examples that end each command's `--help`.
 */
import type { Command } from 'commander';
import { registerCompletion } from './completion.js';
import { addHelpExamples } from './help-examples.js';

/**
 * Adds the completion and manual commands and the help examples; call after registering commands.
 *
 * @example
 * finishProgram(program, (s) => process.stdout.write(s), '0.1.0')
 */
export function finishProgram(program: Command, write: (s: string) => void, version: string): void {
  registerCompletion(program, write, version);
  addHelpExamples(program);
}
