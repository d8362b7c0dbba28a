import type { Presenter } from '../output/presenter.js';
import type { OutputOptions } from './common.js';

/** What a command's action calls: run the presenter over the inputs with the chosen output. */
export type CommandRunner = <R>(inputs: string[], options: OutputOptions, presenter: Presenter<R>) => Promise<void>;
