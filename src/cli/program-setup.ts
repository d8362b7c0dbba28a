/**
 * What the whole program adds once every command is registered: the `completion` and `manual`
 * commands, generated from the program itself. A command's own bundle leaves them out (the
 * launcher sends `completion` and `manual` to the help bundle), and with them their code.
 */
import type { Command } from 'commander';
import { registerCompletion } from './completion.js';

/**
 * Adds the completion and manual commands; call after registering every command.
 *
 * @example
 * finishProgram(program, (s) => process.stdout.write(s), '0.1.0')
 */
export function finishProgram(program: Command, write: (s: string) => void, version: string): void {
  registerCompletion(program, write, version);
}
