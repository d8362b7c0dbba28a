// The command line's bundle for `pondus candidates`: only its own code is loaded.
import { candidatesPresenter, registerCandidates } from '../commands/empirical.js';
import { start } from '../start.js';

start({ register: (program, run) => registerCandidates(program, run), presenters: { candidates: candidatesPresenter } });
