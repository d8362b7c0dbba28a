// The command line's bundle for `pondus combustion`: only its own code is loaded.
import { combustionPresenter, registerCombustion } from '../commands/empirical.js';
import { start } from '../start.js';

start({ register: (program, run) => registerCombustion(program, run), presenters: { combustion: combustionPresenter } });
