import type { InputItem } from '../input/inputs.js';
import type { CommandName, CommandOptions } from './registry.js';

/**
 * What a command's action calls: run the named command's presenter (see
 * registry.ts) over the inputs, with the chosen output. Inputs read from a file
 * by the command itself come with their line numbers, or as a stream of batches (a sheet read row by row).
 */
export type CommandRunner = <K extends CommandName>(command: K, inputs: string[], options: CommandOptions<K>, lineNumbers?: number[], source?: AsyncIterable<InputItem[]>) => Promise<void>;
