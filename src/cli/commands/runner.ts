import type { InputItem } from '../input/inputs.js';
import type { OutputOptions } from './common.js';

/**
 * What a command's action calls: run the named command's presenter (see
 * registry.ts) over the inputs, with the chosen output. Inputs read from a file
 * by the command itself come with their line numbers, or as a stream of batches (a sheet read row by row).
 */
export type CommandRunner = (command: string, inputs: string[], options: OutputOptions, lineNumbers?: number[], source?: AsyncIterable<InputItem[]>) => Promise<void>;
