/**
 * Presenters by command name: a command's action names itself and passes its
 * options; the runner builds the presenter here.
 */
import type { Presenter } from '../output/presenter.js';
import { analysisPresenter } from './analysis.js';
import { balancePresenter } from './balance.js';
import { basisPresenter, dilutePresenter, gravimetricPresenter, saltPresenter } from './conversions.js';
import { candidatesPresenter, combustionPresenter, empiricalPresenter } from './empirical.js';
import { preparePresenter } from './prepare.js';
import { reactPresenter } from './react.js';
import { reagentsPresenter } from './reagents.js';
import { calcPresenter } from './calc.js';
import { compositionPresenter } from './composition.js';
import { massPresenter } from './mass.js';
import { QC_PRESENTERS } from './qc.js';
import { PHARMACY_PRESENTERS } from './pharmacy.js';
import { ionPresenter } from './ion.js';
import { patternPresenter } from './pattern.js';

export const PRESENTERS = Object.freeze({
  mass: massPresenter,
  composition: compositionPresenter,
  calc: calcPresenter,
  analysis: analysisPresenter,
  balance: balancePresenter,
  react: reactPresenter,
  reagents: reagentsPresenter,
  prepare: preparePresenter,
  dilute: dilutePresenter,
  gravimetric: gravimetricPresenter,
  basis: basisPresenter,
  salt: saltPresenter,
  empirical: empiricalPresenter,
  combustion: combustionPresenter,
  candidates: candidatesPresenter,
  ...QC_PRESENTERS,
  ...PHARMACY_PRESENTERS,
  ion: ionPresenter,
  pattern: patternPresenter,
});

/** The name of a command that prints results. */
export type CommandName = keyof typeof PRESENTERS;
/** The options the named command's presenter takes. */
export type CommandOptions<K extends CommandName> = Parameters<(typeof PRESENTERS)[K]>[0];

/**
 * The presenter of the named command for its options: the one place the name is looked up, typed
 * by the name so a command cannot be run with another's options.
 *
 * @example
 * presenterOf('mass', {}).columns[0] // 'input'
 */
export function presenterOf<K extends CommandName>(command: K, options: CommandOptions<K>): Presenter<unknown> {
  return (PRESENTERS[command] as (o: CommandOptions<K>) => Presenter<unknown>)(options);
}
