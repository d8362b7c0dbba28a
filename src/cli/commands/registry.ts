/**
 * Presenters by command name, so a worker thread can rebuild the presenter a
 * command uses from the command's name and its (plain) options.
 */
import type { Presenter } from '../output/presenter.js';
import { analysisPresenter } from './analysis.js';
import { calcPresenter } from './calc.js';
import { compositionPresenter } from './composition.js';
import { massPresenter } from './mass.js';

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Factory = (options: any) => Presenter<any>;

export const PRESENTERS: Readonly<Record<string, Factory>> = Object.freeze({
  mass: massPresenter,
  composition: compositionPresenter,
  calc: calcPresenter,
  analysis: analysisPresenter,
});
