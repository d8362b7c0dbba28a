/**
 * Presenters by command name: a command's action names itself and passes its
 * options; the runner builds the presenter here.
 *
 * The types come from {@link PRESENTERS}, the table of every command. The command line itself is
 * built in parts (one bundle per command module, so that a command loads only its own code): each
 * part runs with a {@link PresenterTable} holding only its own presenters, typed by the same names.
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

export const PRESENTERS = /* @__PURE__ */ Object.freeze({
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
/** Some of the presenters, each under its own command's name (one part of the command line). */
export type PresenterTable = { readonly [K in CommandName]?: (typeof PRESENTERS)[K] };

/**
 * The presenter of the named command for its options, from the table of every command.
 *
 * @example
 * presenterOf('mass', {}).columns[0] // 'input'
 */
export function presenterOf<K extends CommandName>(command: K, options: CommandOptions<K>): Presenter<unknown> {
  return (PRESENTERS[command] as (o: CommandOptions<K>) => Presenter<unknown>)(options);
}
