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

// eslint-disable-next-line @typescript-eslint/no-explicit-any
type Factory = (options: any) => Presenter<any>;

export const PRESENTERS: Readonly<Record<string, Factory>> = Object.freeze({
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
