// The command line's bundle for `pondus empirical`, `pondus combustion`, `pondus candidates`: only their own code is loaded.
import { registerEmpirical, candidatesPresenter, combustionPresenter, empiricalPresenter } from '../commands/empirical.js';
import { start } from '../start.js';

start({ register: registerEmpirical, presenters: { empirical: empiricalPresenter, combustion: combustionPresenter, candidates: candidatesPresenter } });
