// The command line's bundle for `pondus empirical`: only its own code is loaded (combustion and
// candidates have bundles of their own).
import { empiricalPresenter, registerEmpiricalCommand } from '../commands/empirical.js';
import { start } from '../start.js';

start({ register: (program, run, stdin) => registerEmpiricalCommand(program, run, stdin), presenters: { empirical: empiricalPresenter } });
