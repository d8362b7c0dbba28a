import type { OutputOptions } from './common.js';

/**
 * What a command's action calls: run the named command's presenter (see
 * registry.ts) over the inputs, with the chosen output.
 */
export type CommandRunner = (command: string, inputs: string[], options: OutputOptions) => Promise<void>;
